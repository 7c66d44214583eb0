import { savedViewInput, type SavedTicketView } from '@shared/schemas/tickets';
import { useQuery } from '@tanstack/react-query';
import clsx from 'clsx';
import { BookmarkPlus, X } from 'lucide-react';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { TextField } from '@/components/ui/text-field';
import { useToast } from '@/components/ui/toast';
import { useDeleteTicketView, useSaveTicketView } from '@/features/tickets/api/mutations';
import { filtersFromParams, filtersToRecord, hasAnyFilter, sameFilters } from '@/features/tickets/components/ticket-filters';
import { ticketQueries, type TicketFilters } from '@/resources/tickets';

interface SavedViewsProps {
  filters: TicketFilters;
  onApply: (filters: TicketFilters) => void;
}

const chip = 'inline-flex min-h-touch items-center rounded-full border px-3 text-sm font-medium transition-colors md:min-h-8';
const chipTone = (active: boolean) =>
  active ? 'border-ink-700 bg-ink-700 text-white' : 'border-stone-300 bg-white text-ink-800 hover:border-stone-400';

/** What the list shows when its address says nothing: the open tickets. */
const defaultFilters = filtersFromParams(new URLSearchParams());

/** The list shows the default (the open tickets, in whatever order it is sorted). */
export const isDefaultView = (filters: TicketFilters) => sameFilters({ ...defaultFilters, sort: filters.sort, dir: filters.dir }, filters);

/** One-tap filter sets a person saved for themselves ("My breached", "Arena this week"). */
export function SavedViews({ filters, onApply }: SavedViewsProps) {
  const views = useQuery(ticketQueries.views());
  const [saving, setSaving] = useState(false);
  const [removing, setRemoving] = useState<SavedTicketView | null>(null);
  const remove = useDeleteTicketView();
  const toast = useToast();
  const items = views.data?.items ?? [];
  const current = items.find((v) => sameFilters(filtersFromParams(new URLSearchParams(v.filters)), filters));
  const onDefault = isDefaultView(filters);

  return (
    <div className="mb-4 flex flex-wrap items-center gap-2" role="group" aria-label="Saved views">
      <button
        type="button"
        aria-pressed={onDefault}
        onClick={() => onApply({ ...defaultFilters, sort: filters.sort, dir: filters.dir })}
        className={clsx(chip, chipTone(onDefault))}
      >
        Open tickets
      </button>
      <button
        type="button"
        aria-pressed={!hasAnyFilter(filters)}
        onClick={() => onApply({ sort: filters.sort, dir: filters.dir })}
        className={clsx(chip, chipTone(!hasAnyFilter(filters)))}
      >
        All tickets
      </button>
      {items.map((v) => {
        const active = v.id === current?.id;
        return (
          <span
            key={v.id}
            className={clsx(chip, 'gap-1 pr-1', active ? 'border-ink-700 bg-ink-700 text-white' : 'border-stone-300 bg-white text-ink-800')}
          >
            <button
              type="button"
              aria-pressed={active}
              onClick={() => onApply(filtersFromParams(new URLSearchParams(v.filters)))}
              className="hover:underline"
            >
              {v.name}
            </button>
            <button
              type="button"
              onClick={() => setRemoving(v)}
              aria-label={`Delete the view “${v.name}”`}
              className={clsx(
                'flex h-6 w-6 items-center justify-center rounded-full',
                active ? 'hover:bg-ink-600' : 'text-stone-500 hover:bg-stone-100 hover:text-ink-900',
              )}
            >
              <X className="h-3.5 w-3.5" aria-hidden="true" />
            </button>
          </span>
        );
      })}
      {hasAnyFilter(filters) && !onDefault && !current ? (
        <Button size="sm" variant="ghost" onClick={() => setSaving(true)} icon={<BookmarkPlus className="h-4 w-4" aria-hidden="true" />}>
          Save view
        </Button>
      ) : null}

      <Dialog
        open={saving}
        onClose={() => setSaving(false)}
        title="Save this view"
        description="The filters and sort order are kept under a name, for you only."
      >
        {saving ? <SaveViewForm filters={filters} onDone={() => setSaving(false)} /> : null}
      </Dialog>
      <ConfirmDialog
        open={removing !== null}
        onClose={() => setRemoving(null)}
        title={`Delete the view “${removing?.name ?? ''}”?`}
        confirmLabel="Delete view"
        tone="danger"
        onConfirm={async () => {
          if (!removing) return;
          await remove.mutateAsync(removing.id);
          toast(`The view “${removing.name}” is deleted.`);
        }}
      >
        <p>The tickets stay as they are; only the saved filters go.</p>
      </ConfirmDialog>
    </div>
  );
}

function SaveViewForm({ filters, onDone }: { filters: TicketFilters; onDone: () => void }) {
  const save = useSaveTicketView();
  const toast = useToast();
  const form = useZodForm(savedViewInput, { defaultValues: { name: '', filters: filtersToRecord(filters) } });
  return (
    <Form
      form={form}
      aria-label="Save this view"
      onSubmit={async (values) => {
        const view = await save.mutateAsync({ ...values, filters: filtersToRecord(filters) });
        toast(`Saved as “${view.name}”.`);
        onDone();
      }}
    >
      <TextField
        name="name"
        label="Name"
        autoComplete="off"
        maxLength={60}
        hint="Saving under an existing name replaces that view."
        autoFocus
      />
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <SubmitButton>Save view</SubmitButton>
      </DialogActions>
    </Form>
  );
}
