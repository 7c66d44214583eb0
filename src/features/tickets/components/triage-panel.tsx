import { ticketPriorities, type TicketPriority, type TicketStatus } from '@shared/schemas/enums';
import { priorityGuidance, type TicketDetail } from '@shared/schemas/tickets';
import { useQuery } from '@tanstack/react-query';
import { CalendarPlus, GitMerge } from 'lucide-react';
import { useId, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { SelectBox } from '@/components/ui/select-field';
import { useToast } from '@/components/ui/toast';
import { useUpdateTicket } from '@/features/tickets/api/mutations';
import { MergeTicketDialog } from '@/features/tickets/components/merge-ticket-dialog';
import { ScheduleVisitDialog } from '@/features/tickets/components/schedule-visit-dialog';
import { statusText } from '@/features/tickets/components/ticket-status';
import { errorMessage } from '@/lib/errors';
import { roleLabels } from '@/lib/format';
import { userQueries } from '@/resources/users';

interface TriagePanelProps {
  ticket: TicketDetail;
  /** Admin and coordinator: priority, assignee, scheduling, merging. A technician moves the status only. */
  office: boolean;
  timeZone?: string;
}

/** Where the office moves a ticket on: status (only the allowed next ones), priority, assignee. */
export function TriagePanel({ ticket, office, timeZone }: TriagePanelProps) {
  // Start from the ticket as it is now; a saved change comes back as a new `updatedAt`.
  return <TriageForm key={ticket.updatedAt} ticket={ticket} office={office} timeZone={timeZone} />;
}

function TriageForm({ ticket, office, timeZone }: TriagePanelProps) {
  const update = useUpdateTicket();
  const staff = useQuery({ ...userQueries.staff(), enabled: office });
  const toast = useToast();
  const [status, setStatus] = useState<TicketStatus>(ticket.status);
  const [priority, setPriority] = useState<TicketPriority>(ticket.priority);
  const [assigneeId, setAssigneeId] = useState<string>(ticket.assignee?.id ?? '');
  const [error, setError] = useState<unknown>(null);
  const ids = { status: useId(), priority: useId(), assignee: useId() };

  const changes = {
    ...(status !== ticket.status ? { status } : {}),
    ...(office && priority !== ticket.priority ? { priority } : {}),
    ...(office && assigneeId !== (ticket.assignee?.id ?? '') ? { assigneeId: assigneeId || null } : {}),
  };
  const dirty = Object.keys(changes).length > 0;
  const merged = Boolean(ticket.mergedInto);
  const canSchedule = office && !merged && (ticket.status === 'scheduled' || ticket.nextStatuses.includes('scheduled'));
  const canMerge = office && !merged && ticket.status !== 'closed';

  const staffOptions = staff.data?.items ?? [];
  const assigneeMissing = ticket.assignee && !staffOptions.some((u) => u.id === ticket.assignee!.id);

  const save = async () => {
    setError(null);
    try {
      await update.mutateAsync({ id: ticket.id, ...changes });
      toast(`${ticket.ref} is updated.`);
    } catch (e) {
      setError(e);
    }
  };

  if (merged) {
    return (
      <Card title="Triage">
        <p className="text-sm text-stone-700">This ticket was merged; work continues on {ticket.mergedInto!.ref}.</p>
      </Card>
    );
  }

  return (
    <Card title="Triage" description={office ? undefined : 'Priority, assignment and visits are set by the office.'}>
      <form
        aria-label="Triage"
        className="space-y-4"
        onSubmit={(e) => {
          e.preventDefault();
          if (dirty) void save();
        }}
      >
        {error ? <Alert tone="danger">{errorMessage(error)}</Alert> : null}
        <div className="space-y-1.5">
          <label htmlFor={ids.status} className="text-sm font-medium text-stone-800">
            Status
          </label>
          <SelectBox
            id={ids.status}
            value={status}
            onChange={(e) => setStatus(e.target.value as TicketStatus)}
            disabled={ticket.nextStatuses.length === 0}
          >
            <option value={ticket.status}>{statusText(ticket.status, false)} (now)</option>
            {ticket.nextStatuses.map((s) => (
              <option key={s} value={s}>
                {statusText(s, false)}
              </option>
            ))}
          </SelectBox>
          <StatusHint from={ticket.status} to={status} />
        </div>
        {office ? (
          <>
            <div className="space-y-1.5">
              <label htmlFor={ids.priority} className="text-sm font-medium text-stone-800">
                Priority
              </label>
              <SelectBox id={ids.priority} value={priority} onChange={(e) => setPriority(e.target.value as TicketPriority)}>
                {ticketPriorities.map((p) => (
                  <option key={p} value={p}>
                    {priorityGuidance[p].label}
                  </option>
                ))}
              </SelectBox>
              {priority !== ticket.priority ? (
                <p className="text-sm text-stone-600">The due times are worked out again from the service plan.</p>
              ) : null}
            </div>
            <div className="space-y-1.5">
              <label htmlFor={ids.assignee} className="text-sm font-medium text-stone-800">
                Assignee
              </label>
              <SelectBox id={ids.assignee} value={assigneeId} onChange={(e) => setAssigneeId(e.target.value)}>
                <option value="">Unassigned</option>
                {assigneeMissing ? <option value={ticket.assignee!.id}>{ticket.assignee!.name}</option> : null}
                {staffOptions.map((u) => (
                  <option key={u.id} value={u.id}>
                    {u.name} ({roleLabels[u.role].toLowerCase()})
                  </option>
                ))}
              </SelectBox>
            </div>
          </>
        ) : null}
        <Button type="submit" variant="primary" disabled={!dirty} loading={update.isPending} className="w-full">
          Save changes
        </Button>
      </form>

      <TriageActions ticket={ticket} canSchedule={canSchedule} canMerge={canMerge} timeZone={timeZone} />
    </Card>
  );
}

/** What moving to the chosen status will do, when it does more than change the status. */
function StatusHint({ from, to }: { from: TicketStatus; to: TicketStatus }) {
  if (to === from) return null;
  if (to === 'waiting_client') return <p className="text-sm text-stone-600">The resolution clock pauses until the ticket moves on.</p>;
  if (to === 'resolved') return <p className="text-sm text-stone-600">The client gets an e-mail and can close the ticket.</p>;
  if (to === 'scheduled')
    return <p className="text-sm text-stone-600">To plan the visit and send the client an invitation, use “Schedule a visit”.</p>;
  return null;
}

interface TriageActionsProps {
  ticket: TicketDetail;
  canSchedule: boolean;
  canMerge: boolean;
  timeZone?: string;
}

/** The office's further actions on a ticket, each in its own dialog: schedule a visit, merge into another ticket. */
function TriageActions({ ticket, canSchedule, canMerge, timeZone }: TriageActionsProps) {
  const [scheduling, setScheduling] = useState(false);
  const [merging, setMerging] = useState(false);
  return (
    <>
      {canSchedule || canMerge ? (
        <div className="mt-4 flex flex-col gap-2 border-t border-stone-100 pt-4">
          {canSchedule ? (
            <Button onClick={() => setScheduling(true)} icon={<CalendarPlus className="h-4 w-4" aria-hidden="true" />}>
              Schedule a visit
            </Button>
          ) : null}
          {canMerge ? (
            <Button variant="ghost" onClick={() => setMerging(true)} icon={<GitMerge className="h-4 w-4" aria-hidden="true" />}>
              Merge into another ticket
            </Button>
          ) : null}
        </div>
      ) : null}

      <ScheduleVisitDialog open={scheduling} onClose={() => setScheduling(false)} ticket={ticket} timeZone={timeZone} />
      <MergeTicketDialog open={merging} onClose={() => setMerging(false)} ticket={ticket} />
    </>
  );
}
