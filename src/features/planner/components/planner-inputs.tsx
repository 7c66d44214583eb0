import { chainLimit, supplyVoltageProblem } from '@shared/calc/electrical';
import { pixelPitchMm } from '@shared/calc/viewing-distance';
import type { CabinetModel } from '@shared/schemas/cabinet-models';
import clsx from 'clsx';
import { Pencil } from 'lucide-react';
import { useController, useFormContext, useWatch } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { ChoiceGroup } from '@/features/planner/components/choice-group';
import { difference, num, sizeImperial, sizeMetric } from '@/features/planner/utils/format';
import { cabinetFromModel, gridOptions, inputPresets, type PlannerFormInput } from '@/features/planner/utils/planner-form';

const numberField = { type: 'number', inputMode: 'decimal', step: 'any', registerOptions: { valueAsNumber: true } } as const;
const wholeField = { type: 'number', inputMode: 'numeric', step: 1, registerOptions: { valueAsNumber: true } } as const;

/** "15 A connector · at most 12 per chain · 190 VA", or what the datasheet does not say. */
export function connectionText(m: Pick<CabinetModel, 'passThroughAmps' | 'maxPerChain' | 'maxPowerVA'>): string {
  const parts = [
    m.passThroughAmps === null ? 'connector rating not given' : `${num(m.passThroughAmps, 1)} A connector`,
    m.maxPerChain === null ? null : `at most ${num(m.maxPerChain)} per chain`,
    m.maxPowerVA === null ? null : `${num(m.maxPowerVA)} VA`,
  ];
  return parts.filter(Boolean).join(' · ');
}

function RadioField<T extends string>({
  name,
  legend,
  choices,
  onChange,
}: {
  name: 'gridMode' | 'target.unit' | 'inputPreset';
  legend: string;
  choices: { value: T; label: string }[];
  onChange?: (v: T) => void;
}) {
  const { control } = useFormContext<PlannerFormInput>();
  const { field } = useController({ control, name });
  return (
    <ChoiceGroup
      legend={legend}
      value={field.value as T}
      onChange={(v) => {
        field.onChange(v);
        onChange?.(v);
      }}
      choices={choices}
    />
  );
}

export function CabinetInputs({ models }: { models: CabinetModel[] }) {
  const form = useFormContext<PlannerFormInput>();
  const modelId = useWatch({ control: form.control, name: 'modelId' });
  const cabinet = useWatch({ control: form.control, name: 'cabinet' });
  const model = models.find((m) => m.id === modelId);
  const pitch =
    Number(cabinet?.widthMm) > 0 && Number(cabinet?.pixelsWide) > 0
      ? pixelPitchMm(Number(cabinet.widthMm), Number(cabinet.pixelsWide))
      : null;

  return (
    <Card title="Cabinet" description="From the catalogue, or typed in by hand.">
      <div className="space-y-4">
        <SelectField
          name="modelId"
          label="Cabinet model"
          options={[
            ...models.map((m) => ({ value: m.id, label: `${m.name} · ${num(m.widthMm)} × ${num(m.heightMm)} mm` })),
            { value: '', label: 'Custom cabinet (type the figures)' },
          ]}
          registerOptions={{
            onChange: (e: { target: { value: string } }) => {
              const chosen = models.find((m) => m.id === e.target.value);
              if (chosen) {
                form.setValue('cabinet', cabinetFromModel(chosen), { shouldValidate: true });
                form.setValue('cardsPerCabinet', 1, { shouldValidate: true });
              }
            },
          }}
        />
        {model ? (
          <div className="rounded border border-stone-200 bg-stone-50 px-3 py-2.5 text-sm">
            <dl className="grid grid-cols-2 gap-x-4 gap-y-1">
              <dt className="text-stone-600">Size</dt>
              <dd className="tabular-nums">
                {num(model.widthMm)} × {num(model.heightMm)} mm
              </dd>
              <dt className="text-stone-600">Pixels</dt>
              <dd className="tabular-nums">
                {num(model.pixelsWide)} × {num(model.pixelsHigh)} ({num(model.pixelPitchMm, 3)} mm)
              </dd>
              <dt className="text-stone-600">Power</dt>
              <dd className="tabular-nums">
                {num(model.maxPowerW)} W max, {num(model.typicalPowerW)} W typical
              </dd>
              <dt className="text-stone-600">Power input</dt>
              <dd className="tabular-nums">
                {num(model.inputVoltageMinV)}–{num(model.inputVoltageMaxV)} V · {connectionText(model)}
              </dd>
              <dt className="text-stone-600">Weight</dt>
              <dd className="tabular-nums">{num(model.weightKg, 1)} kg</dd>
              <dt className="text-stone-600">Modules</dt>
              <dd className="tabular-nums">
                {model.modulesWide} × {model.modulesHigh}, {model.environment}
              </dd>
            </dl>
            <Button
              size="sm"
              variant="ghost"
              className="-ml-2 mt-2"
              icon={<Pencil className="h-3.5 w-3.5" aria-hidden="true" />}
              onClick={() => form.setValue('modelId', '', { shouldValidate: true })}
            >
              Adjust the figures
            </Button>
          </div>
        ) : (
          <div className="grid grid-cols-2 gap-3">
            <TextField name="cabinet.widthMm" label="Width (mm)" {...numberField} />
            <TextField name="cabinet.heightMm" label="Height (mm)" {...numberField} />
            <TextField name="cabinet.pixelsWide" label="Pixels wide" {...wholeField} />
            <TextField name="cabinet.pixelsHigh" label="Pixels high" {...wholeField} />
            <TextField name="cabinet.maxPowerW" label="Maximum power (W)" {...numberField} />
            <TextField name="cabinet.typicalPowerW" label="Typical power (W)" {...numberField} />
            <TextField name="cabinet.weightKg" label="Weight (kg)" {...numberField} />
            <TextField name="cardsPerCabinet" label="Receiving cards" hint="Per cabinet" {...wholeField} />
            <p className="col-span-2 text-sm text-stone-600">
              Pixel pitch: <span className="font-medium tabular-nums text-ink-950">{pitch ? `${num(pitch, 3)} mm` : '—'}</span> (width ÷
              pixels wide)
            </p>
            <p className="col-span-2 mt-1 text-sm font-medium text-stone-800">From the datasheet, when known</p>
            <TextField name="cabinet.inputVoltageMinV" label="Lowest input (V)" {...numberField} />
            <TextField name="cabinet.inputVoltageMaxV" label="Highest input (V)" {...numberField} />
            <TextField name="cabinet.passThroughAmps" label="Connector rating (A)" hint="Power in / pass-through" {...numberField} />
            <TextField name="cabinet.maxPerChain" label="Most per chain" hint="Maker's limit" {...wholeField} />
            <TextField name="cabinet.maxPowerVA" label="Maximum VA" hint="Gives the power factor" {...numberField} />
            <TextField name="cabinet.receivingCardPixels" label="Card capacity (px)" hint="Per receiving card" {...wholeField} />
          </div>
        )}
      </div>
    </Card>
  );
}

export function GridInputs() {
  const form = useFormContext<PlannerFormInput>();
  const [gridMode, cabinet, target, columns, rows] = useWatch({
    control: form.control,
    name: ['gridMode', 'cabinet', 'target', 'columns', 'rows'],
  });
  const options = gridMode === 'size' ? gridOptions(cabinet, target) : [];

  /** The closest grid follows the typed target size; another option can still be picked. */
  const followTarget = () => {
    const [best] = gridOptions(form.getValues('cabinet'), form.getValues('target'));
    if (!best) return;
    form.setValue('columns', best.columns, { shouldValidate: true });
    form.setValue('rows', best.rows, { shouldValidate: true });
  };
  const targetField = { ...numberField, registerOptions: { valueAsNumber: true, onChange: followTarget } } as const;

  return (
    <Card title="Grid" description="Columns × rows, or the size you need.">
      <div className="space-y-4">
        <RadioField
          name="gridMode"
          legend="Set the grid by"
          choices={[
            { value: 'grid', label: 'Columns × rows' },
            { value: 'size', label: 'Target size' },
          ]}
          onChange={(mode) => {
            if (mode === 'size') followTarget();
          }}
        />
        {gridMode === 'grid' ? (
          <div className="grid grid-cols-2 gap-3">
            <TextField name="columns" label="Columns" {...wholeField} min={1} max={500} />
            <TextField name="rows" label="Rows" {...wholeField} min={1} max={500} />
          </div>
        ) : (
          <div className="space-y-3">
            <RadioField
              name="target.unit"
              legend="Unit"
              choices={[
                { value: 'm', label: 'Metres' },
                { value: 'ft', label: 'Feet' },
              ]}
              onChange={followTarget}
            />
            <div className="grid grid-cols-2 gap-3">
              <TextField name="target.width" label={`Width (${target?.unit === 'ft' ? 'ft' : 'm'})`} {...targetField} />
              <TextField name="target.height" label={`Height (${target?.unit === 'ft' ? 'ft' : 'm'})`} {...targetField} />
            </div>
            {options.length ? (
              <fieldset>
                <legend className="mb-1.5 text-sm font-medium text-stone-800">Nearest grids</legend>
                <ul className="space-y-1.5">
                  {options.map((o) => {
                    const chosen = o.columns === Number(columns) && o.rows === Number(rows);
                    return (
                      <li key={`${o.columns}x${o.rows}`}>
                        <label
                          className={clsx(
                            'flex cursor-pointer items-start gap-3 rounded border px-3 py-2 text-sm has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-ink-600',
                            chosen ? 'border-ink-600 bg-ink-50' : 'border-stone-200 bg-white hover:border-stone-400',
                          )}
                        >
                          <input
                            type="radio"
                            name="nearest-grid"
                            className="mt-1 h-4 w-4 accent-ink-700"
                            checked={chosen}
                            onChange={() => {
                              form.setValue('columns', o.columns, { shouldValidate: true });
                              form.setValue('rows', o.rows, { shouldValidate: true });
                            }}
                          />
                          <span className="min-w-0">
                            <span className="block font-semibold text-ink-950">
                              {o.columns} × {o.rows}
                              <span className="font-normal text-stone-600"> · {num(o.columns * o.rows)} cabinets</span>
                            </span>
                            <span className="block tabular-nums text-stone-700">
                              {sizeMetric(o.widthMm, o.heightMm)} · {sizeImperial(o.widthMm, o.heightMm)}
                            </span>
                            <span className="block text-xs text-stone-600">
                              Width {difference(o.widthErrorMm, 'wider', 'narrower')}, height{' '}
                              {difference(o.heightErrorMm, 'taller', 'shorter')}
                            </span>
                          </span>
                        </label>
                      </li>
                    );
                  })}
                </ul>
              </fieldset>
            ) : (
              <p className="text-sm text-stone-600">Type a width and a height to see the grids that come closest.</p>
            )}
          </div>
        )}
      </div>
    </Card>
  );
}

export function SupplyInputs() {
  const form = useFormContext<PlannerFormInput>();
  const [supply, cabinet, preset] = useWatch({ control: form.control, name: ['supply', 'cabinet', 'inputPreset'] });
  const chain = chainText(supply, cabinet);
  return (
    <Card title="Supply and signal">
      <div className="space-y-4">
        <div className="grid grid-cols-2 gap-3">
          <TextField name="supply.voltage" label="Voltage (V)" hint="Line-to-line on three phases" {...numberField} />
          <SelectField
            name="supply.phases"
            label="Phases"
            options={[
              { value: '1', label: 'Single phase' },
              { value: '3', label: 'Three phase' },
            ]}
            registerOptions={{ setValueAs: (v: string) => Number(v) }}
          />
          <TextField name="supply.breakerAmps" label="Breaker (A)" hint="Each branch circuit" {...numberField} />
          <TextField
            name="supply.continuousFactor"
            label="Continuous-load factor"
            hint="0.8: NEC 210.20(A); local code elsewhere"
            {...numberField}
          />
          <TextField name="supply.powerFactor" label="Power factor" hint="Empty: datasheet VA, else 0.95" {...numberField} />
        </div>
        {chain ? (
          <p className="text-sm text-stone-700" data-testid="chain-summary">
            {chain}
          </p>
        ) : null}
        <TextField
          name="outputCapacityPixels"
          label="Output capacity (pixels)"
          hint="Pixels one controller output drives"
          {...wholeField}
        />
        <div className="grid grid-cols-2 gap-3">
          <TextField name="processorOutputs" label="Processor outputs" hint="Optional" {...wholeField} />
          <TextField name="dataCableToWallM" label="Cable to the wall (m)" hint="Processor to the wall's corner" {...numberField} />
        </div>
        <RadioField
          name="inputPreset"
          legend="Input"
          choices={inputPresets.map((p) => ({ value: p, label: p === 'hd' ? '1920 × 1080' : p === 'uhd' ? '3840 × 2160' : 'Custom' }))}
        />
        {preset === 'custom' ? (
          <div className="grid grid-cols-2 gap-3">
            <TextField name="input.width" label="Input width (px)" {...wholeField} />
            <TextField name="input.height" label="Input height (px)" {...wholeField} />
          </div>
        ) : null}
      </div>
    </Card>
  );
}

const figure = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? v : undefined);

/** "Each chain: one 208 V line-to-line circuit, up to 2,160 W (the maker's limit)", while the figures are whole. */
function chainText(supply: PlannerFormInput['supply'] | undefined, cabinet: PlannerFormInput['cabinet'] | undefined): string | null {
  const voltage = figure(supply?.voltage);
  const breakerAmps = figure(supply?.breakerAmps);
  const maxPowerW = figure(cabinet?.maxPowerW);
  if (!supply || !cabinet || voltage === undefined || breakerAmps === undefined || maxPowerW === undefined || maxPowerW <= 0) return null;
  const s = {
    voltage,
    phases: Number(supply.phases) === 3 ? (3 as const) : (1 as const),
    breakerAmps,
    continuousFactor: figure(supply.continuousFactor) ?? 0.8,
    powerFactor: figure(supply.powerFactor),
  };
  const c = {
    maxPowerW,
    maxPowerVA: figure(cabinet.maxPowerVA),
    inputVoltageMinV: figure(cabinet.inputVoltageMinV),
    inputVoltageMaxV: figure(cabinet.inputVoltageMaxV),
    passThroughAmps: figure(cabinet.passThroughAmps),
    maxPerChain: figure(cabinet.maxPerChain),
  };
  if (supplyVoltageProblem(s, c)) return null;
  const limit = chainLimit(s, c);
  const by = { circuit: 'the circuit', connector: "the cabinet's connector", maker: "the maker's limit" }[limit.chainLimitedBy];
  return `Each power chain is one ${num(limit.branch.voltageV, 1)} V ${limit.branch.kind} circuit carrying up to ${num(limit.chainLimitW)} W (set by ${by}).`;
}
