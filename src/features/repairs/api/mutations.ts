// The repair write from the form: kept in the phone's outbox first, then sent (api/send-outbox.ts).
import { useQueryClient } from '@tanstack/react-query';
import { addToOutbox, getOutboxItem, type OutboxProblem, type OutboxRepair } from '@/lib/offline-queue';
import { sendOutbox, type SendResult } from '@/features/repairs/api/send-outbox';

/**
 * Saves a repair: written to the outbox (IndexedDB) before anything goes on the network, then
 * one try to send it. Resolves with where it ended: sent, waiting for the network, or refused (and why).
 */
export function useQueueRepair() {
  const queryClient = useQueryClient();
  return async (item: OutboxRepair): Promise<{ outcome: SendResult; problem: OutboxProblem | null }> => {
    await addToOutbox(item);
    await sendOutbox(queryClient, { only: item.key }).catch(() => undefined);
    const left = await getOutboxItem(item.key);
    if (!left) return { outcome: 'sent', problem: null };
    return left.state === 'needs_attention' ? { outcome: 'refused', problem: left.problem } : { outcome: 'waiting', problem: null };
  };
}
