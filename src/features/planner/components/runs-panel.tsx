import { runPatterns, type Run, type RunLimits, type RunPattern } from '@shared/calc/runs';
import type { RunKind } from '@shared/schemas/wall-plan';
import { useState, type ReactNode } from 'react';
import { WallMap, WallViewToggle, type GridPosition } from '@/components/wall-map/wall-map';
import { ChoiceGroup } from '@/features/planner/components/choice-group';
import { RunArrows } from '@/features/planner/components/run-arrows';
import { RunLegend } from '@/features/planner/components/run-legend';
import { num } from '@/features/planner/utils/format';
import { runPatternLabels } from '@/features/planner/utils/planner-form';
import { kindLabels } from '@/features/planner/utils/wall-runs';

export const kindChoices = [
  { value: 'data', label: 'Data runs' },
  { value: 'power', label: 'Power runs' },
] as const;

/** "6 runs · 72 cabinets · 2,654,208 px, at most 650,000 px per output" */
export function runTotals(runs: Run[], limits: RunLimits): string {
  const cabinets = runs.reduce((n, r) => n + r.cells.length, 0);
  const head = `${num(runs.length)} ${runs.length === 1 ? 'run' : 'runs'} · ${num(cabinets)} cabinets`;
  return limits.kind === 'data'
    ? `${head} · ${num(cabinets * limits.cabinetPixels)} px in all, at most ${num(limits.outputCapacityPixels)} px per output`
    : `${head} · ${num(cabinets * limits.cabinetMaxPowerW)} W in all, at most ${num(limits.chainCapacityW)} W per chain`;
}

interface RunsMapProps {
  kind: RunKind;
  columns: number;
  rows: number;
  cellAspect: number;
  runs: Run[];
  limits: RunLimits;
  selected?: number | null;
  onSelect?: (position: number) => void;
  onCellActivate?: (p: GridPosition) => void;
  selectedCells?: GridPosition[];
  /** Controls above the map (pattern, editing tools). */
  toolbar?: ReactNode;
}

/** A wall map with the runs of one kind as numbered arrows, its view toggle and the per-run legend. */
export function RunsMap({
  kind,
  columns,
  rows,
  cellAspect,
  runs,
  limits,
  selected = null,
  onSelect,
  onCellActivate,
  selectedCells,
  toolbar,
}: RunsMapProps) {
  const [view, setView] = useState<'front' | 'rear'>('front');
  const label = kindLabels[kind];
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        {toolbar ?? <span />}
        <WallViewToggle view={view} onChange={setView} />
      </div>
      <WallMap
        columns={columns}
        rows={rows}
        view={view}
        cellAspect={cellAspect}
        showLegend={false}
        ariaLabel={`${label.title} over the wall map, ${columns} × ${rows}`}
        onCellActivate={onCellActivate}
        selected={selectedCells}
        overlay={(g) => <RunArrows geometry={g} runs={runs} highlight={selected} />}
      />
      <p className="text-sm font-medium text-stone-700" data-testid={`${kind}-run-totals`}>
        {runTotals(runs, limits)}
      </p>
      <RunLegend
        runs={runs}
        limits={limits}
        selected={selected}
        onSelect={onSelect}
        label={`${label.title}: load of each run against its limit`}
      />
    </div>
  );
}

interface PlannerRunsProps {
  columns: number;
  rows: number;
  cellAspect: number;
  patterns: Record<RunKind, RunPattern>;
  onPatternChange: (kind: RunKind, pattern: RunPattern) => void;
  runs: Record<RunKind, Run[]>;
  limits: Record<RunKind, RunLimits>;
}

/** The planner's runs: data or power, by rows, columns or serpentine, drawn over the wall map. */
export function PlannerRuns({ columns, rows, cellAspect, patterns, onPatternChange, runs, limits }: PlannerRunsProps) {
  const [kind, setKind] = useState<RunKind>('data');
  return (
    <div className="space-y-4">
      <ChoiceGroup legend="Show" hideLegend value={kind} onChange={setKind} choices={kindChoices} />
      <RunsMap
        kind={kind}
        columns={columns}
        rows={rows}
        cellAspect={cellAspect}
        runs={runs[kind]}
        limits={limits[kind]}
        toolbar={
          <ChoiceGroup
            legend={`Lay the ${kind} runs by`}
            size="sm"
            value={patterns[kind]}
            onChange={(p) => onPatternChange(kind, p)}
            choices={runPatterns.map((p) => ({ value: p, label: runPatternLabels[p] }))}
          />
        }
      />
    </div>
  );
}
