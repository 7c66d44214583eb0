import type { ReactNode } from 'react';
import type { SessionUser } from '@shared/schemas/auth';
import clsx from 'clsx';
import { ChevronDown, LogOut, UserRound } from 'lucide-react';
import { Link } from 'react-router-dom';
import { Popover, popoverItemClasses } from '@/components/ui/popover';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { initials, roleLabels } from '@/lib/format';

export interface ShellProps {
  user: SessionUser;
  onSignOut: () => void;
  signingOut: boolean;
  children: ReactNode;
}

interface UserMenuProps {
  user: SessionUser;
  onSignOut: () => void;
  signingOut: boolean;
  /** On a dark bar (technician and client headers) or a light one (office top bar). */
  tone?: 'light' | 'dark';
  /** Show the name beside the initials (when there is room). */
  showName?: boolean;
}

/**
 * The button's name starts with what it shows (the initials, then the name where there is room),
 * so a person who says or reads "AL" finds it (WCAG 2.5.3, label in name).
 */
const accountMenuName = (name: string) => `${initials(name)} ${name}, account menu`;

/** The person's initials; opens their account link and sign-out. */
export function UserMenu({ user, onSignOut, signingOut, tone = 'light', showName = true }: UserMenuProps) {
  return (
    <Popover
      trigger={(props) => (
        <button
          type="button"
          {...props}
          aria-label={accountMenuName(user.name)}
          className={clsx(
            'flex min-h-touch items-center gap-2 rounded-md px-1.5 md:min-h-10',
            tone === 'light' ? 'text-stone-800 hover:bg-stone-100' : 'text-white hover:bg-white/10',
          )}
        >
          <span
            aria-hidden="true"
            className={clsx(
              'flex h-8 w-8 items-center justify-center rounded-full text-xs font-semibold',
              tone === 'light' ? 'bg-ink-800 text-white' : 'bg-amber-400 text-ink-950',
            )}
          >
            {initials(user.name)}
          </span>{' '}
          {/* The space keeps "AL Ada Lovelace" two words in the text the name is checked against. */}
          {showName ? <span className="hidden max-w-[12rem] truncate text-sm font-medium md:block">{user.name}</span> : null}
          <ChevronDown className="hidden h-4 w-4 opacity-70 md:block" aria-hidden="true" />
        </button>
      )}
      className="w-64"
      label="Account menu"
    >
      {(close) => (
        <div>
          <div className="border-b border-stone-200 px-3 pb-2.5 pt-2">
            <p className="truncate font-semibold text-ink-950">{user.name}</p>
            <p className="truncate text-sm text-stone-600">{user.email}</p>
            <p className="mt-1 text-xs font-medium text-stone-500">
              {roleLabels[user.role]}
              {user.clientName ? ` · ${user.clientName}` : ''}
            </p>
          </div>
          <div className="pt-1">
            <Link to={paths.account.getHref()} onClick={close} className={popoverItemClasses}>
              <UserRound className="h-4 w-4 text-stone-500" aria-hidden="true" /> Account
            </Link>
            <button type="button" onClick={onSignOut} disabled={signingOut} className={popoverItemClasses}>
              {signingOut ? <Spinner label="" /> : <LogOut className="h-4 w-4 text-stone-500" aria-hidden="true" />} Sign out
            </button>
          </div>
        </div>
      )}
    </Popover>
  );
}

/** The first stop for keyboard users: jumps over the navigation. */
export function SkipLink() {
  return (
    <a
      href="#main"
      className="sr-only z-50 rounded bg-amber-400 px-4 py-2 font-medium text-ink-950 focus:not-sr-only focus:fixed focus:left-3 focus:top-3"
    >
      Skip to content
    </a>
  );
}
