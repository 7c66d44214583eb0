import { placeCabinetInput, type Position } from '@shared/schemas/cabinets';
import { cellLabel } from '@shared/calc/grid';
import { SquareDashed, X } from 'lucide-react';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { usePlaceCabinet } from '@/features/cabinets/api/mutations';

interface EmptyCellCardProps {
  wallId: string;
  position: Position;
  /** Office: register a new cabinet at this position. */
  canRegister: boolean;
  onClose?: () => void;
  /** The dialog's title already names the position. */
  titled?: boolean;
}

/** A position with no cabinet: the office can register one here. */
export function EmptyCellCard({ wallId, position, canRegister, onClose, titled = false }: EmptyCellCardProps) {
  const label = cellLabel(position);
  return (
    <article
      aria-labelledby={titled ? undefined : 'empty-cell-title'}
      aria-label={titled ? label : undefined}
      className="space-y-4"
      data-testid="empty-cell-card"
    >
      <header className="flex items-start justify-between gap-3">
        <div className="flex items-start gap-3">
          <span className="flex h-10 w-10 shrink-0 items-center justify-center rounded-full bg-stone-100 text-stone-600">
            <SquareDashed className="h-5 w-5" aria-hidden="true" />
          </span>
          <div>
            {titled ? null : (
              <h2 id="empty-cell-title" className="text-xl font-semibold">
                {label}
              </h2>
            )}
            <p className="text-stone-600">No cabinet is registered at this position.</p>
          </div>
        </div>
        {onClose ? (
          <button
            type="button"
            onClick={onClose}
            className="-mr-2 -mt-1 flex h-touch w-touch shrink-0 items-center justify-center rounded text-stone-500 hover:bg-stone-100 hover:text-stone-900"
            aria-label="Close"
          >
            <X className="h-5 w-5" aria-hidden="true" />
          </button>
        ) : null}
      </header>
      {canRegister ? (
        <PlaceCabinetForm key={label} wallId={wallId} position={position} />
      ) : (
        <p className="text-sm text-stone-600">
          The office registers new cabinets. A cabinet already on this wall can be moved here from its card.
        </p>
      )}
    </article>
  );
}

function PlaceCabinetForm({ wallId, position }: { wallId: string; position: Position }) {
  const place = usePlaceCabinet();
  const toast = useToast();
  const form = useZodForm(placeCabinetInput, {
    defaultValues: { ...position, serial: '', batch: '', installedOn: null, notes: '' },
  });
  return (
    <Form
      form={form}
      aria-label={`Register a cabinet at ${cellLabel(position)}`}
      className="space-y-4 border-t border-stone-200 pt-4"
      onSubmit={async (values) => {
        const cabinet = await place.mutateAsync({ wallId, ...values, ...position });
        toast(`${cabinet.serial} is registered at ${cabinet.position}.`);
      }}
    >
      <h3 className="text-base font-semibold">Register a cabinet here</h3>
      <TextField name="serial" label="Serial" autoComplete="off" autoCapitalize="characters" spellCheck={false} />
      <TextField name="batch" label="Module batch / bin" autoComplete="off" hint="Optional. From the label on the modules." />
      <TextField
        name="installedOn"
        label="Installed on"
        type="date"
        registerOptions={{ setValueAs: (v: unknown) => (v === '' || v === undefined ? null : v) }}
      />
      <SubmitButton>Register at {cellLabel(position)}</SubmitButton>
    </Form>
  );
}
