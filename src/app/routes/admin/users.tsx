import { roles, type Role } from '@shared/schemas/enums';
import { UserPlus } from 'lucide-react';
import { useState } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { InviteUserDialog } from '@/features/users/components/invite-user-dialog';
import { UsersTable } from '@/features/users/components/users-table';
import { adminOnly, requireUser } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { useDocumentTitle } from '@/lib/use-document-title';
import { userQueries, type UserFilters } from '@/resources/users';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

/** The filters live in the address, so a filtered list can be bookmarked or shared. */
function filtersFrom(params: URLSearchParams): UserFilters {
  const role = params.get('role');
  return {
    q: params.get('q')?.trim() || undefined,
    role: role && (roles as readonly string[]).includes(role) ? (role as Role) : undefined,
  };
}

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request, adminOnly);
  const filters = filtersFrom(new URL(request.url).searchParams);
  // Warm the cache; a failure shows in the table (with a retry) rather than instead of the page.
  await queryClient.ensureInfiniteQueryData(userQueries.list(filters)).catch(() => undefined);
  return null;
}

export function Component() {
  useDocumentTitle('Users');
  const [params, setParams] = useSearchParams();
  const [inviting, setInviting] = useState(false);
  const filters = filtersFrom(params);

  return (
    <>
      <PageHeader
        title="Users"
        description="Everyone who can sign in: office staff, technicians and client contacts."
        actions={
          <Button variant="primary" onClick={() => setInviting(true)} icon={<UserPlus className="h-4 w-4" aria-hidden="true" />}>
            Invite person
          </Button>
        }
      />
      <UsersTable
        filters={filters}
        onFiltersChange={(next) =>
          setParams(
            (prev) => {
              const p = new URLSearchParams(prev);
              for (const [key, value] of Object.entries(next))
                if (value) p.set(key, value);
                else p.delete(key);
              return p;
            },
            { replace: true },
          )
        }
      />
      <InviteUserDialog open={inviting} onClose={() => setInviting(false)} />
    </>
  );
}
