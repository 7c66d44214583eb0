import { useMemo } from 'react';
import { FilterSelect } from '@/components/ui/filters';
import type { SelectOption } from '@/components/ui/select-field';
import { useCabinetModels } from '@/features/catalogue/api/get-cabinet-models';
import { useClientOptions } from '@/features/clients/api/get-clients';
import { useSites } from '@/features/sites/api/get-sites';

export interface PlaceFilterOptions {
  /** Absent for client users: they have one organisation. */
  clientOptions?: SelectOption[];
  siteOptions: SelectOption[];
  modelOptions: SelectOption[];
}

/**
 * The choices of the register lists' client, site and cabinet model filters. The sites are those
 * of the chosen client; without one, staff see each site with its client's name.
 */
export function usePlaceFilterOptions(staff: boolean, clientId: string | undefined): PlaceFilterOptions {
  const clients = useClientOptions(staff);
  const sites = useSites({ clientId });
  const models = useCabinetModels();
  const clientOptions = useMemo(() => (clients.data ?? []).map((c) => ({ value: c.id, label: c.name })), [clients.data]);
  const siteOptions = useMemo(
    () => (sites.data?.items ?? []).map((s) => ({ value: s.id, label: staff && !clientId ? `${s.name} (${s.clientName})` : s.name })),
    [sites.data, staff, clientId],
  );
  const modelOptions = useMemo(() => (models.data?.items ?? []).map((m) => ({ value: m.id, label: m.name })), [models.data]);
  return { clientOptions: staff ? clientOptions : undefined, siteOptions, modelOptions };
}

export interface PlaceFilterValues {
  clientId?: string;
  siteId?: string;
  modelId?: string;
}

/** Client, site and cabinet model filters; a filter without choices is not shown. */
export function PlaceFilters({
  options,
  values,
  onChange,
}: {
  options: Partial<PlaceFilterOptions>;
  values: PlaceFilterValues;
  onChange: (next: PlaceFilterValues) => void;
}) {
  const { clientOptions, siteOptions, modelOptions } = options;
  return (
    <>
      {clientOptions && clientOptions.length > 1 ? (
        <FilterSelect
          label="Client"
          anyLabel="All clients"
          options={clientOptions}
          value={values.clientId ?? ''}
          // A site belongs to one client: a new client clears the site.
          onChange={(v) => onChange({ ...values, clientId: v || undefined, siteId: undefined })}
        />
      ) : null}
      {siteOptions && siteOptions.length > 0 ? (
        <FilterSelect label="Site" anyLabel="All sites" options={siteOptions} value={values.siteId ?? ''} onChange={(v) => onChange({ ...values, siteId: v || undefined })} />
      ) : null}
      {modelOptions && modelOptions.length > 0 ? (
        <FilterSelect
          label="Cabinet model"
          anyLabel="All models"
          options={modelOptions}
          value={values.modelId ?? ''}
          onChange={(v) => onChange({ ...values, modelId: v || undefined })}
        />
      ) : null}
    </>
  );
}
