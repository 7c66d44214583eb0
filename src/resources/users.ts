// The users resource: the admin's list of accounts, the staff list the pickers offer, and the
// writes to accounts. The staff list is filed under ['users'], so inviting, changing or disabling
// someone refreshes the assignee and technician pickers too.
import { queryOptions } from '@tanstack/react-query';
import type { InviteUserInput, UpdateUserInput } from '@shared/schemas/auth';
import type { CappedList, Page } from '@shared/schemas/common';
import type { Role } from '@shared/schemas/enums';
import type { StaffMember, UserSummary } from '@shared/schemas/users';
import { api } from '@/lib/api-client';
import { pagedQueryOptions } from '@/lib/paged-query';

/** The users list's search and role (the API's query parameters). */
export interface UserFilters {
  q?: string;
  role?: Role;
}

export const usersPageSize = 50;

export const userKeys = {
  all: ['users'] as const,
  lists: () => [...userKeys.all, 'list'] as const,
  list: (filters: UserFilters) => [...userKeys.lists(), filters] as const,
  staff: () => [...userKeys.all, 'staff'] as const,
};

const getUsers = (filters: UserFilters & { cursor?: string }, signal?: AbortSignal) =>
  api.get<Page<UserSummary>>('/api/users', { query: { limit: usersPageSize, ...filters }, signal });

export const userQueries = {
  /** Pages of people with an account, by e-mail address (admins). */
  list: (filters: UserFilters) => pagedQueryOptions(userKeys.list(filters), (cursor, signal) => getUsers({ ...filters, cursor }, signal)),
  /** Active staff by name, for the assignee and visit pickers (staff only). */
  staff: () =>
    queryOptions({
      queryKey: userKeys.staff(),
      queryFn: ({ signal }) => api.get<CappedList<StaffMember>>('/api/staff', { signal }),
      staleTime: 5 * 60_000,
    }),
};

export const userRequests = {
  /** Creates the account and e-mails an invite link (201). */
  invite: (input: InviteUserInput) => api.post<UserSummary>('/api/users', input),
  /** Name, role, organisation, phone, and disabling or enabling the account. */
  update: ({ id, ...input }: UpdateUserInput & { id: string }) => api.patch<UserSummary>(`/api/users/${encodeURIComponent(id)}`, input),
  /** Sends the invite e-mail again with a fresh link (202); 409 `already_active` once a password is set. */
  resendInvite: (id: string) => api.post<{ message: string }>(`/api/users/${encodeURIComponent(id)}/invite`),
};
