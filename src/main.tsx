import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { AppProvider } from '@/app/provider';
import { AppRouter } from '@/app/router';
import { startOutboxSync } from '@/features/repairs/api/outbox-sync';
import { keepSessionForOffline } from '@/lib/offline-session';
import { queryClient } from '@/lib/query-client';
import { registerServiceWorker } from '@/lib/service-worker';
import { sessionKeys } from '@/resources/session';
import './index.css';

// The UI font is fetched now, while the app starts, rather than when text is first laid out: a font
// that arrives after a large page (a wall map of 2,000 cells) is drawn makes the browser restyle
// and lay out the whole page a second time.
if (document.fonts) {
  for (const weight of [400, 500, 600, 700]) void document.fonts.load(`${weight} 1em "Work Sans"`).catch(() => undefined);
}

// The app shell offline (a service worker and the last signed-in user), and the repairs logged
// without signal sent as soon as the network allows.
registerServiceWorker();
keepSessionForOffline(queryClient, sessionKeys.me());
startOutboxSync(queryClient);

const root = document.getElementById('root');
if (!root) throw new Error('The page has no #root element.');

createRoot(root).render(
  <StrictMode>
    <AppProvider>
      <AppRouter />
    </AppProvider>
  </StrictMode>,
);
