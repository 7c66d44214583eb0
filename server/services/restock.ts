// The restock list: for each wall with a site kit, the spare modules of its own batches the kit
// should hold to cover the failures of one restock lead time at the chosen service level
// (shared/calc/spares.ts, Poisson), against what the kit holds, and how many to send.
import { and, eq, isNull, sql } from 'drizzle-orm';
import { forecastSpares } from '../../shared/calc/spares.js';
import { failuresPerModuleMonth, moduleMonths } from '../../shared/calc/reliability.js';
import type { RestockLine } from '../../shared/schemas/stock.js';
import { db } from '../db/client.js';
import { cabinetModels } from '../db/schema/catalogue.js';
import { clients, sites } from '../db/schema/clients.js';
import { parts, stockBalances, stockLocations } from '../db/schema/stock.js';
import { repairs } from '../db/schema/visits.js';
import { cabinets, walls } from '../db/schema/walls.js';

/** A wall's own failure rate is used once it has been in service this long; before, its model's. */
export const OWN_RATE_AFTER_MONTHS = 12;
/** The mean Gregorian month: 365.2425 days ÷ 12 (from memory). */
const DAYS_PER_MONTH = 365.2425 / 12;

interface WallFacts {
  id: string;
  name: string;
  siteId: string;
  siteName: string;
  clientName: string;
  modelId: string;
  modules: number;
  months: number;
  failures: number;
}

/** Every wall in service with its module count, months in service and module failures so far. */
async function wallFacts(now: Date): Promise<WallFacts[]> {
  const rows = await db()
    .select({
      id: walls.id,
      name: walls.name,
      siteId: walls.siteId,
      siteName: sites.name,
      clientName: clients.name,
      modelId: walls.cabinetModelId,
      installDate: walls.installDate,
      modules: sql<number>`(select count(*)::int from ${cabinets} c where c.wall_id = ${walls.id}) * ${cabinetModels.modulesWide} * ${cabinetModels.modulesHigh}`,
      failures: sql<number>`(select count(*)::int from ${repairs} r where r.wall_id = ${walls.id} and r.component = 'module' and r.action in ('replaced', 'cabinet_swapped'))`,
    })
    .from(walls)
    .innerJoin(sites, eq(sites.id, walls.siteId))
    .innerJoin(clients, eq(clients.id, walls.clientId))
    .innerJoin(cabinetModels, eq(cabinetModels.id, walls.cabinetModelId))
    .where(isNull(walls.archivedAt))
    .orderBy(clients.name, sites.name, walls.name);
  return rows.map((r) => ({
    ...r,
    months: r.installDate
      ? Math.max(0, (now.getTime() - new Date(`${r.installDate}T00:00:00Z`).getTime()) / 86_400_000 / DAYS_PER_MONTH)
      : 0,
  }));
}

/** The spares forecast per wall, against its site kit's modules of the wall's own batches. */
export async function restockList(serviceLevel: number, now = new Date()): Promise<{ items: RestockLine[] }> {
  const facts = await wallFacts(now);
  // The model's pooled rate, for walls too new to have their own.
  const byModel = new Map<string, { failures: number; exposure: number }>();
  for (const f of facts) {
    const m = byModel.get(f.modelId) ?? { failures: 0, exposure: 0 };
    m.failures += f.failures;
    m.exposure += moduleMonths(f.modules, f.months);
    byModel.set(f.modelId, m);
  }
  const kits = await db()
    .select({ id: stockLocations.id, name: stockLocations.name, siteId: stockLocations.siteId })
    .from(stockLocations)
    .where(and(eq(stockLocations.kind, 'site_kit'), isNull(stockLocations.archivedAt)));
  const moduleParts = await db()
    .select({ id: parts.id, name: parts.name, sku: parts.sku, modelId: parts.cabinetModelId, leadTimeDays: parts.leadTimeDays })
    .from(parts)
    .where(and(eq(parts.kind, 'module'), isNull(parts.archivedAt)));

  const kitStock = await kitModulesByBatch();
  const batchesOf = await wallBatchesByWall();

  const items: RestockLine[] = [];
  for (const f of facts) {
    const kit = kits.find((k) => k.siteId === f.siteId) ?? null;
    const part = moduleParts.find((p) => p.modelId === f.modelId) ?? null;
    const own = f.months >= OWN_RATE_AFTER_MONTHS;
    const pooled = byModel.get(f.modelId)!;
    const failures = own ? f.failures : pooled.failures;
    const exposure = own ? moduleMonths(f.modules, f.months) : pooled.exposure;
    const rate = exposure > 0 ? failuresPerModuleMonth(failures, exposure) : 0;
    const leadTimeMonths = (part?.leadTimeDays ?? 30) / DAYS_PER_MONTH;
    const forecast = forecastSpares({ modules: f.modules, failuresPerModuleMonth: rate, leadTimeMonths, serviceLevel });
    // Modules of the wall's own batches (any case) in its kit.
    const onHand =
      kit && part ? [...(batchesOf.get(f.id) ?? [])].reduce((n, batch) => n + (kitStock.get(`${kit.id}:${part.id}:${batch}`) ?? 0), 0) : 0;
    items.push({
      wallId: f.id,
      wallName: f.name,
      siteName: f.siteName,
      clientName: f.clientName,
      kit: kit ? { id: kit.id, name: kit.name } : null,
      part: part ? { id: part.id, name: part.name, sku: part.sku } : null,
      modules: f.modules,
      rateBasis: own ? 'wall' : 'model',
      failures,
      exposureModuleMonths: exposure,
      failuresPerThousandModuleMonths: rate * 1000,
      leadTimeMonths,
      expectedFailures: forecast.expectedFailures,
      recommended: forecast.recommendedSpares,
      onHand,
      toSend: Math.max(0, forecast.recommendedSpares - onHand),
    });
  }
  return { items };
}

/** The batches (lower case) of each wall's cabinets: what its spares should match. */
async function wallBatchesByWall(): Promise<Map<string, Set<string>>> {
  const rows = await db()
    .selectDistinct({ wallId: cabinets.wallId, batch: sql<string>`lower(${cabinets.batch})` })
    .from(cabinets)
    .where(sql`${cabinets.wallId} is not null and ${cabinets.batch} <> ''`);
  const byWall = new Map<string, Set<string>>();
  for (const r of rows) byWall.set(r.wallId!, (byWall.get(r.wallId!) ?? new Set()).add(r.batch));
  return byWall;
}

/** Modules on hand in every site kit, by kit, part and batch (lower case), in one query. */
async function kitModulesByBatch(): Promise<Map<string, number>> {
  const rows = await db()
    .select({
      locationId: stockBalances.locationId,
      partId: stockBalances.partId,
      batch: sql<string>`lower(${stockBalances.batch})`,
      onHand: sql<number>`sum(${stockBalances.quantity})::int`,
    })
    .from(stockBalances)
    .innerJoin(stockLocations, eq(stockLocations.id, stockBalances.locationId))
    .innerJoin(parts, eq(parts.id, stockBalances.partId))
    .where(and(eq(stockLocations.kind, 'site_kit'), eq(parts.kind, 'module')))
    .groupBy(stockBalances.locationId, stockBalances.partId, sql`lower(${stockBalances.batch})`);
  return new Map(rows.map((r) => [`${r.locationId}:${r.partId}:${r.batch}`, r.onHand]));
}
