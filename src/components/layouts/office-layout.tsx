import clsx from 'clsx';
import type { LucideIcon } from 'lucide-react';
import {
  Building2,
  Calculator,
  CalendarRange,
  Grid3x3,
  History,
  Inbox,
  Layers,
  LayoutDashboard,
  MapPin,
  Package,
  Menu,
  Search,
  Square,
  Ticket,
  Users,
  X,
} from 'lucide-react';
import { useEffect, useRef, useState } from 'react';
import { NavLink, useLocation, useNavigate, useSearchParams } from 'react-router-dom';
import { SkipLink, UserMenu, type ShellProps } from '@/components/layouts/user-menu';
import { Logo } from '@/components/ui/logo';
import { paths } from '@/config/paths';

interface NavItem {
  to: string;
  label: string;
  icon: LucideIcon;
  end?: boolean;
}

const workItems: NavItem[] = [
  { to: paths.home.getHref(), label: 'Today', icon: LayoutDashboard, end: true },
  { to: paths.clients.getHref(), label: 'Clients', icon: Building2 },
  { to: paths.sites.getHref(), label: 'Sites', icon: MapPin },
  { to: paths.walls.getHref(), label: 'Walls', icon: Grid3x3 },
  { to: paths.cabinets.getHref(), label: 'Cabinets', icon: Square },
  { to: paths.catalogue.getHref(), label: 'Catalogue', icon: Layers },
  { to: paths.tickets.getHref(), label: 'Tickets', icon: Ticket },
  { to: paths.dispatch.getHref(), label: 'Dispatch', icon: CalendarRange },
  { to: paths.stock.getHref(), label: 'Stock', icon: Package },
  { to: paths.planner.getHref(), label: 'Planner', icon: Calculator },
];

const adminItems: NavItem[] = [
  { to: paths.admin.users.getHref(), label: 'Users', icon: Users },
  { to: paths.admin.audit.getHref(), label: 'Audit log', icon: History },
  { to: paths.admin.mailbox.getHref(), label: 'Mailbox', icon: Inbox },
];

function SideNav({ isAdmin, onNavigate }: { isAdmin: boolean; onNavigate?: () => void }) {
  const link = (item: NavItem) => (
    <li key={item.to}>
      <NavLink
        to={item.to}
        end={item.end}
        onClick={onNavigate}
        className={({ isActive }) =>
          clsx(
            'group flex min-h-touch items-center gap-3 rounded-md px-3 text-base font-medium transition-colors lg:min-h-10',
            isActive
              ? 'bg-ink-800 text-white shadow-[inset_3px_0_0_theme(colors.amber.400)]'
              : 'text-ink-200 hover:bg-ink-800/60 hover:text-white',
          )
        }
      >
        {({ isActive }) => (
          <>
            <item.icon
              className={clsx('h-5 w-5 shrink-0', isActive ? 'text-amber-400' : 'text-ink-300 group-hover:text-ink-100')}
              aria-hidden="true"
            />
            {item.label}
          </>
        )}
      </NavLink>
    </li>
  );
  return (
    <nav aria-label="Main" className="flex-1 overflow-y-auto px-3 py-4">
      <ul className="space-y-0.5">{workItems.map(link)}</ul>
      {isAdmin ? (
        <>
          <p className="mb-1 mt-6 px-3 text-2xs font-semibold uppercase text-ink-300">Administration</p>
          <ul className="space-y-0.5">{adminItems.map(link)}</ul>
        </>
      ) : null}
    </nav>
  );
}

function SearchBox() {
  const navigate = useNavigate();
  const location = useLocation();
  const [params] = useSearchParams();
  const onSearchPage = location.pathname === paths.search.path;
  const [q, setQ] = useState(onSearchPage ? (params.get('q') ?? '') : '');
  const inputRef = useRef<HTMLInputElement>(null);
  const wide = useMediaQuery('(min-width: 640px)');

  useEffect(() => {
    if (onSearchPage) setQ(params.get('q') ?? '');
  }, [onSearchPage, params]);

  // "/" jumps to the search box from anywhere that is not a text field.
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const target = e.target as HTMLElement | null;
      const typing = target && (target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName));
      if (e.key === '/' && !typing && !e.metaKey && !e.ctrlKey && !e.altKey) {
        e.preventDefault();
        inputRef.current?.focus();
      }
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, []);

  return (
    <form
      role="search"
      className="relative w-full max-w-xl"
      onSubmit={(e) => {
        e.preventDefault();
        const text = q.trim();
        if (text) navigate(paths.search.getHref(text));
      }}
    >
      <label htmlFor="global-search" className="sr-only">
        Search Gridkeep
      </label>
      <Search className="pointer-events-none absolute left-3 top-1/2 h-4 w-4 -translate-y-1/2 text-stone-500" aria-hidden="true" />
      <input
        ref={inputRef}
        id="global-search"
        type="search"
        value={q}
        onChange={(e) => setQ(e.target.value)}
        placeholder={wide ? 'Search clients, sites, walls, serials, tickets…' : 'Search…'}
        aria-keyshortcuts="/"
        autoComplete="off"
        className="block h-10 w-full rounded-md border border-stone-400 bg-stone-50 pl-9 pr-3 text-md text-stone-900 placeholder:text-stone-500 hover:border-stone-400 focus:bg-white"
      />
    </form>
  );
}

function useMediaQuery(query: string) {
  const [matches, setMatches] = useState(() => window.matchMedia(query).matches);
  useEffect(() => {
    const list = window.matchMedia(query);
    const update = () => setMatches(list.matches);
    update();
    list.addEventListener('change', update);
    return () => list.removeEventListener('change', update);
  }, [query]);
  return matches;
}

/** The office shell: side navigation, a search box and the user menu in the top bar. */
export function OfficeLayout({ user, onSignOut, signingOut, children }: ShellProps) {
  const [drawerOpen, setDrawerOpen] = useState(false);
  const location = useLocation();
  const isAdmin = user.role === 'admin';

  useEffect(() => setDrawerOpen(false), [location.pathname]);

  return (
    <div className="min-h-dvh bg-stone-50" data-shell="office">
      <SkipLink />
      <aside className="on-ink fixed inset-y-0 left-0 z-30 hidden w-sidebar flex-col bg-ink-900 lg:flex">
        <div className="flex h-topbar items-center px-5">
          <Logo />
        </div>
        <SideNav isAdmin={isAdmin} />
      </aside>

      {drawerOpen ? (
        <div className="fixed inset-0 z-40 lg:hidden" role="dialog" aria-modal="true" aria-label="Menu">
          <button type="button" className="absolute inset-0 bg-ink-950/50" aria-label="Close menu" onClick={() => setDrawerOpen(false)} />
          <div className="on-ink absolute inset-y-0 left-0 flex w-72 max-w-[85vw] flex-col bg-ink-900 shadow-pop">
            <div className="flex h-topbar items-center justify-between pl-5 pr-2">
              <Logo />
              <button
                type="button"
                onClick={() => setDrawerOpen(false)}
                className="flex h-touch w-touch items-center justify-center rounded text-ink-100 hover:bg-ink-800"
                aria-label="Close menu"
              >
                <X className="h-5 w-5" aria-hidden="true" />
              </button>
            </div>
            <SideNav isAdmin={isAdmin} onNavigate={() => setDrawerOpen(false)} />
          </div>
        </div>
      ) : null}

      <div className="lg:pl-sidebar">
        <header className="sticky top-0 z-20 flex h-topbar items-center gap-2 border-b border-stone-200 bg-white/95 px-3 backdrop-blur sm:gap-4 sm:px-6">
          <button
            type="button"
            onClick={() => setDrawerOpen(true)}
            className="flex h-touch w-touch shrink-0 items-center justify-center rounded text-ink-800 hover:bg-stone-100 lg:hidden"
            aria-label="Open menu"
            aria-expanded={drawerOpen}
          >
            <Menu className="h-5 w-5" aria-hidden="true" />
          </button>
          <SearchBox />
          <div className="ml-auto shrink-0">
            <UserMenu user={user} onSignOut={onSignOut} signingOut={signingOut} />
          </div>
        </header>
        <main id="main" tabIndex={-1} className="mx-auto w-full max-w-[110rem] px-4 py-6 focus:outline-none sm:px-6 lg:px-8">
          {children}
        </main>
      </div>
    </div>
  );
}
