import { cellLabel } from '@shared/calc/grid';
import { runPatterns, type RunPattern, type RunProblem } from '@shared/calc/runs';
import type { RunKind } from '@shared/schemas/wall-plan';
import type { WallDetail } from '@shared/schemas/walls';
import clsx from 'clsx';
import { ArrowDown, ArrowUp, ListOrdered, Pencil, Plus, Repeat2, Trash2, Undo2 } from 'lucide-react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { ChoiceGroup } from '@/features/planner/components/choice-group';
import { useRunsEditor } from '@/features/planner/hooks/use-runs-editor';
import { PowerCaution } from '@/features/planner/components/plan-cautions';
import { kindChoices, RunsMap } from '@/features/planner/components/runs-panel';
import { num } from '@/features/planner/utils/format';
import { runPatternLabels } from '@/features/planner/utils/planner-form';
import { addRun, moveRun, removeRun, renumber, reverseRun } from '@/features/planner/utils/run-edit';
import { kindLabels, pathText } from '@/features/planner/utils/wall-runs';
import { errorMessage } from '@/lib/errors';

const MAX_PROBLEMS_SHOWN = 40;

/** "120 V single-phase, 20 A breaker at 80 %" */
function supplyText(s: { voltage: number; phases: 1 | 3; breakerAmps: number; continuousFactor: number }) {
  return `${num(s.voltage)} V ${s.phases === 3 ? 'three-phase' : 'single-phase'}, ${num(s.breakerAmps)} A breaker at ${num(s.continuousFactor * 100)} %`;
}

/**
 * The runs page's body: the wall's stored runs (or a proposal), drawn over the wall map per kind;
 * the office edits them by hand (pick a run, click cells to add or take them out in order,
 * renumber), checked live with the same rules the server applies, and saves them.
 */
export function RunsEditor({ wall, canEdit }: { wall: WallDetail; canEdit: boolean }) {
  const editor = useRunsEditor(wall);
  const {
    settings,
    settingsStored,
    tightened,
    storedSettings,
    limits,
    kind,
    setKind,
    editing,
    setEditing,
    pendingPattern,
    setPendingPattern,
  } = editor;
  const { set, position, selectedRun, runs, problems, select, applyPattern, onCell } = editor;
  const shownProblems = problems[kind];

  return (
    <div className="space-y-6">
      {tightened ? (
        <Alert tone="danger" title="The stored chain capacity is over the safe limit" live={false}>
          {settings.chainCapacityW > 0
            ? `The plan stored ${num(storedSettings.chainCapacityW)} W per chain; on its supply and with this cabinet's connector and maker's limit a chain may carry ${num(settings.chainCapacityW)} W. The power runs are checked against ${num(settings.chainCapacityW)} W.`
            : `The stored supply (${supplyText(settings.supply)}) cannot feed this cabinet's input range; plan the wall again in the planner.`}
        </Alert>
      ) : null}
      {!set.stored ? (
        <Alert tone="info" title="No runs are stored for this wall yet" live={false}>
          This is a proposal from its cabinet model and {settingsStored ? 'its stored settings' : 'the default settings'}, laid{' '}
          {set.pattern === 'custom' ? 'by hand' : `by ${runPatternLabels[set.pattern].toLowerCase()}`}.
          {canEdit ? ' Save it to keep it, or change it first.' : ''}
        </Alert>
      ) : null}

      <Card>
        <div className="space-y-4">
          <div className="flex flex-wrap items-start justify-between gap-3">
            <div className="space-y-1.5">
              <ChoiceGroup legend="Runs shown" hideLegend value={kind} onChange={setKind} choices={kindChoices} />
              <p className="text-sm text-stone-600">
                Laid {set.pattern === 'custom' ? 'by hand' : `by ${runPatternLabels[set.pattern].toLowerCase()}`} for{' '}
                {kind === 'data' ? `${num(settings.outputCapacityPixels)} px per output` : `${num(settings.chainCapacityW)} W per chain`} (
                {supplyText(settings.supply)}){settingsStored ? '' : ', default settings'}.
              </p>
            </div>
            {canEdit ? (
              <Button
                variant={editing ? 'primary' : 'secondary'}
                aria-pressed={editing}
                onClick={() => setEditing((e) => !e)}
                icon={<Pencil className="h-4 w-4" aria-hidden="true" />}
              >
                {editing ? 'Editing' : 'Edit by hand'}
              </Button>
            ) : null}
          </div>
          {editing ? <EditTools editor={editor} /> : null}

          <RunsMap
            kind={kind}
            columns={wall.columns}
            rows={wall.rows}
            cellAspect={wall.cabinetModel.heightMm / wall.cabinetModel.widthMm}
            runs={runs}
            limits={limits[kind]}
            selected={position}
            onSelect={(p) => select(p === position ? null : p)}
            onCellActivate={onCell}
            selectedCells={editing && selectedRun ? selectedRun.cells : undefined}
          />

          <ProblemList problems={shownProblems} kind={kind} onShowRun={(index) => select(set.runs.findIndex((r) => r.index === index))} />

          <details className="rounded border border-stone-200 bg-white">
            <summary className="cursor-pointer px-3 py-2 text-sm font-medium text-ink-800">Cells of each run, in order</summary>
            <ol className="divide-y divide-stone-100 text-sm">
              {runs.map((r, i) => (
                <li key={`${i}-${r.index}`} className="px-3 py-1.5">
                  <span className="font-semibold">Run {r.index}:</span> <span className="text-stone-700">{pathText(r) || 'no cells'}</span>
                </li>
              ))}
            </ol>
          </details>
        </div>
      </Card>

      {canEdit ? <SaveBar editor={editor} /> : null}

      <PowerCaution supply={settings.supply} />

      <ConfirmDialog
        open={pendingPattern !== null}
        onClose={() => setPendingPattern(null)}
        title="Replace the runs drawn by hand?"
        confirmLabel="Replace"
        tone="danger"
        onConfirm={async () => {
          if (pendingPattern) applyPattern(pendingPattern);
        }}
      >
        The {kindLabels[kind].title.toLowerCase()} you edited are replaced by runs laid{' '}
        {pendingPattern ? `by ${runPatternLabels[pendingPattern].toLowerCase()}` : ''}.
      </ConfirmDialog>
    </div>
  );
}

function ProblemList({ problems, kind, onShowRun }: { problems: RunProblem[]; kind: RunKind; onShowRun: (index: number) => void }) {
  if (!problems.length) {
    return (
      <p className="text-sm font-medium text-state-on-track" data-testid={`${kind}-runs-sound`}>
        Every cabinet is in exactly one run, each link joins neighbours, and no run is over its limit.
      </p>
    );
  }
  return (
    <div className="rounded border border-danger-600/40 bg-danger-50 px-3 py-2.5" role="status">
      <p className="text-sm font-semibold text-danger-700">
        {problems.length} {problems.length === 1 ? 'problem' : 'problems'} in the {kindLabels[kind].title.toLowerCase()}
      </p>
      <ul className="mt-1.5 space-y-1 text-sm text-stone-800">
        {problems.slice(0, MAX_PROBLEMS_SHOWN).map((p, i) => (
          <li key={i} className="flex items-start justify-between gap-3">
            <span>{p.message}</span>
            {p.run !== undefined ? (
              <button type="button" className={clsx('link shrink-0 text-sm')} onClick={() => onShowRun(p.run!)}>
                Show run {p.run}
              </button>
            ) : p.cell ? (
              <span className="shrink-0 text-xs text-stone-600">{cellLabel(p.cell)}</span>
            ) : null}
          </li>
        ))}
      </ul>
      {problems.length > MAX_PROBLEMS_SHOWN ? (
        <p className="mt-1 text-sm text-stone-700">…and {num(problems.length - MAX_PROBLEMS_SHOWN)} more.</p>
      ) : null}
    </div>
  );
}

type Editor = ReturnType<typeof useRunsEditor>;

/** The hand-editing tools: new, reverse, move, delete and renumber runs, or start again from a pattern. */
function EditTools({ editor }: { editor: Editor }) {
  const { set, position, selectedRun, update, select, setPendingPattern, applyPattern } = editor;
  return (
    <div className="space-y-3 rounded border border-ink-200 bg-ink-50 p-3">
      <p className="text-sm text-ink-800">
        {selectedRun
          ? `Run ${selectedRun.index} is selected: click cells to add them to its end in order, or click one of its cells to take it out.`
          : 'Pick a run in the list below (or click one of its cells), then click cells to add or take them out.'}
      </p>
      <div className="flex flex-wrap gap-2">
        <Button
          size="sm"
          icon={<Plus className="h-4 w-4" aria-hidden="true" />}
          onClick={() => {
            update(addRun(set.runs));
            select(set.runs.length);
          }}
        >
          New run
        </Button>
        <Button
          size="sm"
          disabled={!selectedRun}
          icon={<Repeat2 className="h-4 w-4" aria-hidden="true" />}
          onClick={() => position !== null && update(reverseRun(set.runs, position))}
        >
          Reverse
        </Button>
        <Button
          size="sm"
          disabled={position === null || position === 0}
          icon={<ArrowUp className="h-4 w-4" aria-hidden="true" />}
          onClick={() => {
            if (position !== null) {
              update(moveRun(set.runs, position, -1));
              select(position - 1);
            }
          }}
        >
          Move up
        </Button>
        <Button
          size="sm"
          disabled={position === null || position >= set.runs.length - 1}
          icon={<ArrowDown className="h-4 w-4" aria-hidden="true" />}
          onClick={() => {
            if (position !== null) {
              update(moveRun(set.runs, position, 1));
              select(position + 1);
            }
          }}
        >
          Move down
        </Button>
        <Button
          size="sm"
          disabled={!selectedRun}
          icon={<Trash2 className="h-4 w-4" aria-hidden="true" />}
          onClick={() => {
            if (position !== null) {
              update(removeRun(set.runs, position));
              select(null);
            }
          }}
        >
          Delete run
        </Button>
        <Button size="sm" icon={<ListOrdered className="h-4 w-4" aria-hidden="true" />} onClick={() => update(renumber(set.runs), true)}>
          Renumber 1…{set.runs.length}
        </Button>
      </div>
      <ChoiceGroup
        legend="Start again from a pattern"
        size="sm"
        value={set.pattern === 'custom' ? ('' as RunPattern) : (set.pattern as RunPattern)}
        onChange={(p) => (set.edited && set.pattern === 'custom' ? setPendingPattern(p) : applyPattern(p))}
        choices={runPatterns.map((p) => ({ value: p, label: runPatternLabels[p] }))}
      />
    </div>
  );
}

/** Where the runs stand (problems, unsaved, saved), with discard and save. */
function SaveBar({ editor }: { editor: Editor }) {
  const { problems, anyProblems, unsaved, save, sets, setSets, initial, setSelected, submit } = editor;
  return (
    <div className="flex flex-col gap-3 rounded-md border border-stone-200 bg-white p-4 shadow-card sm:flex-row sm:items-center sm:justify-between">
      <div className="text-sm text-stone-700" aria-live="polite">
        {anyProblems
          ? `Fix the problems first: ${problems.data.length} in the data runs, ${problems.power.length} in the power runs.`
          : unsaved
            ? 'The data and power runs are sound. Save them to store them on the wall.'
            : 'Saved: these are the runs stored on the wall.'}
        {save.isError ? (
          <Alert tone="danger" className="mt-2">
            {errorMessage(save.error)}
          </Alert>
        ) : null}
      </div>
      <div className="flex shrink-0 gap-2">
        <Button
          disabled={!(sets.data.edited || sets.power.edited)}
          icon={<Undo2 className="h-4 w-4" aria-hidden="true" />}
          onClick={() => {
            setSets(initial());
            setSelected({ data: null, power: null });
          }}
        >
          Discard changes
        </Button>
        <Button
          variant="primary"
          disabled={anyProblems || !unsaved}
          loading={save.isPending}
          onClick={() => void submit().catch(() => undefined)}
        >
          Save runs
        </Button>
      </div>
    </div>
  );
}
