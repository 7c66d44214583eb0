import { cellLabel } from '@shared/calc/grid';
import { ArrowLeftRight, ArrowRight, CircleDot, FileUp, MapPin, PackageMinus, RefreshCw, Wrench } from 'lucide-react';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { CabinetEvent } from '@shared/schemas/cabinets';
import { paths } from '@/config/paths';
import { cabinetStatusLabels } from '@/features/cabinets/components/cabinet-status';
import { formatDateTime } from '@/lib/format';

const pos = (column: number | null, row: number | null) => (column && row ? cellLabel({ column, row }) : null);
const linkClass = 'text-ink-700 underline underline-offset-2 hover:text-ink-900';

/** A wall named in the history, linked to its page. */
function WallName({ id, name }: { id: string | null; name: string }) {
  return id ? (
    <Link to={paths.wall.getHref(id)} className={linkClass}>
      {name}
    </Link>
  ) : (
    <>{name}</>
  );
}

/**
 * Where on which wall, naming (and linking) the wall only when the move crossed walls. A side
 * left out of the history (another organisation's wall, as a client user reads it) is "elsewhere".
 */
function place(
  wallId: string | null,
  wallName: string | null,
  column: number | null,
  row: number | null,
  showWall: boolean,
  none = 'stock',
): ReactNode {
  const p = pos(column, row);
  if (!p) return wallName ? <WallName id={wallId} name={wallName} /> : none;
  return showWall && wallName ? (
    <>
      {p} on <WallName id={wallId} name={wallName} />
    </>
  ) : (
    p
  );
}

/** The other cabinet of a swap, linked to its card. */
function OtherCabinet({ serial }: { serial: string | null }) {
  if (!serial) return <>another cabinet</>;
  return (
    <Link to={paths.cabinetLabel.getHref(serial)} className={`font-mono ${linkClass}`}>
      {serial}
    </Link>
  );
}

/** One line that says what happened, positions written C{col}·R{row}, the records it names linked. */
export function EventText({ event: e }: { event: CabinetEvent }): ReactNode {
  const crossWalls = Boolean(e.fromWallId && e.toWallId && e.fromWallId !== e.toWallId);
  // A move or a swap always has a wall on both sides: one left out is another organisation's.
  const none = e.kind === 'moved' || e.kind === 'swapped' ? 'elsewhere' : 'stock';
  const from = place(e.fromWallId, e.fromWallName, e.fromColumn, e.fromRow, crossWalls, none);
  const to = place(e.toWallId, e.toWallName, e.toColumn, e.toRow, crossWalls || !e.fromWallId, none);
  switch (e.kind) {
    case 'placed':
      return e.fromStatus && e.fromStatus !== 'installed' ? (
        <>
          Placed at {to} (was {cabinetStatusLabels[e.fromStatus].toLowerCase()})
        </>
      ) : (
        <>Placed at {to}</>
      );
    case 'imported':
      return <>Registered at {to} by CSV import</>;
    case 'moved':
      return (
        <>
          Moved from {from} to {to}
        </>
      );
    case 'swapped':
      return (
        <>
          Swapped with <OtherCabinet serial={e.otherSerial} />: from {from} to {to}
        </>
      );
    case 'removed':
      return (
        <>
          Taken off the wall at {from}
          {e.toStatus ? `: ${cabinetStatusLabels[e.toStatus].toLowerCase()}` : ''}
        </>
      );
    case 'repaired':
      return pos(e.fromColumn, e.fromRow) ? <>Repaired at {from}</> : 'Repaired';
    case 'status_changed':
      return `Status ${e.fromStatus ? `changed from ${cabinetStatusLabels[e.fromStatus].toLowerCase()} ` : ''}to ${
        e.toStatus ? cabinetStatusLabels[e.toStatus].toLowerCase() : '—'
      }`;
    default:
      return e.kind;
  }
}

const icons = {
  placed: MapPin,
  imported: FileUp,
  moved: ArrowRight,
  swapped: ArrowLeftRight,
  removed: PackageMinus,
  repaired: Wrench,
  status_changed: RefreshCw,
} as const;

/**
 * The cabinet's life, newest first: placed, moved, swapped, repaired, removed. Staff see which
 * notes the client reads too; `truncated` says older events are not shown.
 */
export function CabinetHistory({ events, truncated = false }: { events: CabinetEvent[]; truncated?: boolean }) {
  if (events.length === 0) return <p className="text-sm text-stone-600">No history recorded.</p>;
  return (
    <ol className="relative space-y-3 border-l border-stone-200 pl-5" aria-label="History, newest first">
      {events.map((e) => {
        const Icon = icons[e.kind] ?? CircleDot;
        return (
          <li key={e.id} className="relative">
            <span className="absolute -left-[1.95rem] top-0 flex h-6 w-6 items-center justify-center rounded-full border border-stone-200 bg-white text-ink-600">
              <Icon className="h-3.5 w-3.5" aria-hidden="true" />
            </span>
            <p className="text-base text-stone-900">
              <EventText event={e} />
            </p>
            <p className="text-xs text-stone-600">
              <time dateTime={e.createdAt}>{formatDateTime(e.createdAt)}</time>
              {e.actorName ? ` · ${e.actorName}` : ''}
            </p>
            {e.note ? (
              <p className="mt-0.5 text-sm text-stone-700">
                <span className="italic">“{e.note}”</span>
                {/* Only staff ever read a staff-only note; the actor's name is theirs alone too. */}
                <span className="text-stone-600">{!e.noteForClient ? ' · staff only' : e.actorName ? ' · shown to the client' : ''}</span>
              </p>
            ) : null}
          </li>
        );
      })}
      {truncated ? <li className="text-sm text-stone-600">Older events are not shown here; the audit log keeps them all.</li> : null}
    </ol>
  );
}
