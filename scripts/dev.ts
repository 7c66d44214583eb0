// `npm run dev`: the same services as `npm start`, then the API restarting on change
// (`tsx watch server/index.ts` on API_PORT, default 3001) and the Vite dev server on PORT
// (default 5173), whose proxy sends /api to the API. Ctrl-C stops all of it.
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import type { ViteDevServer } from 'vite';
import { accountLines, projectRoot, Shutdown, startLocalServices } from './lib/local-services.js';

const log = (line: string) => console.log(line);
const shutdown = new Shutdown(log);

shutdown.exitOnSignals('the development servers');

/**
 * Stops the API watcher and the server it runs. The watcher leads a process group of its own
 * (see `detached` below), so the signal goes to the group: a Ctrl-C while the server is still
 * starting, before the watcher relays signals, stops both as well.
 */
function stopChild(child: ChildProcess): Promise<void> {
  const signalGroup = (signal: NodeJS.Signals) => {
    try {
      process.kill(-child.pid!, signal);
    } catch {
      /* the group is gone already */
    }
  };
  if (child.exitCode !== null || child.signalCode !== null) {
    signalGroup('SIGTERM'); // a server the watcher left behind
    return Promise.resolve();
  }
  return new Promise((resolve) => {
    const kill = setTimeout(() => signalGroup('SIGKILL'), 15_000);
    child.once('exit', () => {
      clearTimeout(kill);
      resolve();
    });
    signalGroup('SIGTERM');
  });
}

async function main() {
  const webPort = Number(process.env.PORT || 5173);
  const apiPort = Number(process.env.API_PORT || 3001);
  // Links in e-mails point at the page people use: the Vite server.
  process.env.APP_URL ||= `http://127.0.0.1:${webPort}`;

  const services = await startLocalServices(shutdown, log);
  // The API child opens its own pool; this process needs none now.
  const { closeDb } = await import('../server/db/client.js');
  await closeDb();
  if (shutdown.stopping) return;

  const api = spawn(path.join(projectRoot, 'node_modules/.bin/tsx'), ['watch', '--clear-screen=false', 'server/index.ts'], {
    cwd: projectRoot,
    env: { ...process.env, PORT: String(apiPort), HOST: '127.0.0.1' },
    stdio: 'inherit',
    // Its own process group: a Ctrl-C reaches it once, from here, not also from the terminal.
    detached: true,
  });
  shutdown.add('the API', () => stopChild(api));
  api.on('exit', (code, signal) => {
    if (!shutdown.stopping) {
      log(`The API watcher stopped (${signal ?? `exit code ${code}`}): stopping everything.`);
      shutdown.exit(1);
    }
  });

  // vite.config.ts reads API_PORT for its /api proxy and PORT for its own port.
  process.env.API_PORT = String(apiPort);
  const { createServer } = await import('vite');
  const vite: ViteDevServer = await createServer({
    root: projectRoot,
    configFile: path.join(projectRoot, 'vite.config.ts'),
    server: { host: '127.0.0.1', port: webPort, strictPort: true },
  });
  shutdown.add('the Vite dev server', () => vite.close());
  await vite.listen();

  log('');
  log(`Gridkeep (development) at http://127.0.0.1:${webPort}  (API on http://127.0.0.1:${apiPort}, restarting on change)`);
  for (const line of services.summary) log(`  ${line}`);
  log(`  data      ${services.dataDir}`);
  log('');
  for (const line of accountLines(services.accounts)) log(line);
  log('');
  log('Press Ctrl-C to stop.');
}

main().catch((err) => {
  console.error(`\nCould not start the development servers: ${(err as Error).message}`);
  shutdown.exit(1);
});
