import type { Run } from '@shared/calc/runs';
import type { PlanSettings, StoredRunPattern } from '@shared/schemas/wall-plan';
import { wallInput } from '@shared/schemas/walls';
import { ArrowRight, Cable } from 'lucide-react';
import { useState } from 'react';
import type { UseFormReturn } from 'react-hook-form';
import { z } from 'zod';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { DialogActions } from '@/components/ui/dialog';
import { Form, SubmitButton } from '@/components/ui/form';
import { SelectField, type SelectOption } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useCreateWallFromPlan } from '@/features/planner/api/mutations';
import { useQuery } from '@tanstack/react-query';
import { clientQueries } from '@/resources/clients';
import { siteQueries } from '@/resources/sites';
import type { WallDetail } from '@shared/schemas/walls';

const choice = (what: string) => z.string({ error: `Choose the ${what}.` }).min(1, `Choose the ${what}.`);

/** Where the new wall goes and what it is called; the model, grid, settings and runs come from the plan. */
export const newWallSchema = z.object({
  clientId: choice('client'),
  siteId: choice('site').pipe(wallInput.shape.siteId),
  name: wallInput.shape.name,
  mounting: wallInput.shape.mounting,
});
export type NewWallForm = UseFormReturn<z.input<typeof newWallSchema>, unknown, z.output<typeof newWallSchema>>;

export const newWallDefaults: z.input<typeof newWallSchema> = { clientId: '', siteId: '', name: '', mounting: 'wall_fixed' };

export interface PlanToSave {
  model: { id: string; name: string };
  columns: number;
  rows: number;
  settings: PlanSettings;
  dataRuns: { pattern: StoredRunPattern; runs: Run[] };
  powerRuns: { pattern: StoredRunPattern; runs: Run[] };
}

const bare = (runs: Run[]) => runs.map((r) => ({ index: r.index, cells: r.cells.map((c) => ({ column: c.column, row: c.row })) }));

interface NewWallFromPlanProps {
  /** Held by the dialog, so what was typed survives closing and opening it again. */
  form: NewWallForm;
  plan: PlanToSave;
  mountingOptions: readonly SelectOption[];
  onCancel: () => void;
}

/**
 * A new wall from the plan, in one request: the client and site it stands at and its name; the
 * catalogue model and grid are the plan's, and the plan's settings and runs are stored on it.
 */
export function NewWallFromPlan({ form, plan, mountingOptions, onCancel }: NewWallFromPlanProps) {
  const create = useCreateWallFromPlan();
  const toast = useToast();
  const [created, setCreated] = useState<WallDetail | null>(null);
  const clientId = form.watch('clientId');
  const clients = useQuery(clientQueries.options());
  const sites = useQuery({ ...siteQueries.options({ clientId }), enabled: Boolean(clientId) });

  if (created) {
    return (
      <div className="space-y-4">
        <Alert tone="success" title={`${created.name} is added`}>
          {created.columns} × {created.rows} cabinets of {created.cabinetModel.name} at {created.siteName}, with the plan's supply,
          capacities and data and power runs.
        </Alert>
        <div className="flex flex-wrap gap-2">
          <ButtonLink to={paths.wall.getHref(created.id)} variant="primary" icon={<ArrowRight className="h-4 w-4" aria-hidden="true" />}>
            Open {created.name}
          </ButtonLink>
          <ButtonLink to={paths.wallRuns.getHref(created.id)} icon={<Cable className="h-4 w-4" aria-hidden="true" />}>
            Its runs
          </ButtonLink>
        </div>
        <DialogActions>
          <Button onClick={onCancel}>Close</Button>
        </DialogActions>
      </div>
    );
  }

  return (
    <Form
      form={form}
      aria-label="A new wall from the plan"
      onSubmit={async ({ siteId, name, mounting }) => {
        const wall = await create.mutateAsync({
          siteId,
          name,
          mounting,
          cabinetModelId: plan.model.id,
          columns: plan.columns,
          rows: plan.rows,
          settings: plan.settings,
          dataRuns: { pattern: plan.dataRuns.pattern, runs: bare(plan.dataRuns.runs) },
          powerRuns: { pattern: plan.powerRuns.pattern, runs: bare(plan.powerRuns.runs) },
        });
        setCreated(wall);
        form.reset(newWallDefaults);
        toast(`${wall.name} is added with the plan.`);
      }}
    >
      <p className="rounded bg-ink-50 px-3 py-2 text-sm text-ink-900" data-testid="new-wall-plan">
        {plan.columns} × {plan.rows} cabinets of <span className="font-medium">{plan.model.name}</span>, with the plan's supply, capacities
        and runs.
      </p>
      <SelectField
        name="clientId"
        label="Client"
        placeholder={clients.isPending ? 'Loading clients…' : 'Choose the client…'}
        options={(clients.data ?? []).map((c) => ({ value: c.id, label: c.name }))}
        registerOptions={{ onChange: () => form.setValue('siteId', '') }}
        hint={clients.isError ? 'The clients could not be loaded; close and try again.' : undefined}
      />
      <SelectField
        name="siteId"
        label="Site"
        placeholder={!clientId ? 'Choose the client first' : sites.isPending ? 'Loading sites…' : 'Choose the site…'}
        options={clientId ? (sites.data?.items ?? []).map((s) => ({ value: s.id, label: s.name })) : []}
        disabled={!clientId}
        hint={clientId && sites.data?.items.length === 0 ? 'This client has no site yet: add one on the client’s page first.' : undefined}
      />
      <TextField name="name" label="Wall name" autoComplete="off" hint="As people on site call it, e.g. Main hall centre wall." />
      <SelectField name="mounting" label="Mounting" options={mountingOptions} />
      <DialogActions>
        <Button onClick={onCancel}>Cancel</Button>
        <SubmitButton>Create the wall</SubmitButton>
      </DialogActions>
    </Form>
  );
}
