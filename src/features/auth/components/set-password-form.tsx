import { newPasswordHint, redeemTokenInput, type LinkToken } from '@shared/schemas/auth';
import { useNavigate } from 'react-router-dom';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { TextField } from '@/components/ui/text-field';
import { paths } from '@/config/paths';
import { useRedeemToken } from '@/features/auth/api/mutations';

export function SetPasswordForm({ token, link }: { token: string; link: LinkToken }) {
  const navigate = useNavigate();
  const redeem = useRedeemToken();
  const form = useZodForm(redeemTokenInput, { defaultValues: { token, password: '' } });

  return (
    <Form
      form={form}
      aria-label={link.kind === 'invite' ? 'Choose a password' : 'Set a new password'}
      onSubmit={async (values) => {
        await redeem.mutateAsync(values);
        navigate(paths.home.getHref(), { replace: true });
      }}
    >
      {/* Lets a password manager store the new password under the right account. */}
      <input type="email" name="username" autoComplete="username" value={link.email} readOnly hidden />
      <TextField
        name="password"
        label={link.kind === 'invite' ? 'Password' : 'New password'}
        type="password"
        autoComplete="new-password"
        revealable
        autoFocus
        hint={newPasswordHint}
      />
      <SubmitButton className="w-full" size="lg">
        {link.kind === 'invite' ? 'Set password and sign in' : 'Save new password and sign in'}
      </SubmitButton>
    </Form>
  );
}
