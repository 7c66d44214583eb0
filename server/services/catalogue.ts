import { and, asc, eq, isNull } from 'drizzle-orm';
import type { CabinetModelInput, CabinetModelPatch } from '../../shared/schemas/cabinet-models.js';
import type { ControllerInput, ControllerPatch } from '../../shared/schemas/controllers.js';
import type { CabinetModel } from '../../shared/schemas/cabinet-models.js';
import type { Controller } from '../../shared/schemas/controllers.js';
import type { CappedList } from '../../shared/schemas/common.js';
import { vaBelowWatts } from '../../shared/schemas/cabinet-models.js';
import { db } from '../db/client.js';
import { cabinetModels } from '../db/schema/catalogue.js';
import { controllers, walls } from '../db/schema/walls.js';
import { badRequest, validationFailed } from '../errors.js';
import type { Actor } from '../middleware/auth.js';
import { recordAudit } from './audit.js';
import { capped } from './pagination.js';
import { found, isStaff, tenantWhere } from './scope.js';

export function presentModel(m: typeof cabinetModels.$inferSelect): CabinetModel {
  return {
    id: m.id,
    name: m.name,
    maker: m.maker,
    widthMm: m.widthMm,
    heightMm: m.heightMm,
    pixelPitchMm: m.pixelPitchMm,
    pixelsWide: m.pixelsWide,
    pixelsHigh: m.pixelsHigh,
    modulesWide: m.modulesWide,
    modulesHigh: m.modulesHigh,
    maxPowerW: m.maxPowerW,
    typicalPowerW: m.typicalPowerW,
    weightKg: m.weightKg,
    brightnessNits: m.brightnessNits,
    inputVoltageMinV: m.inputVoltageMinV,
    inputVoltageMaxV: m.inputVoltageMaxV,
    passThroughAmps: m.passThroughAmps,
    maxPerChain: m.maxPerChain,
    maxPowerVA: m.maxPowerVA,
    environment: m.environment,
    archived: m.archivedAt !== null,
  };
}

/**
 * Read whole by the pickers and the catalogue page, so capped rather than paged: a company keeps
 * tens of models and controllers, and the cap says "more" long before an answer grows large.
 */
export const CABINET_MODELS_CAP = 1000;
export const CONTROLLERS_CAP = 2000;

export async function listCabinetModels(includeArchived = false, cap = CABINET_MODELS_CAP): Promise<CappedList<CabinetModel>> {
  const rows = await db()
    .select()
    .from(cabinetModels)
    .where(includeArchived ? undefined : isNull(cabinetModels.archivedAt))
    .orderBy(asc(cabinetModels.name), asc(cabinetModels.id))
    .limit(cap + 1);
  return capped(rows.map(presentModel), cap);
}

export async function getCabinetModel(id: string) {
  const [row] = await db().select().from(cabinetModels).where(eq(cabinetModels.id, id));
  return presentModel(found(row, 'Cabinet model'));
}

export async function createCabinetModel(actor: Actor, input: CabinetModelInput) {
  return db().transaction(async (tx) => {
    const [row] = await tx.insert(cabinetModels).values(input).returning();
    await recordAudit(tx, { actor, entity: 'cabinet_model', entityId: row.id, action: 'created', after: row });
    return presentModel(row);
  });
}

/**
 * The name, the maker and the datasheet's power connection change; the physical spec of walls
 * already built must not drift.
 */
export async function updateCabinetModel(actor: Actor, id: string, input: CabinetModelPatch) {
  return db().transaction(async (tx) => {
    const [before] = await tx.select().from(cabinetModels).where(eq(cabinetModels.id, id)).for('update');
    found(before, 'Cabinet model');
    if (input.maxPowerVA != null && input.maxPowerVA < before.maxPowerW) throw validationFailed({ maxPowerVA: vaBelowWatts });
    const { archived, ...fields } = input;
    const [after] = await tx
      .update(cabinetModels)
      .set({ ...fields, ...(archived === undefined ? {} : { archivedAt: archived ? (before.archivedAt ?? new Date()) : null }) })
      .where(eq(cabinetModels.id, id))
      .returning();
    await recordAudit(tx, { actor, entity: 'cabinet_model', entityId: id, action: 'updated', before, after });
    return presentModel(after);
  });
}

// ---- controllers ----
/** A controller; its notes (spare locations, passwords written down, staff remarks) to staff only. */
function presentController(c: typeof controllers.$inferSelect, wallName: string | null, staff: boolean): Controller {
  return {
    id: c.id,
    wallId: c.wallId,
    wallName,
    model: c.model,
    serial: c.serial,
    firmware: c.firmware,
    outputs: c.outputs,
    outputsInUse: c.outputsInUse,
    pixelsPerOutput: c.pixelsPerOutput,
    ...(staff ? { notes: c.notes } : {}),
    archived: c.archivedAt !== null,
  };
}

export async function listControllers(actor: Actor, wallId?: string): Promise<CappedList<Controller>> {
  const rows = await db()
    .select({ c: controllers, wallName: walls.name })
    .from(controllers)
    .leftJoin(walls, eq(walls.id, controllers.wallId))
    .where(
      and(
        isNull(controllers.archivedAt),
        wallId ? eq(controllers.wallId, wallId) : undefined,
        // Client users see only controllers on their own walls (the left join yields null otherwise).
        actor.role === 'client' ? tenantWhere(actor, walls.clientId) : undefined,
      ),
    )
    .orderBy(asc(controllers.serial))
    .limit(CONTROLLERS_CAP + 1);
  return capped(
    rows.map((r) => presentController(r.c, r.wallName, isStaff(actor))),
    CONTROLLERS_CAP,
  );
}

export async function getController(actor: Actor, id: string) {
  const [row] = await db()
    .select({ c: controllers, wallName: walls.name })
    .from(controllers)
    .leftJoin(walls, eq(walls.id, controllers.wallId))
    .where(and(eq(controllers.id, id), actor.role === 'client' ? tenantWhere(actor, walls.clientId) : undefined));
  const r = found(row, 'Controller');
  return presentController(r.c, r.wallName, isStaff(actor));
}

async function assertWall(wallId: string | null | undefined) {
  if (!wallId) return;
  const [wall] = await db().select({ id: walls.id }).from(walls).where(eq(walls.id, wallId));
  if (!wall) throw badRequest('validation_failed', 'That wall does not exist.', { wallId: 'Unknown wall.' });
}

export async function createController(actor: Actor, input: ControllerInput) {
  await assertWall(input.wallId);
  const id = await db().transaction(async (tx) => {
    const [row] = await tx
      .insert(controllers)
      .values({ ...input, wallId: input.wallId ?? null })
      .returning();
    await recordAudit(tx, { actor, entity: 'controller', entityId: row.id, action: 'created', after: row });
    return row.id;
  });
  return getController(actor, id);
}

export async function updateController(actor: Actor, id: string, input: ControllerPatch) {
  await assertWall(input.wallId);
  await db().transaction(async (tx) => {
    const [before] = await tx.select().from(controllers).where(eq(controllers.id, id)).for('update');
    found(before, 'Controller');
    const { archived, ...fields } = input;
    if (fields.outputsInUse !== undefined && fields.outputsInUse > before.outputs) {
      throw badRequest('validation_failed', 'Cannot use more outputs than the controller has.', {
        outputsInUse: `At most ${before.outputs}.`,
      });
    }
    const [after] = await tx
      .update(controllers)
      .set({ ...fields, ...(archived === undefined ? {} : { archivedAt: archived ? (before.archivedAt ?? new Date()) : null }) })
      .where(eq(controllers.id, id))
      .returning();
    await recordAudit(tx, { actor, entity: 'controller', entityId: id, action: 'updated', before, after });
  });
  return getController(actor, id);
}
