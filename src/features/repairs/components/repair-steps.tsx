import { cellLabel } from '@shared/calc/grid';
import type { Position } from '@shared/schemas/cabinets';
import { repairComponents, repairFaults, type PartKind } from '@shared/schemas/enums';
import { actionLabels, componentLabels, faultLabels, fateLabels, partKindFor } from '@shared/schemas/repairs';
import type { WallDetail } from '@shared/schemas/walls';
import { useQuery } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { CellStep } from '@/features/repairs/components/cell-step';
import { ChoiceButtons } from '@/features/repairs/components/choice-buttons';
import { ModuleGrid } from '@/features/repairs/components/module-grid';
import { PhotoPicker } from '@/features/repairs/components/photo-picker';
import { SpareCabinetList } from '@/features/repairs/components/spare-cabinet-picker';
import { BatchMismatchConfirm, SourceTabs, SpareList, spareSources } from '@/features/repairs/components/spare-picker';
import { actionsFor, describeWork, withAction, withComponent, type RepairDraft, type StepId } from '@/features/repairs/utils/repair-draft';
import { formatDate } from '@/lib/format';
import { stockQueries } from '@/resources/stock';
import { wallQueries } from '@/resources/walls';

type Change = (change: (d: RepairDraft) => RepairDraft) => void;

interface StepProps {
  draft: RepairDraft;
  wall: WallDetail;
  reported: Position[];
  userId: string;
  /** A choice that moves on to the next step. */
  choose: Change;
  /** A change that stays on the step. */
  update: Change;
}

/** The body of the current step. */
export function RepairStepBody({ step, ...props }: StepProps & { step: StepId }) {
  const { draft, wall, choose, update } = props;
  switch (step) {
    case 'cell':
      return (
        <CellStep
          wall={{
            id: wall.id,
            name: wall.name,
            columns: wall.columns,
            rows: wall.rows,
            cellAspect: wall.cabinetModel.heightMm / wall.cabinetModel.widthMm,
          }}
          reported={props.reported}
          view={draft.view}
          onViewChange={(view) => update((d) => ({ ...d, view }))}
          value={draft.cell}
          onPick={(c) =>
            choose((d) => ({
              ...d,
              // The cell as tapped now: the cabinet may have moved since the draft was made.
              cell: { column: c.column, row: c.row },
              cabinet: { id: c.id, serial: c.serial, batch: c.batch },
              // Another cabinet: its batch decides the spare, so the spare is chosen again.
              ...(d.cabinet?.id === c.id ? {} : { spare: null, replacement: null, acceptBatchMismatch: false }),
            }))
          }
        />
      );
    case 'cabinet':
      return <CabinetStep {...props} />;
    case 'component':
      return (
        <StepTitle title="What did you work on?">
          <ChoiceButtons
            label="Component"
            choices={repairComponents.map((c) => ({ value: c, label: componentLabels[c] }))}
            value={draft.component}
            onChoose={(c) => choose((d) => withComponent(d, c))}
          />
        </StepTitle>
      );
    case 'module':
      return (
        <StepTitle title="Which module?">
          <ModuleGrid
            wide={wall.cabinetModel.modulesWide}
            high={wall.cabinetModel.modulesHigh}
            view={draft.view}
            onViewChange={(view) => update((d) => ({ ...d, view }))}
            value={draft.module}
            onChoose={(p) => choose((d) => ({ ...d, module: p }))}
          />
        </StepTitle>
      );
    case 'fault':
      return (
        <StepTitle title="What was wrong?">
          <ChoiceButtons
            label="Fault"
            choices={repairFaults.map((f) => ({ value: f, label: faultLabels[f] }))}
            value={draft.fault}
            onChoose={(f) => choose((d) => ({ ...d, fault: f }))}
          />
        </StepTitle>
      );
    case 'action':
      return (
        <StepTitle title="What did you do?">
          <ChoiceButtons
            label="Action"
            choices={actionsFor(draft.component).map((a) => ({
              value: a,
              label: actionLabels[a],
              hint: a === 'replaced' ? 'With a spare' : a === 'cabinet_swapped' ? 'A spare cabinet takes the position' : undefined,
            }))}
            value={draft.action}
            onChoose={(a) => choose((d) => withAction(d, a))}
          />
        </StepTitle>
      );
    case 'spare':
      return <SpareStep {...props} />;
    case 'removed':
      return (
        <StepTitle
          title={
            draft.action === 'cabinet_swapped'
              ? `Where does ${draft.cabinet?.serial ?? 'the removed cabinet'} go?`
              : 'Where does the removed part go?'
          }
        >
          <ChoiceButtons
            label="Removed part"
            columns={1}
            choices={(['to_bench', 'to_vendor_return', 'scrapped'] as const).map((f) => ({
              value: f,
              label: fateLabels[f],
              hint:
                f === 'to_bench'
                  ? 'To be tested and repaired in the workshop'
                  : f === 'to_vendor_return'
                    ? 'Back to its maker under warranty'
                    : 'Beyond repair',
            }))}
            value={draft.removedPartFate === 'none' ? null : draft.removedPartFate}
            onChoose={(f) => choose((d) => ({ ...d, removedPartFate: f }))}
          />
        </StepTitle>
      );
    case 'notes':
      return <NotesStep {...props} />;
  }
}

function StepTitle({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="space-y-3" aria-label={title}>
      <h2 className="text-xl font-semibold text-ink-950">{title}</h2>
      {children}
    </section>
  );
}

function CabinetStep({ draft, wall }: StepProps) {
  const cabinets = useQuery(wallQueries.cabinets(wall.id));
  const cabinet = cabinets.data?.items.find((c) => c.id === draft.cabinet?.id);
  if (!draft.cabinet || !draft.cell) return null;
  return (
    <StepTitle title={`Cabinet at ${cellLabel(draft.cell)}`}>
      <div className="space-y-3 rounded-md border border-stone-200 bg-white p-4 shadow-card" data-testid="repair-cabinet">
        <p className="break-all font-mono text-2xl font-semibold text-ink-950">{draft.cabinet.serial}</p>
        <dl className="grid grid-cols-2 gap-x-4 gap-y-3">
          <div>
            <dt className="text-xs font-semibold text-stone-600">Module batch</dt>
            <dd className="font-mono text-base">{draft.cabinet.batch || <span className="font-sans text-stone-500">Not recorded</span>}</dd>
          </div>
          <div>
            <dt className="text-xs font-semibold text-stone-600">Model</dt>
            <dd className="text-base">{wall.cabinetModel.name}</dd>
          </div>
          <div>
            <dt className="text-xs font-semibold text-stone-600">Modules</dt>
            <dd className="text-base">
              {wall.cabinetModel.modulesWide} × {wall.cabinetModel.modulesHigh}
            </dd>
          </div>
          <div>
            <dt className="text-xs font-semibold text-stone-600">Installed on</dt>
            <dd className="text-base">{formatDate(cabinet?.installedOn ?? null)}</dd>
          </div>
        </dl>
        {cabinet && cabinet.openTickets > 0 ? (
          <Badge tone="danger">
            {cabinet.openTickets === 1 ? '1 open ticket names this position' : `${cabinet.openTickets} open tickets name this position`}
          </Badge>
        ) : null}
      </div>
      <p className="text-sm text-stone-700">Check the serial on the cabinet’s label. Another cabinet? Go back and tap it on the map.</p>
    </StepTitle>
  );
}

function SpareStep({ draft, wall, userId, choose, update }: StepProps) {
  const locations = useQuery(stockQueries.locations());
  const sources = spareSources(locations.data?.items ?? [], userId, wall.siteId);
  const [picked, setPicked] = useState<string | null>(null);
  const sourceId = picked ?? draft.spare?.locationId ?? sources[0]?.id ?? null;
  const source = sources.find((s) => s.id === sourceId) ?? null;
  const swap = draft.action === 'cabinet_swapped';
  const kind = draft.component ? partKindFor[draft.component] : null;

  if (locations.isPending) return <Spinner label="Loading your van and the site kit" />;
  if (locations.isError) {
    return <LoadError title="Your van and the site kit could not be loaded." error={locations.error} />;
  }
  return (
    <StepTitle title={swap ? 'Which spare cabinet takes the position?' : 'Which spare did you fit?'}>
      {sources.length ? (
        <SourceTabs sources={sources} value={sourceId} onChange={setPicked} />
      ) : (
        <Alert tone="info">No van in your name and no site kit at this site. The office sets them up under Stock.</Alert>
      )}
      {source && swap && draft.cabinet ? (
        <SpareCabinetList
          location={source}
          modelId={wall.cabinetModel.id}
          batch={draft.cabinet.batch}
          value={draft.replacement}
          onPick={(replacement) => choose((d) => ({ ...d, replacement }))}
        />
      ) : null}
      {source && !swap && kind ? (
        <SpareList
          wallId={wall.id}
          location={source}
          kind={kind as PartKind}
          value={draft.spare}
          onPick={(spare) =>
            spare.matchesWallBatch
              ? choose((d) => ({ ...d, spare, acceptBatchMismatch: false }))
              : update((d) => ({ ...d, spare, acceptBatchMismatch: false }))
          }
        />
      ) : null}
      {!swap && draft.spare && !draft.spare.matchesWallBatch ? (
        <BatchMismatchConfirm
          spare={draft.spare}
          accepted={draft.acceptBatchMismatch}
          onAccept={(accepted) => (accepted ? choose : update)((d) => ({ ...d, acceptBatchMismatch: accepted }))}
        />
      ) : null}
    </StepTitle>
  );
}

function NotesStep({ draft, wall, update }: StepProps) {
  return (
    <StepTitle title="Notes and photos">
      <div className="rounded-md border border-stone-200 bg-white p-3.5 text-base shadow-card" aria-label="The repair">
        <p className="font-semibold text-ink-950">
          {wall.name} · {draft.cell ? cellLabel(draft.cell) : ''} · <span className="font-mono">{draft.cabinet?.serial}</span>
        </p>
        <p className="text-stone-800">{describeWork(draft)}</p>
        {draft.action === 'replaced' && draft.spare ? (
          <p className="text-stone-700">
            Spare: {draft.spare.partName}
            {draft.spare.batch ? `, batch ${draft.spare.batch}` : ''} from {draft.spare.locationName}
            {!draft.spare.matchesWallBatch ? ' (another batch, confirmed)' : ''}
          </p>
        ) : null}
        {draft.action === 'cabinet_swapped' && draft.replacement ? (
          <p className="text-stone-700">
            Replaced by <span className="font-mono">{draft.replacement.serial}</span> from {draft.replacement.locationName}
          </p>
        ) : null}
        {draft.removedPartFate !== 'none' ? (
          <p className="text-stone-700">Removed part: {fateLabels[draft.removedPartFate].toLowerCase()}</p>
        ) : null}
      </div>
      <label className="block space-y-1.5">
        <span className="text-base font-medium text-ink-950">Notes</span>
        <textarea
          value={draft.notes}
          onChange={(e) => {
            const notes = e.target.value;
            update((d) => ({ ...d, notes }));
          }}
          rows={4}
          maxLength={2000}
          className="block w-full rounded border border-stone-300 bg-white px-3 py-2.5 text-md text-ink-950 focus:border-ink-500 focus:outline-none focus:ring-2 focus:ring-ink-200"
          placeholder="Optional: what you found, what to watch next time"
        />
        <span className="block text-sm text-stone-600">Staff only; the client’s report leaves them out.</span>
      </label>
      <PhotoPicker photos={draft.photos} onChange={(photos) => update((d) => ({ ...d, photos }))} />
    </StepTitle>
  );
}
