import { inject } from 'vitest';

// The server reads its configuration from the environment on first use.
process.env.DATABASE_URL = inject('databaseUrl');
process.env.JWT_SECRET ??= 'test-secret-that-is-long-enough-for-hs256-signing';
process.env.MAIL_WORKER = 'false';
process.env.APP_URL ??= 'http://127.0.0.1:3000';
