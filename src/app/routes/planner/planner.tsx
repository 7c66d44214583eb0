import { Save } from 'lucide-react';
import { useMemo, useState } from 'react';
import { useWatch } from 'react-hook-form';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Form, useZodForm } from '@/components/ui/form';
import { PageHeader } from '@/components/ui/page-header';
import { PlanFigures } from '@/features/planner/components/plan-figures';
import { PlanNeeds } from '@/features/planner/components/plan-needs';
import { CabinetInputs, GridInputs, SupplyInputs } from '@/features/planner/components/planner-inputs';
import { PlannerRuns } from '@/features/planner/components/runs-panel';
import { SavePlanDialog } from '@/features/planner/components/save-plan-dialog';
import { planResult } from '@/features/planner/utils/plan-result';
import {
  defaultPlannerValues,
  inputOf,
  plannerFormSchema,
  valuesFromWall,
  type PlannerFormInput,
} from '@/features/planner/utils/planner-form';
import { num } from '@/features/planner/utils/format';
import { mountingOptions } from '@/features/walls/components/wall-labels';
import { requireUser, staff } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { isOffice, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { useQuery } from '@tanstack/react-query';
import { cabinetModelQueries } from '@/resources/cabinet-models';
import { wallQueries } from '@/resources/walls';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

const wallParam = (url: string) => {
  const id = new URL(url).searchParams.get('wall');
  return id && /^[0-9a-f-]{36}$/i.test(id) ? id : null;
};

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request, staff);
  const wallId = wallParam(request.url);
  // Warm the cache; a failure shows on the page (custom cabinets still work) rather than instead of it.
  await Promise.all([
    queryClient.ensureQueryData(cabinetModelQueries.list()).catch(() => undefined),
    wallId ? queryClient.ensureQueryData(wallQueries.detail(wallId)).catch(() => undefined) : undefined,
  ]);
  return null;
}

export function Component() {
  useDocumentTitle('Planner');
  const user = useUser();
  const [params] = useSearchParams();
  const models = useQuery(cabinetModelQueries.list());
  const wallId = params.get('wall');
  const startWall = wallId ? queryClient.getQueryData(wallQueries.detail(wallId).queryKey) : undefined;
  const [defaultValues] = useState<PlannerFormInput>(() => (startWall ? valuesFromWall(startWall) : defaultPlannerValues));
  const form = useZodForm(plannerFormSchema, { mode: 'onChange', defaultValues });
  const values = useWatch({ control: form.control });
  const parsed = useMemo(() => plannerFormSchema.safeParse(values), [values]);
  const [saving, setSaving] = useState(false);

  const result = useMemo(() => (parsed.success ? planResult(parsed.data) : null), [parsed]);

  const modelList = models.data?.items ?? [];
  const model = result ? modelList.find((m) => m.id === result.v.modelId) : undefined;

  return (
    <>
      <PageHeader
        title="Planner"
        description="A wall from a cabinet model and a grid: size, pixels, power, heat, weight, outputs and runs. The figures follow as you type."
        actions={
          isOffice(user) ? (
            <Button
              variant="primary"
              icon={<Save className="h-4 w-4" aria-hidden="true" />}
              onClick={() => setSaving(true)}
              disabled={!result}
            >
              Save onto a wall…
            </Button>
          ) : null
        }
      />
      <div className="grid items-start gap-6 xl:grid-cols-[minmax(0,25rem)_minmax(0,1fr)]">
        <Form form={form} onSubmit={() => undefined} aria-label="Wall plan inputs">
          {models.isError ? <Alert tone="danger">The catalogue could not be loaded; a custom cabinet still works.</Alert> : null}
          <CabinetInputs models={modelList} />
          <GridInputs />
          <SupplyInputs />
        </Form>

        <div className="min-w-0 space-y-6">
          <Card
            title="Wall plan"
            description={
              result
                ? `${num(result.v.columns)} × ${num(result.v.rows)} of ${model ? model.name : 'a custom cabinet'}`
                : 'Fix the figures below to see the plan.'
            }
          >
            {result ? (
              <PlanFigures
                plan={result.plan}
                columns={result.v.columns}
                rows={result.v.rows}
                supply={result.settings.supply}
                outputCapacityPixels={result.settings.outputCapacityPixels}
                cardsPerCabinet={result.v.cardsPerCabinet}
                input={inputOf(result.v)}
              />
            ) : (
              <PlanNeeds issues={parsed.error?.issues ?? []} />
            )}
          </Card>

          {result ? (
            <Card
              title="Runs"
              description="Numbered arrows in the order the cable links the cabinets, from the disc with the run's number."
            >
              <PlannerRuns
                columns={result.v.columns}
                rows={result.v.rows}
                cellAspect={result.v.cabinet.heightMm / result.v.cabinet.widthMm}
                patterns={result.patterns}
                onPatternChange={(kind, pattern) =>
                  form.setValue(kind === 'data' ? 'dataPattern' : 'powerPattern', pattern, { shouldValidate: true })
                }
                runs={result.runs}
                limits={result.limits}
              />
            </Card>
          ) : null}
        </div>
      </div>

      {result && isOffice(user) ? (
        <SavePlanDialog
          open={saving}
          onClose={() => setSaving(false)}
          model={model ? { id: model.id, name: model.name } : null}
          columns={result.v.columns}
          rows={result.v.rows}
          settings={result.settings}
          dataRuns={{ pattern: result.patterns.data, runs: result.runs.data }}
          powerRuns={{ pattern: result.patterns.power, runs: result.runs.power }}
          startWallId={startWall ? startWall.id : null}
          mountingOptions={mountingOptions}
          onUseGrid={(columns, rows) => {
            form.setValue('gridMode', 'grid');
            form.setValue('columns', columns, { shouldValidate: true });
            form.setValue('rows', rows, { shouldValidate: true });
          }}
        />
      ) : null}
    </>
  );
}
