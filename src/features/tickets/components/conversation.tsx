import { commentInput, type CommentInput, type TicketComment } from '@shared/schemas/tickets';
import { useQuery } from '@tanstack/react-query';
import clsx from 'clsx';
import { Globe, Lock, MessagesSquare } from 'lucide-react';
import { useId } from 'react';
import { useFormContext } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Card } from '@/components/ui/card';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { Spinner } from '@/components/ui/spinner';
import { TextAreaField } from '@/components/ui/text-area-field';
import { useToast } from '@/components/ui/toast';
import { useAddComment } from '@/features/tickets/api/mutations';
import { errorMessage } from '@/lib/errors';
import { formatAgo, formatDateTime, initials } from '@/lib/format';
import { ticketQueries } from '@/resources/tickets';

export const internalLabel = 'Internal — not visible to the client';

interface ConversationProps {
  ticketId: string;
  /** Staff see internal notes and may write them; client users only ever post in public. */
  staff: boolean;
  /** A closed or merged ticket takes no more comments. */
  closed: boolean;
}

/** The ticket's conversation, oldest first, and the composer. */
export function Conversation({ ticketId, staff, closed }: ConversationProps) {
  const comments = useQuery(ticketQueries.comments(ticketId));
  const items = comments.data?.items ?? [];
  return (
    <Card
      title={
        <span className="inline-flex items-center gap-2">
          <MessagesSquare className="h-4 w-4 text-ink-600" aria-hidden="true" />
          Conversation
        </span>
      }
    >
      <div className="space-y-5">
        {comments.isPending ? (
          <p className="flex items-center gap-2 text-sm text-stone-600">
            <Spinner label="" /> Loading…
          </p>
        ) : comments.isError ? (
          <Alert tone="danger">{errorMessage(comments.error)}</Alert>
        ) : items.length === 0 ? (
          <p className="text-sm text-stone-600">
            {staff ? 'No comments yet.' : 'No replies yet. We will write here, and you get an e-mail when we do.'}
          </p>
        ) : (
          <ol className="space-y-3" aria-label="Comments">
            {items.map((c) => (
              <CommentItem key={c.id} comment={c} />
            ))}
          </ol>
        )}
        {closed ? (
          <p className="rounded-md bg-stone-100 px-3 py-2 text-sm text-stone-700">
            This ticket is closed. {staff ? '' : 'If the fault is back, open a new ticket.'}
          </p>
        ) : (
          <Composer ticketId={ticketId} staff={staff} />
        )}
      </div>
    </Card>
  );
}

function CommentItem({ comment: c }: { comment: TicketComment }) {
  const internal = c.visibility === 'internal';
  return (
    <li>
      <article
        aria-label={`${internal ? 'Internal note' : 'Comment'} by ${c.author.name}`}
        className={clsx('rounded-md border px-3.5 py-3', internal ? 'border-amber-300 bg-amber-50' : 'border-stone-200 bg-white')}
      >
        <header className="mb-1.5 flex flex-wrap items-center gap-x-2 gap-y-1">
          <span
            className={clsx(
              'flex h-7 w-7 shrink-0 items-center justify-center rounded-full text-xs font-semibold',
              c.author.staff ? 'bg-ink-800 text-white' : 'bg-stone-200 text-stone-800',
            )}
            aria-hidden="true"
          >
            {initials(c.author.name)}
          </span>
          <span className="font-semibold text-ink-950">{c.author.name}</span>
          <span className="text-xs text-stone-600">{c.author.staff ? 'Service desk' : 'Client'}</span>
          <time dateTime={c.createdAt} title={formatDateTime(c.createdAt)} className="text-xs text-stone-600">
            · {formatAgo(c.createdAt)}
          </time>
          {internal ? (
            <span className="ml-auto inline-flex items-center gap-1 rounded-full bg-amber-100 px-2 py-0.5 text-xs font-semibold text-amber-900 ring-1 ring-inset ring-amber-300">
              <Lock className="h-3 w-3" aria-hidden="true" />
              {internalLabel}
            </span>
          ) : null}
        </header>
        <p className="whitespace-pre-wrap break-words text-base text-stone-900">{c.body}</p>
      </article>
    </li>
  );
}

function Composer({ ticketId, staff }: { ticketId: string; staff: boolean }) {
  const add = useAddComment(ticketId);
  const toast = useToast();
  const form = useZodForm(commentInput, { defaultValues: { body: '', visibility: 'public' } });
  const visibility = form.watch('visibility') ?? 'public';
  const internal = visibility === 'internal';

  return (
    <Form
      form={form}
      aria-label={staff ? 'Write a comment' : 'Write a reply'}
      className={clsx(
        'space-y-3 rounded-md border p-3 transition-colors',
        internal ? 'border-amber-400 bg-amber-50' : 'border-stone-200 bg-stone-50',
      )}
      onSubmit={async (values) => {
        await add.mutateAsync({ body: values.body, visibility: staff ? values.visibility : 'public' });
        // Keep the chosen visibility: a second internal note must not go out in public by accident.
        form.reset({ body: '', visibility: values.visibility });
        toast(
          values.visibility === 'internal'
            ? 'Internal note added.'
            : staff
              ? 'Reply sent. The client gets an e-mail.'
              : 'Reply sent to the service desk.',
        );
      }}
    >
      {staff ? <VisibilityChoice /> : null}
      <TextAreaField
        name="body"
        label={staff ? (internal ? 'Note for the team' : 'Reply to the client') : 'Your reply'}
        rows={3}
        hint={
          staff ? (
            internal ? (
              <span className="inline-flex items-center gap-1 font-medium text-amber-900">
                <Lock className="h-3.5 w-3.5" aria-hidden="true" /> Only staff see this. Not visible to the client, and no e-mail goes out.
              </span>
            ) : (
              <span className="inline-flex items-center gap-1 font-medium text-ink-800">
                <Globe className="h-3.5 w-3.5" aria-hidden="true" /> The client sees this and their contacts get an e-mail.
              </span>
            )
          ) : (
            'The service desk sees this straight away.'
          )
        }
      />
      <div className="flex justify-end">
        <SubmitButton
          variant={internal ? 'secondary' : 'primary'}
          icon={internal ? <Lock className="h-4 w-4" aria-hidden="true" /> : undefined}
        >
          {staff ? (internal ? 'Add internal note' : 'Send public reply') : 'Send reply'}
        </SubmitButton>
      </div>
    </Form>
  );
}

/** Staff choose who sees a comment: a public reply (e-mailed to the client) or an internal note. */
function VisibilityChoice() {
  const { register, watch } = useFormContext<CommentInput>();
  const visibility = watch('visibility') ?? 'public';
  const groupId = useId();
  return (
    <fieldset>
      <legend id={groupId} className="sr-only">
        Who sees this comment
      </legend>
      <div className="inline-flex rounded-md border border-stone-300 bg-white p-0.5" role="radiogroup" aria-labelledby={groupId}>
        {(
          [
            { value: 'public', label: 'Public reply', icon: Globe },
            { value: 'internal', label: 'Internal note', icon: Lock },
          ] as const
        ).map((o) => (
          <label
            key={o.value}
            className={clsx(
              'flex min-h-touch cursor-pointer items-center gap-1.5 rounded px-3 text-sm font-medium md:min-h-9',
              'has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-ink-600',
              visibility === o.value
                ? o.value === 'internal'
                  ? 'bg-amber-400 text-ink-950'
                  : 'bg-ink-800 text-white'
                : 'text-ink-800 hover:bg-stone-100',
            )}
          >
            <input type="radio" value={o.value} className="sr-only" {...register('visibility')} />
            <o.icon className="h-4 w-4" aria-hidden="true" />
            {o.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
