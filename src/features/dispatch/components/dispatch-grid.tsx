import type { VisitListItem, VisitRef } from '@shared/schemas/visits';
import clsx from 'clsx';
import { format, parseISO } from 'date-fns';
import { useMemo, useState } from 'react';
import { VisitBlock } from '@/features/dispatch/components/visit-block';
import { siteDate } from '@/features/dispatch/utils/week';

interface DispatchGridProps {
  /** The week's seven dates (YYYY-MM-DD). */
  days: string[];
  /** Today's date in the office, to mark its column. */
  today: string;
  visits: VisitListItem[];
  technicians: VisitRef[];
  onOpen: (visit: VisitListItem) => void;
  /** A block dropped on a cell: the visit, the row it came from, the row and date it was dropped on. */
  onMove: (visit: VisitListItem, fromTechnicianId: string, toTechnicianId: string, date: string) => void;
}

/** Each technician's visits by site date, earliest first; a visit with two technicians is in both rows. */
function byRowAndDay(visits: VisitListItem[]) {
  const cells = new Map<string, VisitListItem[]>();
  const sorted = [...visits].sort((a, b) => Date.parse(a.windowStart) - Date.parse(b.windowStart));
  for (const v of sorted) {
    const date = siteDate(v.windowStart, v.site.timeZone);
    for (const t of v.technicians) {
      const key = `${t.id}:${date}`;
      cells.set(key, [...(cells.get(key) ?? []), v]);
    }
  }
  return cells;
}

/** The week: technicians as rows, days as columns; drag a planned visit to another day or technician. */
export function DispatchGrid({ days, today, visits, technicians, onOpen, onMove }: DispatchGridProps) {
  const cells = useMemo(() => byRowAndDay(visits), [visits]);
  const [dragging, setDragging] = useState<{ visit: VisitListItem; from: string } | null>(null);
  const [over, setOver] = useState<string | null>(null);

  return (
    <div className="overflow-x-auto rounded-md border border-stone-200 bg-white shadow-card">
      <table className="w-full min-w-[56rem] table-fixed border-collapse text-left text-sm">
        <caption className="sr-only">
          Visits by technician and day. Times are at each site. Drag a planned visit to another day or technician, or open it to change it.
        </caption>
        <colgroup>
          <col className="w-36" />
          {days.map((d) => (
            <col key={d} />
          ))}
        </colgroup>
        <thead>
          <tr className="border-b border-stone-200 bg-stone-50">
            <th scope="col" className="px-3 py-2 text-xs font-semibold text-stone-600">
              Technician
            </th>
            {days.map((d) => (
              <th
                key={d}
                scope="col"
                aria-current={d === today ? 'date' : undefined}
                className={clsx(
                  'border-l border-stone-200 px-2 py-2 text-xs font-semibold',
                  d === today ? 'bg-amber-50 text-ink-950' : 'text-stone-600',
                )}
              >
                {format(parseISO(d), 'EEE d MMM')}
                {d === today ? <span className="ml-1 font-normal text-amber-800">· Today</span> : null}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {technicians.map((t) => (
            <tr key={t.id} className="border-b border-stone-200 last:border-b-0">
              <th scope="row" className="px-3 py-2 align-top text-sm font-medium text-ink-950">
                {t.name}
              </th>
              {days.map((d) => {
                const key = `${t.id}:${d}`;
                const here = cells.get(key) ?? [];
                return (
                  <td
                    key={d}
                    onDragOver={(e) => {
                      if (!dragging) return;
                      e.preventDefault();
                      e.dataTransfer.dropEffect = 'move';
                      if (over !== key) setOver(key);
                    }}
                    onDragLeave={() => setOver((o) => (o === key ? null : o))}
                    onDrop={(e) => {
                      e.preventDefault();
                      const drag = dragging;
                      setDragging(null);
                      setOver(null);
                      if (drag) onMove(drag.visit, drag.from, t.id, d);
                    }}
                    className={clsx(
                      'h-24 border-l border-stone-200 p-1 align-top',
                      d === today && 'bg-amber-50/40',
                      dragging && over === key && 'bg-ink-100 outline-dashed outline-2 -outline-offset-2 outline-ink-500',
                    )}
                  >
                    <ul className="space-y-1" aria-label={`${t.name}, ${format(parseISO(d), 'EEEE d MMMM')}`}>
                      {here.map((v) => (
                        <li key={v.id}>
                          <VisitBlock
                            visit={v}
                            technicianId={t.id}
                            onOpen={onOpen}
                            onDragStart={(visit, from) => setDragging({ visit, from })}
                            onDragEnd={() => {
                              setDragging(null);
                              setOver(null);
                            }}
                          />
                        </li>
                      ))}
                    </ul>
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
