import clsx from 'clsx';
import { NavLink } from 'react-router-dom';
import { SkipLink, UserMenu, type ShellProps } from '@/components/layouts/user-menu';
import { Logo } from '@/components/ui/logo';
import { paths } from '@/config/paths';

const items = [
  { to: paths.home.getHref(), label: 'Overview', end: true },
  { to: paths.walls.getHref(), label: 'Walls' },
  { to: paths.tickets.getHref(), label: 'Tickets' },
  { to: paths.visits.getHref(), label: 'Visits' },
];

/** The client portal: the organisation's name up top and a few plain sections. */
export function ClientLayout({ user, onSignOut, signingOut, children }: ShellProps) {
  const organisation = user.clientName || 'Your organisation';
  return (
    <div className="min-h-dvh bg-stone-50" data-shell="client">
      <SkipLink />
      <header className="on-ink bg-ink-900">
        <div className="mx-auto flex max-w-6xl items-center justify-between gap-4 px-4 pb-2 pt-4 sm:px-6">
          <div className="flex min-w-0 items-center gap-3">
            <Logo showName={false} />
            <div className="min-w-0">
              <p className="truncate text-lg font-semibold leading-tight text-white">{organisation}</p>
              <p className="text-xs text-ink-200">Service portal · Gridkeep</p>
            </div>
          </div>
          <UserMenu user={user} onSignOut={onSignOut} signingOut={signingOut} tone="dark" />
        </div>
        <nav aria-label="Main" className="mx-auto max-w-6xl overflow-x-auto px-2 sm:px-4">
          <ul className="flex min-w-max gap-1">
            {items.map((item) => (
              <li key={item.to}>
                <NavLink
                  to={item.to}
                  end={item.end}
                  className={({ isActive }) =>
                    clsx(
                      'flex min-h-touch items-center border-b-[3px] px-3 text-base font-medium',
                      isActive ? 'border-amber-400 text-white' : 'border-transparent text-ink-200 hover:text-white',
                    )
                  }
                >
                  {item.label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>
      </header>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl px-4 py-6 focus:outline-none sm:px-6">
        {children}
      </main>
    </div>
  );
}
