// The runs page's editing state: the wall's runs of each kind (stored or proposed), the selected
// run, the live check against the same rules the server applies, and saving.
import { validateRuns, type Run, type RunPattern } from '@shared/calc/runs';
import type { Cell } from '@shared/calc/grid';
import type { RunKind } from '@shared/schemas/wall-plan';
import type { WallDetail } from '@shared/schemas/walls';
import { useMemo, useState } from 'react';
import { useToast } from '@/components/ui/toast';
import { useSaveWallPlan } from '@/features/planner/api/mutations';
import { toggleCell } from '@/features/planner/utils/run-edit';
import { limitsOfWall, proposeRuns, runSetOfWall, settingsOfWall, withLoads, type RunSet } from '@/features/planner/utils/wall-runs';

export interface EditableSet extends RunSet {
  edited: boolean;
}

export function useRunsEditor(wall: WallDetail) {
  const { settings: storedSettings, stored: settingsStored } = useMemo(() => settingsOfWall(wall), [wall]);
  const limits = useMemo(
    () => ({ data: limitsOfWall(wall, 'data', storedSettings), power: limitsOfWall(wall, 'power', storedSettings) }),
    [wall, storedSettings],
  );
  // A chain never carries more than its circuit, connector and maker allow, whatever was stored.
  const settings = { ...storedSettings, chainCapacityW: limits.power.chainCapacityW };
  const tightened = storedSettings.chainCapacityW > settings.chainCapacityW * (1 + 1e-9);
  const initial = () => ({
    data: { ...runSetOfWall(wall, 'data', settings), edited: false },
    power: { ...runSetOfWall(wall, 'power', settings), edited: false },
  });
  const [sets, setSets] = useState<Record<RunKind, EditableSet>>(initial);
  const [kind, setKind] = useState<RunKind>('data');
  const [selected, setSelected] = useState<Record<RunKind, number | null>>({ data: null, power: null });
  const [editing, setEditing] = useState(false);
  const [pendingPattern, setPendingPattern] = useState<RunPattern | null>(null);
  const save = useSaveWallPlan();
  const toast = useToast();

  const set = sets[kind];
  const position = selected[kind];
  const selectedRun = position !== null ? set.runs[position] : undefined;
  const runs = useMemo(() => withLoads(set.runs, limits[kind]), [set.runs, limits, kind]);
  const problems = useMemo(
    () => ({
      data: validateRuns(wall.columns, wall.rows, sets.data.runs, limits.data),
      power: validateRuns(wall.columns, wall.rows, sets.power.runs, limits.power),
    }),
    [sets, wall.columns, wall.rows, limits],
  );
  const unsaved = sets.data.edited || sets.power.edited || !sets.data.stored || !sets.power.stored;
  const anyProblems = problems.data.length + problems.power.length > 0;

  const update = (next: Run[], keepPattern = false) =>
    setSets((s) => ({ ...s, [kind]: { ...s[kind], runs: next, edited: true, pattern: keepPattern ? s[kind].pattern : 'custom' } }));
  const select = (p: number | null) => setSelected((s) => ({ ...s, [kind]: p }));

  const applyPattern = (pattern: RunPattern) => {
    setSets((s) => ({
      ...s,
      [kind]: { ...s[kind], pattern, runs: proposeRuns(wall.columns, wall.rows, pattern, limits[kind]), edited: true },
    }));
    select(null);
  };

  const onCell = (cell: Cell) => {
    if (!editing) {
      const holder = set.runs.findIndex((r) => r.cells.some((c) => c.column === cell.column && c.row === cell.row));
      select(holder >= 0 && holder !== position ? holder : null);
      return;
    }
    if (position === null) {
      const holder = set.runs.findIndex((r) => r.cells.some((c) => c.column === cell.column && c.row === cell.row));
      if (holder >= 0) select(holder);
      return;
    }
    update(toggleCell(set.runs, position, cell));
  };

  const submit = async () => {
    const body = (k: RunKind) => ({
      pattern: sets[k].pattern,
      runs: sets[k].runs.map((r) => ({ index: r.index, cells: r.cells.map((c) => ({ column: c.column, row: c.row })) })),
    });
    await save.mutateAsync({ wallId: wall.id, settings, dataRuns: body('data'), powerRuns: body('power') });
    setSets((s) => ({ data: { ...s.data, stored: true, edited: false }, power: { ...s.power, stored: true, edited: false } }));
    setEditing(false);
    toast('Runs saved.');
  };

  return {
    settings,
    settingsStored,
    tightened,
    storedSettings,
    limits,
    sets,
    setSets,
    initial,
    kind,
    setKind,
    selected,
    setSelected,
    editing,
    setEditing,
    pendingPattern,
    setPendingPattern,
    save,
    set,
    position,
    selectedRun,
    runs,
    problems,
    unsaved,
    anyProblems,
    update,
    select,
    applyPattern,
    onCell,
    submit,
  };
}
