import type { Router } from 'express';
import { healthRouter } from './health.js';

/** Mounts every API router under /api. Keep one line per domain. */
export function apiRoutes(api: Router) {
  api.use('/health', healthRouter);
}
