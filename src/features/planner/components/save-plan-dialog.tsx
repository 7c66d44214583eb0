import type { Run } from '@shared/calc/runs';
import type { PlanSettings, StoredRunPattern } from '@shared/schemas/wall-plan';
import { ArrowRight } from 'lucide-react';
import { useId, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { SelectBox, type SelectOption } from '@/components/ui/select-field';
import { Spinner } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { wallQueries } from '@/resources/walls';
import { useQuery } from '@tanstack/react-query';
import { useSaveWallPlan } from '@/features/planner/api/mutations';
import { ChoiceGroup } from '@/features/planner/components/choice-group';
import { NewWallFromPlan, newWallDefaults, newWallSchema } from '@/features/planner/components/new-wall-from-plan';
import { useZodForm } from '@/components/ui/form';
import { errorMessage } from '@/lib/errors';
import type { WallSummary } from '@shared/schemas/walls';

interface SavePlanDialogProps {
  open: boolean;
  onClose: () => void;
  /** The catalogue model of the plan, or null for a cabinet typed in by hand. */
  model: { id: string; name: string } | null;
  columns: number;
  rows: number;
  settings: PlanSettings;
  dataRuns: { pattern: StoredRunPattern; runs: Run[] };
  powerRuns: { pattern: StoredRunPattern; runs: Run[] };
  /** Switch the plan to a wall's grid (the runs follow). */
  onUseGrid: (columns: number, rows: number) => void;
  /** The wall the planner was opened from: saving onto it is offered first. */
  startWallId?: string | null;
  /** The mountings a new wall may have. */
  mountingOptions: readonly SelectOption[];
}

type Target = 'new' | 'existing';
const targets = [
  { value: 'new', label: 'A new wall' },
  { value: 'existing', label: 'An existing wall' },
] as const;

const choiceLabel = (w: WallSummary) => `${w.clientName} · ${w.siteName} · ${w.name} (${w.columns} × ${w.rows})`;
const bare = (runs: Run[]) => runs.map((r) => ({ index: r.index, cells: r.cells.map((c) => ({ column: c.column, row: c.row })) }));

/**
 * Stores the plan's settings and runs on a new wall (the plan's model and grid, at a site the
 * office picks) or on an existing wall of the same cabinet model. The runs must match an existing
 * wall's grid, so a wall of another size offers to switch the plan to its grid first.
 */
export function SavePlanDialog({
  open,
  onClose,
  model,
  columns,
  rows,
  settings,
  dataRuns,
  powerRuns,
  onUseGrid,
  startWallId,
  mountingOptions,
}: SavePlanDialogProps) {
  const selectId = useId();
  const [target, setTarget] = useState<Target>(startWallId ? 'existing' : 'new');
  const [wallId, setWallId] = useState(startWallId ?? '');
  const newWallForm = useZodForm(newWallSchema, { defaultValues: newWallDefaults });
  const [saved, setSaved] = useState<WallSummary | null>(null);
  // Walls built from the plan's cabinet model, by name.
  const walls = useQuery({
    ...wallQueries.page({ cabinetModelId: model?.id, sort: 'name' }),
    enabled: open && Boolean(model) && target === 'existing',
  });
  const save = useSaveWallPlan();
  const toast = useToast();
  const wall = walls.data?.items.find((w) => w.id === wallId) ?? null;
  const gridMatches = wall ? wall.columns === columns && wall.rows === rows : false;

  const close = () => {
    setSaved(null);
    save.reset();
    onClose();
  };

  const submit = async () => {
    if (!wall) return;
    await save.mutateAsync({
      wallId: wall.id,
      settings,
      dataRuns: { pattern: dataRuns.pattern, runs: bare(dataRuns.runs) },
      powerRuns: { pattern: powerRuns.pattern, runs: bare(powerRuns.runs) },
    });
    setSaved(wall);
    toast(`Plan saved onto ${wall.name}.`);
  };

  let body;
  if (!model) {
    body = (
      <Alert tone="info" title="Choose the cabinet model from the catalogue">
        A plan is saved onto a wall built from a catalogue model. A cabinet typed in by hand makes no wall and matches none.
      </Alert>
    );
  } else if (target === 'new') {
    body = (
      <NewWallFromPlan
        form={newWallForm}
        plan={{ model, columns, rows, settings, dataRuns, powerRuns }}
        mountingOptions={mountingOptions}
        onCancel={close}
      />
    );
  } else if (saved) {
    body = (
      <div className="space-y-4">
        <Alert tone="success" title="Plan saved">
          The settings and the data and power runs are stored on {saved.name}.
        </Alert>
        <ButtonLink to={paths.wallRuns.getHref(saved.id)} variant="primary" icon={<ArrowRight className="h-4 w-4" aria-hidden="true" />}>
          Open the runs of {saved.name}
        </ButtonLink>
      </div>
    );
  } else if (walls.isPending) {
    body = <Spinner label="Loading walls" />;
  } else if (walls.isError) {
    body = <Alert tone="danger">{errorMessage(walls.error)}</Alert>;
  } else if (!walls.data.items.length) {
    body = <p className="text-base text-stone-700">No wall in the register is built from {model.name}.</p>;
  } else {
    body = (
      <div className="space-y-4">
        <p className="text-base text-stone-700">
          Walls built from <span className="font-medium text-ink-950">{model.name}</span>. Saving replaces the settings and runs stored on
          the wall.
        </p>
        <div className="space-y-1.5">
          <label htmlFor={selectId} className="text-sm font-medium text-stone-800">
            Wall
          </label>
          <SelectBox id={selectId} value={wallId} onChange={(e) => setWallId(e.target.value)}>
            <option value="">Choose a wall…</option>
            {walls.data.items.map((w) => (
              <option key={w.id} value={w.id}>
                {choiceLabel(w)}
              </option>
            ))}
          </SelectBox>
        </div>
        {wall && !gridMatches ? (
          <Alert tone="info" title={`This wall is ${wall.columns} × ${wall.rows}; the plan is ${columns} × ${rows}`}>
            <p>The runs must cover the wall's own grid.</p>
            <Button size="sm" className="mt-2" onClick={() => onUseGrid(wall.columns, wall.rows)}>
              Use the wall's grid ({wall.columns} × {wall.rows})
            </Button>
          </Alert>
        ) : null}
        {save.isError ? <Alert tone="danger">{errorMessage(save.error)}</Alert> : null}
      </div>
    );
  }

  return (
    <Dialog
      open={open}
      onClose={close}
      title="Save onto a wall"
      description="Stores the supply, the capacities and the data and power runs as drawn."
      size="lg"
      footer={
        model && target === 'new' ? undefined : saved || !model ? (
          <Button onClick={close}>Close</Button>
        ) : (
          <>
            <Button onClick={close}>Cancel</Button>
            <Button
              variant="primary"
              onClick={() => void submit().catch(() => undefined)}
              disabled={!wall || !gridMatches}
              loading={save.isPending}
            >
              Save onto wall
            </Button>
          </>
        )
      }
    >
      <div className="space-y-5">
        {model && !saved ? <ChoiceGroup legend="Save the plan onto" value={target} onChange={setTarget} choices={targets} /> : null}
        {body}
      </div>
    </Dialog>
  );
}
