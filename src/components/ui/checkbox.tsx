import type { InputHTMLAttributes, ReactNode } from 'react';
import { useFormContext, type RegisterOptions } from 'react-hook-form';
import { FieldErrorText, useFieldState } from '@/components/ui/field';

interface CheckboxProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'name' | 'id' | 'type'> {
  name: string;
  label: ReactNode;
  hint?: ReactNode;
  registerOptions?: RegisterOptions;
}

/** A checkbox bound to the surrounding <Form>; the whole row is the touch target. */
export function Checkbox({ name, label, hint, registerOptions, ...rest }: CheckboxProps) {
  const { register } = useFormContext();
  const { id, hintId, errorId, error } = useFieldState(name);
  return (
    <div>
      <label htmlFor={id} className="flex min-h-touch cursor-pointer items-start gap-3 py-2 md:min-h-0">
        <input
          id={id}
          type="checkbox"
          className="mt-0.5 h-5 w-5 shrink-0 rounded border-stone-400 accent-ink-700"
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? errorId : hint ? hintId : undefined}
          {...rest}
          {...register(name, registerOptions)}
        />
        <span>
          <span className="text-base text-stone-900">{label}</span>
          {hint ? (
            <span id={hintId} className="block text-sm text-stone-600">
              {hint}
            </span>
          ) : null}
        </span>
      </label>
      {error ? <FieldErrorText id={errorId} message={error} /> : null}
    </div>
  );
}
