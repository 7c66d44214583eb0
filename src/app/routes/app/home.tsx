import type { ReactNode } from 'react';
import { CalendarDays, Grid3x3, ScanLine, Ticket, Truck, type LucideIcon } from 'lucide-react';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { attentionTicketsQueryOptions } from '@/features/board/api/get-attention-tickets';
import { clockCountsQueryOptions } from '@/features/board/api/get-clock-counts';
import { waitingTicketsQueryOptions } from '@/features/board/api/get-waiting-tickets';
import { TodayBoard } from '@/features/board/components/today-board';
import { requireUser } from '@/app/auth-guard';
import { firstName } from '@/lib/format';
import { queryClient } from '@/lib/query-client';
import { audienceOf, isOffice, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request }: LoaderFunctionArgs) {
  const user = await requireUser(request);
  // The office's board: warm it; anything that fails shows in its own section with the error.
  if (isOffice(user)) {
    await Promise.all([
      queryClient.prefetchQuery(attentionTicketsQueryOptions()),
      queryClient.prefetchQuery(waitingTicketsQueryOptions()),
      queryClient.prefetchQuery(clockCountsQueryOptions()),
    ]);
  }
  return null;
}

function greeting(now = new Date()) {
  const h = now.getHours();
  return h < 5 ? 'Good evening' : h < 12 ? 'Good morning' : h < 18 ? 'Good afternoon' : 'Good evening';
}

/** The start page of each shell: the office's today board; the technician and client panels are PLACEHOLDERS until the visits and portal screens exist. */
export function Component() {
  const user = useUser();
  const audience = audienceOf(user);
  useDocumentTitle(audience === 'client' ? 'Overview' : 'Today');
  if (audience === 'technician') return <TechnicianHome name={user.name} />;
  if (audience === 'client') return <ClientHome name={user.name} organisation={user.clientName ?? 'your organisation'} />;
  return <OfficeHome name={user.name} />;
}

function Upcoming({ icon: Icon, title, children }: { icon: LucideIcon; title: string; children: ReactNode }) {
  return (
    <Card as="article">
      <div className="flex items-start gap-3">
        <span className="flex h-9 w-9 shrink-0 items-center justify-center rounded-md bg-ink-50 text-ink-700">
          <Icon className="h-5 w-5" aria-hidden="true" />
        </span>
        <div className="min-w-0 space-y-1.5">
          <h2 className="text-base font-semibold">{title}</h2>
          <div className="text-sm text-stone-600">{children}</div>
        </div>
      </div>
    </Card>
  );
}

function OfficeHome({ name }: { name: string }) {
  return (
    <>
      <PageHeader
        title={`${greeting()}, ${firstName(name)}`}
        description="Your today board: what needs attention first."
        actions={
          <ButtonLink to={paths.tickets.getHref({ open: 'true' })} icon={<Ticket className="h-4 w-4" aria-hidden="true" />}>
            Open tickets
          </ButtonLink>
        }
      />
      <TodayBoard />
    </>
  );
}

function TechnicianHome({ name }: { name: string }) {
  return (
    <>
      <PageHeader title={`${greeting()}, ${firstName(name)}`} description="Your visits today appear here, in order." />
      <div className="space-y-4">
        <Upcoming icon={CalendarDays} title="My visits today">
          <p>Each visit with its site, access notes, the wall and the work to do. Tap one to start.</p>
        </Upcoming>
        <div className="grid grid-cols-2 gap-3">
          <ButtonLink to={paths.scan.getHref()} size="lg" variant="primary" icon={<ScanLine className="h-5 w-5" aria-hidden="true" />}>
            Scan label
          </ButtonLink>
          <ButtonLink to={paths.vanStock.getHref()} size="lg" icon={<Truck className="h-5 w-5" aria-hidden="true" />}>
            Van stock
          </ButtonLink>
        </div>
        <p className="rounded-md border border-amber-200 bg-amber-50 px-4 py-3 text-sm text-amber-900">
          Isolate power before opening a cabinet, handle modules with ESD protection, and use proper access equipment when
          working at height.
        </p>
      </div>
    </>
  );
}

function ClientHome({ name, organisation }: { name: string; organisation: string }) {
  return (
    <>
      <PageHeader title={`Welcome, ${firstName(name)}`} description={`The service overview for ${organisation}.`} />
      <div className="grid gap-4 md:grid-cols-3">
        <Upcoming icon={Grid3x3} title="Your walls">
          <p>Each wall at your sites and how it is doing.</p>
        </Upcoming>
        <Upcoming icon={Ticket} title="Open tickets">
          <p>What you have reported and where each ticket stands.</p>
        </Upcoming>
        <Upcoming icon={CalendarDays} title="Upcoming maintenance">
          <p>Planned visits and their reports afterwards.</p>
        </Upcoming>
      </div>
      <div className="mt-6">
        <ButtonLink to={paths.tickets.getHref()} variant="primary" icon={<Ticket className="h-4 w-4" aria-hidden="true" />}>
          Report a fault
        </ButtonLink>
      </div>
    </>
  );
}
