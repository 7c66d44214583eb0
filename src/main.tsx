import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { AppProvider } from '@/app/provider';
import { AppRouter, afterFirstScreen } from '@/app/router';
import { startOutboxSync } from '@/features/repairs/api/outbox-sync';
import { keepSessionForOffline } from '@/lib/offline-session';
import { queryClient } from '@/lib/query-client';
import { registerServiceWorker } from '@/lib/service-worker';
import { sessionKeys, sessionQueries } from '@/resources/session';
import './index.css';

// Every weight of the UI font is fetched once the first screen's code has arrived, rather than when
// a weight is first laid out: a font that arrives after a large page (a wall map of 2,000 cells) is
// drawn makes the browser restyle and lay out the whole page a second time. Not sooner: on a slow
// link the four files would take four of the six connections the first screen's code needs.
afterFirstScreen(() => {
  if (!document.fonts) return;
  for (const weight of [400, 500, 600, 700]) void document.fonts.load(`${weight} 1em "Work Sans"`).catch(() => undefined);
});

// The app shell offline (a service worker and the last signed-in user), and the repairs logged
// without signal sent as soon as the network allows.
registerServiceWorker();
keepSessionForOffline(queryClient, sessionKeys.me());
startOutboxSync(queryClient);

// Every first screen waits for the session check (the route loaders ask it): it starts now, beside
// the screen's own code, rather than after that code has arrived.
void queryClient.prefetchQuery(sessionQueries.me());

const root = document.getElementById('root');
if (!root) throw new Error('The page has no #root element.');

createRoot(root).render(
  <StrictMode>
    <AppProvider>
      <AppRouter />
    </AppProvider>
  </StrictMode>,
);
