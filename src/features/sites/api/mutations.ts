// Writes to a site. A site shows on its client's page too (site list, counts).
import { clientKeys } from '@/resources/clients';
import { siteKeys, siteRequests } from '@/resources/sites';
import { useWrite } from '@/lib/mutation';

export const useCreateSite = () => useWrite(siteRequests.create, [siteKeys.all, clientKeys.all]);
export const useUpdateSite = () =>
  useWrite(siteRequests.update, [siteKeys.all, clientKeys.all], (site, set) => set(siteKeys.detail(site.id), site));
