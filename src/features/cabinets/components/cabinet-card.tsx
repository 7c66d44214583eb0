import { cellLabel } from '@shared/calc/grid';
import { cabinetPatch, type Position } from '@shared/schemas/cabinets';
import { ArrowLeftRight, Move, Pencil, Wrench, X } from 'lucide-react';
import { useState, type ReactNode } from 'react';
import { Link, useLocation } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { paths } from '@/config/paths';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { SelectField } from '@/components/ui/select-field';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import type { CabinetDetail } from '@shared/schemas/cabinets';
import type { WallCabinet } from '@shared/schemas/walls';
import { useUpdateCabinet } from '@/features/cabinets/api/mutations';
import { CabinetHistory } from '@/features/cabinets/components/cabinet-history';
import { EmptyCellCard } from '@/features/cabinets/components/empty-cell-card';
import { CabinetStatusPill, cabinetStatusOptions } from '@/features/cabinets/components/cabinet-status';
import { TextAreaField } from '@/components/ui/text-area-field';
import { errorMessage } from '@/lib/errors';
import { formatDate } from '@/lib/format';
import { useQuery } from '@tanstack/react-query';
import { cabinetQueries } from '@/resources/cabinets';
import { wallQueries } from '@/resources/walls';

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="min-w-0">
      <dt className="text-xs font-semibold text-stone-600">{label}</dt>
      <dd className="mt-0.5 break-words text-base text-stone-900">{children}</dd>
    </div>
  );
}

/** Model, batch, install date, where it is kept: the facts of one cabinet. */
export function CabinetFacts({ cabinet }: { cabinet: CabinetDetail }) {
  return (
    <dl className="grid grid-cols-2 gap-x-4 gap-y-3">
      <Fact label="Model">{cabinet.model.name}</Fact>
      <Fact label="Module batch">{cabinet.batch || <span className="text-stone-500">Not recorded</span>}</Fact>
      <Fact label="Installed on">{formatDate(cabinet.installedOn)}</Fact>
      <Fact label="Modules">
        {cabinet.model.modulesWide} × {cabinet.model.modulesHigh}
      </Fact>
      {cabinet.stockLocation ? <Fact label="Stock location">{cabinet.stockLocation.name}</Fact> : null}
      {cabinet.notes ? (
        <div className="col-span-2">
          <Fact label="Notes (staff only)">
            <span className="whitespace-pre-line">{cabinet.notes}</span>
          </Fact>
        </div>
      ) : null}
    </dl>
  );
}

/** The open tickets that name the cabinet's position, each one tap away (a thumb-sized target on a phone). */
function OpenTicketLinks({ tickets }: { tickets: WallCabinet['openTicketRefs'] }) {
  const { pathname } = useLocation();
  if (tickets.length === 0) return null;
  return (
    <div className="flex flex-wrap items-center gap-x-2 text-sm font-medium text-state-open-ticket">
      <span>{tickets.length === 1 ? '1 open ticket names this position:' : `${tickets.length} open tickets name this position:`}</span>
      {tickets.map((t) =>
        // Opened from that ticket's own page: say so rather than link to where we are.
        paths.ticket.getHref(t.id) === pathname ? (
          <span key={t.id} className="font-mono" aria-current="page">
            {t.ref} (this ticket)
          </span>
        ) : (
          <Link
            key={t.id}
            to={paths.ticket.getHref(t.id)}
            className="inline-flex min-h-touch items-center font-mono underline underline-offset-2 hover:text-ink-900 md:min-h-0"
          >
            {t.ref}
          </Link>
        ),
      )}
    </div>
  );
}

interface CabinetCardProps {
  cabinetId: string;
  /** What the wall map already knows, shown while the full record loads. */
  summary?: WallCabinet;
  /** Staff: move, swap, change status. */
  canOperate: boolean;
  onMove?: (cabinet: CabinetDetail) => void;
  onSwap?: (cabinet: CabinetDetail) => void;
  onClose?: () => void;
  /** Leave out the "Cabinet at C3·R2" line when the dialog's title already says it. */
  titled?: boolean;
  /** Opened from a visit: a repair logged from the card belongs to that visit. */
  visitId?: string;
}

/** The card of a cabinet opened from the wall map: serial, position, status, facts and whole history. */
export function CabinetCard({ cabinetId, summary, canOperate, onMove, onSwap, onClose, titled = false, visitId }: CabinetCardProps) {
  const query = useQuery({ ...cabinetQueries.detail(cabinetId ?? ''), enabled: Boolean(cabinetId) });
  const cabinet = query.data;
  const [editing, setEditing] = useState(false);
  const serial = cabinet?.serial ?? summary?.serial ?? '';
  const position = cabinet?.position ?? (summary ? cellLabel(summary) : null);
  const status = cabinet?.status ?? summary?.status;

  return (
    <article aria-labelledby={`cabinet-${cabinetId}-title`} className="space-y-4" data-testid="cabinet-card">
      <header className="flex items-start justify-between gap-3">
        <div className="min-w-0 space-y-1">
          {titled ? null : (
            <p className="text-xs font-semibold uppercase tracking-wide text-stone-600">Cabinet{position ? ` at ${position}` : ''}</p>
          )}
          <h2 id={`cabinet-${cabinetId}-title`} className="break-all font-mono text-2xl font-semibold text-ink-950">
            {serial}
          </h2>
          {status ? <CabinetStatusPill status={status} /> : null}
          {summary ? <OpenTicketLinks tickets={summary.openTicketRefs} /> : null}
        </div>
        {onClose ? (
          <button
            type="button"
            onClick={onClose}
            className="-mr-2 -mt-1 flex h-touch w-touch shrink-0 items-center justify-center rounded text-stone-500 hover:bg-stone-100 hover:text-stone-900"
            aria-label="Close the cabinet card"
          >
            <X className="h-5 w-5" aria-hidden="true" />
          </button>
        ) : null}
      </header>

      {canOperate && cabinet ? (
        <div className="flex flex-wrap gap-2">
          {cabinet.wall && onMove ? (
            <Button onClick={() => onMove(cabinet)} icon={<Move className="h-4 w-4" aria-hidden="true" />}>
              Move
            </Button>
          ) : null}
          {cabinet.wall && onSwap ? (
            <Button onClick={() => onSwap(cabinet)} icon={<ArrowLeftRight className="h-4 w-4" aria-hidden="true" />}>
              Swap
            </Button>
          ) : null}
          <Button onClick={() => setEditing(true)} icon={<Pencil className="h-4 w-4" aria-hidden="true" />}>
            Status and batch
          </Button>
          {cabinet.wall && cabinet.column && cabinet.row ? (
            <ButtonLink
              variant="primary"
              to={paths.logRepair.getHref({ visitId, wallId: cabinet.wall.id, col: cabinet.column, row: cabinet.row })}
              icon={<Wrench className="h-4 w-4" aria-hidden="true" />}
            >
              Log repair
            </ButtonLink>
          ) : null}
        </div>
      ) : null}

      {query.isPending ? (
        <p className="text-stone-600">
          <Spinner className="mr-2" label="" /> Loading the cabinet…
        </p>
      ) : query.isError ? (
        <Alert tone="danger" title="The cabinet could not be loaded.">
          {errorMessage(query.error)}
        </Alert>
      ) : cabinet ? (
        <>
          <CabinetFacts cabinet={cabinet} />
          <section aria-labelledby={`cabinet-${cabinetId}-history`} className="space-y-2 border-t border-stone-200 pt-3">
            <h3 id={`cabinet-${cabinetId}-history`} className="text-base font-semibold">
              History
            </h3>
            <CabinetHistory events={cabinet.history} truncated={cabinet.historyTruncated} />
          </section>
          <UpdateCabinetDialog cabinet={cabinet} open={editing} onClose={() => setEditing(false)} />
        </>
      ) : null}
    </article>
  );
}

interface CabinetCellDialogProps {
  wall: { id: string; name: string };
  /** The cell to open; null keeps the dialog closed. */
  position: Position | null;
  onClose: () => void;
  canOperate: boolean;
  /** Opened from a visit: "Log repair" records the repair on that visit. */
  visitId?: string;
}

/**
 * The cabinet card of one cell, opened from a map outside the wall page (a ticket's map): the
 * same card, in a dialog, with the way to the wall page, where the cabinet is moved or swapped.
 */
export function CabinetCellDialog({ wall, position, onClose, canOperate, visitId }: CabinetCellDialogProps) {
  const cabinets = useQuery({ ...wallQueries.cabinets(wall.id), enabled: position !== null });
  const occupant = position ? cabinets.data?.items.find((c) => c.column === position.column && c.row === position.row) : undefined;
  const label = position ? cellLabel(position) : '';
  return (
    <Dialog open={position !== null} onClose={onClose} title={occupant ? `Cabinet at ${label}` : `${label} on ${wall.name}`}>
      {position === null ? null : cabinets.isPending ? (
        <p className="text-stone-600">
          <Spinner className="mr-2" label="" /> Loading the cabinets…
        </p>
      ) : cabinets.isError ? (
        <LoadError title="The cabinets could not be loaded." error={cabinets.error} onRetry={() => void cabinets.refetch()} />
      ) : occupant ? (
        <CabinetCard key={occupant.id} cabinetId={occupant.id} summary={occupant} canOperate={canOperate} titled visitId={visitId} />
      ) : (
        <EmptyCellCard wallId={wall.id} position={position} canRegister={false} titled />
      )}
      {position ? (
        <DialogActions>
          <ButtonLink to={paths.wall.getHref(wall.id, { col: position.column, row: position.row })}>Open on the wall page</ButtonLink>
          <Button onClick={onClose}>Close</Button>
        </DialogActions>
      ) : null}
    </Dialog>
  );
}

function UpdateCabinetDialog({ cabinet, open, onClose }: { cabinet: CabinetDetail; open: boolean; onClose: () => void }) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title={`Update ${cabinet.serial}`}
      description={cabinet.position ? `At ${cabinet.position} on ${cabinet.wall?.name}` : undefined}
    >
      {open ? <UpdateCabinetForm cabinet={cabinet} onDone={onClose} /> : null}
    </Dialog>
  );
}

function UpdateCabinetForm({ cabinet, onDone }: { cabinet: CabinetDetail; onDone: () => void }) {
  const update = useUpdateCabinet();
  const toast = useToast();
  const form = useZodForm(cabinetPatch, {
    defaultValues: { status: cabinet.status, batch: cabinet.batch, notes: cabinet.notes ?? '', note: '', noteForClient: false },
  });
  const status = form.watch('status');
  const forClient = form.watch('noteForClient');
  const leaves = Boolean(cabinet.wall) && status !== 'installed';
  // A cabinet goes onto a wall by being moved there, not by a status.
  const options = cabinetStatusOptions.filter((o) => o.value !== 'installed' || cabinet.wall);
  return (
    <Form
      form={form}
      aria-label={`Update ${cabinet.serial}`}
      onSubmit={async (values) => {
        const saved = await update.mutateAsync({ id: cabinet.id, ...values });
        toast(saved.wall ? `${saved.serial} is saved.` : `${saved.serial} is off the wall: ${cabinet.position ?? 'its position'} is free.`);
        onDone();
      }}
    >
      <SelectField name="status" label="Status" options={options} />
      {leaves ? (
        <Alert tone="info">This takes the cabinet off the wall and frees {cabinet.position}. The history keeps where it was.</Alert>
      ) : null}
      <TextField
        name="batch"
        label="Module batch / bin"
        autoComplete="off"
        hint="Modules from different batches differ slightly in colour."
      />
      <TextAreaField name="notes" label="Notes" rows={3} hint="Staff only." />
      <TextField
        name="note"
        label="Reason (kept in the history)"
        autoComplete="off"
        hint={
          forClient
            ? 'Optional. The client’s users will read it in the cabinet’s history.'
            : 'Optional. Staff only, e.g. sent to the bench for a dead receiving card.'
        }
      />
      <Checkbox
        name="noteForClient"
        label="Show this reason to the client"
        hint="Leave it off for anything internal: stock, costs, other sites."
      />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Save</SubmitButton>
      </DialogActions>
    </Form>
  );
}
