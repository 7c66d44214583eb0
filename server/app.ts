import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import cookieParser from 'cookie-parser';
import express from 'express';
import helmet from 'helmet';
import { config } from './config.js';
import { authenticate, requireSameOriginWrites } from './middleware/auth.js';
import { apiNotFound, errorHandler } from './middleware/error-handler.js';
import { requestId } from './middleware/request-id.js';
import { clientFiles } from './middleware/static-files.js';
import { refuseNul } from './middleware/validate.js';
import { healthRouter } from './routes/health.js';
import { apiRoutes } from './routes/index.js';

const distDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../dist');

/** Builds the Express app without listening: server/index.ts listens, supertest imports this. */
export function createApp(options: { serveClient?: boolean } = {}) {
  const app = express();
  const cfg = config();
  app.disable('x-powered-by');
  if (cfg.TRUST_PROXY) app.set('trust proxy', /^\d+$/.test(cfg.TRUST_PROXY) ? Number(cfg.TRUST_PROXY) : cfg.TRUST_PROXY);

  app.use(requestId);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          mediaSrc: ["'self'", 'blob:'],
          styleSrc: ["'self'", "'unsafe-inline'"],
          upgradeInsecureRequests: cfg.COOKIE_SECURE ? [] : null,
        },
      },
      hsts: cfg.COOKIE_SECURE,
    }),
  );

  const api = express.Router();
  api.use((_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    next();
  });
  // Health never depends on a session (or on the database answering the session check).
  api.use('/health', healthRouter);
  api.use(express.json({ limit: '1mb' }));
  api.use(cookieParser());
  api.use(refuseNul);
  api.use(requireSameOriginWrites);
  api.use(authenticate);
  apiRoutes(api);
  api.use(apiNotFound);
  app.use('/api', api);

  if (options.serveClient && fs.existsSync(path.join(distDir, 'index.html'))) {
    // Precompressed files, /assets immutable, the page revalidated, source maps 404; every other
    // GET is a client route (React Router): /c/<serial> from a QR label among them.
    app.use(clientFiles(distDir));
  }

  app.use(errorHandler);
  return app;
}
