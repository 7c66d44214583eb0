// Builders for integration tests: each test makes its own organisation and people, so tests
// share one database without seeing each other's rows.
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { Role } from '../../shared/schemas/enums.js';
import { createApp } from '../../server/app.js';
import { db } from '../../server/db/client.js';
import { users } from '../../server/db/schema/accounts.js';
import { clients, servicePlans, sites } from '../../server/db/schema/clients.js';
import { cabinetModels } from '../../server/db/schema/catalogue.js';
import { walls } from '../../server/db/schema/walls.js';
import { hashPassword } from '../../server/services/passwords.js';

export const TEST_PASSWORD = 'correct horse battery staple 42';
let passwordHash: Promise<string> | undefined;
const sharedHash = () => (passwordHash ??= hashPassword(TEST_PASSWORD));

export const unique = (prefix = 't') => `${prefix}-${randomUUID().slice(0, 8)}`;

let app: ReturnType<typeof createApp> | undefined;
/** One app for the whole test file (it holds no per-test state). */
export const testApp = () => (app ??= createApp());

export async function createServicePlan(overrides: Partial<typeof servicePlans.$inferInsert> = {}) {
  const [plan] = await db()
    .insert(servicePlans)
    .values({
      name: unique('Plan'),
      clockMode: 'business',
      targets: {
        critical: { responseHours: 1, resolutionHours: 8 },
        high: { responseHours: 4, resolutionHours: 24 },
        normal: { responseHours: 8, resolutionHours: 72 },
        low: { responseHours: 24, resolutionHours: 160 },
      },
      ...overrides,
    })
    .returning();
  return plan;
}

/** An organisation with one site and, when asked, one wall. */
export async function createOrganisation(
  options: { withWall?: boolean; timeZone?: string; model?: Partial<typeof cabinetModels.$inferInsert> } = {},
) {
  const plan = await createServicePlan();
  const [client] = await db()
    .insert(clients)
    .values({ name: unique('Client'), servicePlanId: plan.id, notes: 'internal note' })
    .returning();
  const [site] = await db()
    .insert(sites)
    .values({
      clientId: client.id,
      name: unique('Site'),
      timeZone: options.timeZone ?? 'America/Chicago',
      internalNotes: 'internal site note',
    })
    .returning();
  let wall: typeof walls.$inferSelect | undefined;
  if (options.withWall) {
    const model = await createCabinetModel(options.model);
    [wall] = await db()
      .insert(walls)
      .values({ clientId: client.id, siteId: site.id, name: unique('Wall'), cabinetModelId: model.id, columns: 12, rows: 6 })
      .returning();
  }
  return { plan, client, site, wall };
}

/** The datasheet of the factory's cabinet model: 500 mm, 192 × 192 pixels, 200 W. */
export const cabinetModelFigures = {
  widthMm: 500,
  heightMm: 500,
  pixelPitchMm: 2.6,
  pixelsWide: 192,
  pixelsHigh: 192,
  modulesWide: 2,
  modulesHigh: 2,
  maxPowerW: 200,
  typicalPowerW: 70,
  weightKg: 7.5,
  brightnessNits: 1000,
};

export async function createCabinetModel(overrides: Partial<typeof cabinetModels.$inferInsert> = {}) {
  const [model] = await db()
    .insert(cabinetModels)
    .values({ name: unique('Model'), ...cabinetModelFigures, ...overrides })
    .returning();
  return model;
}

export async function createUser(options: { role: Role; clientId?: string; password?: string | null; name?: string }) {
  const email = `${unique(options.role)}@example.test`.toLowerCase();
  const hash = options.password === null ? null : options.password ? await hashPassword(options.password) : await sharedHash();
  const [user] = await db()
    .insert(users)
    .values({
      email,
      name: options.name ?? `Test ${options.role}`,
      role: options.role,
      clientId: options.role === 'client' ? options.clientId : null,
      passwordHash: hash,
    })
    .returning();
  return user;
}

/** A supertest agent that keeps the session cookie and sends the CSRF header on writes. */
export interface Session {
  user: typeof users.$inferSelect;
  get: (path: string) => request.Test;
  post: (path: string, body?: object) => request.Test;
  patch: (path: string, body?: object) => request.Test;
  put: (path: string, body?: object) => request.Test;
  delete: (path: string) => request.Test;
  agent: ReturnType<typeof request.agent>;
}

export async function signIn(user: typeof users.$inferSelect, password = TEST_PASSWORD): Promise<Session> {
  const agent = request.agent(testApp());
  const res = await agent.post('/api/auth/login').set('X-Requested-With', 'gridkeep').send({ email: user.email, password });
  if (res.status !== 200) throw new Error(`sign-in failed for ${user.email}: ${res.status} ${JSON.stringify(res.body)}`);
  const csrf = { 'X-Requested-With': 'gridkeep' };
  return {
    user,
    agent,
    get: (path) => agent.get(path),
    post: (path, body = {}) => agent.post(path).set(csrf).send(body),
    patch: (path, body = {}) => agent.patch(path).set(csrf).send(body),
    put: (path, body = {}) => agent.put(path).set(csrf).send(body),
    delete: (path) => agent.delete(path).set(csrf),
  };
}

/** Creates a user of the role (with an organisation for client users) and signs them in. */
export async function signedIn(role: Role, clientId?: string) {
  const user = await createUser({ role, clientId });
  return signIn(user);
}

/** The anonymous caller, with and without the CSRF header. */
export const anonymous = () => request(testApp());
