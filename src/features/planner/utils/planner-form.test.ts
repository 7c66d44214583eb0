import { describe, expect, it } from 'vitest';
import { defaultPlannerValues, gridOptions, plannerFormSchema, toPlanRequest, type PlannerFormInput } from './planner-form';

const values = (patch: Partial<PlannerFormInput> = {}): PlannerFormInput => ({ ...defaultPlannerValues, ...patch });
const issuesOf = (v: PlannerFormInput) => {
  const r = plannerFormSchema.safeParse(v);
  return r.success ? {} : Object.fromEntries(r.error.issues.map((i) => [i.path.join('.'), i.message]));
};

describe('the planner form', () => {
  it('offers 12 × 6 first for 20 ft × 10 ft of 500 mm cabinets (1 ft = 304.8 mm, NIST Handbook 44)', () => {
    // 6,096 ÷ 500 = 12.19 columns, 3,048 ÷ 500 = 6.10 rows.
    const options = gridOptions({ widthMm: 500, heightMm: 500 }, { unit: 'ft', width: 20, height: 10 });
    expect(options[0]).toMatchObject({ columns: 12, rows: 6, widthErrorMm: -96, heightErrorMm: -48 });
    expect(options.map((o) => `${o.columns}×${o.rows}`).sort()).toEqual(['12×6', '12×7', '13×6', '13×7']);
    // Metres: 6 m × 3 m of 500 mm cabinets is exactly 12 × 6, offered alone.
    expect(gridOptions({ widthMm: 500, heightMm: 500 }, { unit: 'm', width: 6, height: 3 }).map((o) => [o.columns, o.rows])).toEqual([
      [12, 6],
    ]);
    expect(gridOptions({ widthMm: 500, heightMm: 500 }, { unit: 'm', width: Number.NaN, height: 3 })).toEqual([]);
  });

  it('turns the fields into the wall-plan request the API takes', () => {
    const parsed = plannerFormSchema.parse(values({ inputPreset: 'uhd', columns: 12, rows: 6 }));
    expect(toPlanRequest(parsed)).toMatchObject({
      columns: 12,
      rows: 6,
      input: { width: 3840, height: 2160 },
      outputCapacityPixels: 650_000,
      dataPattern: 'rows',
      powerPattern: 'rows',
    });
    // Empty datasheet boxes are "not known", never zero: the plan then assumes 0.95 and says so.
    const request = toPlanRequest(parsed);
    expect(request.supply.powerFactor).toBeUndefined();
    expect(request.cabinet.passThroughAmps).toBeUndefined();
  });

  it('puts the API’s own cross-field rules on the fields they name', () => {
    // 192 × 192 = 36,864 px per cabinet: over an output of 30,000 px.
    expect(issuesOf(values({ outputCapacityPixels: 30_000 }))).toEqual({
      outputCapacityPixels: 'One cabinet (36,864 pixels) is over the output capacity.',
    });
    // 120 V × 1 A × 0.8 = 96 W a circuit (NEC 210.19(A)(1)): less than one 180 W cabinet.
    expect(issuesOf(values({ supply: { ...defaultPlannerValues.supply, breakerAmps: 1 } }))).toHaveProperty(['supply.breakerAmps']);
    // 480 V is outside the cabinet's 100–240 V input range.
    expect(issuesOf(values({ supply: { ...defaultPlannerValues.supply, voltage: 480 } }))).toEqual({
      'supply.voltage': expect.stringContaining("outside the cabinet's 100 V–240 V input range"),
    });
    // A 0.5 A connector passes 120 V × 0.5 A × 0.95 = 57 W: less than one 180 W cabinet.
    expect(issuesOf(values({ cabinet: { ...defaultPlannerValues.cabinet, passThroughAmps: 0.5 } }))).toEqual({
      'cabinet.passThroughAmps': 'One cabinet (180 W) is over what its power connector may carry (57 W).',
    });
  });

  it('checks the target size and a custom input only when they are used', () => {
    expect(issuesOf(values({ gridMode: 'grid' }))).toEqual({});
    expect(issuesOf(values({ gridMode: 'size' }))).toEqual({
      'target.width': 'Width must be a number.',
      'target.height': 'Height must be a number.',
    });
    expect(issuesOf(values({ inputPreset: 'custom', input: { width: 1920.5, height: 1080 } }))).toEqual({
      'input.width': 'Input width must be a whole number.',
    });
  });
});
