import { beforeAll, describe, expect, it } from 'vitest';
import { anonymous, cabinetModelFigures, createOrganisation, signedIn, type Session } from '../factories/index.js';

// The catalogue's cabinet models carry the datasheet's power input, which the wall plan uses:
// input voltage range, the power connector's rating, the maker's most cabinets per chain, VA.
const model = cabinetModelFigures;
const name = () => `Test model ${Math.random().toString(36).slice(2, 8)}`;

let office: Session;
let tech: Session;
beforeAll(async () => {
  office = await signedIn('coordinator');
  tech = await signedIn('technician');
});

describe('cabinet models: power input', () => {
  it('creates a model with its power input, and leaves unknown figures empty', async () => {
    const res = await office.post('/api/cabinet-models', {
      ...model,
      name: name(),
      inputVoltageMinV: 200,
      inputVoltageMaxV: 240,
      passThroughAmps: 16,
      maxPerChain: 10,
      maxPowerVA: 210,
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ inputVoltageMinV: 200, inputVoltageMaxV: 240, passThroughAmps: 16, maxPerChain: 10, maxPowerVA: 210 });
    const bare = await office.post('/api/cabinet-models', { ...model, name: name() });
    expect(bare.body).toMatchObject({
      inputVoltageMinV: 100,
      inputVoltageMaxV: 240,
      passThroughAmps: null,
      maxPerChain: null,
      maxPowerVA: null,
    });
  });

  it('refuses volt-amperes below the watts and a reversed voltage range, naming the field', async () => {
    const va = await office.post('/api/cabinet-models', { ...model, name: name(), maxPowerVA: 150 });
    expect(va.status).toBe(400);
    expect(va.body.error.fields).toHaveProperty('maxPowerVA');
    const range = await office.post('/api/cabinet-models', { ...model, name: name(), inputVoltageMinV: 240, inputVoltageMaxV: 100 });
    expect(range.body.error.fields).toHaveProperty('inputVoltageMinV');
    const created = await office.post('/api/cabinet-models', { ...model, name: name() });
    const patch = await office.patch(`/api/cabinet-models/${created.body.id}`, { maxPowerVA: 150 });
    expect(patch.status).toBe(400);
    expect(patch.body.error.fields).toHaveProperty('maxPowerVA');
  });

  it('lets the office add the connector rating later, and a wall planned afterwards is held to it', async () => {
    const { wall } = await createOrganisation({ withWall: true });
    const before = await office.get(`/api/walls/${wall!.id}`);
    const modelId = before.body.cabinetModel.id;
    const patched = await office.patch(`/api/cabinet-models/${modelId}`, { passThroughAmps: 10, maxPerChain: null });
    expect(patched.status).toBe(200);
    expect(patched.body).toMatchObject({ passThroughAmps: 10, maxPerChain: null });
    // 120 V × 10 A × 1 = 1,200 W through the connector, under the circuit's 120 × 20 × 0.8 = 1,920 W.
    const saved = await office.put(`/api/walls/${wall!.id}/plan`, {
      settings: {
        supply: { voltage: 120, phases: 1, breakerAmps: 20, continuousFactor: 0.8, powerFactor: 1 },
        outputCapacityPixels: 650_000,
      },
    });
    expect(saved.status).toBe(200);
    expect(saved.body.planSettings.chainCapacityW).toBeCloseTo(1200, 9);
    expect(saved.body.cabinetModel.passThroughAmps).toBe(10);
  });

  it('is the office’s to change: 401 signed out, 403 for a technician', async () => {
    expect(
      (
        await anonymous()
          .post('/api/cabinet-models')
          .set('X-Requested-With', 'gridkeep')
          .send({ ...model, name: name() })
      ).status,
    ).toBe(401);
    expect((await tech.post('/api/cabinet-models', { ...model, name: name() })).status).toBe(403);
  });
});
