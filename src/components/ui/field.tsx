import clsx from 'clsx';
import { CircleAlert } from 'lucide-react';
import { useId, type ReactNode } from 'react';
import { get, useFormContext, type FieldError } from 'react-hook-form';

/** Ids and the error of a named field inside the surrounding <Form>. */
export function useFieldState(name: string) {
  const { formState } = useFormContext();
  const error = get(formState.errors, name) as FieldError | undefined;
  // Unique per mounted field, even when two forms on a page share field names.
  const id = `${useId()}${name.replace(/[^\w-]/g, '-')}`;
  return { id, hintId: `${id}-hint`, errorId: `${id}-error`, error: error?.message ? String(error.message) : undefined };
}

export const inputClasses = (invalid: boolean, className?: string) =>
  clsx(
    'block w-full rounded border bg-white px-3 text-md text-stone-900 shadow-sm placeholder:text-stone-500',
    'min-h-touch md:min-h-10 disabled:bg-stone-100 disabled:text-stone-500',
    invalid ? 'border-danger-600' : 'border-stone-400 hover:border-stone-500',
    className,
  );

interface FieldShellProps {
  id: string;
  label: ReactNode;
  hint?: ReactNode;
  hintId: string;
  error?: string;
  errorId: string;
  className?: string;
  /** Something next to the label, like a "Forgot password?" link. */
  labelAside?: ReactNode;
  children: ReactNode;
}

/** Label, control, hint and error message, in that order. */
export function FieldShell({ id, label, hint, hintId, error, errorId, className, labelAside, children }: FieldShellProps) {
  return (
    <div className={clsx('space-y-1.5', className)}>
      <div className="flex items-baseline justify-between gap-3">
        <label htmlFor={id} className="text-sm font-medium text-stone-800">
          {label}
        </label>
        {labelAside}
      </div>
      {children}
      {hint && !error ? (
        <p id={hintId} className="text-sm text-stone-600">
          {hint}
        </p>
      ) : null}
      {error ? <FieldErrorText id={errorId} message={error} /> : null}
    </div>
  );
}

export function FieldErrorText({ id, message }: { id: string; message: string }) {
  return (
    <p id={id} className="flex items-start gap-1.5 text-sm font-medium text-danger-700">
      <CircleAlert className="mt-0.5 h-4 w-4 shrink-0" aria-hidden="true" />
      {message}
    </p>
  );
}

export const describedBy = (hint: unknown, error: unknown, hintId: string, errorId: string) =>
  error ? errorId : hint ? hintId : undefined;
