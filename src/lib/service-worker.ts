// Registers the service worker (vite-plugin-pwa's Workbox build, /sw.js) that keeps the app
// shell on the phone for opening Gridkeep with no signal. Production builds only: in
// development Vite serves modules that change at every save.

/** Set by a browser test that exercises the offline shell (others run without a service worker). */
export const serviceWorkerTestFlag = 'gridkeep:service-worker';

function allowed(): boolean {
  if (!('serviceWorker' in navigator)) return false;
  // Automated browsers (the browser tests) get no service worker unless a test asks for one: a
  // cached shell would outlive the build each test run starts from.
  if (navigator.webdriver) {
    try {
      return localStorage.getItem(serviceWorkerTestFlag) === 'on';
    } catch {
      return false;
    }
  }
  return true;
}

export function registerServiceWorker() {
  if (!import.meta.env.PROD || !allowed()) return;
  window.addEventListener('load', () => {
    navigator.serviceWorker.register('/sw.js', { scope: '/' }).catch((error: unknown) => console.warn('No offline shell:', error));
  });
}
