import { moveCabinetInput, type Position } from '@shared/schemas/cabinets';
import { cellLabel } from '@shared/calc/grid';
import { MousePointerClick } from 'lucide-react';
import { useMemo, useState, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { Card } from '@/components/ui/card';
import { Dialog } from '@/components/ui/dialog';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { WallMap, WallViewToggle, type WallMapCell } from '@/components/wall-map/wall-map';
import { useMoveCabinet } from '@/features/cabinets/api/mutations';
import { useSwapCabinets } from '@/features/cabinets/api/mutations';
import type { CabinetDetail } from '@shared/schemas/cabinets';
import type { WallCabinet } from '@shared/schemas/walls';
import { CabinetCard } from '@/features/cabinets/components/cabinet-card';
import { EmptyCellCard } from '@/features/cabinets/components/empty-cell-card';
import { useMediaQuery } from '@/lib/use-media-query';
import { z } from 'zod';
import { useQuery } from '@tanstack/react-query';
import { wallQueries } from '@/resources/walls';

type View = 'front' | 'rear';
type Mode = { kind: 'move' | 'swap'; cabinet: CabinetDetail } | null;
type Pending = { kind: 'move'; cabinet: CabinetDetail; to: Position } | { kind: 'swap'; cabinet: CabinetDetail; other: WallCabinet } | null;

interface CabinetWallMapProps {
  wall: { id: string; name: string; columns: number; rows: number; cellAspect?: number };
  /** The open cell (kept in the address by the page). */
  selected: Position | null;
  onSelect: (p: Position | null) => void;
  view: View;
  onViewChange: (view: View) => void;
  /** Office: register a cabinet on an empty position. */
  canRegister: boolean;
  /** Staff: move, swap and change the status of cabinets. */
  canOperate: boolean;
  /** Shown above the map (e.g. the service caution). */
  notice?: ReactNode;
}

const same = (a: Position | null | undefined, b: Position | null | undefined) =>
  Boolean(a && b && a.column === b.column && a.row === b.row);
const samePlace = (a: Position | null, b: Position | null) => a === b || same(a, b);

/**
 * A value the page keeps in the address (the open cell, the view), shown changed at once: a new
 * address re-renders the whole page once the router has run its loaders, so the map and the card
 * follow a tap now, in the tap's own task, and the address a moment later. When the address
 * changes (to this value or to another), it leads again.
 */
function useAddressValue<T>(value: T, equal: (a: T, b: T) => boolean, onChange: (next: T) => void) {
  const [pending, setPending] = useState<{ value: T; base: T } | null>(null);
  const current = pending && equal(pending.base, value) ? pending.value : value;
  if (pending && !equal(pending.base, value)) setPending(null);
  const change = (next: T) => {
    setPending({ value: next, base: value });
    onChange(next);
  };
  return [current, change] as const;
}

/**
 * The wall map of the register: cells coloured by cabinet state and open tickets; a tap opens
 * the cabinet card (a side panel on wide screens, a dialog on phones) from which staff move or
 * swap the cabinet by tapping its new position.
 */
export function CabinetWallMap({
  wall,
  selected: selectedInAddress,
  onSelect: select,
  view: viewInAddress,
  onViewChange,
  canRegister,
  canOperate,
  notice,
}: CabinetWallMapProps) {
  const [selected, onSelect] = useAddressValue(selectedInAddress, samePlace, select);
  const [view, setView] = useAddressValue<View>(viewInAddress, (a, b) => a === b, onViewChange);
  const query = useQuery(wallQueries.cabinets(wall.id));
  const wide = useMediaQuery('(min-width: 1280px)');
  const toast = useToast();
  const [mode, setMode] = useState<Mode>(null);
  const [pending, setPending] = useState<Pending>(null);

  const cabinets = useMemo(() => query.data?.items ?? [], [query.data]);
  const byCell = useMemo(() => new Map(cabinets.map((c) => [`${c.column}:${c.row}`, c])), [cabinets]);
  const cells = useMemo<WallMapCell[]>(
    () => cabinets.map((c) => ({ column: c.column, row: c.row, serial: c.serial, tone: c.openTickets > 0 ? 'open_ticket' : c.status })),
    [cabinets],
  );
  const occupant = (p: Position | null) => (p ? byCell.get(`${p.column}:${p.row}`) : undefined);
  const source = mode?.cabinet.column && mode.cabinet.row ? { column: mode.cabinet.column, row: mode.cabinet.row } : null;
  const [sc, sr, mc, mr] = [selected?.column, selected?.row, source?.column, source?.row];
  const highlighted = useMemo(() => {
    const list: Position[] = [];
    if (sc && sr) list.push({ column: sc, row: sr });
    if (mc && mr) list.push({ column: mc, row: mr });
    return list;
  }, [sc, sr, mc, mr]);

  const onCellActivate = (p: Position) => {
    if (!mode) {
      onSelect(p);
      return;
    }
    if (same(p, source)) return;
    const there = occupant(p);
    if (mode.kind === 'move') {
      if (there) toast(`${cellLabel(p)} holds ${there.serial}. Choose a free position, or use Swap.`, 'danger');
      else setPending({ kind: 'move', cabinet: mode.cabinet, to: p });
    } else if (!there) {
      toast(`${cellLabel(p)} is empty. Choose a cabinet to swap with, or use Move.`, 'danger');
    } else {
      setPending({ kind: 'swap', cabinet: mode.cabinet, other: there });
    }
  };

  const filled = cabinets.filter((c) => c.column <= wall.columns && c.row <= wall.rows).length;
  const withTickets = cabinets.filter((c) => c.openTickets > 0).length;
  const current = occupant(selected);

  const panel = selected ? (
    query.isPending ? (
      <p className="text-stone-600">
        <Spinner className="mr-2" label="" /> Loading the cabinets…
      </p>
    ) : current ? (
      <CabinetCard
        key={current.id}
        cabinetId={current.id}
        summary={current}
        canOperate={canOperate}
        onMove={(cabinet) => setMode({ kind: 'move', cabinet })}
        onSwap={(cabinet) => setMode({ kind: 'swap', cabinet })}
        onClose={wide ? () => onSelect(null) : undefined}
        titled={!wide}
      />
    ) : (
      <EmptyCellCard
        wallId={wall.id}
        position={selected}
        canRegister={canRegister}
        onClose={wide ? () => onSelect(null) : undefined}
        titled={!wide}
      />
    )
  ) : (
    <div className="flex items-start gap-3 text-stone-700">
      <MousePointerClick className="mt-0.5 h-5 w-5 shrink-0 text-ink-500" aria-hidden="true" />
      <p>Tap a cell to open its cabinet: serial, batch, status and history{canOperate ? ', and to move or swap it' : ''}.</p>
    </div>
  );

  return (
    <div className={wide ? 'grid grid-cols-[minmax(0,1fr)_25rem] items-start gap-5' : 'space-y-4'}>
      <Card
        title="Wall map"
        description={
          query.data
            ? `${filled} of ${wall.columns * wall.rows} positions hold a cabinet${withTickets ? ` · ${withTickets} named in an open ticket` : ''}`
            : query.isPending
              ? 'Loading the cabinets…'
              : undefined
        }
        actions={<WallViewToggle view={view} onChange={setView} />}
      >
        <div className="space-y-3">
          {notice}
          {query.data?.truncated ? (
            <p role="status" className="rounded-md border border-amber-300 bg-amber-50 px-3.5 py-2.5 text-base text-amber-900">
              This wall holds more cabinets than the map draws ({cabinets.length.toLocaleString('en')}). Find the others in the cabinet list
              by serial.
            </p>
          ) : null}
          {mode ? (
            <div
              role="status"
              className="flex flex-wrap items-center justify-between gap-3 rounded-md border border-amber-300 bg-amber-50 px-3.5 py-2.5"
            >
              <p className="text-base text-amber-900">
                {mode.kind === 'move' ? (
                  <>
                    Moving <span className="font-mono font-semibold">{mode.cabinet.serial}</span> from {mode.cabinet.position}: tap a free
                    position.
                  </>
                ) : (
                  <>
                    Swapping <span className="font-mono font-semibold">{mode.cabinet.serial}</span> at {mode.cabinet.position}: tap the
                    cabinet to swap with.
                  </>
                )}
              </p>
              <Button onClick={() => setMode(null)}>Cancel</Button>
            </div>
          ) : null}
          {query.isError ? (
            <LoadError title="The cabinets could not be loaded." error={query.error} onRetry={() => query.refetch()} />
          ) : (
            // Drawn in outline while the cabinets load, so that their arrival only names and
            // colours the cells already there (2,000 cells are drawn well before the list comes).
            <WallMap
              columns={wall.columns}
              rows={wall.rows}
              cells={cells}
              cellAspect={wall.cellAspect}
              view={view}
              selected={highlighted}
              onCellActivate={onCellActivate}
              ariaLabel={`Wall map of ${wall.name}, ${wall.columns} columns by ${wall.rows} rows`}
            />
          )}
        </div>
      </Card>

      {wide ? (
        <aside
          aria-label="Cabinet"
          className="sticky top-20 max-h-[calc(100dvh-6rem)] overflow-y-auto rounded-md border border-stone-200 bg-white p-5 shadow-card"
        >
          {panel}
        </aside>
      ) : (
        <Dialog
          open={selected !== null && mode === null}
          onClose={() => onSelect(null)}
          title={selected ? (current ? `Cabinet at ${cellLabel(selected)}` : `${cellLabel(selected)}: empty position`) : 'Cabinet'}
        >
          {selected ? panel : null}
        </Dialog>
      )}

      <ConfirmMoveDialog
        pending={pending}
        wallId={wall.id}
        onCancel={() => setPending(null)}
        onDone={(to) => {
          setPending(null);
          setMode(null);
          onSelect(to);
        }}
      />
    </div>
  );
}

const noteSchema = z.object({ note: moveCabinetInput.shape.note, noteForClient: z.boolean() });

/** Confirms a move or a swap, with an optional reason kept in the history. */
function ConfirmMoveDialog({
  pending,
  wallId,
  onCancel,
  onDone,
}: {
  pending: Pending;
  wallId: string;
  onCancel: () => void;
  onDone: (to: Position) => void;
}) {
  const title = pending?.kind === 'swap' ? 'Swap these cabinets?' : 'Move this cabinet?';
  return (
    <Dialog open={pending !== null} onClose={onCancel} title={title} size="sm">
      {pending ? (
        <ConfirmMoveForm
          key={`${pending.kind}:${pending.cabinet.id}`}
          pending={pending}
          wallId={wallId}
          onCancel={onCancel}
          onDone={onDone}
        />
      ) : null}
    </Dialog>
  );
}

function ConfirmMoveForm({
  pending,
  wallId,
  onCancel,
  onDone,
}: {
  pending: NonNullable<Pending>;
  wallId: string;
  onCancel: () => void;
  onDone: (to: Position) => void;
}) {
  const move = useMoveCabinet();
  const swap = useSwapCabinets();
  const toast = useToast();
  const form = useZodForm(noteSchema, { defaultValues: { note: '', noteForClient: false } });
  const { cabinet } = pending;
  const forClient = form.watch('noteForClient');
  return (
    <Form
      form={form}
      aria-label={pending.kind === 'swap' ? 'Confirm the swap' : 'Confirm the move'}
      onSubmit={async ({ note, noteForClient }) => {
        if (pending.kind === 'move') {
          const moved = await move.mutateAsync({
            id: cabinet.id,
            wallId,
            column: pending.to.column,
            row: pending.to.row,
            note,
            noteForClient,
          });
          toast(`${moved.serial} moved to ${moved.position}.`);
          onDone(pending.to);
        } else {
          const swapped = await swap.mutateAsync({ id: cabinet.id, otherCabinetId: pending.other.id, note, noteForClient });
          toast(`${swapped.serial} and ${pending.other.serial} swapped places.`);
          onDone({ column: pending.other.column, row: pending.other.row });
        }
      }}
    >
      <p className="text-base text-stone-800">
        {pending.kind === 'move' ? (
          <>
            <span className="font-mono font-semibold">{cabinet.serial}</span> goes from {cabinet.position} to{' '}
            <strong>{cellLabel(pending.to)}</strong>. The move is kept in its history.
          </>
        ) : (
          <>
            <span className="font-mono font-semibold">{cabinet.serial}</span> ({cabinet.position}) and{' '}
            <span className="font-mono font-semibold">{pending.other.serial}</span> ({cellLabel(pending.other)}) take each other’s
            positions. Both histories keep the swap.
          </>
        )}
      </p>
      <TextField
        name="note"
        label="Reason"
        autoComplete="off"
        hint={
          forClient
            ? 'Optional. The client’s users will read it in the cabinet’s history.'
            : 'Optional. Staff only, e.g. moved to match the module batch of its neighbours.'
        }
      />
      <Checkbox
        name="noteForClient"
        label="Show this note to the client"
        hint="Leave it off for anything internal: stock, costs, other sites."
      />
      <div className="flex justify-end gap-2">
        <Button onClick={onCancel}>Cancel</Button>
        <SubmitButton>{pending.kind === 'move' ? `Move to ${cellLabel(pending.to)}` : 'Swap them'}</SubmitButton>
      </div>
    </Form>
  );
}
