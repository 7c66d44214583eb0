import type { VisitDetail } from '@shared/schemas/visits';
import type { StaffMember } from '@shared/schemas/users';
import { useQuery } from '@tanstack/react-query';
import clsx from 'clsx';
import { useMemo, useRef } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { SelectField } from '@/components/ui/select-field';
import { Spinner } from '@/components/ui/spinner';
import { TextAreaField } from '@/components/ui/text-area-field';
import { useToast } from '@/components/ui/toast';
import { useCreateVisit } from '@/features/dispatch/api/mutations';
import { planVisitForm, TechnicianChecks, WhenFields, type PlanVisitValues } from '@/features/dispatch/components/visit-form';
import { formatSiteTime } from '@/lib/site-time';
import { siteQueries } from '@/resources/sites';
import { ticketQueries } from '@/resources/tickets';
import { userQueries } from '@/resources/users';
import { wallQueries } from '@/resources/walls';

/** The open tickets the picker offers, newest first. */
const openTickets = ticketQueries.page({ open: 'true', sort: 'createdAt', dir: 'desc' }, 200);

interface PlanVisitDialogProps {
  open: boolean;
  onClose: () => void;
  /** The ticket to plan for, chosen already (`/dispatch?ticketId=`). */
  ticketId?: string;
  /** The day the form starts on (YYYY-MM-DD). */
  date: string;
  /** The visit is booked. */
  onPlanned: (visit: VisitDetail) => void;
}

/** Books a visit for a ticket or for a wall's planned maintenance; the invitees get an invitation. */
export function PlanVisitDialog({ open, onClose, ticketId, date, onPlanned }: PlanVisitDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title="Plan a visit"
      description="The technicians and the client’s contacts get an e-mail with a calendar invitation."
      size="lg"
    >
      {open ? <PlanVisitLoader ticketId={ticketId} date={date} onCancel={onClose} onPlanned={onPlanned} /> : null}
    </Dialog>
  );
}

interface LoaderProps {
  ticketId?: string;
  date: string;
  onCancel: () => void;
  onPlanned: (visit: VisitDetail) => void;
}

/** A ticket chosen from its page is loaded first: its site's time zone and its assignee start the form. */
function PlanVisitLoader({ ticketId, ...rest }: LoaderProps) {
  const ticket = useQuery({ ...ticketQueries.detail(ticketId ?? ''), enabled: Boolean(ticketId) });
  const staff = useQuery(userQueries.staff());
  if (ticketId && ticket.isPending) return <Spinner label="Loading the ticket" />;
  if (staff.isPending) return <Spinner label="Loading the team" />;
  const technicians = (staff.data?.items ?? []).filter((u) => u.role === 'technician');
  const preset = ticket.data;
  const assignee = preset?.assignee && technicians.some((t) => t.id === preset.assignee?.id) ? [preset.assignee.id] : [];
  return (
    <PlanVisitForm
      {...rest}
      technicians={technicians}
      preset={
        preset
          ? { id: preset.id, label: `${preset.ref} · ${preset.title} — ${preset.site.name}`, timeZone: preset.siteTimeZone }
          : undefined
      }
      defaultTechnicianIds={assignee}
    />
  );
}

interface FormProps extends Omit<LoaderProps, 'ticketId'> {
  technicians: StaffMember[];
  preset?: { id: string; label: string; timeZone: string };
  defaultTechnicianIds: string[];
}

function PlanVisitForm({ date, onCancel, onPlanned, technicians, preset, defaultTechnicianIds }: FormProps) {
  const create = useCreateVisit();
  const toast = useToast();
  const tickets = useQuery(openTickets);
  const walls = useQuery(wallQueries.page({}));
  const sites = useQuery(siteQueries.options());

  const zoneBySite = useMemo(() => new Map((sites.data?.items ?? []).map((s) => [s.id, s.timeZone])), [sites.data]);
  const ticketChoices = useMemo(() => {
    const items = (tickets.data?.items ?? []).map((t) => ({
      value: t.id,
      label: `${t.ref} · ${t.title} — ${t.site.name}`,
      siteId: t.site.id,
    }));
    return preset && !items.some((t) => t.value === preset.id) ? [{ value: preset.id, label: preset.label, siteId: '' }, ...items] : items;
  }, [tickets.data, preset]);
  const wallChoices = useMemo(
    () => (walls.data?.items ?? []).map((w) => ({ value: w.id, label: `${w.name} — ${w.siteName}, ${w.clientName}`, siteId: w.siteId })),
    [walls.data],
  );

  const zoneOf = (v: { kind: string; ticketId: string; wallId: string }) => {
    if (v.kind === 'ticket') {
      if (preset && v.ticketId === preset.id) return preset.timeZone;
      return zoneBySite.get(ticketChoices.find((t) => t.value === v.ticketId)?.siteId ?? '');
    }
    return zoneBySite.get(wallChoices.find((w) => w.value === v.wallId)?.siteId ?? '');
  };
  // The schema is made once; it reads the zone from the choices as they are when the form is sent.
  const zoneRef = useRef(zoneOf);
  zoneRef.current = zoneOf;
  const schema = useMemo(() => planVisitForm((v) => zoneRef.current(v)), []);
  const form = useZodForm(schema, {
    defaultValues: {
      kind: 'ticket',
      ticketId: preset?.id ?? '',
      wallId: '',
      date,
      windowStart: '09:00',
      windowEnd: '11:00',
      technicianIds: defaultTechnicianIds,
      internalNotes: '',
    } satisfies PlanVisitValues,
  });

  return (
    <Form
      form={form}
      aria-label="Plan a visit"
      onSubmit={async (values) => {
        const visit = await create.mutateAsync(values);
        toast(
          `Visit booked for ${formatSiteTime(visit.windowStart, visit.site.timeZone)}. The technicians and the client’s contacts were sent an invitation.`,
        );
        onPlanned(visit);
      }}
    >
      <KindChoice />
      <WhatFields ticketChoices={ticketChoices} wallChoices={wallChoices} loading={tickets.isPending || walls.isPending} />
      <ZoneAwareWhen zoneOf={zoneOf} />
      <TechnicianChecks technicians={technicians} loading={false} />
      <TextAreaField name="internalNotes" label="Internal notes" hint="For the team only; the client never sees them." rows={3} />
      <DialogActions>
        <Button onClick={onCancel}>Cancel</Button>
        <SubmitButton>Book and invite</SubmitButton>
      </DialogActions>
    </Form>
  );
}

const kinds = [
  { value: 'ticket', label: 'For a ticket' },
  { value: 'maintenance', label: 'Planned maintenance' },
] as const;

/** A ticket visit or planned maintenance, as two large choices. */
function KindChoice() {
  const { register, control } = useFormContext<PlanVisitValues>();
  const kind = useWatch({ control, name: 'kind' });
  return (
    <fieldset>
      <legend className="mb-1.5 text-sm font-medium text-stone-800">What the visit is for</legend>
      <div className="inline-flex rounded-md border border-stone-300 bg-white p-0.5">
        {kinds.map((k) => (
          <label
            key={k.value}
            className={clsx(
              'flex min-h-touch cursor-pointer items-center rounded px-3 text-sm font-medium md:min-h-9',
              'has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-ink-600',
              kind === k.value ? 'bg-ink-800 text-white' : 'text-ink-800 hover:bg-stone-100',
            )}
          >
            <input type="radio" value={k.value} className="sr-only" {...register('kind')} />
            {k.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

interface Choice {
  value: string;
  label: string;
}

/** The ticket, or the wall for planned maintenance. */
function WhatFields({ ticketChoices, wallChoices, loading }: { ticketChoices: Choice[]; wallChoices: Choice[]; loading: boolean }) {
  const kind = useWatch<PlanVisitValues, 'kind'>({ name: 'kind' });
  return kind === 'ticket' ? (
    <SelectField
      name="ticketId"
      label="Ticket"
      placeholder={loading ? 'Loading the open tickets…' : 'Choose an open ticket'}
      options={ticketChoices}
      hint="The site and the wall come from the ticket."
    />
  ) : (
    <SelectField
      name="wallId"
      label="Wall"
      placeholder={loading ? 'Loading the walls…' : 'Choose the wall'}
      options={wallChoices}
      hint="The site comes from the wall."
    />
  );
}

/** The day and times, naming the zone of the site chosen so far. */
function ZoneAwareWhen({ zoneOf }: { zoneOf: (v: { kind: string; ticketId: string; wallId: string }) => string | undefined }) {
  const [kind, ticketId, wallId] = useWatch<PlanVisitValues, ['kind', 'ticketId', 'wallId']>({ name: ['kind', 'ticketId', 'wallId'] });
  return <WhenFields timeZone={zoneOf({ kind, ticketId, wallId })} />;
}
