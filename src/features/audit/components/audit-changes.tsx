/** Before and after of one audit event, field by field; changed values side by side. */
export function AuditChanges({ before, after }: { before: unknown; after: unknown }) {
  const b = asRecord(before);
  const a = asRecord(after);
  if (!b && !a) {
    if (before === null && after === null) return <p className="text-sm text-stone-600">No details were recorded for this event.</p>;
    return <RawChange before={before} after={after} />;
  }
  const keys = [...new Set([...Object.keys(b ?? {}), ...Object.keys(a ?? {})])].sort();
  if (keys.length === 0) return <p className="text-sm text-stone-600">Nothing changed in the recorded fields.</p>;
  // A record created (no before) or removed (no after): one column of values.
  const only = !b ? a : !a ? b : null;
  if (only) {
    return (
      <div className="max-w-3xl">
        <p className="mb-1.5 text-xs font-semibold text-stone-600">{!b ? 'Recorded values' : 'Values when removed'}</p>
        <dl className="grid grid-cols-[minmax(8rem,auto)_1fr] gap-x-4 text-sm">
          {keys.map((key) => (
            <div key={key} className="contents">
              <dt className="border-t border-stone-200 py-1.5 font-medium text-stone-700">{humanise(key)}</dt>
              <dd className="border-t border-stone-200 py-1.5">
                <Value value={only[key]} />
              </dd>
            </div>
          ))}
        </dl>
      </div>
    );
  }
  return (
    <table className="w-full max-w-4xl table-fixed border-collapse text-sm">
      <caption className="sr-only">Changes</caption>
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
        {keys.map((key) => {
          const was = b ? b[key] : undefined;
          const now = a ? a[key] : undefined;
          const changed = JSON.stringify(was) !== JSON.stringify(now);
          return (
            <tr key={key} className="border-t border-stone-200 align-top">
              <th scope="row" className="py-1.5 pr-3 text-left font-medium text-stone-700">
                {humanise(key)}
              </th>
              <td className="py-1.5 pr-3">
                <Value value={was} tone={changed && b ? 'before' : undefined} />
              </td>
              <td className="py-1.5">
                <Value value={now} tone={changed && a ? 'after' : undefined} />
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

function asRecord(value: unknown): Record<string, unknown> | null {
  return value && typeof value === 'object' && !Array.isArray(value) ? (value as Record<string, unknown>) : null;
}

const fieldNames: Record<string, string> = {
  id: 'Id',
  email: 'E-mail',
  clientId: 'Organisation id',
  passwordChangedAt: 'Password changed',
};

/** "clientId" → "Client id", "last_sign_in_at" → "Last sign in at". */
function humanise(key: string) {
  if (fieldNames[key]) return fieldNames[key];
  const words = key
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/_/g, ' ')
    .toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

function Value({ value, tone }: { value: unknown; tone?: 'before' | 'after' }) {
  if (value === undefined) return <span className="text-stone-500">—</span>;
  const blank = value === null || value === '';
  const text = blank ? 'empty' : typeof value === 'string' ? value : JSON.stringify(value);
  return (
    <span
      className={
        tone === 'before'
          ? 'rounded bg-danger-50 px-1 text-danger-700 line-through decoration-danger-600/50'
          : tone === 'after'
            ? 'rounded bg-state-on-track-bg px-1 text-state-on-track'
            : blank
              ? 'italic text-stone-500'
              : 'text-stone-800'
      }
      style={{ overflowWrap: 'anywhere' }}
    >
      <span className="sr-only">{tone === 'before' ? 'was: ' : tone === 'after' ? 'now: ' : ''}</span>
      {text}
    </span>
  );
}

function RawChange({ before, after }: { before: unknown; after: unknown }) {
  return (
    <dl className="grid gap-2 text-sm sm:grid-cols-2">
      <div>
        <dt className="text-xs font-semibold text-stone-600">Before</dt>
        <dd className="whitespace-pre-wrap break-words font-mono text-xs">{JSON.stringify(before, null, 2)}</dd>
      </div>
      <div>
        <dt className="text-xs font-semibold text-stone-600">After</dt>
        <dd className="whitespace-pre-wrap break-words font-mono text-xs">{JSON.stringify(after, null, 2)}</dd>
      </div>
    </dl>
  );
}
