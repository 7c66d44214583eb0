import { measureWall, type WallMeasures } from '@shared/calc/wall-plan';
import type { ReactNode } from 'react';
import { Card } from '@/components/ui/card';
import type { WallDetail } from '@shared/schemas/walls';
import { StructureCaution } from '@/features/walls/components/service-caution';
import { mountingLabels } from '@/features/walls/components/wall-labels';
import { formatDate } from '@/lib/format';

const n = (value: number, digits = 0) => value.toLocaleString('en', { minimumFractionDigits: digits, maximumFractionDigits: digits });

/**
 * The figures of the whole wall from its model and grid (shared/calc/wall-plan.ts): no supply is
 * needed, and circuits are not shown on this card (see the planner).
 */
export function wallFigures(wall: Pick<WallDetail, 'cabinetModel' | 'columns' | 'rows'>): WallMeasures {
  return measureWall(wall.cabinetModel, wall.columns, wall.rows);
}

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="min-w-0">
      <dt className="text-xs font-semibold text-stone-600">{label}</dt>
      <dd className="mt-0.5 text-base text-stone-900">{children}</dd>
    </div>
  );
}

/** Model, grid, size (m and ft-in), resolution, pitch, power and weight of the wall. */
export function WallSpecCard({ wall }: { wall: WallDetail }) {
  const m = wall.cabinetModel;
  const plan = wallFigures(wall);
  return (
    <Card
      title="Specification"
      description={`${m.name}${m.maker ? ` · ${m.maker}` : ''} · ${m.environment === 'outdoor' ? 'outdoor' : 'indoor'}`}
    >
      <dl className="grid grid-cols-2 gap-x-4 gap-y-3 sm:grid-cols-3">
        <Fact label="Grid">
          {wall.columns} × {wall.rows} <span className="text-stone-600">({n(wall.columns * wall.rows)} cabinets)</span>
        </Fact>
        <Fact label="Pixel pitch">{m.pixelPitchMm} mm</Fact>
        <Fact label="Cabinet">
          {n(m.widthMm)} × {n(m.heightMm)} mm · {m.modulesWide} × {m.modulesHigh} modules
        </Fact>
        {plan ? (
          <>
            <Fact label="Size">
              {n(plan.widthMm / 1000, 2)} × {n(plan.heightMm / 1000, 2)} m
              <span className="block text-sm text-stone-600">
                {plan.widthFeetInches} × {plan.heightFeetInches}
              </span>
            </Fact>
            <Fact label="Resolution">
              {n(plan.pixelsWide)} × {n(plan.pixelsHigh)} px
              <span className="block text-sm text-stone-600">{n(plan.totalPixels / 1e6, 2)} megapixels</span>
            </Fact>
            <Fact label="Area">
              {n(plan.areaM2, 2)} m²
              <span className="block text-sm text-stone-600">aspect {n(plan.aspectRatio, 2)} : 1</span>
            </Fact>
            <Fact label="Power (max / typical)">
              {n(plan.maxPowerW / 1000, 1)} / {n(plan.typicalPowerW / 1000, 1)} kW
              <span className="block text-sm text-stone-600">{n(plan.heatBtuPerHour)} BTU/h at max</span>
            </Fact>
            <Fact label="Weight">
              {n(plan.weightKg)} kg <span className="text-stone-600">({n(plan.weightLb)} lb)</span>
            </Fact>
            <Fact label="Closest viewing">{n(plan.minViewingDistanceM, 1)} m</Fact>
          </>
        ) : null}
        <Fact label="Mounting">{mountingLabels[wall.mounting]}</Fact>
        <Fact label="Installed">{formatDate(wall.installDate)}</Fact>
        <Fact label="Warranty ends">{formatDate(wall.warrantyEnd)}</Fact>
        <Fact label="Last calibrated">{formatDate(wall.calibrationDate)}</Fact>
        <Fact label="Power input">
          {m.inputVoltageMinV}–{m.inputVoltageMaxV} V
          {m.passThroughAmps !== null ? <span className="block text-sm text-stone-600">{n(m.passThroughAmps, 0)} A connector</span> : null}
        </Fact>
      </dl>
      {wall.inputNotes ? (
        <div className="mt-4 border-t border-stone-100 pt-3">
          <p className="text-xs font-semibold text-stone-600">Input signal</p>
          <p className="mt-0.5 whitespace-pre-line">{wall.inputNotes}</p>
        </div>
      ) : null}
      {wall.internalNotes ? (
        <div className="mt-4 border-t border-stone-100 pt-3">
          <p className="text-xs font-semibold text-stone-600">Internal notes (staff only)</p>
          <p className="mt-0.5 whitespace-pre-line">{wall.internalNotes}</p>
        </div>
      ) : null}
      {wall.mounting === 'ground_stacked' || wall.mounting === 'flown' ? (
        <div className="mt-4">
          <StructureCaution />
        </div>
      ) : null}
    </Card>
  );
}
