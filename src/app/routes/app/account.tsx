import { LogOut } from 'lucide-react';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { PageHeader } from '@/components/ui/page-header';
import { useLogout } from '@/features/auth/api/mutations';
import { ChangePasswordForm } from '@/features/auth/components/change-password-form';
import { requireUser } from '@/app/auth-guard';
import { roleLabels } from '@/lib/format';
import { useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request);
  return null;
}

export function Component() {
  useDocumentTitle('Account');
  const user = useUser();
  const logout = useLogout();
  return (
    <>
      <PageHeader title="Your account" />
      <div className="grid max-w-4xl items-start gap-6 lg:grid-cols-2">
        <Card title="Details" description="Ask an administrator to change your name, role or e-mail address.">
          <dl className="space-y-3 text-base">
            <div>
              <dt className="text-sm text-stone-600">Name</dt>
              <dd className="font-medium text-ink-950">{user.name}</dd>
            </div>
            <div>
              <dt className="text-sm text-stone-600">E-mail</dt>
              <dd className="break-all font-medium text-ink-950">{user.email}</dd>
            </div>
            <div>
              <dt className="text-sm text-stone-600">Role</dt>
              <dd className="font-medium text-ink-950">{roleLabels[user.role]}</dd>
            </div>
            {user.clientName ? (
              <div>
                <dt className="text-sm text-stone-600">Organisation</dt>
                <dd className="font-medium text-ink-950">{user.clientName}</dd>
              </div>
            ) : null}
          </dl>
          <div className="mt-6 border-t border-stone-200 pt-4">
            <Button onClick={() => logout.mutate()} loading={logout.isPending} icon={<LogOut className="h-4 w-4" aria-hidden="true" />}>
              Sign out
            </Button>
          </div>
        </Card>
        <Card title="Change password">
          <ChangePasswordForm email={user.email} />
        </Card>
      </div>
    </>
  );
}
