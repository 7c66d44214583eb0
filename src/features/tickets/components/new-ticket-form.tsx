import type { TicketScope } from '@shared/schemas/enums';
import { positionLabel, type Position } from '@shared/schemas/register';
import { createTicketInput, type CreateTicketInput, type TicketDetail } from '@shared/schemas/tickets';
import type { WallSummary } from '@shared/schemas/walls';
import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import clsx from 'clsx';
import { Building2, Cpu, Grid3x3, LayoutGrid, MapPin, X } from 'lucide-react';
import { useEffect, useState, type ReactNode } from 'react';
import { useForm, type Resolver } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import type { z } from 'zod';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { FieldErrorText } from '@/components/ui/field';
import { Form, SubmitButton } from '@/components/ui/form';
import { SelectField } from '@/components/ui/select-field';
import { Spinner } from '@/components/ui/spinner';
import { TextAreaField } from '@/components/ui/text-area-field';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useCreateTicket } from '@/features/tickets/api/mutations';
import { PriorityPicker } from '@/features/tickets/components/priority-picker';
import { TicketWallMap } from '@/features/tickets/components/ticket-wall-map';
import { MediaPicker, UploadList } from '@/features/tickets/components/upload-list';
import { useUploadQueue } from '@/features/tickets/components/use-upload-queue';
import { errorMessage } from '@/lib/errors';
import { siteQueries } from '@/resources/sites';
import { wallQueries } from '@/resources/walls';

/**
 * The shared schema's rules, with words for a person opening a ticket where the generic
 * messages ("Invalid UUID") would say nothing.
 */
const schemaResolver = zodResolver(createTicketInput);
const friendlyResolver: Resolver<z.input<typeof createTicketInput>, unknown, CreateTicketInput> = async (values, context, options) => {
  const result = await schemaResolver(values, context, options);
  const words: Record<string, string> = { siteId: 'Choose the site.', priority: 'Choose how bad it is.', title: 'Say in a few words what is wrong.' };
  for (const [name, message] of Object.entries(words)) {
    const error = (result.errors as Record<string, { message?: string } | undefined>)[name];
    if (error) error.message = message;
  }
  return result;
};

const sameCell = (a: Position, b: Position) => a.column === b.column && a.row === b.row;
const sortCells = (cells: Position[]) => [...cells].sort((a, b) => a.row - b.row || a.column - b.column);

/** "Open a ticket": where, what, how bad, a few words, and photos from the phone. */
export function NewTicketForm({ forClient }: { forClient: boolean }) {
  const navigate = useNavigate();
  const toast = useToast();
  const create = useCreateTicket();
  const uploads = useUploadQueue();
  const sites = useQuery(siteQueries.options());
  const [created, setCreated] = useState<TicketDetail | null>(null);
  const [uploadFailures, setUploadFailures] = useState(0);

  const form = useForm<z.input<typeof createTicketInput>, unknown, CreateTicketInput>({
    resolver: friendlyResolver,
    defaultValues: { siteId: '', wallId: null, scope: 'cells', cells: [], title: '', description: '' },
  });
  const siteId = form.watch('siteId');
  const wallId = form.watch('wallId');
  const scope = (form.watch('scope') ?? 'cells') as TicketScope;
  const cells = (form.watch('cells') ?? []) as Position[];
  const walls = useQuery({ ...wallQueries.page({ siteId: siteId || undefined }), enabled: Boolean(siteId) });
  const wall = walls.data?.items.find((w) => w.id === wallId) ?? null;
  const [place, setPlace] = useState<'wall' | 'site' | ''>('');

  // One site: nothing to choose.
  useEffect(() => {
    if (sites.data?.items.length === 1 && !form.getValues('siteId')) form.setValue('siteId', sites.data.items[0].id);
  }, [sites.data, form]);

  // A new site: the wall and cells chosen before belong to another site.
  useEffect(() => {
    form.setValue('wallId', null);
    form.setValue('cells', []);
    setPlace('');
  }, [siteId, form]);

  const chooseWall = (w: WallSummary | null) => {
    form.setValue('wallId', w?.id ?? null, { shouldValidate: form.formState.isSubmitted });
    form.setValue('cells', []);
    form.setValue('scope', w ? 'cells' : 'site');
    form.clearErrors(['wallId', 'cells']);
    setPlace(w ? 'wall' : 'site');
  };
  const toggleCell = (p: Position) => {
    const current = (form.getValues('cells') ?? []) as Position[];
    const next = current.some((c) => sameCell(c, p)) ? current.filter((c) => !sameCell(c, p)) : sortCells([...current, p]);
    form.setValue('cells', next);
    if (next.length) form.clearErrors('cells');
  };

  const goToTicket = (t: TicketDetail) => navigate(paths.ticket.getHref(t.id));

  if (sites.isPending) return <p className="flex items-center gap-2 py-10 text-stone-600"><Spinner label="" /> Loading your sites…</p>;
  if (sites.isError) return <Alert tone="danger" title="Your sites could not be loaded.">{errorMessage(sites.error)}</Alert>;
  if (sites.data.items.length === 0) {
    return (
      <Alert tone="info" title="No sites yet">
        {forClient ? 'Your organisation has no sites in Gridkeep yet. Call or e-mail the service desk and we will set them up.' : 'Add a client site first.'}
      </Alert>
    );
  }

  if (created) {
    return (
      <Card title={`${created.ref} is open`} description="The service desk has it. Your photos and videos are on their way.">
        <div className="space-y-4">
          <UploadList items={uploads.items} onRetry={(key) => uploads.retry(created.id, key).then(() => undefined)} />
          {uploadFailures > 0 ? (
            <Alert tone="danger" title={uploadFailures === 1 ? 'One file could not be sent.' : `${uploadFailures} files could not be sent.`}>
              <p>Try again, or go on to the ticket: you can add photos there too.</p>
            </Alert>
          ) : null}
          <div className="flex flex-wrap gap-2">
            <Button variant="primary" onClick={() => goToTicket(created)} disabled={uploads.busy}>
              Go to the ticket
            </Button>
          </div>
        </div>
      </Card>
    );
  }

  const siteError = form.formState.errors.siteId?.message;
  const wallError = form.formState.errors.wallId?.message;
  const cellsError = form.formState.errors.cells?.message;

  return (
    <Form
      form={form}
      aria-label="Open a ticket"
      className="space-y-6"
      onSubmit={async (values) => {
        if (values.wallId && values.scope === 'cells' && !(values.cells?.length)) {
          form.setError('cells', { type: 'manual', message: 'Tap the faulty cabinets on the map, or choose “The whole wall”.' }, { shouldFocus: false });
          document.getElementById('ticket-what')?.scrollIntoView({ behavior: 'smooth', block: 'start' });
          return;
        }
        const ticket = await create.mutateAsync({
          ...values,
          wallId: values.wallId || null,
          scope: values.wallId ? values.scope : 'site',
          cells: values.wallId && values.scope === 'cells' ? values.cells : [],
        });
        if (uploads.items.length === 0) {
          toast(`${ticket.ref} is open. The service desk has it.`);
          goToTicket(ticket);
          return;
        }
        setCreated(ticket);
        const failed = await uploads.sendAll(ticket.id);
        setUploadFailures(failed);
        if (failed === 0) {
          toast(`${ticket.ref} is open, with your photos.`);
          goToTicket(ticket);
        }
      }}
    >
      <Step number={1} title="Where is the problem?">
        {sites.data.items.length > 1 ? (
          <SelectField
            name="siteId"
            label="Site"
            placeholder="Choose the site…"
            options={sites.data.items.map((s) => ({ value: s.id, label: forClient ? `${s.name}${s.city ? ` · ${s.city}` : ''}` : `${s.name} (${s.clientName})` }))}
          />
        ) : (
          <p className="flex items-center gap-2 text-base text-stone-800">
            <MapPin className="h-4 w-4 text-ink-600" aria-hidden="true" />
            {sites.data.items[0].name}
            {sites.data.items[0].city ? <span className="text-stone-600">· {sites.data.items[0].city}</span> : null}
          </p>
        )}
        {siteError && sites.data.items.length === 1 ? <FieldErrorText id="site-error" message={siteError} /> : null}

        {siteId ? (
          <fieldset className="space-y-2" aria-describedby={wallError ? 'wall-error' : undefined}>
            <legend className="mb-2 text-sm font-medium text-stone-800">Which wall?</legend>
            {walls.isPending ? (
              <p className="flex items-center gap-2 text-sm text-stone-600"><Spinner label="" /> Loading the walls…</p>
            ) : walls.isError ? (
              <Alert tone="danger">{errorMessage(walls.error)}</Alert>
            ) : (
              <div className="grid gap-2 sm:grid-cols-2">
                {walls.data.items.map((w) => (
                  <ChoiceCard
                    key={w.id}
                    name="wall-choice"
                    checked={place === 'wall' && wallId === w.id}
                    onChange={() => chooseWall(w)}
                    icon={Grid3x3}
                    title={w.name}
                    detail={`${w.columns} × ${w.rows} cabinets${w.openTicketCount ? ` · ${w.openTicketCount} open ticket${w.openTicketCount === 1 ? '' : 's'}` : ''}`}
                  />
                ))}
                <ChoiceCard
                  name="wall-choice"
                  checked={place === 'site'}
                  onChange={() => chooseWall(null)}
                  icon={Building2}
                  title="Something else at the site"
                  detail="Not one wall: a question, a cable run, the spare kit…"
                />
              </div>
            )}
            {wallError ? <FieldErrorText id="wall-error" message={wallError} /> : null}
          </fieldset>
        ) : null}
      </Step>

      {wall ? (
        <Step number={2} title="What is wrong with it?" id="ticket-what">
          <fieldset>
            <legend className="sr-only">What is affected</legend>
            <div className="grid gap-2 sm:grid-cols-3">
              <ChoiceCard name="scope" checked={scope === 'cells'} onChange={() => form.setValue('scope', 'cells')} icon={LayoutGrid} title="Some cabinets" detail="Tap them on the map" />
              <ChoiceCard
                name="scope"
                checked={scope === 'whole_wall'}
                onChange={() => {
                  form.setValue('scope', 'whole_wall');
                  form.clearErrors('cells');
                }}
                icon={Grid3x3}
                title="The whole wall"
                detail="Dark, frozen, or wrong everywhere"
              />
              <ChoiceCard
                name="scope"
                checked={scope === 'controller'}
                onChange={() => {
                  form.setValue('scope', 'controller');
                  form.clearErrors('cells');
                }}
                icon={Cpu}
                title="Controller / signal"
                detail="No picture, wrong input, the processor"
              />
            </div>
          </fieldset>
          {scope === 'cells' ? (
            <div className="space-y-3">
              <p className="text-sm text-stone-700">
                Tap each faulty cabinet as the audience sees the wall. Tap again to unselect. Behind the wall? Switch to <em>Rear</em>.
              </p>
              <TicketWallMap wall={wall} selected={cells} onToggle={toggleCell} markOpenTickets />
              <div aria-live="polite" className="rounded-md border border-stone-200 bg-stone-50 px-3 py-2">
                {cells.length ? (
                  <div className="flex flex-wrap items-center gap-1.5">
                    <span className="mr-1 text-sm font-medium text-stone-800">
                      {cells.length === 1 ? '1 cabinet selected:' : `${cells.length} cabinets selected:`}
                    </span>
                    {cells.map((c) => (
                      <button
                        key={positionLabel(c)}
                        type="button"
                        onClick={() => toggleCell(c)}
                        className="inline-flex min-h-8 items-center gap-1 rounded-full border border-amber-500 bg-amber-50 pl-2.5 pr-1.5 text-sm font-medium text-amber-900 hover:bg-amber-100"
                        aria-label={`Unselect ${positionLabel(c)}`}
                      >
                        {positionLabel(c)}
                        <X className="h-3.5 w-3.5" aria-hidden="true" />
                      </button>
                    ))}
                    <Button size="sm" variant="ghost" onClick={() => form.setValue('cells', [])}>
                      Clear
                    </Button>
                  </div>
                ) : (
                  <p className="text-sm text-stone-600">No cabinet selected yet.</p>
                )}
              </div>
              {cellsError ? <FieldErrorText id="cells-error" message={cellsError} /> : null}
            </div>
          ) : null}
        </Step>
      ) : null}

      <Step number={wall ? 3 : 2} title="How bad is it?">
        <PriorityPicker hideLegend />
      </Step>

      <Step number={wall ? 4 : 3} title="Tell us about it">
        <TextField name="title" label="In a few words" placeholder="e.g. Dark square lower left of centre" maxLength={160} autoComplete="off" />
        <TextAreaField
          name="description"
          label="What do you see?"
          hint="Optional. When it started, what is on screen, whether it comes and goes, an event coming up."
          rows={4}
        />
      </Step>

      <Step number={wall ? 5 : 4} title="Photos or a short video" optional>
        <p className="text-sm text-stone-700">A photo of the fault from the audience side helps us bring the right part.</p>
        <MediaPicker onFiles={uploads.add} />
        <UploadList items={uploads.items} onRemove={uploads.remove} />
      </Step>

      <div className="flex flex-wrap items-center gap-3">
        <SubmitButton size="lg">Send the ticket</SubmitButton>
        <p className="text-sm text-stone-600">{forClient ? 'You get an e-mail when the service desk answers.' : 'The client’s contacts are kept informed by e-mail.'}</p>
      </div>
    </Form>
  );
}

function Step({ number, title, optional = false, id, children }: { number: number; title: string; optional?: boolean; id?: string; children: ReactNode }) {
  return (
    <section id={id} aria-label={title} className="scroll-mt-20 rounded-md border border-stone-200 bg-white p-4 shadow-card sm:p-5">
      <h2 className="mb-4 flex items-center gap-2.5 text-lg font-semibold">
        <span className="flex h-7 w-7 shrink-0 items-center justify-center rounded-full bg-ink-800 text-sm font-semibold text-white" aria-hidden="true">
          {number}
        </span>
        {title}
        {optional ? <span className="text-sm font-normal text-stone-500">(optional)</span> : null}
      </h2>
      <div className="space-y-4">{children}</div>
    </section>
  );
}

interface ChoiceCardProps {
  name: string;
  checked: boolean;
  onChange: () => void;
  icon: typeof Grid3x3;
  title: string;
  detail?: string;
}

function ChoiceCard({ name, checked, onChange, icon: Icon, title, detail }: ChoiceCardProps) {
  return (
    <label
      className={clsx(
        'flex min-h-touch cursor-pointer items-start gap-3 rounded-md border bg-white p-3 transition-colors',
        'has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-ink-600 has-[:focus-visible]:ring-offset-2',
        checked ? 'border-ink-700 bg-ink-50 shadow-[inset_0_0_0_1px_theme(colors.ink.700)]' : 'border-stone-300 hover:border-stone-400',
      )}
    >
      <input type="radio" name={name} checked={checked} onChange={onChange} className="sr-only" />
      <Icon className={clsx('mt-0.5 h-5 w-5 shrink-0', checked ? 'text-ink-700' : 'text-stone-500')} aria-hidden="true" />
      <span className="min-w-0">
        <span className="block font-semibold text-ink-950">{title}</span>
        {detail ? <span className="block text-sm text-stone-600">{detail}</span> : null}
      </span>
    </label>
  );
}
