// The restock list: for each wall with a site kit, the spare modules of its own batches the kit
// should hold to cover the failures of one restock lead time at the chosen service level
// (shared/calc/spares.ts, Poisson), against what the kit holds, and how many to send.
import { and, eq, inArray, isNull, sql } from 'drizzle-orm';
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
    const onHand = kit && part ? await kitOnHand(kit.id, part.id, f.id) : 0;
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

/** Modules of the wall's own batches in a kit (any case), the batches its cabinets carry. */
async function kitOnHand(kitId: string, partId: string, wallId: string): Promise<number> {
  const batches = await db().selectDistinct({ batch: cabinets.batch }).from(cabinets).where(eq(cabinets.wallId, wallId));
  const lower = batches.map((b) => b.batch.toLowerCase()).filter(Boolean);
  if (!lower.length) return 0;
  const [row] = await db()
    .select({ n: sql<number>`coalesce(sum(${stockBalances.quantity}), 0)::int` })
    .from(stockBalances)
    .where(and(eq(stockBalances.locationId, kitId), eq(stockBalances.partId, partId), inArray(sql`lower(${stockBalances.batch})`, lower)));
  return row.n;
}
