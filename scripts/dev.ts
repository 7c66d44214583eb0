// `npm run dev`: the same services as `npm start`, then the API restarting on change
// (`tsx watch server/index.ts` on API_PORT, default 3001) and the Vite dev server on PORT
// (default 5173), whose proxy sends /api to the API. Ctrl-C stops all of it.
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import type { ViteDevServer } from 'vite';
import { accountLines, projectRoot, Shutdown, startLocalServices } from './lib/local-services.js';

const log = (line: string) => console.log(line);
const shutdown = new Shutdown(log);

let exiting = false;
function exit(code: number) {
  if (exiting) return;
  exiting = true;
  const force = setTimeout(() => {
    log('Stopping took too long: exiting.');
    process.exit(code || 1);
  }, 30_000);
  force.unref();
  shutdown.run().then(() => {
    clearTimeout(force);
    process.exit(code);
  });
}

for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) {
  process.on(signal, () => {
    if (exiting) return;
    log(`\n${signal}: stopping…`);
    exit(0);
  });
}

function stopChild(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const kill = setTimeout(() => child.kill('SIGKILL'), 15_000);
    child.once('exit', () => {
      clearTimeout(kill);
      resolve();
    });
    child.kill('SIGTERM');
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
  if (exiting) return;

  const api = spawn(path.join(projectRoot, 'node_modules/.bin/tsx'), ['watch', '--clear-screen=false', 'server/index.ts'], {
    cwd: projectRoot,
    env: { ...process.env, PORT: String(apiPort), HOST: '127.0.0.1' },
    stdio: 'inherit',
    // Its own process group: a Ctrl-C reaches it once, from here, not also from the terminal.
    detached: true,
  });
  shutdown.add('the API', () => stopChild(api));
  api.on('exit', (code, signal) => {
    if (!exiting) {
      log(`The API watcher stopped (${signal ?? `exit code ${code}`}): stopping everything.`);
      exit(1);
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
  exit(1);
});
