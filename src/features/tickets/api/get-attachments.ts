import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { TicketAttachment } from '@/features/tickets/api/types';

/** Photos, videos and files of a ticket, newest first. */
export async function getAttachments(ticketId: string, signal?: AbortSignal) {
  const { items } = await api.get<{ items: TicketAttachment[] }>(`/api/tickets/${encodeURIComponent(ticketId)}/attachments`, { signal });
  return items;
}

export const attachmentsQueryOptions = (ticketId: string) =>
  queryOptions({
    queryKey: ticketsKeys.attachments(ticketId),
    queryFn: ({ signal }) => getAttachments(ticketId, signal),
  });

export const useAttachments = (ticketId: string) => useQuery(attachmentsQueryOptions(ticketId));

/** The address that shows a photo or video in the page rather than downloading it. */
export const inlineUrl = (a: Pick<TicketAttachment, 'id'>) => `/api/attachments/${encodeURIComponent(a.id)}?inline=1`;
export const downloadUrl = (a: Pick<TicketAttachment, 'id'>) => `/api/attachments/${encodeURIComponent(a.id)}`;
