import { FilterSelect } from '@/components/ui/filters';
import type { SelectOption } from '@/components/ui/select-field';

export interface PlaceFilterOptions {
  /** Absent for client users: they have one organisation. */
  clientOptions?: SelectOption[];
  siteOptions: SelectOption[];
  modelOptions: SelectOption[];
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
        <FilterSelect
          label="Site"
          anyLabel="All sites"
          options={siteOptions}
          value={values.siteId ?? ''}
          onChange={(v) => onChange({ ...values, siteId: v || undefined })}
        />
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
