import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MailboxItem } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { mailboxKeys } from '@/features/mailbox/api/keys';

/**
 * What the local SMTP server received, newest first. 404 when real SMTP is in use (there is
 * no local mailbox then).
 */
export async function getMailbox(signal?: AbortSignal): Promise<MailboxItem[]> {
  const { items } = await api.get<{ items: MailboxItem[] }>('/api/dev/mailbox', { signal });
  return [...items].sort((a, b) => b.date.localeCompare(a.date));
}

export const mailboxQueryOptions = () =>
  queryOptions({
    queryKey: mailboxKeys.list(),
    queryFn: ({ signal }) => getMailbox(signal),
    staleTime: 0,
  });

/** Checks for new mail every few seconds while the page is open. */
export const useMailbox = () => useQuery({ ...mailboxQueryOptions(), refetchInterval: 5000 });
