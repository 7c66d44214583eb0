// The development mailbox: what the local SMTP fake received (admins; 404 when real SMTP is in
// use, there is no local mailbox then). Read only.
import { queryOptions } from '@tanstack/react-query';
import type { MailboxItem } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';

export const mailboxKeys = {
  all: ['mailbox'] as const,
  list: () => [...mailboxKeys.all, 'list'] as const,
};

export const mailboxQueries = {
  /** The received messages, newest first; looked at again every few seconds while shown. */
  list: () =>
    queryOptions({
      queryKey: mailboxKeys.list(),
      queryFn: async ({ signal }) => {
        const { items } = await api.get<{ items: MailboxItem[] }>('/api/dev/mailbox', { signal });
        return { items: [...items].sort((a, b) => b.date.localeCompare(a.date)) };
      },
      staleTime: 0,
      refetchInterval: 5000,
    }),
};
