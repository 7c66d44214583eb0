import type { PlanCheck } from '@shared/calc/plan-checks';
import type { WallPlan } from '@shared/calc/wall-plan';
import clsx from 'clsx';
import { CircleCheck, CircleX, Info } from 'lucide-react';
import { amps, num, watts } from '@/features/planner/utils/format';

/** Circuits shown before the table scrolls; a 500 × 500 wall can have thousands. */
const SHOWN = 200;

/** The phase table: each branch circuit, its phase or phase pair, its cabinets, watts and amps. */
export function CircuitTable({ plan }: { plan: WallPlan }) {
  const shown = plan.circuits.slice(0, SHOWN);
  return (
    <section aria-label="Circuits" className="space-y-2">
      <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-500">Circuits and phases</h3>
      <div className="max-h-80 overflow-auto rounded border border-stone-200 bg-white">
        <table className="w-full text-sm tabular-nums">
          <thead className="sticky top-0 bg-stone-50 text-left text-xs text-stone-600">
            <tr>
              <th scope="col" className="px-3 py-2 font-semibold">
                Circuit
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Phase
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Cabinets
              </th>
              <th scope="col" className="px-3 py-2 text-right font-semibold">
                Watts
              </th>
              <th scope="col" className="px-3 py-2 text-right font-semibold">
                Amps
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-stone-100">
            {shown.map((c) => (
              <tr key={c.circuit}>
                <th scope="row" className="px-3 py-1.5 text-left font-medium text-ink-950">
                  {c.circuit}
                </th>
                <td className="px-3 py-1.5">{c.phase ?? '—'}</td>
                <td className="px-3 py-1.5">
                  {num(c.cabinets)} <span className="text-stone-600">({c.from === c.to ? c.from : `${c.from} → ${c.to}`})</span>
                </td>
                <td className="whitespace-nowrap px-3 py-1.5 text-right">{watts(c.watts)}</td>
                <td className="whitespace-nowrap px-3 py-1.5 text-right">{amps(c.amps)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {plan.circuits.length > SHOWN ? (
        <p className="text-sm text-stone-600">
          The first {num(SHOWN)} of {num(plan.circuits.length)} circuits; the run sheet lists every one.
        </p>
      ) : null}
    </section>
  );
}

const statusLook = {
  pass: { icon: CircleCheck, className: 'text-state-on-track', label: 'Passes' },
  fail: { icon: CircleX, className: 'text-danger-700', label: 'Fails' },
  note: { icon: Info, className: 'text-ink-600', label: 'Note' },
} as const;

/** The installer's checks: failures first, then passes, then the notes behind the figures. */
export function PlanChecks({ checks }: { checks: PlanCheck[] }) {
  const order = { fail: 0, pass: 1, note: 2 } as const;
  const sorted = [...checks].sort((a, b) => order[a.status] - order[b.status]);
  return (
    <section aria-label="Checks" className="space-y-2">
      <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-500">Checks before wiring</h3>
      <ul className="divide-y divide-stone-100 rounded border border-stone-200 bg-white">
        {sorted.map((check) => {
          const look = statusLook[check.status];
          const Icon = look.icon;
          return (
            <li key={check.code} className="flex items-start gap-2.5 px-3 py-2 text-sm" data-check={check.code} data-status={check.status}>
              <Icon className={clsx('mt-0.5 h-4 w-4 shrink-0', look.className)} aria-hidden="true" />
              <span>
                <span className="sr-only">{look.label}: </span>
                <span className={check.status === 'fail' ? 'font-medium text-danger-700' : 'text-stone-800'}>{check.message}</span>
              </span>
            </li>
          );
        })}
      </ul>
    </section>
  );
}
