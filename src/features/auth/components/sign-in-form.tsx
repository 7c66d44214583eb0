import { loginInput } from '@shared/schemas/auth';
import { Link, useNavigate } from 'react-router-dom';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { TextField } from '@/components/ui/text-field';
import { paths, safeNext } from '@/config/paths';
import { useLogin } from '@/features/auth/api/mutations';

interface SignInFormProps {
  /** Where to go once signed in (checked to stay inside the app). */
  next?: string | null;
  defaultEmail?: string;
}

export function SignInForm({ next, defaultEmail = '' }: SignInFormProps) {
  const navigate = useNavigate();
  const login = useLogin();
  const form = useZodForm(loginInput, { defaultValues: { email: defaultEmail, password: '' } });
  const email = form.watch('email');

  return (
    <Form
      form={form}
      aria-label="Sign in"
      onSubmit={async (values) => {
        try {
          await login.mutateAsync(values);
        } catch (error) {
          form.resetField('password');
          throw error;
        }
        navigate(safeNext(next), { replace: true });
      }}
    >
      <TextField name="email" label="E-mail address" type="email" autoComplete="username" inputMode="email" autoFocus={!defaultEmail} />
      <TextField
        name="password"
        label="Password"
        type="password"
        autoComplete="current-password"
        revealable
        autoFocus={Boolean(defaultEmail)}
        labelAside={
          <Link to={paths.auth.forgotPassword.getHref(email || undefined)} className="link text-sm">
            Forgot password?
          </Link>
        }
      />
      <SubmitButton className="w-full" size="lg">
        Sign in
      </SubmitButton>
    </Form>
  );
}
