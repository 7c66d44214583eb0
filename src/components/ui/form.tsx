import { zodResolver } from '@hookform/resolvers/zod';
import clsx from 'clsx';
import type { FormHTMLAttributes, ReactNode } from 'react';
import { FormProvider, useForm, useFormContext, type FieldValues, type Path, type UseFormProps, type UseFormReturn } from 'react-hook-form';
import type { z } from 'zod';
import { Alert } from '@/components/ui/alert';
import { Button, type ButtonProps } from '@/components/ui/button';
import { isApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/errors';

/** react-hook-form with the shared zod schema as resolver: the same rules the server applies. */
export function useZodForm<S extends z.ZodType<FieldValues, FieldValues>>(
  schema: S,
  props?: Omit<UseFormProps<z.input<S>, unknown, z.output<S>>, 'resolver'>,
) {
  return useForm<z.input<S>, unknown, z.output<S>>({ ...props, resolver: zodResolver(schema) });
}

/**
 * Puts a failed request's errors on the form: each of the server's `fields` on its input (when
 * the form has one by that name), and the overall message at the top of the form.
 */
export function applyServerError<T extends FieldValues>(form: UseFormReturn<T, unknown, FieldValues>, error: unknown) {
  const known = new Set(Object.keys(form.getValues() ?? {}));
  let placed = 0;
  const placedMessages = new Set<string>();
  if (isApiError(error) && error.fields) {
    for (const [name, message] of Object.entries(error.fields)) {
      const root = name.split('.')[0];
      if (!known.has(root)) continue;
      form.setError(name as Path<T>, { type: 'server', message }, { shouldFocus: placed === 0 });
      placed += 1;
      placedMessages.add(message);
    }
  }
  const message = errorMessage(error);
  // When the field messages say it all, a banner repeating them is noise.
  const fieldsSayItAll = placed > 0 && isApiError(error) && (error.code === 'validation_failed' || placedMessages.has(error.message));
  if (!fieldsSayItAll) form.setError('root.server', { type: 'server', message });
}

interface FormProps<TIn extends FieldValues, TOut extends FieldValues> extends Omit<
  FormHTMLAttributes<HTMLFormElement>,
  'onSubmit' | 'children'
> {
  form: UseFormReturn<TIn, unknown, TOut>;
  onSubmit: (values: TOut) => Promise<unknown> | unknown;
  children: ReactNode;
}

/** A form bound to react-hook-form: validates with the resolver, submits, and shows server errors. */
export function Form<TIn extends FieldValues, TOut extends FieldValues>({
  form,
  onSubmit,
  children,
  className,
  ...rest
}: FormProps<TIn, TOut>) {
  const submit = form.handleSubmit(async (values) => {
    try {
      await onSubmit(values);
    } catch (error) {
      applyServerError(form as unknown as UseFormReturn<TIn, unknown, FieldValues>, error);
    }
  });
  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={submit} className={clsx('space-y-5', className)} {...rest}>
        <FormError />
        {children}
      </form>
    </FormProvider>
  );
}

/** The form-wide error (from the server), announced to screen readers. */
export function FormError() {
  const { formState } = useFormContext();
  const message = formState.errors.root?.server?.message;
  return message ? <Alert tone="danger">{String(message)}</Alert> : null;
}

/** The submit button: shows progress and blocks double submits. */
export function SubmitButton({ children, variant = 'primary', ...rest }: ButtonProps) {
  const { formState } = useFormContext();
  return (
    <Button type="submit" variant={variant} loading={formState.isSubmitting} {...rest}>
      {children}
    </Button>
  );
}
