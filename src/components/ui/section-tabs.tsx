import clsx from 'clsx';
import { Link } from 'react-router-dom';

export interface SectionTab<K extends string> {
  key: K;
  label: string;
  /** The address of the section (kept in the address, so a section can be linked to). */
  to: string;
}

/** The sections of one page as links under its header, the current one underlined. */
export function SectionTabs<K extends string>({ label, tabs, current }: { label: string; tabs: SectionTab<K>[]; current: K }) {
  return (
    <nav aria-label={label} className="-mt-2 mb-5 flex gap-1 overflow-x-auto border-b border-stone-200">
      {tabs.map((t) => (
        <Link
          key={t.key}
          to={t.to}
          replace
          aria-current={current === t.key ? 'page' : undefined}
          className={clsx(
            '-mb-px flex min-h-touch shrink-0 items-center border-b-2 px-3.5 text-base font-medium md:min-h-10',
            current === t.key
              ? 'border-amber-500 text-ink-950'
              : 'border-transparent text-stone-600 hover:border-stone-300 hover:text-ink-900',
          )}
        >
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
