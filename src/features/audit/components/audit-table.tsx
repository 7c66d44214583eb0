import type { AuditEventView } from '@shared/schemas/users';
import { keepPreviousData, useInfiniteQuery } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { History, X } from 'lucide-react';
import { useMemo } from 'react';
import { Badge } from '@/components/ui/badge';
import { DataTable, pagedQueryProps } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { FilterSearch, FilterSelect } from '@/components/ui/filters';
import { AuditChanges } from '@/features/audit/components/audit-changes';
import { formatDateTime } from '@/lib/format';
import { auditQueries, type AuditFilters } from '@/resources/audit';

/** The kinds of record the log speaks of (the server's `entity` names). */
const entityLabels: Record<string, string> = {
  user: 'User',
  client: 'Client',
  site: 'Site',
  contact: 'Contact',
  service_plan: 'Service plan',
  wall: 'Wall',
  cabinet: 'Cabinet',
  cabinet_model: 'Cabinet model',
  controller: 'Controller',
  ticket: 'Ticket',
  visit: 'Visit',
  repair: 'Repair',
  maintenance_plan: 'Maintenance plan',
  part: 'Part',
  stock_location: 'Stock location',
  stock_movement: 'Stock movement',
  vendor_return: 'Vendor return',
  company_settings: 'Company settings',
};

const entityLabel = (entity: string) => entityLabels[entity] ?? entity.replace(/_/g, ' ');
const actionLabel = (action: string) => {
  const text = action.replace(/_/g, ' ');
  return text.charAt(0).toUpperCase() + text.slice(1);
};

const column = createColumnHelper<AuditEventView>();

/** The log's columns; a record id narrows the log to that record's history (`onShowRecord`). */
function auditColumns(onShowRecord: (entity: string, entityId: string) => void) {
  return [
    column.accessor('createdAt', {
      header: 'When',
      meta: { alwaysVisible: true, className: 'whitespace-nowrap' },
      cell: (c) => <time dateTime={c.getValue()}>{formatDateTime(c.getValue())}</time>,
    }),
    column.accessor((e) => e.actor?.name ?? 'System', {
      id: 'actor',
      header: 'Who',
      meta: { className: 'whitespace-nowrap' },
      cell: (c) => (c.row.original.actor ? c.getValue() : <span className="italic text-stone-500">System</span>),
    }),
    column.accessor('entity', {
      header: 'Record',
      meta: { csv: (e) => entityLabel(e.entity) },
      cell: (c) => <Badge tone="ink">{entityLabel(c.getValue())}</Badge>,
    }),
    column.accessor('entityId', {
      header: 'Record id',
      meta: { className: 'whitespace-nowrap' },
      cell: (c) => {
        const id = c.getValue();
        // Long ids (uuids) show their first characters; the full id is in the title and the CSV.
        const short = id.length > 13 ? `${id.slice(0, 8)}…` : id;
        return (
          <button
            type="button"
            className="font-mono text-xs text-ink-700 underline decoration-ink-200 underline-offset-2 hover:decoration-ink-600"
            title={`${id}: show only this record's history`}
            aria-label={`Show only the history of ${entityLabel(c.row.original.entity).toLowerCase()} ${id}`}
            onClick={() => onShowRecord(c.row.original.entity, id)}
          >
            {short}
          </button>
        );
      },
    }),
    column.accessor('action', {
      header: 'Action',
      meta: { csv: (e) => e.action },
      cell: (c) => <span className="font-medium">{actionLabel(c.getValue())}</span>,
    }),
    column.accessor((e) => JSON.stringify({ before: e.before, after: e.after }), {
      id: 'changes',
      header: 'Changes (raw)',
      meta: { hiddenByDefault: true, className: 'max-w-md truncate font-mono text-xs' },
    }),
  ];
}

interface AuditTableProps {
  filters: AuditFilters;
  onFiltersChange: (filters: AuditFilters) => void;
}

export function AuditTable({ filters, onFiltersChange }: AuditTableProps) {
  const query = useInfiniteQuery({ ...auditQueries.list(filters), placeholderData: keepPreviousData });
  const rows = useMemo(() => query.data?.pages.flatMap((p) => p.items) ?? [], [query.data]);

  const columns = useMemo(
    () => auditColumns((entity, entityId) => onFiltersChange({ ...filters, entity, entityId })),
    [filters, onFiltersChange],
  );

  const filtered = Boolean(filters.entity || filters.entityId || filters.actorId);

  return (
    <DataTable
      tableId="audit-log"
      label="Audit log, newest first"
      columns={columns}
      data={rows}
      getRowId={(e) => String(e.id)}
      {...pagedQueryProps(query)}
      renderExpanded={(e) => <AuditChanges before={e.before} after={e.after} />}
      expandLabel={(e) => `Show changes: ${actionLabel(e.action)} ${entityLabel(e.entity)} ${formatDateTime(e.createdAt)}`}
      toolbar={<AuditFilterBar filters={filters} onFiltersChange={onFiltersChange} />}
      empty={
        <EmptyState
          icon={History}
          title={filtered ? 'No events match these filters' : 'Nothing recorded yet'}
          description={filtered ? 'Clear a filter to see more.' : 'Every change to users, clients, walls, tickets and stock appears here.'}
        />
      }
    />
  );
}

/** The log's filters: the kind of record, one record's id, and (when set from elsewhere) one person. */
function AuditFilterBar({ filters, onFiltersChange }: AuditTableProps) {
  const entityOptions = useMemo(() => {
    const known = Object.entries(entityLabels).map(([value, label]) => ({ value, label }));
    if (filters.entity && !entityLabels[filters.entity]) known.push({ value: filters.entity, label: filters.entity });
    return known.sort((a, b) => a.label.localeCompare(b.label));
  }, [filters.entity]);
  return (
    <>
      <FilterSelect
        label="Record type"
        anyLabel="All records"
        options={entityOptions}
        value={filters.entity ?? ''}
        onChange={(entity) => onFiltersChange({ ...filters, entity: entity || undefined, entityId: undefined })}
      />
      <FilterSearch
        label="Record id"
        placeholder="Exact id"
        value={filters.entityId ?? ''}
        onChange={(entityId) => onFiltersChange({ ...filters, entityId: entityId.trim() || undefined })}
      />
      {filters.actorId ? (
        <button
          type="button"
          onClick={() => onFiltersChange({ ...filters, actorId: undefined })}
          className="mb-1 inline-flex min-h-9 items-center gap-1.5 rounded-full bg-ink-50 px-3 text-sm text-ink-800 ring-1 ring-ink-200 hover:bg-ink-100"
        >
          By one person only
          <X className="h-3.5 w-3.5" aria-hidden="true" />
          <span className="sr-only">(remove this filter)</span>
        </button>
      ) : null}
    </>
  );
}
