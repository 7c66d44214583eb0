import type { SessionUser } from '@shared/schemas/auth';
import type { Role } from '@shared/schemas/enums';
import { data, redirect } from 'react-router-dom';
import { paths } from '@/config/paths';
import { queryClient } from '@/lib/query-client';
import { sessionQueries } from '@/resources/session';

/**
 * For route loaders: the signed-in user, or a redirect to sign-in that comes back to this
 * address afterwards. With `roles`, anyone else gets "not found" (as the API answers).
 */
export async function requireUser(request: Request, roles?: readonly Role[]): Promise<SessionUser> {
  const user = await queryClient.ensureQueryData(sessionQueries.me());
  if (!user) {
    const url = new URL(request.url);
    throw redirect(paths.auth.signIn.getHref(url.pathname + url.search));
  }
  if (roles && !roles.includes(user.role)) throw data('Not found', { status: 404 });
  return user;
}

export const staff = ['admin', 'coordinator', 'technician'] as const satisfies readonly Role[];
export const office = ['admin', 'coordinator'] as const satisfies readonly Role[];
export const adminOnly = ['admin'] as const satisfies readonly Role[];
