import { serial } from '@shared/schemas/cabinets';
import { ArrowRight } from 'lucide-react';
import type { ChangeEvent } from 'react';
import { useFormContext } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { z } from 'zod';
import { describedBy, FieldShell, inputClasses, useFieldState } from '@/components/ui/field';
import { Form, SubmitButton, useZodForm } from '@/components/ui/form';
import { paths } from '@/config/paths';

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

/** Type a cabinet's serial (as printed under its QR label) and open that cabinet. */
export function SerialLookupForm({ autoFocus = false, hint, className }: SerialLookupFormProps) {
  const navigate = useNavigate();
  const form = useZodForm(serialLookup, { defaultValues: { serial: '' } });
  return (
    <Form
      form={form}
      onSubmit={(values) => navigate(paths.cabinetLabel.getHref(values.serial))}
      className={className}
      aria-label="Open a cabinet by serial"
    >
      <SerialInput autoFocus={autoFocus} hint={hint} />
      <SubmitButton size="lg" className="w-full">
        Open cabinet
        <ArrowRight className="h-5 w-5" aria-hidden="true" />
      </SubmitButton>
    </Form>
  );
}
