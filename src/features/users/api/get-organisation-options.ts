import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { usersKeys } from '@/features/users/api/keys';

export interface OrganisationOption {
  id: string;
  name: string;
}

/** Client organisations for the picker of a client user's account (the first 500 by name). */
export async function getOrganisationOptions(signal?: AbortSignal): Promise<OrganisationOption[]> {
  const page = await api.get<Page<OrganisationOption>>('/api/clients', { query: { limit: 500 }, signal });
  return page.items
    .map(({ id, name }) => ({ id, name }))
    .sort((a, b) => a.name.localeCompare(b.name));
}

export const organisationOptionsQueryOptions = () =>
  queryOptions({
    queryKey: usersKeys.organisationOptions(),
    queryFn: ({ signal }) => getOrganisationOptions(signal),
    staleTime: 5 * 60_000,
  });

export const useOrganisationOptions = (enabled = true) => useQuery({ ...organisationOptionsQueryOptions(), enabled });
