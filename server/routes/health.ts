import { Router } from 'express';
import { getPool } from '../db/client.js';

export const healthRouter = Router();

/**
 * 200 when the app and its database answer; 503 with Retry-After naming what is down otherwise.
 * Mounted before the session check (server/app.ts), so a signed-in caller gets the same answer.
 */
healthRouter.get('/', async (_req, res) => {
  let database: 'ok' | 'down' = 'ok';
  try {
    const client = await getPool().connect();
    try {
      await client.query({ text: 'select 1', query_timeout: 2000 } as never);
    } finally {
      client.release();
    }
  } catch {
    database = 'down';
  }
  res.setHeader('Cache-Control', 'no-store');
  if (database === 'down') res.setHeader('Retry-After', '5');
  res.status(database === 'ok' ? 200 : 503).json({ status: database === 'ok' ? 'ok' : 'degraded', database });
});
