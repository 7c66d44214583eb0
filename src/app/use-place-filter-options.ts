import { useQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import type { PlaceFilterOptions } from '@/components/ui/place-filters';
import { cabinetModelQueries } from '@/resources/cabinet-models';
import { clientQueries } from '@/resources/clients';
import { siteQueries } from '@/resources/sites';

/**
 * The choices of the register lists' client, site and cabinet model filters. The sites are those
 * of the chosen client; without one, staff see each site with its client's name.
 */
export function usePlaceFilterOptions(staff: boolean, clientId: string | undefined): PlaceFilterOptions {
  const clients = useQuery({ ...clientQueries.options(), enabled: staff });
  const sites = useQuery(siteQueries.options({ clientId }));
  const models = useQuery(cabinetModelQueries.list());
  const clientOptions = useMemo(() => (clients.data ?? []).map((c) => ({ value: c.id, label: c.name })), [clients.data]);
  const siteOptions = useMemo(
    () => (sites.data?.items ?? []).map((s) => ({ value: s.id, label: staff && !clientId ? `${s.name} (${s.clientName})` : s.name })),
    [sites.data, staff, clientId],
  );
  const modelOptions = useMemo(() => (models.data?.items ?? []).map((m) => ({ value: m.id, label: m.name })), [models.data]);
  return { clientOptions: staff ? clientOptions : undefined, siteOptions, modelOptions };
}
