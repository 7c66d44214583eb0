// Contracts of the trade calculators (/api/calc/*): the same schemas check the planner's forms
// and the server's requests. Cross-field rules sit here, each naming the field to fix.
import { z } from 'zod';
import { chainLimit, DEFAULT_CONTINUOUS_FACTOR, supplyVoltageProblem, wholeUnitsWithin } from '../calc/electrical.js';
import { cabinetsPerRun, runPatterns, type Run, type RunLimits, type RunPattern, type RunProblem } from '../calc/runs.js';
import type { ClockMode } from '../calc/service-clock.js';
import type { SparesForecast } from '../calc/spares.js';
import { DEFAULT_OUTPUT_CAPACITY_PIXELS } from '../calc/video-signal.js';
import { DEFAULT_RUN_PATTERN, type WallPlan } from '../calc/wall-plan.js';

const count = new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 });

const positive = (label: string, max: number) =>
  z
    .number({ error: `${label} must be a number.` })
    .positive(`${label} must be more than zero.`)
    .max(max, `${label} must be at most ${count.format(max)}.`);
const positiveInt = (label: string, max: number) => positive(label, max).int(`${label} must be a whole number.`);
const share = (label: string) =>
  z
    .number({ error: `${label} must be a number.` })
    .gt(0, `${label} must be more than 0.`)
    .max(1, `${label} must be at most 1.`);

/**
 * Cross-field rules that compute with several fields run only once every field is valid on
 * its own (zod would otherwise run them after a failed `positive()` and divide by a negative).
 */
const whenFieldsValid = { when: (payload: { issues: readonly unknown[] }) => payload.issues.length === 0 };

const columns = positiveInt('Columns', 500);
const rows = positiveInt('Rows', 500);

// ---- wall plan ----

export const cabinetSpecInput = z
  .object({
    widthMm: positive('Cabinet width', 10_000),
    heightMm: positive('Cabinet height', 10_000),
    pixelsWide: positiveInt('Pixels wide', 100_000),
    pixelsHigh: positiveInt('Pixels high', 100_000),
    maxPowerW: positive('Maximum power', 100_000),
    typicalPowerW: positive('Typical power', 100_000),
    weightKg: positive('Weight', 10_000),
    // From the datasheet, when known: they make the power figures the cabinet's own.
    maxPowerVA: positive('Maximum volt-amperes', 100_000).optional(),
    inputVoltageMinV: positive('Lowest input voltage', 1_000).optional(),
    inputVoltageMaxV: positive('Highest input voltage', 1_000).optional(),
    passThroughAmps: positive('Connector rating', 1_000).optional(),
    maxPerChain: positiveInt('Cabinets per chain', 10_000).optional(),
    receivingCards: positiveInt('Receiving cards', 16).optional(),
    receivingCardPixels: positiveInt('Receiving card capacity', 100_000_000).optional(),
  })
  .refine((c) => c.typicalPowerW <= c.maxPowerW, {
    path: ['typicalPowerW'],
    message: 'Typical power cannot exceed maximum power.',
    ...whenFieldsValid,
  })
  .refine((c) => c.maxPowerVA === undefined || c.maxPowerVA >= c.maxPowerW, {
    path: ['maxPowerVA'],
    message: 'Volt-amperes cannot be less than watts (the power factor is at most 1).',
    ...whenFieldsValid,
  })
  .refine((c) => c.inputVoltageMinV === undefined || c.inputVoltageMaxV === undefined || c.inputVoltageMinV <= c.inputVoltageMaxV, {
    path: ['inputVoltageMinV'],
    message: 'The lowest input voltage cannot exceed the highest.',
    ...whenFieldsValid,
  });

export const supplyInput = z.object({
  voltage: positive('Voltage', 1_000),
  phases: z.union([z.literal(1), z.literal(3)], { error: 'Phases must be 1 or 3.' }),
  breakerAmps: positive('Breaker rating', 10_000),
  continuousFactor: share('Continuous-load factor').default(DEFAULT_CONTINUOUS_FACTOR),
  // Left out: the datasheet's volt-amperes, else 0.95 (DEFAULT_POWER_FACTOR).
  powerFactor: share('Power factor').optional(),
});

const processorInput = z.object({
  outputs: positiveInt('Processor outputs', 1_000).optional(),
  pixelCapacity: positiveInt('Processor capacity', 1_000_000_000).optional(),
  maxWidth: positiveInt('Processor width', 1_000_000).optional(),
  maxHeight: positiveInt('Processor height', 1_000_000).optional(),
});

const runPattern = (label: string) => z.enum(runPatterns, { error: `${label} must be rows, columns or serpentine.` });

/**
 * The supply and cabinet fields a chain limit needs, checked together: a branch voltage within
 * the cabinet's input range, and at least one whole cabinet on a chain (naming the limit that
 * is too small). `at` is where the supply sits in the request.
 */
export function checkChain(
  supply: z.output<typeof supplyInput>,
  cabinet: z.output<typeof cabinetSpecInput>,
  ctx: z.RefinementCtx,
  at: (string | number)[] = ['supply'],
) {
  const problem = supplyVoltageProblem(supply, cabinet);
  if (problem) {
    ctx.addIssue({ code: 'custom', path: [...at, 'voltage'], message: problem });
    return;
  }
  const limit = chainLimit(supply, cabinet);
  if (limit.cabinetsPerChain >= 1) return;
  const over = `One cabinet (${count.format(cabinet.maxPowerW)} W) is over`;
  ctx.addIssue(
    limit.chainLimitedBy === 'connector'
      ? {
          code: 'custom',
          path: ['cabinet', 'passThroughAmps'],
          message: `${over} what its power connector may carry (${count.format(limit.chainLimitW)} W).`,
        }
      : {
          code: 'custom',
          path: [...at, 'breakerAmps'],
          message: `${over} the circuit's continuous capacity (${count.format(limit.circuitCapacityW)} W).`,
        },
  );
}

export const wallPlanRequest = z
  .object({
    cabinet: cabinetSpecInput,
    columns,
    rows,
    supply: supplyInput,
    outputCapacityPixels: positiveInt('Output capacity', 100_000_000).default(DEFAULT_OUTPUT_CAPACITY_PIXELS),
    input: z.object({ width: positiveInt('Input width', 100_000), height: positiveInt('Input height', 100_000) }).optional(),
    dataPattern: runPattern('Data pattern').default(DEFAULT_RUN_PATTERN),
    powerPattern: runPattern('Power pattern').default(DEFAULT_RUN_PATTERN),
    processor: processorInput.optional(),
    dataCableToWallM: z
      .number({ error: 'Cable length must be a number.' })
      .min(0, 'Cable length cannot be negative.')
      .max(10_000, 'Cable length must be at most 10,000 m.')
      .optional(),
  })
  .superRefine((v, ctx) => {
    const cabinetPixels = v.cabinet.pixelsWide * v.cabinet.pixelsHigh;
    if (wholeUnitsWithin(v.outputCapacityPixels, cabinetPixels) < 1) {
      ctx.addIssue({
        code: 'custom',
        path: ['outputCapacityPixels'],
        message: `One cabinet (${count.format(cabinetPixels)} pixels) is over the output capacity.`,
      });
    }
    checkChain(v.supply, v.cabinet, ctx);
  }, whenFieldsValid);
export type WallPlanRequest = z.input<typeof wallPlanRequest>;
export type WallPlanResponse = WallPlan;

// ---- runs ----

const runKinds = ['data', 'power'] as const;

/** The per-cabinet loads and capacities of a data or a power run, as flat request fields. */
const runLimitFields = {
  columns,
  rows,
  kind: z.enum(runKinds, { error: 'Kind must be data or power.' }),
  cabinetPixels: positiveInt('Cabinet pixels', 100_000_000).optional(),
  outputCapacityPixels: positiveInt('Output capacity', 100_000_000).default(DEFAULT_OUTPUT_CAPACITY_PIXELS),
  cabinetMaxPowerW: positive('Cabinet maximum power', 100_000).optional(),
  chainCapacityW: positive('Chain capacity', 1_000_000).optional(),
};

type LimitFields = {
  kind: (typeof runKinds)[number];
  cabinetPixels?: number;
  outputCapacityPixels: number;
  cabinetMaxPowerW?: number;
  chainCapacityW?: number;
};

/** The limits a data or power run has, or null when a field it needs is missing. */
function limitsOf(v: LimitFields): RunLimits | null {
  if (v.kind === 'data') {
    return v.cabinetPixels === undefined
      ? null
      : { kind: 'data', cabinetPixels: v.cabinetPixels, outputCapacityPixels: v.outputCapacityPixels };
  }
  return v.cabinetMaxPowerW === undefined || v.chainCapacityW === undefined
    ? null
    : { kind: 'power', cabinetMaxPowerW: v.cabinetMaxPowerW, chainCapacityW: v.chainCapacityW };
}

function checkRequired(v: LimitFields, ctx: z.RefinementCtx) {
  const required = v.kind === 'data' ? (['cabinetPixels'] as const) : (['cabinetMaxPowerW', 'chainCapacityW'] as const);
  for (const field of required) {
    if (v[field] === undefined) ctx.addIssue({ code: 'custom', path: [field], message: `Required for ${v.kind} runs.` });
  }
}

function checkCapacity(v: LimitFields, ctx: z.RefinementCtx) {
  const limits = limitsOf(v);
  if (!limits || cabinetsPerRun(limits) >= 1) return;
  ctx.addIssue(
    limits.kind === 'data'
      ? {
          code: 'custom',
          path: ['outputCapacityPixels'],
          message: `One cabinet (${count.format(limits.cabinetPixels)} pixels) is over the output capacity.`,
        }
      : {
          code: 'custom',
          path: ['chainCapacityW'],
          message: `One cabinet (${count.format(limits.cabinetMaxPowerW)} W) is over the chain capacity.`,
        },
  );
}

export const runsRequest = z
  .object({ ...runLimitFields, pattern: z.enum(runPatterns, { error: 'Pattern must be rows, columns or serpentine.' }) })
  .superRefine(checkRequired)
  .superRefine(checkCapacity, whenFieldsValid)
  .transform((v) => ({ columns: v.columns, rows: v.rows, pattern: v.pattern as RunPattern, limits: limitsOf(v) as RunLimits }));
export type RunsRequest = z.input<typeof runsRequest>;
export interface RunsResponse {
  runs: Run[];
}

const cellInput = z.object({
  column: z.number({ error: 'Column must be a number.' }).int('Column must be a whole number.'),
  row: z.number({ error: 'Row must be a number.' }).int('Row must be a whole number.'),
});

/** Runs as drawn or edited by hand: cells may be anywhere, the check reports what is wrong. */
export const runsValidateRequest = z
  .object({
    ...runLimitFields,
    runs: z
      .array(
        z.object({
          index: positiveInt('Run number', 1_000_000),
          cells: z.array(cellInput).max(250_000, 'Too many cells in one run.'),
        }),
      )
      .max(250_000, 'Too many runs.'),
  })
  .superRefine(checkRequired)
  .superRefine(checkCapacity, whenFieldsValid)
  .transform((v) => ({ columns: v.columns, rows: v.rows, runs: v.runs, limits: limitsOf(v) as RunLimits }));
export type RunsValidateRequest = z.input<typeof runsValidateRequest>;
export interface RunsValidateResponse {
  problems: RunProblem[];
}

// ---- spares forecast ----

export const sparesRequest = z.object({
  modules: positiveInt('Modules', 10_000_000),
  failuresPerModuleMonth: z
    .number({ error: 'Failure rate must be a number.' })
    .min(0, 'Failure rate cannot be negative.')
    .max(1, 'Failure rate must be at most 1 per module-month.'),
  leadTimeMonths: positive('Lead time', 120),
  serviceLevel: z
    .number({ error: 'Service level must be a number.' })
    .gt(0, 'Service level must be more than 0.')
    .lt(1, 'Service level must be below 1 (no stock covers every case); try 0.95.'),
});
export type SparesRequest = z.input<typeof sparesRequest>;
export type SparesResponse = SparesForecast;

// ---- service clock ----

/** True for a time-zone name the runtime knows (IANA names such as America/Chicago). */
function knownTimeZone(name: string): boolean {
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: name });
    return true;
  } catch {
    return false;
  }
}

const clockTime = /^(?:[01]\d|2[0-3]):[0-5]\d$/;
const minutes = (hhmm: string) => Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3, 5));

export const businessCalendarInput = z
  .object({
    days: z
      .array(z.number({ error: 'Days are ISO weekdays, 1 (Monday) to 7 (Sunday).' }).int().min(1).max(7), {
        error: 'Days are ISO weekdays, 1 (Monday) to 7 (Sunday).',
      })
      .min(1, 'Pick at least one business day.')
      .max(7)
      .refine((d) => new Set(d).size === d.length, 'Each day only once.'),
    start: z.string().regex(clockTime, 'Use a time such as 08:00.'),
    end: z.string().regex(clockTime, 'Use a time such as 18:00.').or(z.literal('24:00')),
  })
  .refine((c) => minutes(c.end) > minutes(c.start), { path: ['end'], message: 'The day must end after it starts.', ...whenFieldsValid });

/** Ten years: the longest span a due time may reach, which also bounds the day-by-day count. */
const MAX_CLOCK_WEEKS = 520;

export const dueRequest = z
  .object({
    start: z.iso
      .datetime({ offset: true, error: 'Use an ISO 8601 time with an offset, such as 2026-03-06T16:00:00-06:00.' })
      .transform((s) => new Date(s)),
    hours: positive('Hours', 100_000),
    // The stored spelling is round_the_clock; the hyphenated one is accepted too.
    mode: z
      .enum(['business', 'round-the-clock', 'round_the_clock'], { error: 'Mode must be business or round-the-clock.' })
      .transform((m): ClockMode => (m === 'business' ? 'business' : 'round_the_clock')),
    timeZone: z.string().min(1, 'Required.').max(64).refine(knownTimeZone, 'Not a known time zone; use a name such as America/Chicago.'),
    calendar: businessCalendarInput,
  })
  .refine(
    (v) => {
      const weeklyHours =
        v.mode === 'business' ? (v.calendar.days.length * (minutes(v.calendar.end) - minutes(v.calendar.start))) / 60 : 168;
      return v.hours / weeklyHours <= MAX_CLOCK_WEEKS;
    },
    { path: ['hours'], message: 'That is more than ten years of clock time.', ...whenFieldsValid },
  );
export type DueRequest = z.input<typeof dueRequest>;
export interface DueResponse {
  /** UTC, ISO 8601. */
  due: string;
}
