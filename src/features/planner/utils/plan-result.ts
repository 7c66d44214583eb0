// Everything the planner shows for valid fields: the wall plan, the settings a save would store,
// the run limits and the runs of the chosen patterns.
import { cabinetsPerRun, generateRuns, type Run } from '@shared/calc/runs';
import { planWall } from '@shared/calc/wall-plan';
import { runLimitsFor, type PlanSettings, type RunKind } from '@shared/schemas/wall-plan';
import { cabinetOf, patternsOf, planInputOf, type PlannerForm } from '@/features/planner/utils/planner-form';

export function planResult(v: PlannerForm) {
  const input = planInputOf(v);
  const plan = planWall(input);
  const patterns = patternsOf(v);
  // The chain's limit as the plan worked it out: circuit, connector and maker's count.
  const settings: PlanSettings = {
    supply: input.supply,
    outputCapacityPixels: input.outputCapacityPixels,
    chainCapacityW: plan.chainLimitW,
  };
  const cabinet = cabinetOf(v);
  const limits = { data: runLimitsFor('data', cabinet, settings), power: runLimitsFor('power', cabinet, settings) };
  // The schema refuses a cabinet over either limit, so every run holds at least one cabinet.
  const runs: Record<RunKind, Run[]> = {
    data: cabinetsPerRun(limits.data) >= 1 ? generateRuns(v.columns, v.rows, patterns.data, limits.data) : [],
    power: cabinetsPerRun(limits.power) >= 1 ? generateRuns(v.columns, v.rows, patterns.power, limits.power) : [],
  };
  return { v, plan, patterns, settings, limits, runs };
}

export type PlanResult = ReturnType<typeof planResult>;
