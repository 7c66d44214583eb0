import { visitStatusLabels, type VisitListItem } from '@shared/schemas/visits';
import type { StaffMember } from '@shared/schemas/users';
import { ExternalLink } from 'lucide-react';
import { useId, useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { inputClasses } from '@/components/ui/field';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useUpdateVisit } from '@/features/dispatch/api/mutations';
import { editVisitForm, TechnicianChecks, WhenFields } from '@/features/dispatch/components/visit-form';
import { siteClock, siteDate } from '@/features/dispatch/utils/week';
import { formatSiteWindow } from '@/lib/site-time';
import { formatSiteTime } from '@/lib/site-time';

export const movedMessage = 'Moved. The technicians and the client’s contacts were sent an updated invitation.';

/** Planned and started visits can still be moved, reassigned or cancelled from dispatch. */
export const canChange = (visit: Pick<VisitListItem, 'status'>) => visit.status === 'planned' || visit.status === 'in_progress';

export const visitTitle = (visit: VisitListItem) => `${visit.site.name} · ${visit.ticket ? visit.ticket.ref : 'Maintenance'}`;

interface EditVisitDialogProps {
  visit: VisitListItem | null;
  technicians: StaffMember[];
  onClose: () => void;
}

/** Move, reassign or cancel one visit: what a drag does, for the keyboard and for touch. */
export function EditVisitDialog({ visit, technicians, onClose }: EditVisitDialogProps) {
  return (
    <Dialog
      open={visit !== null}
      onClose={onClose}
      title={visit ? visitTitle(visit) : ''}
      description={
        visit
          ? `${visitStatusLabels[visit.status]} · ${formatSiteWindow(visit.windowStart, visit.windowEnd, visit.site.timeZone)}`
          : undefined
      }
      size="lg"
    >
      {visit ? (
        canChange(visit) ? (
          <EditVisitForm key={`${visit.id}:${visit.sequence}`} visit={visit} technicians={technicians} onDone={onClose} />
        ) : (
          <ClosedVisit visit={visit} onDone={onClose} />
        )
      ) : null}
    </Dialog>
  );
}

function VisitLink({ visit }: { visit: VisitListItem }) {
  return (
    <Link to={paths.visit.getHref(visit.id)} className="inline-flex items-center gap-1.5 text-sm font-medium text-ink-700 hover:underline">
      <ExternalLink className="h-4 w-4" aria-hidden="true" />
      Open the visit
    </Link>
  );
}

function ClosedVisit({ visit, onDone }: { visit: VisitListItem; onDone: () => void }) {
  return (
    <div className="space-y-3">
      <p className="text-base text-stone-800">
        {visit.status === 'completed' ? 'This visit is completed; it can no longer be moved.' : 'This visit was cancelled.'}
      </p>
      <VisitLink visit={visit} />
      <DialogActions>
        <Button onClick={onDone}>Close</Button>
      </DialogActions>
    </div>
  );
}

const sameSet = (a: string[], b: string[]) => a.length === b.length && a.every((id) => b.includes(id));

function EditVisitForm({ visit, technicians, onDone }: { visit: VisitListItem; technicians: StaffMember[]; onDone: () => void }) {
  const zone = visit.site.timeZone;
  const update = useUpdateVisit();
  const toast = useToast();
  const [cancelling, setCancelling] = useState(false);
  const schema = useMemo(() => editVisitForm(zone), [zone]);
  const form = useZodForm(schema, {
    defaultValues: {
      date: siteDate(visit.windowStart, zone),
      windowStart: siteClock(visit.windowStart, zone),
      windowEnd: siteClock(visit.windowEnd, zone),
      technicianIds: visit.technicians.map((t) => t.id),
    },
  });
  // Someone no longer in the team list (left, or not a technician any more) still shows while on the visit.
  const choices = [
    ...technicians,
    ...visit.technicians.filter((t) => !technicians.some((m) => m.id === t.id)).map((t) => ({ ...t, role: 'technician' as const })),
  ];

  return (
    <>
      <Form
        form={form}
        aria-label="Change the visit"
        onSubmit={async (values) => {
          const moved =
            Date.parse(values.windowStart ?? '') !== Date.parse(visit.windowStart) ||
            Date.parse(values.windowEnd ?? '') !== Date.parse(visit.windowEnd);
          const reassigned = !sameSet(
            values.technicianIds ?? [],
            visit.technicians.map((t) => t.id),
          );
          if (!moved && !reassigned) return onDone();
          await update.mutateAsync({
            id: visit.id,
            ...(moved ? { windowStart: values.windowStart, windowEnd: values.windowEnd } : {}),
            ...(reassigned ? { technicianIds: values.technicianIds } : {}),
          });
          toast(moved ? movedMessage : 'Saved. The technicians and the client’s contacts were sent an updated invitation.');
          onDone();
        }}
      >
        <WhenFields timeZone={zone} />
        <TechnicianChecks technicians={choices} loading={false} />
        <VisitLink visit={visit} />
        <DialogActions>
          <Button variant="danger" className="mr-auto" onClick={() => setCancelling(true)}>
            Cancel visit…
          </Button>
          <Button onClick={onDone}>Close</Button>
          <SubmitButton>Save and send update</SubmitButton>
        </DialogActions>
      </Form>
      <CancelVisitDialog
        open={cancelling}
        visit={visit}
        onClose={() => setCancelling(false)}
        onCancelled={() => {
          setCancelling(false);
          onDone();
        }}
      />
    </>
  );
}

interface CancelVisitDialogProps {
  open: boolean;
  visit: VisitListItem;
  onClose: () => void;
  onCancelled: () => void;
}

/** Asks before cancelling, with the reason the invitees read in the cancellation. */
function CancelVisitDialog({ open, visit, onClose, onCancelled }: CancelVisitDialogProps) {
  const update = useUpdateVisit();
  const toast = useToast();
  const [reason, setReason] = useState('');
  const id = useId();
  return (
    <ConfirmDialog
      open={open}
      onClose={onClose}
      title="Cancel this visit?"
      confirmLabel="Cancel the visit"
      tone="danger"
      onConfirm={async () => {
        await update.mutateAsync({ id: visit.id, status: 'cancelled', cancelReason: reason.trim() || undefined });
        toast('Visit cancelled. The technicians and the client’s contacts were sent a cancellation.');
        onCancelled();
      }}
    >
      <p>
        {visitTitle(visit)}, {formatSiteTime(visit.windowStart, visit.site.timeZone)}. The technicians and the client’s contacts get a
        cancellation that takes it out of their calendars.
      </p>
      <div className="space-y-1.5">
        <label htmlFor={id} className="text-sm font-medium text-stone-800">
          Reason
        </label>
        <textarea
          id={id}
          rows={3}
          maxLength={500}
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          className={inputClasses(false, 'py-2 leading-normal')}
        />
        <p className="text-sm text-stone-600">Optional. It goes into the cancellation e-mail, to the technicians and the client.</p>
      </div>
    </ConfirmDialog>
  );
}
