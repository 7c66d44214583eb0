import type { TicketScope } from '@shared/schemas/enums';
import { cellLabel } from '@shared/calc/grid';
import type { Position } from '@shared/schemas/cabinets';
import type { WallSummary } from '@shared/schemas/walls';
import { Cpu, Grid3x3, LayoutGrid, X } from 'lucide-react';
import { useFormContext } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { FieldErrorText } from '@/components/ui/field';
import { ChoiceCard, Step, type NewTicketValues } from '@/features/tickets/components/new-ticket-step';
import { TicketWallMap } from '@/features/tickets/components/ticket-wall-map';

const sameCell = (a: Position, b: Position) => a.column === b.column && a.row === b.row;
const sortCells = (cells: Position[]) => [...cells].sort((a, b) => a.row - b.row || a.column - b.column);

/** Step 2, "What is wrong with it?": some cabinets (tapped on the map), the whole wall, or its controller. */
export function WhatStep({ wall }: { wall: WallSummary }) {
  const form = useFormContext<NewTicketValues>();
  const scope = (form.watch('scope') ?? 'cells') as TicketScope;
  const cells = (form.watch('cells') ?? []) as Position[];
  const cellsError = form.formState.errors.cells?.message;

  const toggleCell = (p: Position) => {
    const current = (form.getValues('cells') ?? []) as Position[];
    const next = current.some((c) => sameCell(c, p)) ? current.filter((c) => !sameCell(c, p)) : sortCells([...current, p]);
    form.setValue('cells', next);
    if (next.length) form.clearErrors('cells');
  };
  const chooseScope = (next: TicketScope) => {
    form.setValue('scope', next);
    if (next !== 'cells') form.clearErrors('cells');
  };

  return (
    <Step number={2} title="What is wrong with it?" id="ticket-what">
      <fieldset>
        <legend className="sr-only">What is affected</legend>
        <div className="grid gap-2 sm:grid-cols-3">
          <ChoiceCard
            name="scope"
            checked={scope === 'cells'}
            onChange={() => chooseScope('cells')}
            icon={LayoutGrid}
            title="Some cabinets"
            detail="Tap them on the map"
          />
          <ChoiceCard
            name="scope"
            checked={scope === 'whole_wall'}
            onChange={() => chooseScope('whole_wall')}
            icon={Grid3x3}
            title="The whole wall"
            detail="Dark, frozen, or wrong everywhere"
          />
          <ChoiceCard
            name="scope"
            checked={scope === 'controller'}
            onChange={() => chooseScope('controller')}
            icon={Cpu}
            title="Controller / signal"
            detail="No picture, wrong input, the processor"
          />
        </div>
      </fieldset>
      {scope === 'cells' ? (
        <div className="space-y-3">
          <p className="text-sm text-stone-700">
            Tap each faulty cabinet as the audience sees the wall. Tap again to unselect. Behind the wall? Switch to <em>Rear</em>.
          </p>
          <TicketWallMap wall={wall} selected={cells} onToggle={toggleCell} markOpenTickets />
          <SelectedCells cells={cells} onUnselect={toggleCell} onClear={() => form.setValue('cells', [])} />
          {cellsError ? <FieldErrorText id="cells-error" message={cellsError} /> : null}
        </div>
      ) : null}
    </Step>
  );
}

/** The cabinets tapped so far, each a chip that unselects it, and "Clear". */
function SelectedCells({ cells, onUnselect, onClear }: { cells: Position[]; onUnselect: (p: Position) => void; onClear: () => void }) {
  return (
    <div aria-live="polite" className="rounded-md border border-stone-200 bg-stone-50 px-3 py-2">
      {cells.length ? (
        <div className="flex flex-wrap items-center gap-1.5">
          <span className="mr-1 text-sm font-medium text-stone-800">
            {cells.length === 1 ? '1 cabinet selected:' : `${cells.length} cabinets selected:`}
          </span>
          {cells.map((c) => (
            <button
              key={cellLabel(c)}
              type="button"
              onClick={() => onUnselect(c)}
              className="inline-flex min-h-8 items-center gap-1 rounded-full border border-amber-500 bg-amber-50 pl-2.5 pr-1.5 text-sm font-medium text-amber-900 hover:bg-amber-100"
              aria-label={`Unselect ${cellLabel(c)}`}
            >
              {cellLabel(c)}
              <X className="h-3.5 w-3.5" aria-hidden="true" />
            </button>
          ))}
          <Button size="sm" variant="ghost" onClick={onClear}>
            Clear
          </Button>
        </div>
      ) : (
        <p className="text-sm text-stone-600">No cabinet selected yet.</p>
      )}
    </div>
  );
}
