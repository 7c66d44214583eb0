import type { Role } from '@shared/schemas/enums';
import { Construction } from 'lucide-react';
import { useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Card } from '@/components/ui/card';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { office, requireUser, staff } from '@/app/auth-guard';
import { audienceOf, useUser, type Audience } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { RouteErrorBoundary } from '@/app/route-error';

/**
 * PLACEHOLDER SCREENS. Each entry is keyed by its path constant and stands in until the real
 * screen exists; replace the matching `placeholder(...)` line in app/router.tsx with the real
 * route module and delete the entry here.
 */
interface PlaceholderSpec {
  title: string | ((params: Record<string, string | undefined>, search: URLSearchParams) => string);
  /** What the finished screen will show, per audience (falls back to `office`). */
  upcoming: Partial<Record<Audience, string[]>> & { office: string[] };
  roles?: readonly Role[];
}

const specs = {
  [paths.schedule.path]: {
    title: 'Schedule',
    roles: office,
    upcoming: { office: ['The week by technician: visits for tickets and planned maintenance', 'Drag to plan, with travel and access notes at hand'] },
  },
  [paths.stock.path]: {
    title: 'Stock',
    roles: office,
    upcoming: { office: ['Spares by part, batch and location: warehouse, vans, on-site kits', 'Movements, reorder points, low-stock alerts and vendor returns'] },
  },
  [paths.reports.path]: {
    title: 'Reports',
    roles: office,
    upcoming: { office: ['Failure rates per wall and cabinet model, repeat positions, repair heat maps', 'Service-plan performance and spares forecasts'] },
  },
  [paths.vanStock.path]: {
    title: 'Van stock',
    roles: staff,
    upcoming: { office: ['Spares in your van by part and batch', 'Matches against the batch of the wall you are at'] },
  },
  [paths.scan.path]: {
    title: 'Scan a label',
    roles: staff,
    upcoming: { office: ["Point the camera at a cabinet's QR label to open that cabinet"] },
  },
  [paths.visits.path]: {
    title: 'Visits',
    upcoming: {
      office: ['Visits with their reports'],
      client: ['Past visits with their reports (PDF) and upcoming maintenance'],
    },
  },
} satisfies Record<string, PlaceholderSpec>;

export type PlaceholderKey = keyof typeof specs;

function PlaceholderPage({ spec }: { spec: PlaceholderSpec }) {
  const user = useUser();
  const params = useParams();
  const [search] = useSearchParams();
  const title = typeof spec.title === 'function' ? spec.title(params, search) : spec.title;
  useDocumentTitle(title);
  const upcoming = spec.upcoming[audienceOf(user)] ?? spec.upcoming.office;
  return (
    <>
      <PageHeader title={title} />
      <Card>
        <div className="flex items-start gap-4">
          <span className="flex h-10 w-10 shrink-0 items-center justify-center rounded-full bg-amber-50 text-amber-700">
            <Construction className="h-5 w-5" aria-hidden="true" />
          </span>
          <div>
            <p className="font-semibold text-ink-950">This screen is being built.</p>
            <p className="mt-1 text-stone-600">When it is ready, it will show:</p>
            <ul className="mt-2 list-disc space-y-1 pl-5 text-stone-800">
              {upcoming.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          </div>
        </div>
      </Card>
    </>
  );
}

/** The route module of a placeholder screen (used by app/router.tsx through `lazy`). */
export function placeholderRoute(key: PlaceholderKey) {
  const spec: PlaceholderSpec = specs[key];
  return {
    loader: async ({ request }: LoaderFunctionArgs) => {
      await requireUser(request, spec.roles);
      return null;
    },
    Component: () => <PlaceholderPage spec={spec} />,
    ErrorBoundary: RouteErrorBoundary,
  };
}

