import type { RunKind } from '@shared/schemas/wall-plan';
import clsx from 'clsx';
import { ArrowLeft, Printer } from 'lucide-react';
import { useMemo, useState } from 'react';
import { Button, ButtonLink } from '@/components/ui/button';
import { Logo } from '@/components/ui/logo';
import { WallMap, WallViewToggle } from '@/components/wall-map/wall-map';
import { paths } from '@/config/paths';
import { continuousLoadNote } from '@shared/calc/electrical';
import { cautions } from '@/features/planner/components/plan-cautions';
import { RunArrows } from '@/features/planner/components/run-arrows';
import { loadText } from '@/features/planner/components/run-legend';
import { runTotals } from '@/features/planner/components/runs-panel';
import { runColour } from '@/features/planner/utils/run-colours';
import { num, sizeImperial, sizeMetric } from '@/features/planner/utils/format';
import { runPatternLabels } from '@/features/planner/utils/planner-form';
import { kindLabels, limitsOfWall, pathText, runSetOfWall, settingsOfWall } from '@/features/planner/utils/wall-runs';
import { formatDate } from '@/lib/format';
import type { WallDetail } from '@shared/schemas/walls';

const mountingLabels: Record<string, string> = {
  ground_stacked: 'Ground-stacked',
  flown: 'Flown',
  wall_fixed: 'Wall-fixed',
  curved: 'Curved',
};

/**
 * The runs as a sheet for the crew: on screen a preview with a print button; on paper the map
 * with large numbered arrows and a table of each run's cells in order, per kind on its own page,
 * with totals and the cautions. Printed outside the app's shell, so no navigation shows.
 */
export function RunsSheet({ wall }: { wall: WallDetail }) {
  const [view, setView] = useState<'front' | 'rear'>('front');
  const { settings, stored: settingsStored } = useMemo(() => settingsOfWall(wall), [wall]);
  const model = wall.cabinetModel;
  const sets = useMemo(
    () => ({ data: runSetOfWall(wall, 'data', settings), power: runSetOfWall(wall, 'power', settings) }),
    [wall, settings],
  );
  const widthMm = wall.columns * model.widthMm;
  const heightMm = wall.rows * model.heightMm;

  return (
    <div className="min-h-dvh bg-white text-stone-900 [-webkit-print-color-adjust:exact] [print-color-adjust:exact]">
      <style>{'@page { size: landscape; margin: 12mm; }'}</style>
      <div className="sticky top-0 z-10 border-b border-stone-200 bg-stone-50/95 backdrop-blur print:hidden">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-3 px-4 py-3">
          <ButtonLink to={paths.wallRuns.getHref(wall.id)} variant="ghost" icon={<ArrowLeft className="h-4 w-4" aria-hidden="true" />}>
            Back to the runs
          </ButtonLink>
          <div className="flex flex-wrap items-center gap-3">
            <WallViewToggle view={view} onChange={setView} />
            <Button variant="primary" icon={<Printer className="h-4 w-4" aria-hidden="true" />} onClick={() => window.print()}>
              Print
            </Button>
          </div>
        </div>
      </div>

      <main className="mx-auto max-w-6xl space-y-8 px-4 py-6 print:max-w-none print:space-y-0 print:p-0">
        <header className="flex flex-wrap items-start justify-between gap-4 border-b-2 border-ink-900 pb-3">
          <div className="space-y-1">
            <p className="text-sm font-semibold uppercase tracking-wide text-ink-600">Power and data runs for the crew</p>
            <h1 className="text-2xl font-semibold">{wall.name}</h1>
            <p className="text-base text-stone-700">
              {wall.clientName} · {wall.siteName}
            </p>
          </div>
          <div className="text-right">
            <Logo tone="dark" className="justify-end" />
            <p className="mt-1 text-sm text-stone-600">Printed {formatDate(new Date().toISOString())}</p>
          </div>
          <dl className="grid w-full grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-4">
            <div>
              <dt className="text-stone-600">Cabinet model</dt>
              <dd className="font-medium">{model.name}</dd>
            </div>
            <div>
              <dt className="text-stone-600">Grid</dt>
              <dd className="font-medium">
                {wall.columns} × {wall.rows} ({num(wall.columns * wall.rows)} cabinets), {mountingLabels[wall.mounting] ?? wall.mounting}
              </dd>
            </div>
            <div>
              <dt className="text-stone-600">Size</dt>
              <dd className="font-medium">
                {sizeMetric(widthMm, heightMm)} · {sizeImperial(widthMm, heightMm)}
              </dd>
            </div>
            <div>
              <dt className="text-stone-600">Planned for</dt>
              <dd className="font-medium">
                {num(settings.outputCapacityPixels)} px per output, {num(limitsOfWall(wall, 'power', settings).chainCapacityW)} W per chain
                {settingsStored ? '' : ' (defaults)'}
              </dd>
            </div>
          </dl>
        </header>

        {(['data', 'power'] as RunKind[]).map((kind, i) => {
          const set = sets[kind];
          const limits = limitsOfWall(wall, kind, settings);
          return (
            <section
              key={kind}
              className={clsx('space-y-3 print:pt-4', i > 0 && 'print:break-before-page')}
              aria-labelledby={`sheet-${kind}`}
            >
              <div className="flex flex-wrap items-baseline justify-between gap-2">
                <h2 id={`sheet-${kind}`} className="text-xl font-semibold">
                  {kindLabels[kind].title}
                  <span className="ml-2 text-base font-normal text-stone-600">
                    {set.pattern === 'custom' ? 'laid by hand' : `by ${runPatternLabels[set.pattern].toLowerCase()}`}
                  </span>
                </h2>
                {set.stored ? null : (
                  <span className="rounded border border-amber-500 px-2 py-0.5 text-sm font-semibold text-amber-800">
                    Proposal — not saved
                  </span>
                )}
              </div>
              <p className="text-base font-medium" data-testid={`sheet-${kind}-totals`}>
                {runTotals(set.runs, limits)}
              </p>
              <div className="print:break-inside-avoid print:[&_[aria-label=Zoom]]:hidden print:[&_p.text-xs]:hidden">
                <WallMap
                  columns={wall.columns}
                  rows={wall.rows}
                  view={view}
                  cellAspect={model.heightMm / model.widthMm}
                  showLegend={false}
                  ariaLabel={`${kindLabels[kind].title} of ${wall.name}`}
                  overlay={(g) => <RunArrows geometry={g} runs={set.runs} large />}
                />
              </div>
              <table className="w-full border-collapse text-sm">
                <thead>
                  <tr className="border-b-2 border-stone-400 text-left">
                    <th scope="col" className="w-28 py-1.5 pr-3 sm:w-20">
                      Run
                    </th>
                    <th scope="col" className="hidden w-24 py-1.5 pr-3 text-right sm:table-cell">
                      Cabinets
                    </th>
                    <th scope="col" className="hidden w-48 py-1.5 pr-3 text-right sm:table-cell">
                      {kind === 'data' ? 'Pixels' : 'Watts'} of limit
                    </th>
                    <th scope="col" className="py-1.5">
                      Cells in order (from the controller or feed)
                    </th>
                  </tr>
                </thead>
                <tbody>
                  {set.runs.map((run, position) => (
                    <tr key={`${position}-${run.index}`} className="border-b border-stone-200 align-top print:break-inside-avoid">
                      <td className="py-1.5 pr-3">
                        <span className="flex items-center gap-2 font-semibold">
                          <span className={clsx('inline-block h-3 w-3 rounded-full', runColour(position).swatch)} aria-hidden="true" />
                          {run.index}
                        </span>
                        <span className="mt-0.5 block text-xs text-stone-600 sm:hidden">
                          {run.cells.length} cab.
                          <br />
                          {loadText(run.cells.length, limits).text}
                        </span>
                      </td>
                      <td className="hidden py-1.5 pr-3 text-right tabular-nums sm:table-cell">{run.cells.length}</td>
                      <td className="hidden py-1.5 pr-3 text-right tabular-nums sm:table-cell">
                        {loadText(run.cells.length, limits).text}
                      </td>
                      <td className="py-1.5 leading-relaxed">{pathText(run)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </section>
          );
        })}

        <section className="space-y-1.5 border-t-2 border-ink-900 pt-3 text-sm print:mt-4 print:break-inside-avoid" aria-label="Cautions">
          <p>
            <span className="font-semibold">Power: </span>
            {cautions.power} {continuousLoadNote(settings.supply)}
          </p>
          <p>
            <span className="font-semibold">Structure: </span>
            {cautions.structure}
          </p>
          <p>
            <span className="font-semibold">Service: </span>
            {cautions.service}
          </p>
        </section>
      </main>
    </div>
  );
}
