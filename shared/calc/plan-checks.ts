// The checks an installer makes on a wall plan before anyone pulls a cable, and the notes that
// say what the power figures rest on. Each check passes, fails, or is a note to read.
import { continuousLoadNote, inputRangeOf } from './electrical.js';
import type { WallPlan, WallPlanInput } from './wall-plan.js';

export const planCheckCodes = [
  'supply_branch',
  'continuous_load',
  'power_factor',
  'input_range',
  'chain_limit',
  'phase_balance',
  'inrush',
  'processor_outputs',
  'processor_pixels',
  'processor_size',
  'input_scale',
  'receiving_card',
  'data_cable_length',
] as const;
export type PlanCheckCode = (typeof planCheckCodes)[number];

export interface PlanCheck {
  code: PlanCheckCode;
  status: 'pass' | 'fail' | 'note';
  message: string;
}

/** The longest cable of twisted-pair Ethernet between two devices: the TIA-568 channel, 100 m. */
export const TWISTED_PAIR_CHANNEL_M = 100;

type Figures = Omit<WallPlan, 'checks'>;

const n = (value: number, digits = 0) => new Intl.NumberFormat('en-US', { maximumFractionDigits: digits }).format(value);
const plural = (count: number, one: string, many = `${one}s`) => `${n(count)} ${count === 1 ? one : many}`;
const note = (code: PlanCheckCode, message: string): PlanCheck => ({ code, status: 'note', message });
const verdict = (code: PlanCheckCode, ok: boolean, message: string): PlanCheck => ({ code, status: ok ? 'pass' : 'fail', message });

/** What the power figures rest on: the branch circuit, the code's factor, the power factor, the binding limit. */
function powerNotes(plan: WallPlanInput, f: Figures): PlanCheck[] {
  const { cabinet, supply } = plan;
  const range = inputRangeOf(cabinet);
  const rangeText = `${n(range.minV)}–${n(range.maxV)} V`;
  const branch = {
    'single-phase': `Each chain is one ${n(f.branchVoltageV, 1)} V single-phase branch circuit.`,
    'line-to-line': `Each chain is one ${n(f.branchVoltageV, 1)} V line-to-line circuit across two phases (A-B, B-C or C-A), within the cabinets' ${rangeText} input.`,
    'line-to-neutral': `${n(supply.voltage, 1)} V line-to-line is over the cabinets' ${rangeText} input, so each chain is one ${n(f.branchVoltageV, 1)} V line-to-neutral circuit (A, B or C to neutral).`,
  }[f.branchKind];
  const pf = {
    datasheet: `Power factor ${n(f.powerFactor, 3)} from the datasheet (${n(cabinet.maxPowerW, 1)} W ÷ ${n(cabinet.maxPowerVA ?? 0, 1)} VA).`,
    given: `Power factor ${n(f.powerFactor, 3)}, as given.`,
    default: `Power factor ${n(f.powerFactor, 2)} assumed: the datasheet gives no volt-amperes. Current = W ÷ (V × ${n(f.powerFactor, 2)}).`,
  }[f.powerFactorSource];
  const by = {
    circuit: `the ${n(supply.breakerAmps, 1)} A circuit at ${n(supply.continuousFactor * 100, 1)} %`,
    connector: `the cabinet's ${n(cabinet.passThroughAmps ?? 0, 1)} A power connector`,
    maker: `the maker's limit of ${plural(cabinet.maxPerChain ?? 0, 'cabinet')} per chain`,
  }[f.chainLimitedBy];
  const notes = [
    note('supply_branch', branch),
    note('continuous_load', continuousLoadNote(supply)),
    note('power_factor', pf),
    note(
      'chain_limit',
      `A chain carries at most ${n(f.chainLimitW)} W (${plural(f.cabinetsPerCircuit, 'cabinet')} at ${n(cabinet.maxPowerW, 1)} W), set by ${by}.`,
    ),
  ];
  if (range.assumed)
    notes.push(
      note('input_range', `The cabinet's input range is not given; ${rangeText} (universal input) is assumed. Check the datasheet.`),
    );
  if (f.phaseCurrentsA) {
    const [a, b, c] = f.phaseCurrentsA;
    const high = Math.max(a, b, c);
    const spread = high > 0 ? ((high - Math.min(a, b, c)) / high) * 100 : 0;
    notes.push(
      note(
        'phase_balance',
        `Line currents at maximum power: A ${n(a, 1)} A, B ${n(b, 1)} A, C ${n(c, 1)} A (${n(spread, 0)} % between the busiest and the lightest phase), whole circuits spread as evenly as they go.`,
      ),
    );
  }
  notes.push(
    note(
      'inrush',
      'Switch-mode supplies draw a surge of many times their running current for a few milliseconds at switch-on. Power the circuits on one after another (a sequencer, or one breaker at a time) and choose breakers whose trip curve tolerates the surge (IEC 60898-1: type C trips at 5–10 × its rating, type B at 3–5 ×). The electrician decides.',
    ),
  );
  return notes;
}

/** The processor's outputs, pixels and canvas against the wall, and how the input is scaled. */
function signalChecks(plan: WallPlanInput, f: Figures): PlanCheck[] {
  const checks: PlanCheck[] = [];
  const processor = plan.processor ?? {};
  const cabinetPixels = plan.cabinet.pixelsWide * plan.cabinet.pixelsHigh;
  if (processor.outputs !== undefined) {
    const fewest = Math.ceil(f.cabinetCount / f.cabinetsPerOutput);
    const ok = f.outputsNeeded <= processor.outputs;
    const hint = ok ? '' : fewest <= processor.outputs ? ` Laid serpentine the wall needs ${n(fewest)}.` : ' Add a processor or outputs.';
    checks.push(
      verdict(
        'processor_outputs',
        ok,
        `The data runs need ${plural(f.outputsNeeded, 'output')}; the processor has ${n(processor.outputs)}.${hint}`,
      ),
    );
  }
  const capacity = processor.pixelCapacity ?? (processor.outputs !== undefined ? processor.outputs * plan.outputCapacityPixels : undefined);
  if (capacity !== undefined) {
    checks.push(
      verdict(
        'processor_pixels',
        f.totalPixels <= capacity,
        `The wall has ${n(f.totalPixels)} pixels; the processor drives up to ${n(capacity)}.`,
      ),
    );
  }
  if (processor.maxWidth !== undefined || processor.maxHeight !== undefined) {
    const ok = f.pixelsWide <= (processor.maxWidth ?? Infinity) && f.pixelsHigh <= (processor.maxHeight ?? Infinity);
    const limits = [
      processor.maxWidth !== undefined ? `${n(processor.maxWidth)} px wide` : '',
      processor.maxHeight !== undefined ? `${n(processor.maxHeight)} px tall` : '',
    ]
      .filter(Boolean)
      .join(' and ');
    checks.push(
      verdict('processor_size', ok, `The wall is ${n(f.pixelsWide)} × ${n(f.pixelsHigh)} px; the processor's canvas is at most ${limits}.`),
    );
  }
  const fit = f.inputFit;
  const input = plan.input ?? { width: 1920, height: 1080 };
  const scale =
    Math.abs(fit.scaleX - fit.scaleY) < 1e-9 ? `×${n(fit.scaleX, 3)}` : `×${n(fit.scaleX, 3)} across and ×${n(fit.scaleY, 3)} down`;
  checks.push(
    note(
      'input_scale',
      `A ${n(input.width)} × ${n(input.height)} input is scaled ${scale} to ${n(fit.scaledWidth)} × ${n(fit.scaledHeight)} px; content made for this wall is ${n(f.pixelsWide)} × ${n(f.pixelsHigh)} px.`,
    ),
  );
  if (plan.cabinet.receivingCardPixels !== undefined) {
    const capacityPerCard = plan.cabinet.receivingCardPixels;
    const ok = f.pixelsPerReceivingCard <= capacityPerCard + 1e-9;
    const cardsNeeded = Math.ceil(cabinetPixels / capacityPerCard);
    checks.push(
      verdict(
        'receiving_card',
        ok,
        ok
          ? `Each receiving card drives ${n(f.pixelsPerReceivingCard)} px of its ${n(capacityPerCard)}.`
          : `Each receiving card would drive ${n(f.pixelsPerReceivingCard)} px, over its ${n(capacityPerCard)}: the cabinet needs ${plural(cardsNeeded, 'card')} of that size, or a larger card.`,
      ),
    );
  }
  return checks;
}

/** Home runs against twisted-pair Ethernet's 100 m channel (TIA-568); fibre beyond. */
function cableChecks(f: Figures): PlanCheck[] {
  const lengths = f.outputs.filter((o) => o.homeRunM !== null);
  if (!lengths.length) return [];
  const longest = lengths.reduce((a, b) => ((b.homeRunM ?? 0) > (a.homeRunM ?? 0) ? b : a));
  const over = lengths.filter((o) => (o.homeRunM ?? 0) > TWISTED_PAIR_CHANNEL_M);
  if (!over.length) {
    return [
      verdict(
        'data_cable_length',
        true,
        `The longest home run is ${n(longest.homeRunM ?? 0, 1)} m (output ${longest.output}), within ${TWISTED_PAIR_CHANNEL_M} m for twisted-pair Ethernet (TIA-568 channel).`,
      ),
    ];
  }
  const which = over.length === 1 ? `Output ${over[0].output} has a home run` : `${n(over.length)} outputs have home runs`;
  return [
    verdict(
      'data_cable_length',
      false,
      `${which} over ${TWISTED_PAIR_CHANNEL_M} m (longest ${n(longest.homeRunM ?? 0, 1)} m, output ${longest.output}), beyond twisted-pair Ethernet (TIA-568 channel): run fibre to the wall or move the processor closer.`,
    ),
  ];
}

/** Every check and note of a plan, power first. */
export function planChecks(plan: WallPlanInput, figures: Figures): PlanCheck[] {
  return [...powerNotes(plan, figures), ...signalChecks(plan, figures), ...cableChecks(figures)];
}
