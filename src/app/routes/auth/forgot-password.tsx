import { useSearchParams } from 'react-router-dom';
import { AuthLayout } from '@/components/layouts/auth-layout';
import { ForgotPasswordForm } from '@/features/auth/components/forgot-password-form';
import { useDocumentTitle } from '@/lib/use-document-title';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export function Component() {
  useDocumentTitle('Reset password');
  const [params] = useSearchParams();
  return (
    <AuthLayout
      title="Reset your password"
      description="Enter the e-mail address of your account. We will send a link to choose a new password."
    >
      <ForgotPasswordForm defaultEmail={params.get('email') ?? ''} />
    </AuthLayout>
  );
}
