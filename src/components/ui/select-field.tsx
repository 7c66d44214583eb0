import clsx from 'clsx';
import { ChevronDown } from 'lucide-react';
import type { ReactNode, Ref, SelectHTMLAttributes } from 'react';
import { useFormContext, type RegisterOptions } from 'react-hook-form';
import { describedBy, FieldShell, inputClasses, useFieldState } from '@/components/ui/field';

export interface SelectOption {
  value: string;
  label: string;
}

interface SelectFieldProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'name' | 'id'> {
  name: string;
  label: ReactNode;
  options: readonly SelectOption[];
  /** A first, empty choice ("Choose…"); its value is ''. */
  placeholder?: string;
  hint?: ReactNode;
  registerOptions?: RegisterOptions;
  className?: string;
}

/** A native select (best on phones and for screen readers) bound to the surrounding <Form>. */
export function SelectField({ name, label, options, placeholder, hint, registerOptions, className, ...rest }: SelectFieldProps) {
  const { register } = useFormContext();
  const { id, hintId, errorId, error } = useFieldState(name);
  return (
    <FieldShell id={id} label={label} hint={hint} hintId={hintId} error={error} errorId={errorId} className={className}>
      <SelectBox
        id={id}
        invalid={Boolean(error)}
        aria-describedby={describedBy(hint, error, hintId, errorId)}
        {...rest}
        {...register(name, registerOptions)}
      >
        {placeholder !== undefined ? <option value="">{placeholder}</option> : null}
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </SelectBox>
    </FieldShell>
  );
}

interface SelectBoxProps extends SelectHTMLAttributes<HTMLSelectElement> {
  invalid?: boolean;
  ref?: Ref<HTMLSelectElement>;
}

/** The styled native select, also used on its own for filters outside a form. */
export function SelectBox({ invalid = false, className, children, ref, ...rest }: SelectBoxProps) {
  return (
    <div className={clsx('relative', className)}>
      <select ref={ref} aria-invalid={invalid || undefined} className={inputClasses(invalid, 'appearance-none pr-9')} {...rest}>
        {children}
      </select>
      <ChevronDown className="pointer-events-none absolute right-3 top-1/2 h-4 w-4 -translate-y-1/2 text-stone-500" aria-hidden="true" />
    </div>
  );
}
