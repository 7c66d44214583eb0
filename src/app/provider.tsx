import { QueryClientProvider } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { ToastProvider } from '@/components/ui/toast';
import { onSignedOut, queryClient } from '@/lib/query-client';
import { sessionKeys } from '@/resources/session';

// Any 401 from any query or mutation: forget the user; the shell then sends them to sign-in
// and brings them back to the same address afterwards.
onSignedOut(() => queryClient.setQueryData(sessionKeys.me(), null));

export function AppProvider({ children }: { children: ReactNode }) {
  return (
    <QueryClientProvider client={queryClient}>
      <ToastProvider>{children}</ToastProvider>
    </QueryClientProvider>
  );
}
