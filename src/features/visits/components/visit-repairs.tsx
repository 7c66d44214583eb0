import type { RepairItem } from '@shared/schemas/repairs';
import { actionLabels, componentLabels, faultLabels, fateLabels } from '@shared/schemas/repairs';
import type { VisitDetail } from '@shared/schemas/visits';
import { Wrench } from 'lucide-react';
import { Link } from 'react-router-dom';
import { Card } from '@/components/ui/card';
import { paths } from '@/config/paths';
import { formatSiteTime } from '@/lib/site-time';
import { inlineUrl } from '@/resources/attachments';

/** "Module 1,2 at C7·R4": what was worked on, where (module positions counted inside the cabinet). */
export function repairWhat(r: Pick<RepairItem, 'component' | 'moduleColumn' | 'moduleRow' | 'position'>): string {
  const module = r.component === 'module' && r.moduleColumn && r.moduleRow ? ` ${r.moduleColumn},${r.moduleRow}` : '';
  return `${componentLabels[r.component]}${module} at ${r.position}`;
}

/** The repairs logged on this visit, oldest first, each with its photos. */
export function VisitRepairs({ visit }: { visit: VisitDetail }) {
  const { repairs, photos } = visit;
  const loose = photos.filter((p) => !p.repairId || !repairs.some((r) => r.id === p.repairId));
  return (
    <Card
      title={
        <span className="inline-flex items-center gap-2">
          <Wrench className="h-4 w-4 text-ink-600" aria-hidden="true" />
          Repairs on this visit
        </span>
      }
      actions={<span className="text-sm tabular-nums text-stone-600">{repairs.length}</span>}
    >
      {repairs.length === 0 ? (
        <p className="text-base text-stone-600">Nothing logged yet.</p>
      ) : (
        <ol className="space-y-3" aria-label="Repairs on this visit">
          {repairs.map((r) => (
            <li key={r.id} className="rounded-md border border-stone-200 px-3 py-3" data-testid="visit-repair">
              <RepairLines repair={r} timeZone={visit.site.timeZone} />
              <Photos photos={photos.filter((p) => p.repairId === r.id)} />
            </li>
          ))}
        </ol>
      )}
      {loose.length > 0 ? <Photos photos={loose} /> : null}
    </Card>
  );
}

function RepairLines({ repair: r, timeZone }: { repair: RepairItem; timeZone: string }) {
  return (
    <>
      <p className="text-md font-semibold text-ink-950">
        {repairWhat(r)}: {actionLabels[r.action].toLowerCase()}
      </p>
      <dl className="mt-1 grid grid-cols-[auto_minmax(0,1fr)] gap-x-3 gap-y-0.5 text-sm">
        <dt className="text-stone-600">Fault</dt>
        <dd className="text-stone-900">{faultLabels[r.fault]}</dd>
        {r.part ? (
          <>
            <dt className="text-stone-600">Part</dt>
            <dd className="text-stone-900">
              {r.part.name}
              {r.part.batch ? <span className="font-mono"> · batch {r.part.batch}</span> : null}
              {r.fromLocation ? <span className="text-stone-600"> · from {r.fromLocation.name}</span> : null}
            </dd>
          </>
        ) : null}
        {r.replacementCabinet ? (
          <>
            <dt className="text-stone-600">New cabinet</dt>
            <dd className="font-mono text-stone-900">{r.replacementCabinet.serial}</dd>
          </>
        ) : null}
        {r.removedPartFate !== 'none' ? (
          <>
            <dt className="text-stone-600">Removed part</dt>
            <dd className="text-stone-900">{fateLabels[r.removedPartFate]}</dd>
          </>
        ) : null}
        {r.cabinetSerial ? (
          <>
            <dt className="text-stone-600">Cabinet</dt>
            <dd>
              <Link to={paths.cabinetLabel.getHref(r.cabinetSerial)} className="font-mono text-ink-700 underline underline-offset-2">
                {r.cabinetSerial}
              </Link>
            </dd>
          </>
        ) : null}
        <dt className="text-stone-600">When</dt>
        <dd className="text-stone-900">
          {formatSiteTime(r.performedAt, timeZone)}
          {r.technicianName ? ` · ${r.technicianName}` : ''}
        </dd>
      </dl>
      {r.notes ? <p className="mt-1 text-sm italic text-stone-700">“{r.notes}”</p> : null}
    </>
  );
}

function Photos({ photos }: { photos: VisitDetail['photos'] }) {
  if (photos.length === 0) return null;
  return (
    <ul className="mt-2 grid grid-cols-3 gap-2" aria-label="Photos">
      {photos.map((p) => (
        <li key={p.id}>
          <a
            href={inlineUrl(p)}
            target="_blank"
            rel="noreferrer"
            className="block aspect-square overflow-hidden rounded border border-stone-200"
          >
            <img src={inlineUrl(p)} alt={p.fileName} loading="lazy" className="h-full w-full object-cover" />
          </a>
        </li>
      ))}
    </ul>
  );
}
