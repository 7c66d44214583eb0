// `npm start`: PostgreSQL, migrations, demo data, the S3 and SMTP fakes, the client build, and
// the app at http://127.0.0.1:3000 (PORT changes it). Ctrl-C stops everything it started.
// DATA_DIR moves .data/; DATABASE_URL, S3_ENDPOINT, SMTP_HOST use real services instead of local
// ones; SKIP_CLIENT_BUILD=1 serves dist/ as it is (API work without a client build).
import { buildClientIfStale } from './lib/client-build.js';
import { accountLines, Shutdown, startLocalServices } from './lib/local-services.js';

const log = (line: string) => console.log(line);
const shutdown = new Shutdown(log);

shutdown.exitOnSignals('Gridkeep');
process.on('unhandledRejection', (reason) => {
  // The server logs and survives lost database connections; anything else reaching here is
  // logged rather than taking the whole stack down.
  console.error('Unhandled rejection:', reason);
});

async function main() {
  const services = await startLocalServices(shutdown, log);
  if (shutdown.stopping) return;
  if (process.env.SKIP_CLIENT_BUILD === '1') log('SKIP_CLIENT_BUILD=1: serving dist/ as it is.');
  else await buildClientIfStale(log);
  if (shutdown.stopping) return;

  const { startServer } = await import('../server/index.js');
  const port = Number(process.env.PORT || 3000);
  const host = process.env.HOST || '127.0.0.1';
  let running;
  try {
    running = await startServer({ port, host });
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'EADDRINUSE') {
      throw new Error(`Port ${port} on ${host} is in use: stop what uses it, or start with PORT=<another port>.`, { cause: err });
    }
    throw err;
  }
  shutdown.add('the web server', () => running.stop());

  log('');
  log(`Gridkeep is running at ${running.url}`);
  for (const line of services.summary) log(`  ${line}`);
  log(`  data      ${services.dataDir}`);
  log('');
  for (const line of accountLines(services.accounts)) log(line);
  log('');
  log('Press Ctrl-C to stop.');
}

main().catch((err) => {
  console.error(`\nCould not start Gridkeep: ${(err as Error).message}`);
  if (process.env.DEBUG) console.error(err);
  shutdown.exit(1);
});
