import { ticketPriorities, type TicketPriority, type TicketStatus } from '@shared/schemas/enums';
import { priorityGuidance, type TicketDetail } from '@shared/schemas/tickets';
import { useQuery } from '@tanstack/react-query';
import clsx from 'clsx';
import { CalendarPlus, GitMerge } from 'lucide-react';
import { useId, useState, type ReactNode } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { SelectBox } from '@/components/ui/select-field';
import { useToast } from '@/components/ui/toast';
import { useUpdateTicket } from '@/features/tickets/api/mutations';
import { MergeTicketDialog } from '@/features/tickets/components/merge-ticket-dialog';
import { ScheduleVisitDialog } from '@/features/tickets/components/schedule-visit-dialog';
import { statusText } from '@/features/tickets/components/ticket-status';
import { errorMessage } from '@/lib/errors';
import { roleLabels } from '@/lib/format';
import { userQueries } from '@/resources/users';

interface HandlingStripProps {
  ticket: TicketDetail;
  /** Admin and coordinator: priority, assignee, scheduling, merging. A technician moves the status only. */
  office: boolean;
  timeZone?: string;
}

/**
 * How the service desk moves a ticket on, in one row under the installation line: status (only the
 * allowed next ones), priority and assignee with Save; then "Schedule a visit" and "Merge".
 */
export function HandlingStrip({ ticket, office, timeZone }: HandlingStripProps) {
  if (ticket.mergedInto) return null; // the page says where the work went; a merged ticket takes no changes
  // Start from the ticket as it is now; a saved change comes back as a new `updatedAt`.
  return <HandlingForm key={ticket.updatedAt} ticket={ticket} office={office} timeZone={timeZone} />;
}

interface ControlProps {
  id: string;
  label: string;
  children: ReactNode;
  hint?: ReactNode;
  className?: string;
}

function Control({ id, label, children, hint, className }: ControlProps) {
  return (
    <div className={clsx('min-w-0 space-y-1', className)}>
      <label htmlFor={id} className="block text-xs font-medium uppercase tracking-wide text-stone-600">
        {label}
      </label>
      {children}
      {hint}
    </div>
  );
}

function HandlingForm({ ticket, office, timeZone }: HandlingStripProps) {
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
  const canSchedule = office && (ticket.status === 'scheduled' || ticket.nextStatuses.includes('scheduled'));
  const canMerge = office && ticket.status !== 'closed';

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

  return (
    <div className="mb-5 rounded-md border border-stone-200 bg-stone-50 px-3 py-3 sm:px-4">
      <div className="flex flex-col gap-3 2xl:flex-row 2xl:items-start 2xl:justify-between">
        <form
          aria-label="Handling"
          className="grid min-w-0 flex-1 gap-3 sm:grid-cols-2 lg:grid-cols-[minmax(0,16rem)_minmax(0,10rem)_minmax(0,18rem)_auto] lg:items-start"
          onSubmit={(e) => {
            e.preventDefault();
            if (dirty) void save();
          }}
        >
          <Control id={ids.status} label="Status" hint={<StatusHint from={ticket.status} to={status} />}>
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
          </Control>
          {office ? (
            <>
              <Control
                id={ids.priority}
                label="Priority"
                hint={
                  priority !== ticket.priority ? (
                    <p className="text-sm text-stone-600">The due times are worked out again from the service plan.</p>
                  ) : null
                }
              >
                <SelectBox id={ids.priority} value={priority} onChange={(e) => setPriority(e.target.value as TicketPriority)}>
                  {ticketPriorities.map((p) => (
                    <option key={p} value={p}>
                      {priorityGuidance[p].label}
                    </option>
                  ))}
                </SelectBox>
              </Control>
              <Control id={ids.assignee} label="Assignee" className="sm:col-span-2 lg:col-span-1">
                <SelectBox id={ids.assignee} value={assigneeId} onChange={(e) => setAssigneeId(e.target.value)}>
                  <option value="">Unassigned</option>
                  {assigneeMissing ? <option value={ticket.assignee!.id}>{ticket.assignee!.name}</option> : null}
                  {staffOptions.map((u) => (
                    <option key={u.id} value={u.id}>
                      {u.name} ({roleLabels[u.role].toLowerCase()})
                    </option>
                  ))}
                </SelectBox>
              </Control>
            </>
          ) : (
            <p className="self-end text-sm text-stone-600 lg:col-span-2">Priority, assignment and visits are set by the office.</p>
          )}
          <div className="sm:col-span-2 lg:col-span-1 lg:pt-5">
            <Button type="submit" variant="primary" disabled={!dirty} loading={update.isPending} className="w-full lg:w-auto">
              Save
            </Button>
          </div>
          {error ? (
            <Alert tone="danger" className="sm:col-span-2 lg:col-span-4">
              {errorMessage(error)}
            </Alert>
          ) : null}
        </form>
        <HandlingActions ticket={ticket} canSchedule={canSchedule} canMerge={canMerge} timeZone={timeZone} />
      </div>
    </div>
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

interface HandlingActionsProps {
  ticket: TicketDetail;
  canSchedule: boolean;
  canMerge: boolean;
  timeZone?: string;
}

/** The office's further actions on a ticket, each in its own dialog: schedule a visit, merge into another ticket. */
function HandlingActions({ ticket, canSchedule, canMerge, timeZone }: HandlingActionsProps) {
  const [scheduling, setScheduling] = useState(false);
  const [merging, setMerging] = useState(false);
  if (!canSchedule && !canMerge) return null;
  return (
    <>
      <div className="flex flex-col gap-2 border-t border-stone-200 pt-3 sm:flex-row 2xl:border-l 2xl:border-t-0 2xl:pl-4 2xl:pt-5">
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
      <ScheduleVisitDialog open={scheduling} onClose={() => setScheduling(false)} ticket={ticket} timeZone={timeZone} />
      <MergeTicketDialog open={merging} onClose={() => setMerging(false)} ticket={ticket} />
    </>
  );
}
