import { createRepairInput } from '@shared/schemas/repairs';
import { describe, expect, it } from 'vitest';
import {
  emptyDraft,
  isAnswered,
  stepsFor,
  toRepairInput,
  withAction,
  withComponent,
  type RepairDraft,
} from '@/features/repairs/utils/repair-draft';

const wallId = '00000000-0000-4000-8000-000000000001';
const cabinetId = '00000000-0000-4000-8000-000000000002';
const partId = '00000000-0000-4000-8000-000000000003';
const locationId = '00000000-0000-4000-8000-000000000004';
const at = '2026-12-05T10:00:00.000Z';

function base(): RepairDraft {
  return {
    ...emptyDraft({ wallId, ticketId: '00000000-0000-4000-8000-000000000005' }),
    wallName: 'Main hall',
    cell: { column: 3, row: 2 },
    cabinet: { id: cabinetId, serial: 'TW39-0001', batch: 'B1' },
  };
}

describe('the repair form', () => {
  it('asks for the module position only for module work, and the spare only when a part is replaced or the cabinet swapped', () => {
    expect(stepsFor({ component: 'receiving_card', action: 'reseated' })).toEqual([
      'cell',
      'cabinet',
      'component',
      'fault',
      'action',
      'notes',
    ]);
    expect(stepsFor({ component: 'module', action: 'replaced' })).toEqual([
      'cell',
      'cabinet',
      'component',
      'module',
      'fault',
      'action',
      'spare',
      'removed',
      'notes',
    ]);
    expect(stepsFor({ component: 'whole_cabinet', action: 'cabinet_swapped' })).toContain('spare');
  });

  it('clears what depended on an earlier choice', () => {
    const d = { ...base(), component: 'module' as const, module: { column: 1, row: 1 }, action: 'replaced' as const };
    const spared = { ...d, spare: { partId, partName: 'Module', batch: 'B1', locationId, locationName: 'Van', matchesWallBatch: true } };
    expect(withComponent(spared, 'fan')).toMatchObject({ component: 'fan', module: null, action: null, spare: null });
    expect(withAction(spared, 'reseated')).toMatchObject({ action: 'reseated', spare: null, removedPartFate: 'none' });
  });

  it('needs a yes for a spare of another batch than the wall’s', () => {
    const d: RepairDraft = {
      ...base(),
      component: 'module',
      action: 'replaced',
      spare: { partId, partName: 'Module', batch: 'B9', locationId, locationName: 'Van', matchesWallBatch: false },
    };
    expect(isAnswered(d, 'spare')).toBe(false);
    expect(isAnswered({ ...d, acceptBatchMismatch: true }, 'spare')).toBe(true);
  });

  it('makes a body the API accepts: a reseated card with no spare, where and when it was seen', () => {
    const d: RepairDraft = { ...base(), component: 'receiving_card', fault: 'no_signal', action: 'reseated', notes: '  Loose  ' };
    const input = toRepairInput(d, at);
    expect(input).toMatchObject({
      cabinetId,
      component: 'receiving_card',
      removedPartFate: 'none',
      notes: 'Loose',
      seenAt: { wallId, column: 3, row: 2 },
      performedAt: at,
    });
    expect(input?.spare).toBeUndefined();
    expect(createRepairInput.safeParse(input).success).toBe(true);
  });

  it('makes a body the API accepts: a module replaced with a confirmed spare of another batch, the old one to the bench', () => {
    const d: RepairDraft = {
      ...base(),
      component: 'module',
      module: { column: 2, row: 1 },
      fault: 'dead_module',
      action: 'replaced',
      spare: { partId, partName: 'Module', batch: 'B9', locationId, locationName: 'Van', matchesWallBatch: false },
      acceptBatchMismatch: true,
      removedPartFate: 'to_bench',
    };
    const input = toRepairInput(d, at);
    expect(input).toMatchObject({ moduleColumn: 2, moduleRow: 1, spare: { partId, batch: 'B9', locationId }, acceptBatchMismatch: true });
    expect(createRepairInput.safeParse(input).success).toBe(true);
  });

  it('is not ready while a step is unanswered', () => {
    expect(toRepairInput({ ...base(), component: 'fan' }, at)).toBeNull();
  });
});
