import type { AuditRecordRef } from '@shared/schemas/users';
import { cellLabel } from '@shared/calc/grid';
import { Link } from 'react-router-dom';
import { auditRecordHref, changedFields, fieldLabel } from '@/features/audit/utils/audit-record';
import { formatDateTime } from '@/lib/format';

interface AuditChangesProps {
  before: unknown;
  after: unknown;
  /** Names of the records the fields point at, by id (the server's `references`). */
  references: Record<string, AuditRecordRef>;
}

/**
 * What one event changed, field by field: the value before and the value after. The server keeps
 * only the changed fields and leaves secrets out; a record created has no "before", one removed
 * no "after".
 */
export function AuditChanges({ before, after, references }: AuditChangesProps) {
  const b = asRecord(before);
  const a = asRecord(after);
  if (!b && !a) return <p className="text-sm text-stone-600">No details were recorded for this event.</p>;
  const keys = changedFields(b, a);
  if (keys.length === 0) return <p className="text-sm text-stone-600">Nothing changed in the recorded fields.</p>;
  return (
    <table className="w-full max-w-4xl table-fixed border-collapse text-sm">
      <caption className="sr-only">Changed fields, before and after</caption>
      <thead>
        <tr className="text-left text-xs text-stone-600">
          <th scope="col" className="w-1/4 py-1 pr-3 font-semibold">
            Field
          </th>
          <th scope="col" className="py-1 pr-3 font-semibold">
            Before
          </th>
          <th scope="col" className="py-1 font-semibold">
            After
          </th>
        </tr>
      </thead>
      <tbody>
        {keys.map((key) => (
          <tr key={key} className="border-t border-stone-200 align-top">
            <th scope="row" className="py-1.5 pr-3 text-left font-medium text-stone-700">
              {fieldLabel(key)}
            </th>
            <td className="py-1.5 pr-3">
              <Value value={b ? b[key] : undefined} references={references} tone="before" />
            </td>
            <td className="py-1.5">
              <Value value={a ? a[key] : undefined} references={references} tone="after" />
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function asRecord(value: unknown): Record<string, unknown> | null {
  return value && typeof value === 'object' && !Array.isArray(value) ? (value as Record<string, unknown>) : null;
}

const isoInstant = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/;
const isCell = (v: unknown): v is { column: number; row: number } =>
  Boolean(v) &&
  typeof v === 'object' &&
  typeof (v as { column?: unknown }).column === 'number' &&
  typeof (v as { row?: unknown }).row === 'number';

const toneClasses = {
  before: 'rounded bg-danger-50 px-1 text-danger-700 line-through decoration-danger-600/50',
  after: 'rounded bg-state-on-track-bg px-1 text-state-on-track',
};

/** One side of a field: a linked name for a record's id, cells as C3·R2, times in words, anything else as text. */
function Value({ value, references, tone }: { value: unknown; references: Record<string, AuditRecordRef>; tone: 'before' | 'after' }) {
  if (value === undefined) return <span className="text-stone-500">—</span>;
  if (value === null || value === '' || (Array.isArray(value) && value.length === 0))
    return <span className="italic text-stone-500">empty</span>;
  const scalars = Array.isArray(value) ? value : [value];
  if (scalars.every((v) => typeof v !== 'object' || isCell(v))) {
    return (
      <span className={toneClasses[tone]} style={{ overflowWrap: 'anywhere' }}>
        <span className="sr-only">{tone === 'before' ? 'was: ' : 'now: '}</span>
        {scalars.map((v, i) => (
          <span key={i}>
            {i > 0 ? ', ' : null}
            <Scalar value={v} references={references} />
          </span>
        ))}
      </span>
    );
  }
  // Settings and runs: kept whole, shown on demand and wrapped.
  return (
    <details>
      <summary className="cursor-pointer text-ink-700">{Array.isArray(value) ? `${value.length} entries` : 'Details'}</summary>
      <pre className="mt-1 whitespace-pre-wrap break-words font-mono text-xs text-stone-800">{JSON.stringify(value, null, 2)}</pre>
    </details>
  );
}

function Scalar({ value, references }: { value: unknown; references: Record<string, AuditRecordRef> }) {
  if (isCell(value)) return <>{cellLabel(value)}</>;
  if (typeof value === 'boolean') return <>{value ? 'Yes' : 'No'}</>;
  if (typeof value === 'string') {
    const ref = references[value];
    if (ref) return <RecordName record={ref} />;
    if (isoInstant.test(value)) return <time dateTime={value}>{formatDateTime(value)}</time>;
    return <>{value}</>;
  }
  return <>{String(value)}</>;
}

/** A record by its name, linked to its page when it has one, with what places it. */
export function RecordName({ record }: { record: AuditRecordRef }) {
  const context = record.context ? <span className="text-stone-600"> ({record.context})</span> : null;
  if (!record.page) {
    return (
      <span>
        {record.name}
        {context}
      </span>
    );
  }
  return (
    <span>
      <Link
        to={auditRecordHref(record.page)}
        className="font-medium text-ink-700 underline decoration-ink-200 underline-offset-2 hover:decoration-ink-600"
      >
        {record.name}
      </Link>
      {context}
    </span>
  );
}
