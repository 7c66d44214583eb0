// What the demo builder's steps share: the rows written so far, the seeded generator and clock,
// and the id given to each key of the story (register.ts, work.ts). Every id comes from the one
// generator, so the steps run in a fixed order and the demo is the same on every run.
import type * as schema from '../schema/index.js';
import { createClock, type Clock } from './clock.js';
import { createRandom, type Random } from './random.js';
import {
  company,
  type staffUsers,
  type ClientKey,
  type ClientUserKey,
  type LocationKey,
  type ModelKey,
  type PartKey,
  type PlanKey,
  type SiteKey,
  type WallKey,
} from './register.js';

export type Insert<T extends { $inferInsert: unknown }> = T['$inferInsert'];

export interface DemoRows {
  companySettings: Insert<typeof schema.companySettings>;
  servicePlans: Insert<typeof schema.servicePlans>[];
  clients: Insert<typeof schema.clients>[];
  sites: Insert<typeof schema.sites>[];
  contacts: Insert<typeof schema.contacts>[];
  users: Insert<typeof schema.users>[];
  cabinetModels: Insert<typeof schema.cabinetModels>[];
  walls: Insert<typeof schema.walls>[];
  controllers: Insert<typeof schema.controllers>[];
  parts: Insert<typeof schema.parts>[];
  stockLocations: Insert<typeof schema.stockLocations>[];
  cabinets: Insert<typeof schema.cabinets>[];
  cabinetEvents: Insert<typeof schema.cabinetEvents>[];
  maintenancePlans: Insert<typeof schema.maintenancePlans>[];
  tickets: Insert<typeof schema.tickets>[];
  ticketComments: Insert<typeof schema.ticketComments>[];
  visits: Insert<typeof schema.visits>[];
  visitTechnicians: Insert<typeof schema.visitTechnicians>[];
  repairs: Insert<typeof schema.repairs>[];
  vendorReturns: Insert<typeof schema.vendorReturns>[];
  stockMovements: Insert<typeof schema.stockMovements>[];
  stockBalances: Insert<typeof schema.stockBalances>[];
  reorderPoints: Insert<typeof schema.reorderPoints>[];
  auditEvents: Insert<typeof schema.auditEvents>[];
}

export type UserKey = keyof typeof staffUsers | ClientUserKey;

/** The id of each key of the story, filled in by the step that writes its row. */
export interface DemoIds {
  plan: Record<PlanKey, string>;
  client: Record<ClientKey, string>;
  site: Record<SiteKey, string>;
  user: Record<UserKey, string>;
  userName: Record<UserKey, string>;
  model: Record<ModelKey, string>;
  part: Record<PartKey, string>;
  location: Record<LocationKey, string>;
  wall: Record<WallKey, string>;
}

export interface Demo {
  rows: DemoRows;
  rand: Random;
  clock: Clock;
  /** A new id from the seeded generator. */
  id: () => string;
  /** When the long-standing records (plans, clients, catalogue) were created. */
  longAgo: Date;
  ids: DemoIds;
}

/** An empty demo for the moment `now`: the seeded generator, the clock and no rows yet. */
export function startDemo(now: Date): Demo {
  const rand = createRandom(0x6b1d2e);
  const clock = createClock(now);
  const rows: DemoRows = {
    companySettings: { id: 1, ...company, updatedAt: now },
    servicePlans: [],
    clients: [],
    sites: [],
    contacts: [],
    users: [],
    cabinetModels: [],
    walls: [],
    controllers: [],
    parts: [],
    stockLocations: [],
    cabinets: [],
    cabinetEvents: [],
    maintenancePlans: [],
    tickets: [],
    ticketComments: [],
    visits: [],
    visitTechnicians: [],
    repairs: [],
    vendorReturns: [],
    stockMovements: [],
    stockBalances: [],
    reorderPoints: [],
    auditEvents: [],
  };
  const ids = { plan: {}, client: {}, site: {}, user: {}, userName: {}, model: {}, part: {}, location: {}, wall: {} } as DemoIds;
  return { rows, rand, clock, id: rand.uuid, longAgo: clock.at(company.defaultTimeZone, -900, 9), ids };
}

/** `Object.entries` keeping the keys' type. */
export const entries = <K extends string, V>(record: Record<K, V>) => Object.entries(record) as [K, V][];

export const pad = (n: number, width: number) => String(n).padStart(width, '0');
