import type { TicketDetail } from '@shared/schemas/tickets';
import type { StaffMember } from '@shared/schemas/users';
import { useQuery } from '@tanstack/react-query';
import { addDays, isValid, parseISO, set } from 'date-fns';
import { TZDate } from '@date-fns/tz';
import { useId, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { inputClasses } from '@/components/ui/field';
import { Spinner } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { useUpdateTicket } from '@/features/tickets/api/mutations';
import { errorMessage } from '@/lib/errors';
import { formatSiteTime, fromLocalInput, toLocalInput, zoneAbbreviation } from '@/lib/site-time';
import { userQueries } from '@/resources/users';

interface ScheduleVisitDialogProps {
  open: boolean;
  onClose: () => void;
  ticket: TicketDetail;
  timeZone?: string;
}

/** Tomorrow 09:00–11:00 at the site: a sensible first guess the office adjusts. */
function defaultWindow(timeZone: string) {
  const tomorrow = addDays(new TZDate(Date.now(), timeZone), 1);
  const start = set(tomorrow, { hours: 9, minutes: 0, seconds: 0, milliseconds: 0 });
  const end = set(tomorrow, { hours: 11, minutes: 0, seconds: 0, milliseconds: 0 });
  return { start: toLocalInput(start, timeZone), end: toLocalInput(end, timeZone) };
}

/** Plans a visit for the ticket (status "scheduled"); the client gets an e-mail with a calendar invitation. */
export function ScheduleVisitDialog({ open, onClose, ticket, timeZone }: ScheduleVisitDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title={`Schedule a visit for ${ticket.ref}`}
      description="The client’s contacts get an e-mail with a calendar invitation."
    >
      {open && timeZone ? <ScheduleForm ticket={ticket} timeZone={timeZone} onDone={onClose} /> : open ? <Spinner /> : null}
    </Dialog>
  );
}

function ScheduleForm({ ticket, timeZone, onDone }: { ticket: TicketDetail; timeZone: string; onDone: () => void }) {
  const staff = useQuery(userQueries.staff());
  const update = useUpdateTicket();
  const toast = useToast();
  const initial = defaultWindow(timeZone);
  const [start, setStart] = useState(initial.start);
  const [end, setEnd] = useState(initial.end);
  const [technicianIds, setTechnicianIds] = useState<string[]>(ticket.assignee ? [ticket.assignee.id] : []);
  const [problem, setProblem] = useState<string | null>(null);
  const ids = { start: useId(), end: useId() };
  const technicians = (staff.data?.items ?? []).filter((u) => u.role === 'technician');
  const zone = zoneAbbreviation(new Date(), timeZone);

  const submit = async () => {
    setProblem(null);
    const startIso = fromLocalInput(start, timeZone);
    const endIso = fromLocalInput(end, timeZone);
    if (!startIso || !endIso) return setProblem('Enter the start and the end of the visit.');
    if (!(parseISO(endIso) > parseISO(startIso))) return setProblem('The visit must end after it starts.');
    try {
      await update.mutateAsync({
        id: ticket.id,
        status: 'scheduled',
        // The assignee picker keeps only technicians: the server refuses anyone else on a visit.
        schedule: { start: startIso, end: endIso, technicianIds: technicianIds.filter((id) => technicians.some((t) => t.id === id)) },
      });
      toast(`Visit planned for ${formatSiteTime(startIso, timeZone)}. The client gets an invitation.`);
      onDone();
    } catch (e) {
      setProblem(errorMessage(e));
    }
  };

  const startValid = isValid(parseISO(fromLocalInput(start, timeZone) ?? ''));

  return (
    <form
      aria-label="Schedule a visit"
      className="space-y-4"
      onSubmit={(e) => {
        e.preventDefault();
        void submit();
      }}
    >
      {problem ? <Alert tone="danger">{problem}</Alert> : null}
      <p className="text-sm text-stone-700">
        Times are at the site ({zone}, {timeZone.replace(/_/g, ' ')}).
      </p>
      <div className="grid gap-3 sm:grid-cols-2">
        <div className="space-y-1.5">
          <label htmlFor={ids.start} className="text-sm font-medium text-stone-800">
            Arrive from
          </label>
          <input
            id={ids.start}
            type="datetime-local"
            value={start}
            onChange={(e) => setStart(e.target.value)}
            className={inputClasses(!startValid)}
            required
          />
        </div>
        <div className="space-y-1.5">
          <label htmlFor={ids.end} className="text-sm font-medium text-stone-800">
            Until
          </label>
          <input
            id={ids.end}
            type="datetime-local"
            value={end}
            onChange={(e) => setEnd(e.target.value)}
            className={inputClasses(false)}
            required
          />
        </div>
      </div>
      <TechnicianChoice technicians={technicians} loading={staff.isPending} chosen={technicianIds} onChange={setTechnicianIds} />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <Button type="submit" variant="primary" loading={update.isPending}>
          Schedule and invite
        </Button>
      </DialogActions>
    </form>
  );
}

interface TechnicianChoiceProps {
  technicians: StaffMember[];
  loading: boolean;
  chosen: string[];
  onChange: (update: (chosen: string[]) => string[]) => void;
}

/** Who goes: a checkbox per technician of the team. */
function TechnicianChoice({ technicians, loading, chosen, onChange }: TechnicianChoiceProps) {
  return (
    <fieldset className="space-y-1">
      <legend className="mb-1 text-sm font-medium text-stone-800">Technicians</legend>
      {loading ? (
        <Spinner />
      ) : technicians.length === 0 ? (
        <p className="text-sm text-stone-600">No technicians in the team yet.</p>
      ) : (
        technicians.map((t) => (
          <label key={t.id} className="flex min-h-touch cursor-pointer items-center gap-3 md:min-h-9">
            <input
              type="checkbox"
              className="h-5 w-5 accent-ink-700"
              checked={chosen.includes(t.id)}
              onChange={(e) => onChange((all) => (e.target.checked ? [...all, t.id] : all.filter((id) => id !== t.id)))}
            />
            <span className="text-base">{t.name}</span>
          </label>
        ))
      )}
    </fieldset>
  );
}
