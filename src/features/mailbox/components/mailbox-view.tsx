import type { MailboxItem } from '@shared/schemas/auth';
import { useQuery } from '@tanstack/react-query';
import clsx from 'clsx';
import { ArrowLeft, Inbox, MailOpen, Paperclip, RefreshCw } from 'lucide-react';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { PageSpinner } from '@/components/ui/spinner';
import { LinkifiedText } from '@/features/mailbox/components/linkified-text';
import { errorMessage, isNotFound } from '@/lib/errors';
import { formatAgo, formatDateTime } from '@/lib/format';
import { mailboxQueries } from '@/resources/mailbox';

/** A list of received messages and a reading pane (one at a time on a phone). */
export function MailboxView() {
  const mailbox = useQuery(mailboxQueries.list());
  const [selectedId, setSelectedId] = useState<string | null>(null);

  if (mailbox.isPending) return <PageSpinner label="Loading the mailbox" />;
  if (mailbox.isError) {
    return isNotFound(mailbox.error) ? (
      <Alert tone="info" title="No development mailbox here">
        The development mailbox is only available with the local mail server. This installation sends e-mail through a real mail server, so
        messages go to people's own inboxes.
      </Alert>
    ) : (
      <Alert tone="danger" title="The mailbox could not be loaded.">
        <p>{errorMessage(mailbox.error)}</p>
        <Button size="sm" className="mt-2" onClick={() => mailbox.refetch()}>
          Try again
        </Button>
      </Alert>
    );
  }

  const items = mailbox.data.items;
  const selected = items.find((m) => m.id === selectedId) ?? null;

  return (
    <div className="overflow-hidden rounded-md border border-stone-200 bg-white shadow-card lg:grid lg:h-[calc(100dvh-13rem)] lg:min-h-[28rem] lg:grid-cols-[22rem_1fr]">
      <section aria-label="Messages" className={clsx('flex min-h-0 flex-col border-stone-200 lg:border-r', selected && 'hidden lg:flex')}>
        <div className="flex items-center justify-between gap-2 border-b border-stone-200 px-4 py-2">
          <p className="text-sm text-stone-600">{items.length === 1 ? '1 message' : `${items.length} messages`}</p>
          <Button
            size="sm"
            variant="ghost"
            onClick={() => mailbox.refetch()}
            loading={mailbox.isFetching}
            icon={<RefreshCw className="h-4 w-4" aria-hidden="true" />}
          >
            Refresh
          </Button>
        </div>
        {items.length === 0 ? (
          <EmptyState
            icon={Inbox}
            title="No mail yet"
            description="Invitations, reset links and ticket notices sent by Gridkeep appear here."
          />
        ) : (
          <ul className="min-h-0 flex-1 divide-y divide-stone-100 overflow-y-auto">
            {items.map((m) => (
              <li key={m.id}>
                <MessageLine message={m} selected={m.id === selectedId} onSelect={() => setSelectedId(m.id)} />
              </li>
            ))}
          </ul>
        )}
      </section>
      <section aria-label="Message" className={clsx('min-h-0 overflow-y-auto', !selected && 'hidden lg:block')}>
        {selected ? (
          <MessagePane message={selected} onBack={() => setSelectedId(null)} />
        ) : (
          <EmptyState
            icon={MailOpen}
            title="Choose a message"
            description="Its text and attachments show here."
            className="h-full justify-center"
          />
        )}
      </section>
    </div>
  );
}

/** One received message in the list: to whom, when, its subject; the chosen one marked. */
function MessageLine({ message: m, selected, onSelect }: { message: MailboxItem; selected: boolean; onSelect: () => void }) {
  return (
    <button
      type="button"
      onClick={onSelect}
      aria-current={selected ? 'true' : undefined}
      className={clsx(
        'block w-full px-4 py-3 text-left hover:bg-stone-50',
        selected && 'bg-ink-50 shadow-[inset_3px_0_0_theme(colors.amber.400)]',
      )}
    >
      <span className="flex items-baseline justify-between gap-2">
        <span className="truncate text-sm text-stone-700">{m.to}</span>
        <time dateTime={m.date} className="shrink-0 text-xs text-stone-500">
          {formatAgo(m.date)}
        </time>
      </span>
      <span className="mt-0.5 flex items-center gap-1.5">
        <span className="truncate font-medium text-ink-950">{m.subject || '(no subject)'}</span>
        {m.attachments.length ? <Paperclip className="h-3.5 w-3.5 shrink-0 text-stone-500" aria-label="Has attachments" /> : null}
      </span>
    </button>
  );
}

function MessagePane({ message, onBack }: { message: MailboxItem; onBack: () => void }) {
  return (
    <article className="px-5 py-4">
      <Button
        variant="ghost"
        size="sm"
        className="-ml-2 mb-2 lg:hidden"
        onClick={onBack}
        icon={<ArrowLeft className="h-4 w-4" aria-hidden="true" />}
      >
        All messages
      </Button>
      <h2 className="text-xl font-semibold">{message.subject || '(no subject)'}</h2>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
        <dt className="text-stone-500">To</dt>
        <dd className="text-stone-800">{message.to}</dd>
        <dt className="text-stone-500">Date</dt>
        <dd className="text-stone-800">
          <time dateTime={message.date}>{formatDateTime(message.date)}</time>
        </dd>
      </dl>
      {message.attachments.length ? (
        <div className="mt-4">
          <h3 className="text-xs font-semibold text-stone-600">Attachments</h3>
          <ul className="mt-1.5 flex flex-wrap gap-2">
            {message.attachments.map((a, i) => (
              <li
                key={`${a.filename}-${i}`}
                className="flex items-center gap-2 rounded border border-stone-200 bg-stone-50 px-2.5 py-1.5 text-sm"
              >
                <Paperclip className="h-4 w-4 text-stone-500" aria-hidden="true" />
                <span className="font-medium text-stone-800">{a.filename || 'unnamed'}</span>
                <span className="text-xs text-stone-500">{a.contentType}</span>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      <div className="mt-5 whitespace-pre-wrap break-words border-t border-stone-200 pt-4 text-base leading-relaxed text-stone-800">
        {message.text ? (
          <LinkifiedText text={message.text} />
        ) : (
          <span className="italic text-stone-500">This message has no plain-text part.</span>
        )}
      </div>
    </article>
  );
}
