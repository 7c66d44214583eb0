import { eq } from 'drizzle-orm';
import type { z } from 'zod';
import { cabinetsPerRun, validateRuns, type Run, type RunLimits } from '../../shared/calc/runs.js';
import { chainLimit, supplyVoltageProblem } from '../../shared/calc/electrical.js';
import {
  cabinetPowerOf,
  runLimitsFor,
  storedRunsOf,
  type PlanSettings,
  type RunCabinet,
  type RunKind,
  type createWallFromPlanRequest,
  type saveWallPlanRequest,
  type WallRunProblem,
  type WallRunsInput,
} from '../../shared/schemas/wall-plan.js';
import { db, type Tx } from '../db/client.js';
import { cabinetModels } from '../db/schema/catalogue.js';
import { walls } from '../db/schema/walls.js';
import { AppError, validationFailed } from '../errors.js';
import type { Actor } from '../middleware/auth.js';
import { recordAudit } from './audit.js';
import { found } from './scope.js';
import { getWall, insertWall, visibleWall } from './walls.js';

type SaveWallPlan = z.output<typeof saveWallPlanRequest>;
type CreateWallFromPlan = z.output<typeof createWallFromPlanRequest>;

const chainLimitWords = {
  circuit: 'its circuit',
  connector: "the cabinet's power connector",
  maker: "the maker's most cabinets per chain",
} as const;

/**
 * The settings as stored: the supply must be able to feed the wall's cabinets, and a chain may
 * carry no more than its circuit, the cabinet's connector and its maker allow (a lower figure of
 * the crew's own is kept; none given takes that limit).
 */
function checkedSettings(input: SaveWallPlan['settings'], cabinet: RunCabinet): PlanSettings {
  const power = cabinetPowerOf(cabinet);
  const problem = supplyVoltageProblem(input.supply, power);
  if (problem) throw validationFailed({ 'settings.supply.voltage': problem }, problem);
  const limit = chainLimit(input.supply, power);
  if (input.chainCapacityW !== undefined && input.chainCapacityW > limit.chainLimitW * (1 + 1e-9)) {
    const message = `A chain on this supply may carry at most ${count.format(limit.chainLimitW)} W, set by ${chainLimitWords[limit.chainLimitedBy]}.`;
    throw validationFailed({ 'settings.chainCapacityW': message }, message);
  }
  return { ...input, chainCapacityW: input.chainCapacityW ?? limit.chainLimitW };
}

const count = new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 });

/**
 * Stores the supply and capacities a wall is planned with and its data and power runs, after
 * checking every run against the wall's grid and its cabinet model. Runs left out of the request
 * stay as stored and are checked against the new settings too; `null` clears them.
 */
export async function saveWallPlan(actor: Actor, wallId: string, input: SaveWallPlan) {
  await db().transaction((tx) => storePlan(tx, actor, wallId, input));
  return getWall(actor, wallId);
}

/**
 * A new wall from the planner: its site and name, the plan's model and grid, and the plan's
 * settings and runs. One transaction: a plan that does not fit leaves no wall behind.
 */
export async function createWallFromPlan(actor: Actor, input: CreateWallFromPlan) {
  const { settings, dataRuns, powerRuns, ...wall } = input;
  const id = await db().transaction(async (tx) => {
    const wallId = await insertWall(tx, actor, wall);
    await storePlan(tx, actor, wallId, { settings, dataRuns, powerRuns });
    return wallId;
  });
  return getWall(actor, id);
}

/** The checks and the write of a plan, inside the caller's transaction. */
async function storePlan(tx: Tx, actor: Actor, wallId: string, input: SaveWallPlan) {
  // Scoped first (another organisation's wall is simply not found), then locked.
  await visibleWall(tx, actor, wallId);
  const [before] = await tx.select().from(walls).where(eq(walls.id, wallId)).for('update');
  const wall = found(before, 'Wall');
  const [model] = await tx.select().from(cabinetModels).where(eq(cabinetModels.id, wall.cabinetModelId));
  const cabinet = found(model, 'Cabinet model');
  const settings = checkedSettings(input.settings, cabinet);

  const dataLimits = runLimitsFor('data', cabinet, settings);
  const powerLimits = runLimitsFor('power', cabinet, settings);
  const fields: Record<string, string> = {};
  if (cabinetsPerRun(dataLimits) < 1) {
    fields['settings.outputCapacityPixels'] = `One cabinet (${count.format(dataLimits.cabinetPixels)} pixels) is over the output capacity.`;
  }
  if (cabinetsPerRun(powerLimits) < 1) {
    fields['settings.chainCapacityW'] = `One cabinet (${count.format(powerLimits.cabinetMaxPowerW)} W) is over the chain capacity.`;
  }
  if (Object.keys(fields).length) throw validationFailed(fields);

  const dataInput = input.dataRuns === undefined ? wall.dataRuns : input.dataRuns;
  const powerInput = input.powerRuns === undefined ? wall.powerRuns : input.powerRuns;
  const problems: WallRunProblem[] = [];
  const check = (kind: RunKind, runs: { pattern: string; runs: Run[] } | null, limits: RunLimits) => {
    if (!runs) return;
    for (const p of validateRuns(wall.columns, wall.rows, runs.runs, limits)) problems.push({ kind, ...p });
  };
  check('data', dataInput, dataLimits);
  check('power', powerInput, powerLimits);
  if (problems.length) {
    const first = problems[0];
    const message =
      problems.length === 1
        ? `The ${first.kind} runs do not fit the wall: ${first.message}`
        : `The runs do not fit the wall (${problems.length} problems). First: ${first.kind} — ${first.message}`;
    throw new AppError(400, 'runs_invalid', message, undefined, undefined, { problems });
  }

  const patternOf = (runs: { pattern: string }) => runs.pattern as WallRunsInput['pattern'];
  const [after] = await tx
    .update(walls)
    .set({
      planSettings: settings,
      dataRuns: dataInput ? storedRunsOf({ pattern: patternOf(dataInput), runs: dataInput.runs }, dataLimits) : null,
      powerRuns: powerInput ? storedRunsOf({ pattern: patternOf(powerInput), runs: powerInput.runs }, powerLimits) : null,
    })
    .where(eq(walls.id, wallId))
    .returning();
  await recordAudit(tx, {
    actor,
    entity: 'wall',
    entityId: wallId,
    action: 'plan_saved',
    before: { planSettings: wall.planSettings, dataRuns: wall.dataRuns, powerRuns: wall.powerRuns },
    after: { planSettings: after.planSettings, dataRuns: after.dataRuns, powerRuns: after.powerRuns },
  });
}
