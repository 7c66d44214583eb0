import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SitePatch } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { siteOwnerKeys, sitesKeys } from '@/features/sites/api/keys';
import type { SiteDetail } from '@/features/sites/api/types';

export const updateSite = ({ id, ...input }: SitePatch & { id: string }) =>
  api.patch<SiteDetail>(`/api/sites/${encodeURIComponent(id)}`, input);

export function useUpdateSite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSite,
    onSuccess: async (site) => {
      queryClient.setQueryData(sitesKeys.detail(site.id), site);
      await Promise.all(siteOwnerKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey })));
    },
  });
}
