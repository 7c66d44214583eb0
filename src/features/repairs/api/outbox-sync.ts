// Keeps the outbox moving without anyone tapping: a try when the app starts, when the phone says
// the network is back (`online`), and every half minute while repairs wait (one bar of signal
// often comes and goes without an `online` event).
import type { QueryClient } from '@tanstack/react-query';
import { listOutbox } from '@/lib/offline-queue';
import { sendOutbox } from '@/features/repairs/api/send-outbox';

const retryEvery = 30_000;
let started = false;

export function startOutboxSync(queryClient: QueryClient) {
  if (started || typeof window === 'undefined') return;
  started = true;
  const send = () => void sendOutbox(queryClient).catch(() => undefined);
  window.addEventListener('online', send);
  window.setInterval(() => {
    void listOutbox().then((items) => {
      if (items.some((i) => i.state === 'waiting')) send();
    });
  }, retryEvery);
  send();
}
