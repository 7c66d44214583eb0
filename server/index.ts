// Listens and shuts down gracefully. Run as the main module it is the production entry:
// migrations first, then the server (docker/Dockerfile). `npm start` calls startServer().
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { pathToFileURL } from 'node:url';
import { createApp } from './app.js';
import { config } from './config.js';
import { closeDb } from './db/client.js';
import { runMigrations } from './db/migrate.js';
import { closeMail, startMailWorker, type MailWorker } from './integrations/mail.js';
import { closeStorage, ensureBucket } from './integrations/s3.js';
import { logger } from './logger.js';
import { workAfterAnswers } from './services/auth.js';
import { forgetOldKeys } from './services/idempotency.js';

export interface RunningServer {
  server: Server;
  port: number;
  url: string;
  /** Stops taking connections, lets requests in flight finish, stops the mail worker, closes the pool. */
  stop: () => Promise<void>;
}

export interface StartServerOptions {
  port?: number;
  host?: string;
  /** How long requests in flight may take to finish on stop before their sockets are cut. */
  drainMs?: number;
}

export async function startServer(options: StartServerOptions = {}): Promise<RunningServer> {
  const cfg = config();
  const port = options.port ?? cfg.PORT;
  const host = options.host ?? cfg.HOST;
  const app = createApp({ serveClient: true });

  const server = await new Promise<Server>((resolve, reject) => {
    const s = app.listen(port, host);
    s.once('listening', () => resolve(s));
    s.once('error', reject);
  });
  // Behind a load balancer: keep idle sockets open longer than its idle timeout (commonly 60 s).
  server.keepAliveTimeout = 65_000;
  server.headersTimeout = 66_000;

  const address = server.address() as AddressInfo;
  const shownHost = host === '0.0.0.0' || host === '::' ? '127.0.0.1' : host;
  const url = `http://${shownHost.includes(':') ? `[${shownHost}]` : shownHost}:${address.port}`;
  logger.info('listening', { url });

  let worker: MailWorker | undefined;
  if (cfg.MAIL_WORKER) worker = startMailWorker();
  // Idempotency keys past any retry's reach are forgotten once an hour.
  const housekeeping = setInterval(() => {
    forgetOldKeys().catch((err: Error) => logger.warn('could not forget old idempotency keys', { err: err.message }));
  }, 3600_000);
  housekeeping.unref();

  let stopping: Promise<void> | undefined;
  const stop = () => {
    stopping ??= (async () => {
      const closed = new Promise<void>((resolve) => server.close(() => resolve()));
      server.closeIdleConnections();
      const cut = setTimeout(() => server.closeAllConnections(), options.drainMs ?? 10_000);
      await closed;
      clearTimeout(cut);
      // Work a route started after answering (a password reset's mail) finishes before the pool closes.
      await workAfterAnswers();
      clearInterval(housekeeping);
      await worker?.stop();
      closeMail();
      closeStorage();
      await closeDb();
      logger.info('stopped');
    })();
    return stopping;
  };

  return { server, port: address.port, url, stop };
}

async function main() {
  const cfg = config();
  await runMigrations(cfg.DATABASE_URL);
  try {
    await ensureBucket();
  } catch (err) {
    logger.warn('object storage is not reachable yet; uploads will fail until it is', { err: (err as Error).message });
  }
  const running = await startServer();

  let firstSignalAt = 0;
  const shutdown = (signal: string) => {
    if (firstSignalAt) {
      // Wrappers (tsx, npm, a terminal's process group) often deliver one Ctrl-C twice:
      // only a later second signal means "stop now".
      if (Date.now() - firstSignalAt < 2000) return;
      logger.warn('second signal: exiting now', { signal });
      process.exit(1);
    }
    firstSignalAt = Date.now();
    logger.info('shutting down', { signal });
    running.stop().then(
      () => process.exit(0),
      (err) => {
        logger.error('shutdown failed', { err });
        process.exit(1);
      },
    );
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  // A lost database connection or a failed background round is logged, never fatal.
  process.on('unhandledRejection', (reason) => logger.error('unhandled rejection', { err: reason }));
  main().catch((err) => {
    logger.error('could not start', { err });
    process.exit(1);
  });
}
