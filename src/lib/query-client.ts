import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError } from '@/lib/api-client';
import { isSignedOut } from '@/lib/errors';

type Listener = () => void;
const signedOutListeners = new Set<Listener>();

/**
 * Called whenever any query or mutation answers 401: the session is gone. The app registers
 * one listener that forgets the signed-in user, and the shell then sends the person to sign-in.
 */
export function onSignedOut(listener: Listener): () => void {
  signedOutListeners.add(listener);
  return () => signedOutListeners.delete(listener);
}

function notifyIfSignedOut(error: unknown) {
  if (isSignedOut(error)) for (const listener of signedOutListeners) listener();
}

export const queryClient = new QueryClient({
  queryCache: new QueryCache({ onError: notifyIfSignedOut }),
  mutationCache: new MutationCache({ onError: notifyIfSignedOut }),
  defaultOptions: {
    queries: {
      staleTime: 30_000,
      // A 4xx will not change by asking again; network hiccups and 5xx get two more tries.
      retry: (failureCount, error) => failureCount < 2 && !(isApiError(error) && error.status >= 400 && error.status < 500),
      refetchOnWindowFocus: true,
    },
    mutations: { retry: false },
  },
});
