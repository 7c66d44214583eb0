import type { createTicketInput } from '@shared/schemas/tickets';
import clsx from 'clsx';
import type { Grid3x3 } from 'lucide-react';
import type { ReactNode } from 'react';
import type { z } from 'zod';

/** The values of the "Open a ticket" form as its inputs hold them (each step reads them from the form's context). */
export type NewTicketValues = z.input<typeof createTicketInput>;

/** One numbered step of "Open a ticket": a titled section. */
export function Step({
  number,
  title,
  optional = false,
  id,
  children,
}: {
  number: number;
  title: string;
  optional?: boolean;
  id?: string;
  children: ReactNode;
}) {
  return (
    <section id={id} aria-label={title} className="scroll-mt-20 rounded-md border border-stone-200 bg-white p-4 shadow-card sm:p-5">
      <h2 className="mb-4 flex items-center gap-2.5 text-lg font-semibold">
        <span
          className="flex h-7 w-7 shrink-0 items-center justify-center rounded-full bg-ink-800 text-sm font-semibold text-white"
          aria-hidden="true"
        >
          {number}
        </span>
        {title}
        {optional ? <span className="text-sm font-normal text-stone-500">(optional)</span> : null}
      </h2>
      <div className="space-y-4">{children}</div>
    </section>
  );
}

interface ChoiceCardProps {
  name: string;
  checked: boolean;
  onChange: () => void;
  icon: typeof Grid3x3;
  title: string;
  detail?: string;
}

/** A radio button drawn as a card with an icon, a title and a line of detail. */
export function ChoiceCard({ name, checked, onChange, icon: Icon, title, detail }: ChoiceCardProps) {
  return (
    <label
      className={clsx(
        'flex min-h-touch cursor-pointer items-start gap-3 rounded-md border bg-white p-3 transition-colors',
        'has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-ink-600 has-[:focus-visible]:ring-offset-2',
        checked ? 'border-ink-700 bg-ink-50 shadow-[inset_0_0_0_1px_theme(colors.ink.700)]' : 'border-stone-300 hover:border-stone-400',
      )}
    >
      <input type="radio" name={name} checked={checked} onChange={onChange} className="sr-only" />
      <Icon className={clsx('mt-0.5 h-5 w-5 shrink-0', checked ? 'text-ink-700' : 'text-stone-500')} aria-hidden="true" />
      <span className="min-w-0">
        <span className="block font-semibold text-ink-950">{title}</span>
        {detail ? <span className="block text-sm text-stone-600">{detail}</span> : null}
      </span>
    </label>
  );
}
