import type { RemovedPartFate, RepairAction, RepairComponent, RepairFault } from '@shared/schemas/enums';
import { Wrench } from 'lucide-react';
import { Link } from 'react-router';
import { paths } from '@/config/paths';
import { TicketPanel } from '@/features/tickets/components/ticket-panel';
import type { TicketRepair } from '@shared/schemas/tickets';
import { formatSiteTime } from '@/lib/site-time';

const actionText: Record<RepairAction, string> = {
  replaced: 'Replaced',
  reseated: 'Reseated',
  recalibrated: 'Recalibrated',
  cabinet_swapped: 'Swapped the cabinet for',
  cleaned: 'Cleaned',
};

const componentText: Record<RepairComponent, string> = {
  module: 'module',
  power_supply: 'power supply',
  receiving_card: 'receiving card',
  data_cable: 'data cable',
  power_cable: 'power cable',
  fan: 'fan',
  whole_cabinet: 'whole cabinet',
};

const faultText: Record<RepairFault, string> = {
  dead_module: 'dead module',
  dead_pixels: 'dead pixels',
  colour_shift: 'colour shift',
  flicker: 'flicker',
  no_signal: 'no signal',
  physical_damage: 'physical damage',
  other: 'other',
};

const fateText: Record<RemovedPartFate, string | null> = {
  none: null,
  to_bench: 'removed part to the bench',
  to_vendor_return: 'removed part kept for a vendor return',
  scrapped: 'removed part scrapped',
};

/** "Replaced module 1,2 at C7·R4": what was done, to what, where. */
export function repairHeadline(r: Pick<TicketRepair, 'action' | 'component' | 'module' | 'position'>): string {
  const what = r.action === 'cabinet_swapped' && r.component === 'whole_cabinet' ? 'a spare' : componentText[r.component];
  const module = r.component === 'module' && r.module ? ` ${r.module.column},${r.module.row}` : '';
  return `${actionText[r.action]} ${what}${module} at ${r.position}`;
}

/** The work done on the wall for this ticket, oldest first, in the site's local time. */
export function TicketRepairs({ repairs, timeZone }: { repairs: TicketRepair[]; timeZone?: string }) {
  if (repairs.length === 0) return null;
  return (
    <TicketPanel title="Repairs" icon={Wrench}>
      <ul className="space-y-3" aria-label="Repairs for this ticket">
        {repairs.map((r) => {
          const stock = [
            r.part ? `spare: ${r.part.name}${r.part.batch ? `, batch ${r.part.batch}` : ''}` : null,
            r.removedPartFate ? fateText[r.removedPartFate] : null,
          ]
            .filter(Boolean)
            .join(' · ');
          return (
            <li key={r.id} className="rounded-md border border-stone-200 px-3 py-2">
              <p className="text-sm font-medium text-ink-950">{repairHeadline(r)}</p>
              <p className="text-xs text-stone-600">
                Fault: {faultText[r.fault]}
                {r.cabinetSerial ? (
                  <>
                    {' · '}
                    <Link to={paths.cabinetLabel.getHref(r.cabinetSerial)} className="font-mono text-ink-700 underline underline-offset-2">
                      {r.cabinetSerial}
                    </Link>
                  </>
                ) : null}
              </p>
              <p className="text-xs text-stone-600">
                {formatSiteTime(r.performedAt, timeZone)}
                {r.technicianName ? ` · ${r.technicianName}` : ''}
              </p>
              {stock ? <p className="mt-1 text-xs text-stone-700">{stock[0].toUpperCase() + stock.slice(1)}</p> : null}
              {r.notes ? <p className="mt-1 text-sm italic text-stone-700">“{r.notes}”</p> : null}
            </li>
          );
        })}
      </ul>
    </TicketPanel>
  );
}
