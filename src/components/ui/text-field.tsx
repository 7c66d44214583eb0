import { Eye, EyeOff } from 'lucide-react';
import { useState, type InputHTMLAttributes, type ReactNode } from 'react';
import { useFormContext, type RegisterOptions } from 'react-hook-form';
import { describedBy, FieldShell, inputClasses, useFieldState } from '@/components/ui/field';

interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'name' | 'id'> {
  name: string;
  label: ReactNode;
  hint?: ReactNode;
  labelAside?: ReactNode;
  registerOptions?: RegisterOptions;
  /** For password fields: a button that shows or hides what was typed. */
  revealable?: boolean;
  className?: string;
}

/** A text input bound to the surrounding <Form> (react-hook-form). */
export function TextField({
  name,
  label,
  hint,
  labelAside,
  registerOptions,
  revealable,
  type = 'text',
  className,
  ...inputProps
}: TextFieldProps) {
  const { register } = useFormContext();
  const { id, hintId, errorId, error } = useFieldState(name);
  const [revealed, setRevealed] = useState(false);
  const input = (
    <input
      id={id}
      type={revealable && revealed ? 'text' : type}
      aria-invalid={error ? true : undefined}
      aria-describedby={describedBy(hint, error, hintId, errorId)}
      className={inputClasses(Boolean(error), revealable ? 'pr-12' : undefined)}
      {...inputProps}
      {...register(name, registerOptions)}
    />
  );
  return (
    <FieldShell
      id={id}
      label={label}
      hint={hint}
      hintId={hintId}
      error={error}
      errorId={errorId}
      labelAside={labelAside}
      className={className}
    >
      {revealable ? (
        <div className="relative">
          {input}
          <button
            type="button"
            onClick={() => setRevealed((v) => !v)}
            aria-pressed={revealed}
            aria-label={revealed ? 'Hide password' : 'Show password'}
            title={revealed ? 'Hide password' : 'Show password'}
            className="absolute inset-y-0 right-0 flex w-touch items-center justify-center rounded-r text-stone-500 hover:text-ink-800"
          >
            {revealed ? <EyeOff className="h-5 w-5" aria-hidden="true" /> : <Eye className="h-5 w-5" aria-hidden="true" />}
          </button>
        </div>
      ) : (
        input
      )}
    </FieldShell>
  );
}
