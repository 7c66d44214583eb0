import { cellLabel } from '@shared/calc/grid';
import { serial } from '@shared/schemas/cabinets';
import { searchCountCap, type SearchCabinet, type SerialTailMatches } from '@shared/schemas/search';
import { useQueryClient } from '@tanstack/react-query';
import { ArrowRight } from 'lucide-react';
import type { ChangeEvent } from 'react';
import { useFormContext } from 'react-hook-form';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { z } from 'zod';
import { describedBy, FieldShell, inputClasses, useFieldState } from '@/components/ui/field';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { toneStyles } from '@/components/wall-map/wall-map-tones';
import { paths } from '@/config/paths';
import { searchQueries } from '@/resources/search';

// The serial rule the server applies (trimmed, upper-cased, letters, digits and . _ - /).
const serialLookup = z.object({ serial });

/** Upper-cases what is typed in place, keeping the caret where it was. */
function upperCaseInPlace(e: ChangeEvent<HTMLInputElement>) {
  const input = e.target;
  const upper = input.value.toUpperCase();
  if (upper === input.value) return;
  const { selectionStart, selectionEnd } = input;
  input.value = upper;
  if (selectionStart !== null && selectionEnd !== null) input.setSelectionRange(selectionStart, selectionEnd);
}

function SerialInput({ autoFocus, hint }: { autoFocus: boolean; hint?: string }) {
  const { register } = useFormContext();
  const { id, hintId, errorId, error } = useFieldState('serial');
  const field = register('serial');
  return (
    <FieldShell id={id} label="Serial" hint={hint} hintId={hintId} error={error} errorId={errorId}>
      <input
        id={id}
        type="text"
        // Serials are codes, not words: no autocorrect, capitals on the phone's keyboard.
        autoComplete="off"
        autoCorrect="off"
        autoCapitalize="characters"
        spellCheck={false}
        enterKeyHint="go"
        autoFocus={autoFocus}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(hint, error, hintId, errorId)}
        className={inputClasses(Boolean(error), 'min-h-touch-lg font-mono text-xl tracking-wide md:min-h-touch-lg')}
        {...field}
        onChange={(e) => {
          upperCaseInPlace(e);
          return field.onChange(e);
        }}
      />
    </FieldShell>
  );
}

interface SerialLookupFormProps {
  /** On the scan page the field takes the focus at once; elsewhere it waits to be tapped. */
  autoFocus?: boolean;
  hint?: string;
  className?: string;
}

/** Where a cabinet is: its wall, site and cell, or only its status when it is off any wall. */
function whereabouts(c: SearchCabinet) {
  const status = toneStyles[c.status].label;
  if (!c.wallName || !c.column || !c.row) return status;
  return [c.wallName, c.siteName, cellLabel({ column: c.column, row: c.row }), status].filter(Boolean).join(' · ');
}

/** The serial with the part that was typed marked, so the reader sees why it is listed. */
function MarkedSerial({ serial, tail }: { serial: string; tail: string }) {
  const at = serial.lastIndexOf(tail);
  if (at < 0) return <>{serial}</>;
  return (
    <>
      {serial.slice(0, at)}
      <mark className="rounded-sm bg-amber-100 px-0.5 text-ink-900">{tail}</mark>
      {serial.slice(at + tail.length)}
    </>
  );
}

/** Several cabinets end in what was typed: the technician picks the one on the label. */
function TailMatches({ tail, matches }: { tail: string; matches: SerialTailMatches }) {
  const more = matches.total - matches.items.length;
  return (
    <section aria-labelledby="serial-matches-heading" className="mt-5 space-y-2">
      <h2 id="serial-matches-heading" className="text-base font-semibold text-ink-900">
        {matches.total >= searchCountCap ? `${searchCountCap}+` : matches.total} cabinets end in “{tail}”: pick the one on the label
      </h2>
      <ul className="divide-y divide-stone-100 rounded-md border border-stone-200 bg-white">
        {matches.items.map((c) => (
          <li key={c.id}>
            <Link
              to={paths.cabinetLabel.getHref(c.serial)}
              className="flex min-h-touch-lg items-center justify-between gap-3 px-4 py-3 hover:bg-stone-50"
            >
              <span className="min-w-0">
                <span className="block font-mono text-lg tracking-wide text-ink-900">
                  <MarkedSerial serial={c.serial} tail={tail} />
                </span>
                <span className="block text-sm text-stone-600">{whereabouts(c)}</span>
              </span>
              <ArrowRight className="h-5 w-5 shrink-0 text-ink-500" aria-hidden="true" />
            </Link>
          </li>
        ))}
      </ul>
      {more > 0 ? <p className="text-sm text-stone-600">Type more of the serial to see the other {more === 1 ? 'one' : 'ones'}.</p> : null}
    </section>
  );
}

/**
 * Type a cabinet's serial (as printed under its QR label), or only its end, and open that
 * cabinet. When several serials end in what was typed they are listed to pick from; what was
 * typed stays in the field whatever the answer, even with no signal.
 */
export function SerialLookupForm({ autoFocus = false, hint, className }: SerialLookupFormProps) {
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const form = useZodForm(serialLookup, { defaultValues: { serial: '' } });
  const [picking, setPicking] = useState<{ tail: string; matches: SerialTailMatches } | null>(null);
  const find = async ({ serial }: { serial: string }) => {
    setPicking(null);
    const matches = await queryClient.fetchQuery(searchQueries.serials(serial));
    const exact = matches.items.find((c) => c.serial === serial);
    const target = exact ?? (matches.total === 1 ? matches.items[0] : undefined);
    if (target) return navigate(paths.cabinetLabel.getHref(target.serial));
    if (matches.total === 0) {
      form.setError('serial', { type: 'not_found', message: `No cabinet's serial is or ends in ${serial}.` }, { shouldFocus: true });
      return;
    }
    setPicking({ tail: serial, matches });
  };
  return (
    <div className={className}>
      <Form form={form} onSubmit={find} aria-label="Open a cabinet by serial">
        <SerialInput autoFocus={autoFocus} hint={hint} />
        <SubmitButton size="lg" className="w-full">
          Open cabinet
          <ArrowRight className="h-5 w-5" aria-hidden="true" />
        </SubmitButton>
      </Form>
      {picking ? <TailMatches tail={picking.tail} matches={picking.matches} /> : null}
    </div>
  );
}
