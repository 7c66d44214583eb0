// Who was signed in on this phone, kept so the app shell opens with no network: a technician
// who reloads behind a wall still reaches the outbox and the repair form (their data is on the
// phone) instead of an error. Only the signed-in user's public profile is kept (name, e-mail,
// role); it is dropped as soon as the server says nobody is signed in, and every API call still
// needs the session cookie, so nothing more can be read with it.
import { hashKey, type QueryClient, type QueryKey } from '@tanstack/react-query';

const storageKey = 'gridkeep:signed-in-user';

function read(): unknown {
  try {
    const text = localStorage.getItem(storageKey);
    return text ? (JSON.parse(text) as unknown) : undefined;
  } catch {
    return undefined;
  }
}

function write(user: unknown) {
  try {
    if (user) localStorage.setItem(storageKey, JSON.stringify(user));
    else localStorage.removeItem(storageKey);
  } catch {
    // Private mode or full storage: the shell then needs the network to open, as before.
  }
}

/**
 * Remembers the session query's user (`key`: the resource's key of "who am I"), and when the
 * app starts with no network, answers that query from what was remembered.
 */
export function keepSessionForOffline(queryClient: QueryClient, key: QueryKey) {
  const hash = hashKey(key);
  queryClient.getQueryCache().subscribe((event) => {
    if (event.type !== 'updated' || event.query.queryHash !== hash || event.query.state.status !== 'success') return;
    write(event.query.state.data);
  });
  if (typeof navigator !== 'undefined' && navigator.onLine === false) {
    const user = read();
    if (user) queryClient.setQueryData(key, user);
  }
}
