// The repair form as the technician fills it in, one tap per step, and what it becomes: the
// `POST /api/repairs` body and the outbox's summary of it.
import { cellLabel } from '@shared/calc/grid';
import type { RemovedPartFate, RepairAction, RepairComponent, RepairFault } from '@shared/schemas/enums';
import { actionLabels, componentLabels, faultLabels, type CreateRepairInput } from '@shared/schemas/repairs';
import type { OutboxPhoto, OutboxSummary } from '@/lib/offline-queue';

export type StepId = 'cell' | 'cabinet' | 'component' | 'module' | 'fault' | 'action' | 'spare' | 'removed' | 'notes';

export const stepTitles: Record<StepId, string> = {
  cell: 'Position',
  cabinet: 'Cabinet',
  component: 'Component',
  module: 'Module',
  fault: 'Fault',
  action: 'Action',
  spare: 'Spare',
  removed: 'Removed part',
  notes: 'Notes and photos',
};

/** The spare part fitted, with the words to show it again. */
export interface DraftSpare {
  partId: string;
  partName: string;
  batch: string;
  locationId: string;
  locationName: string;
  matchesWallBatch: boolean;
}

/** A whole-cabinet swap's spare cabinet. */
export interface DraftReplacement {
  cabinetId: string;
  serial: string;
  batch: string;
  locationName: string;
}

export interface RepairDraft {
  /** Where the form was opened from (kept with a queued repair). */
  visitId?: string;
  ticketId?: string;
  wallId: string | null;
  wallName: string;
  step: StepId;
  view: 'front' | 'rear';
  cell: { column: number; row: number } | null;
  cabinet: { id: string; serial: string; batch: string } | null;
  component: RepairComponent | null;
  /** As seen from the audience, from the top-left. */
  module: { column: number; row: number } | null;
  fault: RepairFault | null;
  action: RepairAction | null;
  spare: DraftSpare | null;
  acceptBatchMismatch: boolean;
  replacement: DraftReplacement | null;
  removedPartFate: RemovedPartFate;
  notes: string;
  photos: OutboxPhoto[];
  /** Made at the first Save tap: a double tap queues the same repair, not two. */
  key: string | null;
}

export function emptyDraft(from: { visitId?: string; ticketId?: string; wallId?: string; cell?: RepairDraft['cell'] }): RepairDraft {
  return {
    visitId: from.visitId,
    ticketId: from.ticketId,
    wallId: from.wallId ?? null,
    wallName: '',
    step: from.cell ? 'cabinet' : 'cell',
    view: 'rear',
    cell: from.cell ?? null,
    cabinet: null,
    component: null,
    module: null,
    fault: null,
    action: null,
    spare: null,
    acceptBatchMismatch: false,
    replacement: null,
    removedPartFate: 'none',
    notes: '',
    photos: [],
    key: null,
  };
}

/** The actions that make sense for a component: a whole cabinet is swapped, a part is replaced. */
export function actionsFor(component: RepairComponent | null): RepairAction[] {
  return component === 'whole_cabinet'
    ? ['cabinet_swapped', 'reseated', 'recalibrated', 'cleaned']
    : ['replaced', 'reseated', 'recalibrated', 'cleaned'];
}

export const takesSpare = (action: RepairAction | null) => action === 'replaced' || action === 'cabinet_swapped';

/** The steps this repair goes through; the module and spare steps only when they apply. */
export function stepsFor(d: Pick<RepairDraft, 'component' | 'action'>): StepId[] {
  const steps: StepId[] = ['cell', 'cabinet', 'component'];
  if (d.component === 'module') steps.push('module');
  steps.push('fault', 'action');
  if (takesSpare(d.action)) steps.push('spare', 'removed');
  steps.push('notes');
  return steps;
}

/** The first step not yet answered (where "Next" leads and where a reopened form starts). */
export function isAnswered(d: RepairDraft, step: StepId): boolean {
  switch (step) {
    case 'cell':
      return d.cell !== null;
    case 'cabinet':
      return d.cabinet !== null;
    case 'component':
      return d.component !== null;
    case 'module':
      return d.module !== null;
    case 'fault':
      return d.fault !== null;
    case 'action':
      return d.action !== null;
    case 'spare':
      return d.action === 'cabinet_swapped'
        ? d.replacement !== null
        : d.spare !== null && (d.spare.matchesWallBatch || d.acceptBatchMismatch);
    case 'removed':
      return d.removedPartFate !== 'none';
    case 'notes':
      return true;
  }
}

/** Choosing something earlier clears what depended on it. */
export function withComponent(d: RepairDraft, component: RepairComponent): RepairDraft {
  if (d.component === component) return d;
  return {
    ...d,
    component,
    module: null,
    action: null,
    spare: null,
    replacement: null,
    acceptBatchMismatch: false,
    removedPartFate: 'none',
  };
}

export function withAction(d: RepairDraft, action: RepairAction): RepairDraft {
  if (d.action === action) return d;
  return { ...d, action, spare: null, replacement: null, acceptBatchMismatch: false, removedPartFate: 'none' };
}

/** The request body (with `seenAt` and `performedAt`); null while something is missing. */
export function toRepairInput(d: RepairDraft, performedAt: string): CreateRepairInput | null {
  if (!d.wallId || !d.cell || !d.cabinet || !d.component || !d.fault || !d.action) return null;
  const swap = d.action === 'cabinet_swapped';
  return {
    cabinetId: d.cabinet.id,
    component: d.component,
    fault: d.fault,
    action: d.action,
    visitId: d.visitId,
    ticketId: d.ticketId,
    moduleColumn: d.component === 'module' ? d.module?.column : undefined,
    moduleRow: d.component === 'module' ? d.module?.row : undefined,
    spare:
      d.action === 'replaced' && d.spare ? { partId: d.spare.partId, batch: d.spare.batch, locationId: d.spare.locationId } : undefined,
    replacementCabinetId: swap ? d.replacement?.cabinetId : undefined,
    acceptBatchMismatch: d.action === 'replaced' && d.spare && !d.spare.matchesWallBatch ? d.acceptBatchMismatch : undefined,
    removedPartFate: takesSpare(d.action) ? d.removedPartFate : 'none',
    notes: d.notes.trim() || undefined,
    seenAt: { wallId: d.wallId, column: d.cell.column, row: d.cell.row },
    performedAt,
  };
}

/** "Module 2·1 · Module dark · Replaced". */
export function describeWork(d: Pick<RepairDraft, 'component' | 'module' | 'fault' | 'action'>): string {
  const parts: string[] = [];
  if (d.component)
    parts.push(d.component === 'module' && d.module ? `Module ${d.module.column}·${d.module.row}` : componentLabels[d.component]);
  if (d.fault) parts.push(faultLabels[d.fault]);
  if (d.action) parts.push(actionLabels[d.action]);
  return parts.join(' · ');
}

export function toSummary(d: RepairDraft, origin?: string): OutboxSummary {
  const part =
    d.action === 'cabinet_swapped' && d.replacement
      ? `Cabinet ${d.replacement.serial} from ${d.replacement.locationName}`
      : d.action === 'replaced' && d.spare
        ? `${d.spare.partName}${d.spare.batch ? `, batch ${d.spare.batch}` : ''} from ${d.spare.locationName}`
        : null;
  return {
    wallId: d.wallId ?? '',
    wallName: d.wallName,
    position: d.cell ? cellLabel(d.cell) : '',
    cabinetSerial: d.cabinet?.serial ?? '',
    what: describeWork(d),
    part,
    visitId: d.visitId,
    ticketId: d.ticketId,
    origin,
  };
}

/** Where a draft is kept: one per place the form is opened from. */
export const draftKey = (from: { visitId?: string; ticketId?: string; wallId?: string }) =>
  `repair:${from.visitId ? `visit:${from.visitId}` : from.ticketId ? `ticket:${from.ticketId}` : `wall:${from.wallId ?? ''}`}`;
