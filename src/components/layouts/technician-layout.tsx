import clsx from 'clsx';
import type { LucideIcon } from 'lucide-react';
import { CircleUser, Grid3x3, House, Package, ScanLine, Ticket } from 'lucide-react';
import { NavLink } from 'react-router-dom';
import { SkipLink, UserMenu, type ShellProps } from '@/components/layouts/user-menu';
import { PendingRepairsBanner } from '@/components/ui/pending-repairs-banner';
import { Logo } from '@/components/ui/logo';
import { paths } from '@/config/paths';

interface NavItem {
  to: string;
  label: string;
  icon: LucideIcon;
  end?: boolean;
}

const items: NavItem[] = [
  { to: paths.home.getHref(), label: 'Today', icon: House, end: true },
  { to: paths.tickets.getHref(), label: 'Tickets', icon: Ticket },
  { to: paths.walls.getHref(), label: 'Walls', icon: Grid3x3 },
  { to: paths.scan.getHref(), label: 'Scan', icon: ScanLine },
  { to: paths.stock.getHref(), label: 'Van', icon: Package },
  { to: paths.account.getHref(), label: 'Me', icon: CircleUser },
];

/** The technician shell: phone first, big targets, navigation at the thumb. */
export function TechnicianLayout({ user, onSignOut, signingOut, children }: ShellProps) {
  return (
    <div className="min-h-dvh bg-stone-50" data-shell="technician">
      <SkipLink />
      <header className="on-ink sticky top-0 z-20 bg-ink-900 pt-[env(safe-area-inset-top)]">
        <div className="mx-auto flex h-topbar max-w-3xl items-center justify-between gap-3 px-3">
          <Logo />
          <UserMenu user={user} onSignOut={onSignOut} signingOut={signingOut} tone="dark" showName={false} />
        </div>
      </header>
      <main
        id="main"
        tabIndex={-1}
        className="mx-auto w-full max-w-3xl px-4 pb-[calc(6rem+env(safe-area-inset-bottom))] pt-5 text-md focus:outline-none"
      >
        {/* Repairs logged without signal stay in sight on every screen until they are sent. */}
        <PendingRepairsBanner className="mb-4" />
        {children}
      </main>
      <nav
        aria-label="Main"
        className="on-ink fixed inset-x-0 bottom-0 z-30 border-t border-ink-800 bg-ink-900 pb-[env(safe-area-inset-bottom)]"
      >
        <ul className="mx-auto grid max-w-3xl grid-cols-6">
          {items.map((item) => (
            <li key={item.to}>
              <NavLink
                to={item.to}
                end={item.end}
                className={({ isActive }) =>
                  clsx(
                    'flex min-h-touch-lg flex-col items-center justify-center gap-1 px-1 py-2 text-xs font-medium',
                    isActive ? 'text-amber-300' : 'text-ink-200 hover:text-white',
                  )
                }
              >
                {({ isActive }) => (
                  <>
                    <span className={clsx('flex h-7 w-12 items-center justify-center rounded-full', isActive && 'bg-ink-700')}>
                      <item.icon className="h-5 w-5" aria-hidden="true" />
                    </span>
                    {item.label}
                  </>
                )}
              </NavLink>
            </li>
          ))}
        </ul>
      </nav>
    </div>
  );
}
