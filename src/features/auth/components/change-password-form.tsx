import { changePasswordInput, newPasswordHint } from '@shared/schemas/auth';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { TextField } from '@/components/ui/text-field';
import { useChangePassword } from '@/features/auth/api/mutations';

export function ChangePasswordForm({ email }: { email: string }) {
  const change = useChangePassword();
  const [done, setDone] = useState(false);
  const form = useZodForm(changePasswordInput, { defaultValues: { currentPassword: '', newPassword: '' } });

  return (
    <Form
      form={form}
      aria-label="Change password"
      className="max-w-form"
      onSubmit={async (values) => {
        setDone(false);
        await change.mutateAsync(values);
        form.reset();
        setDone(true);
      }}
    >
      {done ? (
        <Alert tone="success">Your password has been changed. Other browsers signed in with your account were signed out.</Alert>
      ) : null}
      <input type="email" name="username" autoComplete="username" value={email} readOnly hidden />
      <TextField name="currentPassword" label="Current password" type="password" autoComplete="current-password" revealable />
      <TextField name="newPassword" label="New password" type="password" autoComplete="new-password" revealable hint={newPasswordHint} />
      <SubmitButton>Change password</SubmitButton>
    </Form>
  );
}
