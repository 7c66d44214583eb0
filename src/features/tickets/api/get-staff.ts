import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { StaffMember } from '@/features/tickets/api/types';

/** Active staff by name, for the assignee and visit pickers (staff only). */
export async function getStaff(signal?: AbortSignal) {
  const { items } = await api.get<{ items: StaffMember[] }>('/api/staff', { signal });
  return items;
}

export const staffQueryOptions = () =>
  queryOptions({ queryKey: ticketsKeys.staff(), queryFn: ({ signal }) => getStaff(signal), staleTime: 5 * 60_000 });

export const useStaff = (enabled = true) => useQuery({ ...staffQueryOptions(), enabled });
