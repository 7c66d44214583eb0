import { forgotPasswordInput } from '@shared/schemas/auth';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { TextField } from '@/components/ui/text-field';
import { paths } from '@/config/paths';
import { useForgotPassword } from '@/features/auth/api/mutations';

export function ForgotPasswordForm({ defaultEmail = '' }: { defaultEmail?: string }) {
  const forgot = useForgotPassword();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const form = useZodForm(forgotPasswordInput, { defaultValues: { email: defaultEmail } });

  if (sentTo) {
    return (
      <div className="space-y-5">
        <Alert tone="success" title="Check your inbox">
          <p>
            If <strong className="font-semibold">{sentTo}</strong> belongs to a Gridkeep account, a link to set a new password is on its
            way. The link works once and expires after a while; ask for a new one if it does.
          </p>
        </Alert>
        <p className="text-base text-stone-700">
          Nothing arrived? Check the spam folder, or{' '}
          <button type="button" className="link" onClick={() => setSentTo(null)}>
            try another address
          </button>
          .
        </p>
        <Link to={paths.auth.signIn.getHref()} className="link inline-block text-base">
          Back to sign-in
        </Link>
      </div>
    );
  }

  return (
    <Form
      form={form}
      aria-label="Reset password"
      onSubmit={async (values) => {
        await forgot.mutateAsync(values);
        setSentTo(values.email);
      }}
    >
      <TextField name="email" label="E-mail address" type="email" autoComplete="username" inputMode="email" autoFocus />
      <SubmitButton className="w-full" size="lg">
        Send reset link
      </SubmitButton>
      <p className="text-center text-base">
        <Link to={paths.auth.signIn.getHref()} className="link">
          Back to sign-in
        </Link>
      </p>
    </Form>
  );
}
