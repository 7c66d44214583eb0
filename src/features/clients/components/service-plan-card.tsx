import { ticketPriorities } from '@shared/schemas/enums';
import { Card } from '@/components/ui/card';
import type { ServicePlan } from '@shared/schemas/clients';

const priorityLabels = { critical: 'Critical', high: 'High', normal: 'Normal', low: 'Low' } as const;
const dayNames = ['', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'];

/** "Mon–Fri" for a run of days, else the days listed. */
function dayRange(days: number[]): string {
  const sorted = [...days].sort((a, b) => a - b);
  if (sorted.length === 7) return 'every day';
  const consecutive = sorted.every((d, i) => i === 0 || d === sorted[i - 1] + 1);
  if (consecutive && sorted.length > 2) return `${dayNames[sorted[0]]}–${dayNames[sorted[sorted.length - 1]]}`;
  return sorted.map((d) => dayNames[d]).join(', ');
}

const hours = (h: number) => (h === 1 ? '1 hour' : `${h} hours`);

/** The client's service plan: when the clock runs and the targets per priority. */
export function ServicePlanCard({ plan }: { plan: ServicePlan | null }) {
  if (!plan) {
    return (
      <Card title="Service plan">
        <p className="text-stone-600">No service plan: tickets from this client have no response or resolution targets.</p>
      </Card>
    );
  }
  const clock =
    plan.clockMode === 'round_the_clock'
      ? 'The clock runs round the clock, every day.'
      : `The clock runs in business hours: ${dayRange(plan.businessDays)}, ${plan.dayStart}–${plan.dayEnd} (site time).`;
  return (
    <Card title={`Service plan: ${plan.name}`} description={clock} flush>
      <table className="w-full text-sm">
        <caption className="sr-only">Targets per priority</caption>
        <thead className="bg-stone-50 text-left text-xs font-semibold text-stone-600">
          <tr>
            <th scope="col" className="px-4 py-2 sm:px-5">
              Priority
            </th>
            <th scope="col" className="px-4 py-2 text-right">
              Respond within
            </th>
            <th scope="col" className="px-4 py-2 text-right sm:pr-5">
              Resolve within
            </th>
          </tr>
        </thead>
        <tbody>
          {ticketPriorities.map((p) => (
            <tr key={p} className="border-t border-stone-100">
              <th scope="row" className="px-4 py-2 text-left font-medium sm:px-5">
                {priorityLabels[p]}
              </th>
              <td className="px-4 py-2 text-right tabular-nums">{hours(plan.targets[p].responseHours)}</td>
              <td className="px-4 py-2 text-right tabular-nums sm:pr-5">{hours(plan.targets[p].resolutionHours)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </Card>
  );
}
