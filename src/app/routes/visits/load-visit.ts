import type { Role } from '@shared/schemas/enums';
import { data, type LoaderFunctionArgs } from 'react-router-dom';
import { requireUser } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { isRecordId } from '@/lib/record-id';
import { visitQueries } from '@/resources/visits';

/**
 * The loader of a visit's pages: signed in (with one of `roles` when given), an id that can be
 * one (a mistyped link is "not found" like a visit that is not there), the visit warmed.
 */
export const visitLoader =
  (roles?: readonly Role[]) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireUser(request, roles);
    const id = params.id ?? '';
    if (!isRecordId(id)) throw data('Not found', { status: 404 });
    await queryClient.ensureQueryData(visitQueries.detail(id));
    return null;
  };
