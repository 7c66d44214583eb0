import { cabinetsPerRun, generateRuns, runPatterns, type Run, type RunPattern } from '@shared/calc/runs';
import { planWall } from '@shared/calc/wall-plan';
import { runLimitsFor, type PlanSettings, type RunKind } from '@shared/schemas/wall-plan';
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
import { cabinetFromModel, CabinetInputs, GridInputs, SupplyInputs } from '@/features/planner/components/planner-inputs';
import { PlannerRuns } from '@/features/planner/components/runs-panel';
import { SavePlanDialog } from '@/features/planner/components/save-plan-dialog';
import {
  cabinetOf,
  defaultPlannerValues,
  inputOf,
  patternsOf,
  planInputOf,
  plannerFormSchema,
  type PlannerFormInput,
} from '@/features/planner/utils/planner-form';
import { num } from '@/features/planner/utils/format';
import { requireUser, staff } from '@/app/auth-guard';
import { queryClient } from '@/lib/query-client';
import { isOffice, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { useQuery } from '@tanstack/react-query';
import type { WallDetail } from '@shared/schemas/walls';
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

const patternOf = (stored: { pattern: string } | null, fallback: RunPattern): RunPattern =>
  stored && (runPatterns as readonly string[]).includes(stored.pattern) ? (stored.pattern as RunPattern) : fallback;

/** The form filled in from a wall of the register: its model, grid, stored settings and run patterns. */
function valuesFromWall(wall: WallDetail): PlannerFormInput {
  const settings = wall.planSettings;
  const controller = wall.controllers[0];
  return {
    ...defaultPlannerValues,
    modelId: wall.cabinetModel.id,
    cabinet: cabinetFromModel(wall.cabinetModel),
    columns: wall.columns,
    rows: wall.rows,
    ...(settings
      ? {
          supply: { ...settings.supply, powerFactor: settings.supply.powerFactor ?? Number.NaN },
          outputCapacityPixels: settings.outputCapacityPixels,
        }
      : controller
        ? { outputCapacityPixels: controller.pixelsPerOutput }
        : {}),
    processorOutputs: controller?.outputs ?? Number.NaN,
    dataPattern: patternOf(wall.dataRuns, defaultPlannerValues.dataPattern as RunPattern),
    powerPattern: patternOf(wall.powerRuns, defaultPlannerValues.powerPattern as RunPattern),
  };
}

const fieldNames: Record<string, string> = {
  cabinet: 'Cabinet',
  columns: 'Columns',
  rows: 'Rows',
  target: 'Target size',
  supply: 'Supply',
  outputCapacityPixels: 'Output capacity',
  input: 'Input',
  processorOutputs: 'Processor outputs',
  dataCableToWallM: 'Data cable',
  cardsPerCabinet: 'Receiving cards',
};

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

  const result = useMemo(() => {
    if (!parsed.success) return null;
    const v = parsed.data;
    const input = planInputOf(v);
    const plan = planWall(input);
    const patterns = patternsOf(v);
    // The chain's limit as the plan worked it out: circuit, connector and maker's count.
    const settings: PlanSettings = { supply: input.supply, outputCapacityPixels: input.outputCapacityPixels, chainCapacityW: plan.chainLimitW };
    const cabinet = cabinetOf(v);
    const limits = { data: runLimitsFor('data', cabinet, settings), power: runLimitsFor('power', cabinet, settings) };
    // The schema refuses a cabinet over either limit, so every run holds at least one cabinet.
    const runs: Record<RunKind, Run[]> = {
      data: cabinetsPerRun(limits.data) >= 1 ? generateRuns(v.columns, v.rows, patterns.data, limits.data) : [],
      power: cabinetsPerRun(limits.power) >= 1 ? generateRuns(v.columns, v.rows, patterns.power, limits.power) : [],
    };
    return { v, plan, patterns, settings, limits, runs };
  }, [parsed]);

  const modelList = models.data?.items ?? [];
  const model = result ? modelList.find((m) => m.id === result.v.modelId) : undefined;

  return (
    <>
      <PageHeader
        title="Planner"
        description="A wall from a cabinet model and a grid: size, pixels, power, heat, weight, outputs and runs. The figures follow as you type."
        actions={
          isOffice(user) ? (
            <Button variant="primary" icon={<Save className="h-4 w-4" aria-hidden="true" />} onClick={() => setSaving(true)} disabled={!result}>
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
              <Alert tone="info" title="The plan needs:" live={false}>
                <ul className="list-disc space-y-0.5 pl-5">
                  {(parsed.error?.issues ?? []).slice(0, 8).map((issue, i) => (
                    <li key={i}>
                      {fieldNames[String(issue.path[0])] ?? 'A field'}: {issue.message}
                    </li>
                  ))}
                </ul>
              </Alert>
            )}
          </Card>

          {result ? (
            <Card title="Runs" description="Numbered arrows in the order the cable links the cabinets, from the disc with the run's number.">
              <PlannerRuns
                columns={result.v.columns}
                rows={result.v.rows}
                cellAspect={result.v.cabinet.heightMm / result.v.cabinet.widthMm}
                patterns={result.patterns}
                onPatternChange={(kind, pattern) => form.setValue(kind === 'data' ? 'dataPattern' : 'powerPattern', pattern, { shouldValidate: true })}
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
