import type { AuditEventView } from '@shared/schemas/users';
import { keepPreviousData, useInfiniteQuery } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { History, X } from 'lucide-react';
import { useMemo } from 'react';
import { Badge } from '@/components/ui/badge';
import { DataTable, pagedQueryProps } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { FilterSearch, FilterSelect } from '@/components/ui/filters';
import { AuditChanges, RecordName } from '@/features/audit/components/audit-changes';
import { actionLabel, changedFields, entityLabel, entityLabels, fieldLabel } from '@/features/audit/utils/audit-record';
import { formatDateTime } from '@/lib/format';
import { auditQueries, type AuditFilters } from '@/resources/audit';

const column = createColumnHelper<AuditEventView>();

/** The record's name for the CSV and the expand button: its name, else its kind and id. */
const recordText = (e: AuditEventView) => (e.record ? e.record.name : `${entityLabel(e.entity)} ${e.entityId}`);

/** The log's columns; "History" narrows the log to that record's history (`onShowRecord`). */
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
      header: 'Kind',
      meta: { csv: (e) => entityLabel(e.entity) },
      cell: (c) => <Badge tone="ink">{entityLabel(c.getValue())}</Badge>,
    }),
    column.accessor(recordText, {
      id: 'record',
      header: 'Record',
      meta: { csv: (e) => `${recordText(e)} (${e.entityId})` },
      cell: (c) => <RecordCell event={c.row.original} onShowRecord={onShowRecord} />,
    }),
    column.accessor('action', {
      header: 'Action',
      meta: { csv: (e) => e.action },
      cell: (c) => <span className="font-medium">{actionLabel(c.getValue())}</span>,
    }),
    column.accessor((e) => changedFields(e.before, e.after).map(fieldLabel).join(', '), {
      id: 'changes',
      header: 'Fields',
      meta: { className: 'max-w-xs text-stone-700' },
      cell: (c) => c.getValue() || <span className="text-stone-500">—</span>,
    }),
  ];
}

/** The record by name (linked to its page), and a button for its history alone. */
function RecordCell({ event, onShowRecord }: { event: AuditEventView; onShowRecord: (entity: string, entityId: string) => void }) {
  const kind = entityLabel(event.entity).toLowerCase();
  return (
    <div className="flex flex-wrap items-baseline gap-x-2">
      {event.record ? (
        <RecordName record={event.record} />
      ) : (
        <span className="font-mono text-xs text-stone-600" title={event.entityId}>
          {event.entityId.length > 13 ? `${event.entityId.slice(0, 8)}…` : event.entityId}
        </span>
      )}
      <button
        type="button"
        className="text-xs text-stone-600 underline decoration-stone-300 underline-offset-2 hover:text-ink-800"
        aria-label={`History of ${kind} ${event.record?.name ?? event.entityId}`}
        onClick={() => onShowRecord(event.entity, event.entityId)}
      >
        History
      </button>
    </div>
  );
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
      renderExpanded={(e) => <AuditChanges before={e.before} after={e.after} references={e.references} />}
      expandLabel={(e) =>
        `Show changes: ${actionLabel(e.action)} ${entityLabel(e.entity).toLowerCase()} ${recordText(e)}, ${formatDateTime(e.createdAt)}`
      }
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
