import { commentInput } from '@shared/schemas/tickets';
import type { CommentVisibility } from '@shared/schemas/enums';
import { Lock, Send } from 'lucide-react';
import { useEffect, useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { Form, useZodForm } from '@/components/ui/form';
import { TextAreaField } from '@/components/ui/text-area-field';
import { useToast } from '@/components/ui/toast';
import { useAddComment } from '@/features/tickets/api/mutations';
import { clearDraft, loadDraft, saveDraft } from '@/lib/drafts';

const draftKey = (ticketId: string) => `ticket-log:${ticketId}`;

/**
 * The composer's text kept on the device at every change (IndexedDB, `src/lib/drafts.ts`): a
 * failed send, a reload or a trip to another screen leaves it where it was. Cleared once sent.
 */
function useLogDraft(ticketId: string, body: string, fill: (text: string) => void) {
  const [loaded, setLoaded] = useState(false);
  useEffect(() => {
    let live = true;
    void loadDraft<string>(draftKey(ticketId)).then((stored) => {
      if (!live) return;
      if (stored) fill(stored);
      setLoaded(true);
    });
    return () => {
      live = false;
    };
    // `fill` changes each render; the draft is read once per ticket.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [ticketId]);
  useEffect(() => {
    if (loaded) void (body ? saveDraft(draftKey(ticketId), body) : clearDraft(draftKey(ticketId)));
  }, [loaded, ticketId, body]);
}

/**
 * One text box and, for staff, two different ways out: "Send to client" (their people get an
 * e-mail) or "Save as staff note" (the client never sees it). A client user only sends.
 */
export function LogComposer({ ticketId, staff }: { ticketId: string; staff: boolean }) {
  const add = useAddComment(ticketId);
  const toast = useToast();
  // Nothing goes to the client unless "Send to client" is pressed.
  const form = useZodForm(commentInput, { defaultValues: { body: '', visibility: staff ? 'internal' : 'public' } });
  const [sending, setSending] = useState<CommentVisibility | null>(null);
  const body = form.watch('body') ?? '';
  useLogDraft(ticketId, body, (text) => {
    if (!form.getValues('body')) form.setValue('body', text);
  });
  const ids = { send: useId(), note: useId() };
  const choose = (visibility: CommentVisibility) => () => form.setValue('visibility', visibility);

  return (
    <Form
      form={form}
      aria-label={staff ? 'Write in the logbook' : 'Write to the service desk'}
      className="space-y-3"
      onSubmit={async (values) => {
        const visibility = staff ? values.visibility : 'public';
        setSending(visibility);
        try {
          await add.mutateAsync({ body: values.body, visibility });
        } finally {
          setSending(null);
        }
        form.reset({ body: '', visibility: staff ? 'internal' : 'public' });
        toast(
          visibility === 'internal'
            ? 'Staff note saved. The client does not see it.'
            : staff
              ? 'Sent. The client gets an e-mail.'
              : 'Sent to the service desk.',
        );
      }}
    >
      <TextAreaField
        name="body"
        label={staff ? 'Message to the client, or a note for staff' : 'Your message to the service desk'}
        rows={3}
        hint={staff ? 'Choose below who it is for.' : 'The service desk sees it straight away.'}
      />
      {staff ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <div className="space-y-1">
            <Button
              type="submit"
              variant="primary"
              onClick={choose('public')}
              loading={sending === 'public'}
              disabled={sending !== null}
              aria-describedby={ids.send}
              icon={<Send className="h-4 w-4" aria-hidden="true" />}
              className="w-full"
            >
              Send to client
            </Button>
            <p id={ids.send} className="text-xs text-stone-600">
              The reporter and the site’s contacts get an e-mail.
            </p>
          </div>
          <div className="space-y-1">
            <Button
              type="submit"
              variant="secondary"
              onClick={choose('internal')}
              loading={sending === 'internal'}
              disabled={sending !== null}
              aria-describedby={ids.note}
              icon={<Lock className="h-4 w-4" aria-hidden="true" />}
              className="w-full border-dashed border-stone-500"
            >
              Save as staff note
            </Button>
            <p id={ids.note} className="text-xs text-stone-600">
              Only staff read it: the client never sees it, and no e-mail goes out.
            </p>
          </div>
        </div>
      ) : (
        <div className="flex justify-end">
          <Button
            type="submit"
            variant="primary"
            loading={sending === 'public'}
            icon={<Send className="h-4 w-4" aria-hidden="true" />}
            className="w-full sm:w-auto"
          >
            Send
          </Button>
        </div>
      )}
    </Form>
  );
}
