// Behind a proxy (issue 16, finding 7): the shipped configuration must not let a caller choose
// the address its sign-in attempts are counted under (OWASP ASVS 5.0 6.3.1 rests on that count;
// ASVS 13.2 asks for a configuration safe as shipped).
import { readFileSync } from 'node:fs';
import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { db } from '../../server/db/client.js';
import { signInAttempts } from '../../server/db/schema/accounts.js';
import { config, isTrustProxySetting, loadConfig } from '../../server/config.js';
import { anonymous, unique } from '../factories/index.js';

const compose = readFileSync(new URL('../../docker/compose.yaml', import.meta.url), 'utf8');
const envExample = readFileSync(new URL('../../docker/.env.example', import.meta.url), 'utf8');

/** What the app container gets: compose's own setting wins over docker/.env (env_file). */
function shippedTrustProxy(): string {
  const fromCompose = /^\s*TRUST_PROXY:\s*\$\{TRUST_PROXY:-([^}]+)\}\s*$/m.exec(compose)?.[1];
  const fromEnv = /^TRUST_PROXY=(.*)$/m.exec(envExample)?.[1];
  return (fromCompose ?? fromEnv ?? '').trim();
}

// This file's app is configured as the compose file ships it (the configuration is read on first use).
process.env.TRUST_PROXY = shippedTrustProxy();

describe('the shipped proxy configuration', () => {
  it('publishes the app on the host loopback only, for the reverse proxy', () => {
    const app = compose.slice(compose.indexOf('\n  app:'), compose.indexOf('\n  postgres:'));
    const published = [...app.matchAll(/^\s*-\s*'([^']+:3000)'\s*$/gm)].map((m) => m[1]);
    expect(published).toEqual(['127.0.0.1:${APP_PORT:-3000}:3000']);
  });

  it('trusts listed proxy addresses, not a hop count', () => {
    const value = shippedTrustProxy();
    expect(value).not.toBe('');
    expect(value).not.toMatch(/^\d+$/);
    expect(isTrustProxySetting(value)).toBe(true);
    expect(config().TRUST_PROXY).toBe(value);
    // The gateway it trusts is the one the compose network declares.
    expect(compose).toMatch(new RegExp(`gateway: ${value.replace(/\./g, '\\.')}\\b`));
  });

  it('counts a direct caller under its own address, whatever X-Forwarded-For says', async () => {
    const email = `${unique('spoof')}@example.test`;
    const res = await anonymous()
      .post('/api/auth/login')
      .set('X-Requested-With', 'gridkeep')
      .set('X-Forwarded-For', '198.51.100.77')
      .send({ email, password: 'not a real password' });
    expect(res.status).toBe(401);
    const [attempt] = await db().select({ ip: signInAttempts.ip }).from(signInAttempts).where(eq(signInAttempts.email, email));
    expect(attempt.ip).toMatch(/^(::ffff:)?127\.0\.0\.1$|^::1$/);
  });

  it('refuses a setting that would believe anyone', () => {
    const base = { DATABASE_URL: 'postgres://x', JWT_SECRET: 'x'.repeat(32) };
    expect(() => loadConfig({ ...base, TRUST_PROXY: 'true' })).toThrow(/TRUST_PROXY/);
    expect(() => loadConfig({ ...base, TRUST_PROXY: '0.0.0.0/0x' })).toThrow(/TRUST_PROXY/);
    expect(loadConfig({ ...base, TRUST_PROXY: '172.29.41.1, 10.0.0.0/8, loopback' }).TRUST_PROXY).toBe('172.29.41.1, 10.0.0.0/8, loopback');
  });
});
