import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SiteInput } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { siteOwnerKeys } from '@/features/sites/api/keys';
import type { SiteDetail } from '@/features/sites/api/types';

export const createSite = (input: SiteInput) => api.post<SiteDetail>('/api/sites', input);

export function useCreateSite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSite,
    onSuccess: () => Promise.all(siteOwnerKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
