// What the plan and edit dialogs share: the form's values (a day and two times at the site, as
// the office thinks of a visit) turned into the contract's window by the shared schemas, and the
// fields for the day, the times and the technicians.
import { createVisitInput, updateVisitInput, type CreateVisitInput, type UpdateVisitInput } from '@shared/schemas/visits';
import type { StaffMember } from '@shared/schemas/users';
import { visitKinds } from '@shared/schemas/enums';
import { get, useController, useFormContext } from 'react-hook-form';
import { addDays, format, parseISO } from 'date-fns';
import { z } from 'zod';
import { FieldErrorText } from '@/components/ui/field';
import { Spinner } from '@/components/ui/spinner';
import { TextField } from '@/components/ui/text-field';
import { atSite } from '@/features/dispatch/utils/week';
import { zoneAbbreviation } from '@/lib/site-time';

const day = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Choose the day.');
const clock = (what: string) => z.string().regex(/^\d{2}:\d{2}(:\d{2})?$/, `Enter the time the visit ${what}.`);

/** The day, the times at the site and the technicians, as the form holds them. */
const whenAndWho = {
  date: day,
  windowStart: clock('starts'),
  windowEnd: clock('ends'),
  technicianIds: z.array(z.string()),
};

/**
 * The window at the site; an end earlier than the start is on the next day (an overnight visit,
 * 22:00–02:00). A time the zone skips (the hour clocks go forward) comes back empty and the
 * contract names it.
 */
export const windowAt = (v: { date: string; windowStart: string; windowEnd: string }, timeZone: string) => {
  const [start, end] = [v.windowStart.slice(0, 5), v.windowEnd.slice(0, 5)];
  const endDate = end < start && day.safeParse(v.date).success ? format(addDays(parseISO(v.date), 1), 'yyyy-MM-dd') : v.date;
  return { windowStart: atSite(v.date, start, timeZone) ?? '', windowEnd: atSite(endDate, end, timeZone) ?? '' };
};

/**
 * The plan form: its values become a `CreateVisitInput` and are checked by the contract itself,
 * whose messages land on the same field names (the server's too). `zoneOf` names the chosen
 * ticket's or wall's site time zone.
 */
export const planVisitForm = (zoneOf: (v: { kind: string; ticketId: string; wallId: string }) => string | undefined) =>
  z
    .object({
      kind: z.enum(visitKinds, { error: 'Choose a ticket visit or planned maintenance.' }),
      ticketId: z.string(),
      wallId: z.string(),
      ...whenAndWho,
      internalNotes: z.string(),
    })
    .transform((v): CreateVisitInput => ({
      kind: v.kind,
      ticketId: v.kind === 'ticket' ? v.ticketId || undefined : undefined,
      wallId: v.kind === 'maintenance' ? v.wallId || undefined : undefined,
      // Nothing chosen yet: any zone will do, the contract then asks for the ticket or the wall.
      ...windowAt(v, zoneOf(v) ?? 'UTC'),
      technicianIds: v.technicianIds,
      internalNotes: v.internalNotes.trim() || undefined,
    }))
    .pipe(createVisitInput);
export type PlanVisitValues = z.input<ReturnType<typeof planVisitForm>>;

/** The edit form: a new day, times or technicians for one visit, checked by the update contract. */
export const editVisitForm = (timeZone: string) =>
  z
    .object(whenAndWho)
    .transform((v): UpdateVisitInput => ({ ...windowAt(v, timeZone), technicianIds: v.technicianIds }))
    .pipe(updateVisitInput);
export type EditVisitValues = z.input<ReturnType<typeof editVisitForm>>;

/** The day and the two times, with the site's zone named so nobody reads them as the office's. */
export function WhenFields({ timeZone }: { timeZone: string | undefined }) {
  return (
    <fieldset className="space-y-3">
      <legend className="text-sm font-medium text-stone-800">When</legend>
      <p className="text-sm text-stone-600">
        {timeZone
          ? `Times at the site (${zoneAbbreviation(new Date(), timeZone)}, ${timeZone.replace(/_/g, ' ')}).`
          : 'Times at the site, once the ticket or wall is chosen.'}{' '}
        An end before the start is on the next day.
      </p>
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField name="date" label="Day" type="date" />
        <TextField name="windowStart" label="From" type="time" step={300} />
        <TextField name="windowEnd" label="Until" type="time" step={300} />
      </div>
    </fieldset>
  );
}

/** A checkbox per technician of the team; the form's `technicianIds`. */
export function TechnicianChecks({ technicians, loading }: { technicians: StaffMember[]; loading: boolean }) {
  const { control, formState } = useFormContext<{ technicianIds: string[] }>();
  const { field } = useController({ control, name: 'technicianIds' });
  const chosen = field.value ?? [];
  // The contract's message is on the list; the server may name one of its entries.
  const error = get(formState.errors, 'technicianIds') as { message?: string; [i: number]: { message?: string } } | undefined;
  const message = error?.message ?? error?.[0]?.message;
  return (
    <fieldset className="space-y-1" aria-describedby={message ? 'technicians-error' : undefined}>
      <legend className="mb-1 text-sm font-medium text-stone-800">Technicians</legend>
      {loading ? (
        <Spinner />
      ) : technicians.length === 0 ? (
        <p className="text-sm text-stone-600">No technicians in the team yet.</p>
      ) : (
        <div className="grid gap-x-4 sm:grid-cols-2">
          {technicians.map((t) => (
            <label key={t.id} className="flex min-h-touch cursor-pointer items-center gap-3 md:min-h-9">
              <input
                type="checkbox"
                className="h-5 w-5 accent-ink-700"
                checked={chosen.includes(t.id)}
                onBlur={field.onBlur}
                onChange={(e) => field.onChange(e.target.checked ? [...chosen, t.id] : chosen.filter((id) => id !== t.id))}
              />
              <span className="text-base">{t.name}</span>
            </label>
          ))}
        </div>
      )}
      {message ? <FieldErrorText id="technicians-error" message={message} /> : null}
    </fieldset>
  );
}
