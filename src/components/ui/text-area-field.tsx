import type { ReactNode, TextareaHTMLAttributes } from 'react';
import { useFormContext, type RegisterOptions } from 'react-hook-form';
import { describedBy, FieldShell, inputClasses, useFieldState } from '@/components/ui/field';

interface TextAreaFieldProps extends Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'name' | 'id'> {
  name: string;
  label: ReactNode;
  hint?: ReactNode;
  labelAside?: ReactNode;
  registerOptions?: RegisterOptions;
  className?: string;
}

/** A multi-line text input bound to the surrounding <Form> (react-hook-form). */
export function TextAreaField({
  name,
  label,
  hint,
  labelAside,
  registerOptions,
  className,
  rows = 4,
  ...textareaProps
}: TextAreaFieldProps) {
  const { register } = useFormContext();
  const { id, hintId, errorId, error } = useFieldState(name);
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
      <textarea
        id={id}
        rows={rows}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(hint, error, hintId, errorId)}
        className={inputClasses(Boolean(error), 'py-2 leading-normal')}
        {...textareaProps}
        {...register(name, registerOptions)}
      />
    </FieldShell>
  );
}
