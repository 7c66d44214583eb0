import { createTicketInput, type CreateTicketInput, type TicketDetail } from '@shared/schemas/tickets';
import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { useForm, type Resolver } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Form, SubmitButton } from '@/components/ui/form';
import { Spinner } from '@/components/ui/spinner';
import { TextAreaField } from '@/components/ui/text-area-field';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useCreateTicket } from '@/features/tickets/api/mutations';
import { TicketCreated } from '@/features/tickets/components/new-ticket-created';
import { Step, type NewTicketValues } from '@/features/tickets/components/new-ticket-step';
import { WhatStep } from '@/features/tickets/components/new-ticket-what-step';
import { wallChoices, WhereStep, type TicketPlace } from '@/features/tickets/components/new-ticket-where-step';
import { PriorityPicker } from '@/features/tickets/components/priority-picker';
import { MediaPicker, UploadList } from '@/features/tickets/components/upload-list';
import { useUploadQueue, type UploadQueue } from '@/features/tickets/components/use-upload-queue';
import { errorMessage } from '@/lib/errors';
import { siteQueries } from '@/resources/sites';

/**
 * The shared schema's rules, with words for a person opening a ticket where the generic
 * messages ("Invalid UUID") would say nothing.
 */
const schemaResolver = zodResolver(createTicketInput);
const friendlyResolver: Resolver<NewTicketValues, unknown, CreateTicketInput> = async (values, context, options) => {
  const result = await schemaResolver(values, context, options);
  const words: Record<string, string> = {
    siteId: 'Choose the site.',
    priority: 'Choose how bad it is.',
    title: 'Say in a few words what is wrong.',
  };
  for (const [name, message] of Object.entries(words)) {
    const error = (result.errors as Record<string, { message?: string } | undefined>)[name];
    if (error) error.message = message;
  }
  return result;
};

/**
 * Opens the ticket, then sends its photos one by one, and goes to the ticket once everything is
 * through. When a file fails, `created` holds the open ticket so the person can try again.
 */
function useSendTicket(uploads: UploadQueue) {
  const navigate = useNavigate();
  const toast = useToast();
  const create = useCreateTicket();
  const [created, setCreated] = useState<TicketDetail | null>(null);
  const [failures, setFailures] = useState(0);
  const goToTicket = (t: TicketDetail) => navigate(paths.ticket.getHref(t.id));

  const send = async (values: CreateTicketInput) => {
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
    setFailures(failed);
    if (failed === 0) {
      toast(`${ticket.ref} is open, with your photos.`);
      goToTicket(ticket);
    }
  };
  return { created, failures, send, goToTicket };
}

/** "Open a ticket": where, what, how bad, a few words, and photos from the phone. */
export function NewTicketForm({ forClient }: { forClient: boolean }) {
  const uploads = useUploadQueue();
  const { created, failures, send, goToTicket } = useSendTicket(uploads);
  const sites = useQuery(siteQueries.options());

  const form = useForm<NewTicketValues, unknown, CreateTicketInput>({
    resolver: friendlyResolver,
    defaultValues: { siteId: '', wallId: null, scope: 'cells', cells: [], title: '', description: '' },
  });
  const siteId = form.watch('siteId');
  const wallId = form.watch('wallId');
  const walls = useQuery(wallChoices(siteId));
  const wall = walls.data?.items.find((w) => w.id === wallId) ?? null;
  const [place, setPlace] = useState<TicketPlace>('');

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

  if (sites.isPending)
    return (
      <p className="flex items-center gap-2 py-10 text-stone-600">
        <Spinner label="" /> Loading your sites…
      </p>
    );
  if (sites.isError)
    return (
      <Alert tone="danger" title="Your sites could not be loaded.">
        {errorMessage(sites.error)}
      </Alert>
    );
  if (sites.data.items.length === 0) {
    return (
      <Alert tone="info" title="No sites yet">
        {forClient
          ? 'Your organisation has no sites in Gridkeep yet. Call or e-mail the service desk and we will set them up.'
          : 'Add a client site first.'}
      </Alert>
    );
  }

  if (created) return <TicketCreated ticket={created} uploads={uploads} failures={failures} onGoToTicket={() => goToTicket(created)} />;

  return (
    <Form
      form={form}
      aria-label="Open a ticket"
      className="space-y-6"
      onSubmit={async (values) => {
        if (values.wallId && values.scope === 'cells' && !values.cells?.length) {
          form.setError(
            'cells',
            { type: 'manual', message: 'Tap the faulty cabinets on the map, or choose “The whole wall”.' },
            { shouldFocus: false },
          );
          document.getElementById('ticket-what')?.scrollIntoView({ behavior: 'smooth', block: 'start' });
          return;
        }
        await send(values);
      }}
    >
      <WhereStep sites={sites.data.items} forClient={forClient} place={place} onPlaceChange={setPlace} />

      {wall ? <WhatStep wall={wall} /> : null}

      <Step number={wall ? 3 : 2} title="How bad is it?">
        <PriorityPicker hideLegend />
      </Step>

      <Step number={wall ? 4 : 3} title="Tell us about it">
        <TextField
          name="title"
          label="In a few words"
          placeholder="e.g. Dark square lower left of centre"
          maxLength={160}
          autoComplete="off"
        />
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
        <p className="text-sm text-stone-600">
          {forClient ? 'You get an e-mail when the service desk answers.' : 'The client’s contacts are kept informed by e-mail.'}
        </p>
      </div>
    </Form>
  );
}
