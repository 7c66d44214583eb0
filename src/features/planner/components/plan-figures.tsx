import type { Supply } from '@shared/calc/electrical';
import type { WallPlan } from '@shared/calc/wall-plan';
import type { ReactNode } from 'react';
import { Caution, cautions, PowerCaution } from '@/features/planner/components/plan-cautions';
import { CircuitTable, PlanChecks } from '@/features/planner/components/plan-power';
import {
  amps,
  feetDecimal,
  inches,
  kilograms,
  num,
  pounds,
  sizeImperial,
  sizeMetric,
  squareFeet,
  squareMetres,
  watts,
} from '@/features/planner/utils/format';
import { M2_PER_SQUARE_FOOT } from '@/features/planner/utils/format';

interface PlanFiguresProps {
  plan: WallPlan;
  columns: number;
  rows: number;
  supply: Supply;
  outputCapacityPixels: number;
  cardsPerCabinet: number;
  input: { width: number; height: number };
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="space-y-2" aria-label={title}>
      <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-500">{title}</h3>
      <dl className="divide-y divide-stone-100 rounded border border-stone-200 bg-white">{children}</dl>
    </section>
  );
}

/** One figure: its name, the metric value and the imperial one (or a note) beside it. */
function Figure({ label, metric, imperial, testId }: { label: ReactNode; metric: ReactNode; imperial?: ReactNode; testId?: string }) {
  return (
    <div className="grid grid-cols-1 gap-x-4 gap-y-0.5 px-3 py-2 sm:grid-cols-[minmax(9rem,12rem)_1fr_1fr]" data-figure={testId}>
      <dt className="text-sm text-stone-600">{label}</dt>
      <dd className="font-medium tabular-nums text-ink-950">{metric}</dd>
      <dd className="text-sm tabular-nums text-stone-700 sm:text-base">{imperial}</dd>
    </div>
  );
}

const phaseText = (s: Supply) => `${num(s.voltage)} V ${s.phases === 3 ? 'three-phase' : 'single-phase'}`;
const branchText: Record<WallPlan['branchKind'], string> = {
  'single-phase': 'single-phase',
  'line-to-line': 'line-to-line (two phases)',
  'line-to-neutral': 'line-to-neutral',
};
const limitText: Record<WallPlan['chainLimitedBy'], string> = {
  circuit: 'the circuit',
  connector: "the cabinet's connector",
  maker: "the maker's limit",
};
const pfText: Record<WallPlan['powerFactorSource'], string> = { datasheet: 'from the datasheet', given: 'as given', default: 'assumed' };
const patternText: Record<WallPlan['dataPattern'], string> = { rows: 'whole rows', columns: 'whole columns', serpentine: 'serpentine' };
const barsText: Record<WallPlan['inputFit']['bars'], string> = {
  none: 'fills the wall, no bars',
  'left-right': 'bars left and right',
  'top-bottom': 'bars top and bottom',
};

/** Every figure of the wall plan, metric beside imperial, with the cautions next to them. */
export function PlanFigures({ plan, columns, rows, supply, outputCapacityPixels, cardsPerCabinet, input }: PlanFiguresProps) {
  return (
    <div className="space-y-5">
      <Section title="Wall">
        <Figure
          testId="cabinets"
          label="Cabinets"
          metric={`${num(plan.cabinetCount)} cabinets`}
          imperial={`${num(columns)} columns × ${num(rows)} rows`}
        />
        <Figure
          testId="size"
          label="Size (width × height)"
          metric={sizeMetric(plan.widthMm, plan.heightMm)}
          imperial={sizeImperial(plan.widthMm, plan.heightMm)}
        />
        <Figure label="Area" metric={squareMetres(plan.areaM2)} imperial={squareFeet(plan.areaM2)} />
        <Figure label="Weight (cabinets only)" metric={kilograms(plan.weightKg)} imperial={pounds(plan.weightKg)} />
        <Figure label="Aspect ratio" metric={`${num(plan.aspectRatio, 2, true)} : 1`} imperial={nearestRatio(plan.aspectRatio)} />
      </Section>
      <Caution>{cautions.structure}</Caution>
      <PictureFigures plan={plan} input={input} />
      <SignalFigures plan={plan} outputCapacityPixels={outputCapacityPixels} cardsPerCabinet={cardsPerCabinet} />
      <PowerFigures plan={plan} supply={supply} />
      <CircuitTable plan={plan} />
      <PowerCaution supply={supply} />
      <PlanChecks checks={plan.checks} />
    </div>
  );
}

/** Resolution, pitch, density, viewing distances and how the input lands on the wall. */
function PictureFigures({ plan, input }: Pick<PlanFiguresProps, 'plan' | 'input'>) {
  const fit = plan.inputFit;
  const barPixels =
    fit.bars === 'left-right' ? plan.pixelsWide - fit.scaledWidth : fit.bars === 'top-bottom' ? plan.pixelsHigh - fit.scaledHeight : 0;
  const square = Math.abs(plan.pixelPitchMm - plan.pixelPitchVerticalMm) < 1e-9;
  return (
    <Section title="Picture">
      <Figure
        label="Resolution"
        metric={`${num(plan.pixelsWide)} × ${num(plan.pixelsHigh)} px`}
        imperial={`${num(plan.totalPixels)} pixels`}
      />
      <Figure
        label="Pixel pitch"
        metric={square ? `${num(plan.pixelPitchMm, 3)} mm` : `${num(plan.pixelPitchMm, 3)} × ${num(plan.pixelPitchVerticalMm, 3)} mm`}
        imperial={square ? inches(plan.pixelPitchMm) : `${inches(plan.pixelPitchMm)} across, ${inches(plan.pixelPitchVerticalMm)} down`}
      />
      <Figure
        label="Pixel density"
        metric={`${num(plan.pixelsPerM2)} px/m²`}
        imperial={`${num(plan.pixelsPerM2 * M2_PER_SQUARE_FOOT)} px/ft²`}
      />
      <Figure
        label="Closest viewing distance"
        metric={`${num(plan.minViewingDistanceM, 1, true)} m`}
        imperial={feetDecimal(plan.minViewingDistanceM)}
      />
      <Figure
        label="Pixels no longer seen (20/20 vision)"
        metric={`${num(plan.acuityDistanceM, 1, true)} m`}
        imperial={feetDecimal(plan.acuityDistanceM)}
      />
      <Figure
        label={`Input ${num(input.width)} × ${num(input.height)}`}
        metric={`×${num(fit.scaleX, 3)}${Math.abs(fit.scaleX - fit.scaleY) > 1e-9 ? ` across, ×${num(fit.scaleY, 3)} down` : ''} → ${num(fit.scaledWidth)} × ${num(fit.scaledHeight)} px`}
        imperial={fit.bars === 'none' ? barsText.none : `${barsText[fit.bars]}, ${num(barPixels / 2, 1)} px each`}
      />
    </Section>
  );
}

/** Controller outputs for the chosen pattern, and receiving cards. */
function SignalFigures({
  plan,
  outputCapacityPixels,
  cardsPerCabinet,
}: Pick<PlanFiguresProps, 'plan' | 'outputCapacityPixels' | 'cardsPerCabinet'>) {
  return (
    <Section title="Signal">
      <Figure
        label="Outputs"
        metric={`${num(plan.outputsNeeded)} ${plan.outputsNeeded === 1 ? 'output' : 'outputs'}`}
        imperial={`${patternText[plan.dataPattern]}, up to ${num(plan.cabinetsPerOutput)} cabinets each at ${num(outputCapacityPixels)} px`}
      />
      <Figure
        label="Receiving cards"
        metric={`${num(plan.cabinetCount * cardsPerCabinet)} cards`}
        imperial={cardsPerCabinet === 1 ? 'one per cabinet' : `${cardsPerCabinet} per cabinet`}
      />
    </Section>
  );
}

/** The supply, power and current, circuits, what one chain carries, line currents and heat. */
function PowerFigures({ plan, supply }: Pick<PlanFiguresProps, 'plan' | 'supply'>) {
  const current = supply.phases === 3 ? 'on the busiest line' : 'in all';
  return (
    <Section title="Power and heat (planning estimates)">
      <Figure
        testId="supply"
        label="Supply"
        metric={phaseText(supply)}
        imperial={`each chain one ${num(plan.branchVoltageV, 1)} V ${branchText[plan.branchKind]} circuit`}
      />
      <Figure label="Maximum power" metric={watts(plan.maxPowerW)} imperial={`${amps(plan.maxCurrentA)} ${current}`} />
      <Figure label="Typical power" metric={watts(plan.typicalPowerW)} imperial={`${amps(plan.typicalCurrentA)} ${current}`} />
      <Figure
        testId="circuits"
        label="Circuits"
        metric={`${num(plan.circuitsNeeded)} × ${num(supply.breakerAmps)} A`}
        imperial={`${patternText[plan.powerPattern]}; each up to ${num(plan.circuitCapacityW)} W at ${num(plan.continuousFactor * 100)} % continuous load`}
      />
      <Figure
        testId="chain-limit"
        label="One chain carries"
        metric={`${num(plan.cabinetsPerCircuit)} cabinets, ${watts(plan.chainLimitW)}`}
        imperial={`set by ${limitText[plan.chainLimitedBy]}; power factor ${num(plan.powerFactor, 3)} ${pfText[plan.powerFactorSource]}`}
      />
      {plan.phaseCurrentsA ? (
        <Figure
          testId="phase-currents"
          label="Line currents"
          metric={plan.phaseCurrentsA.map((a, i) => `${'ABC'[i]} ${amps(a)}`).join(' · ')}
          imperial="at maximum power, whole circuits spread over the phases"
        />
      ) : null}
      <Figure label="Heat at maximum power" metric={watts(plan.maxPowerW)} imperial={`${num(plan.heatBtuPerHour)} BTU/h`} />
    </Section>
  );
}

/** The nearest small whole-number ratio people name a shape by (16:9, 2:1), when one is close. */
function nearestRatio(ratio: number): string {
  const named: [number, number][] = [
    [1, 1],
    [4, 3],
    [3, 2],
    [16, 10],
    [16, 9],
    [2, 1],
    [21, 9],
    [3, 1],
    [4, 1],
    [9, 16],
    [1, 2],
    [3, 4],
  ];
  for (const [w, h] of named) if (Math.abs(ratio - w / h) / (w / h) < 0.01) return `${w}:${h}`;
  return '';
}
