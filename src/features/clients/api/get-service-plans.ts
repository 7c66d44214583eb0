import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { clientsKeys } from '@/features/clients/api/keys';
import type { ServicePlan } from '@/features/clients/api/types';

/** The service plans a client can be on (staff only). */
export const getServicePlans = (signal?: AbortSignal) => api.get<{ items: ServicePlan[] }>('/api/service-plans', { signal });

export const servicePlansQueryOptions = () =>
  queryOptions({
    queryKey: clientsKeys.servicePlans(),
    queryFn: ({ signal }) => getServicePlans(signal),
    staleTime: 10 * 60_000,
  });

export const useServicePlans = (enabled = true) => useQuery({ ...servicePlansQueryOptions(), enabled });
