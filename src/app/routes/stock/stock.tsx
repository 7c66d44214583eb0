import type { StockBalance, StockLocation, StockMovementInput } from '@shared/schemas/stock';
import { useQuery } from '@tanstack/react-query';
import { Plus, Undo2 } from 'lucide-react';
import { useMemo, useState } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { SectionTabs } from '@/components/ui/section-tabs';
import { paths } from '@/config/paths';
import { LedgerTable } from '@/features/stock/components/ledger-table';
import { RestockTable } from '@/features/stock/components/restock-table';
import { SpareCabinets } from '@/features/stock/components/spare-cabinets';
import {
  AddLocationDialog,
  AddPartDialog,
  LocationsTable,
  PartsTable,
  ReorderPointDialog,
} from '@/features/stock/components/stock-records';
import { OpenReturnDialog, VendorReturnsTable } from '@/features/stock/components/vendor-returns';
import { Card } from '@/components/ui/card';
import { FilterSelect } from '@/components/ui/filters';
import { MovementDialog } from '@/features/stock/components/movement-dialog';
import { locationKindLabels, StockTable } from '@/features/stock/components/stock-table';
import { LocationStockCards } from '@/features/stock/components/van-stock';
import { requireUser, staff } from '@/app/auth-guard';
import { idParam, useListFilters } from '@/lib/list-filters';
import { queryClient } from '@/lib/query-client';
import { isOffice, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { stockQueries, type MovementFilters, type StockFilters } from '@/resources/stock';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

const tabs = ['on-hand', 'ledger', 'returns', 'restock', 'parts', 'locations'] as const;

const ledgerFiltersFrom = (params: URLSearchParams): MovementFilters => ({
  partId: idParam(params, 'partId'),
  locationId: idParam(params, 'locationId'),
});

function filtersFrom(params: URLSearchParams): StockFilters {
  const kind = params.get('partKind');
  const kinds = ['module', 'power_supply', 'receiving_card', 'cable', 'fan', 'cabinet'] as const;
  const sort = params.get('sort');
  return {
    locationId: idParam(params, 'locationId'),
    partKind: kinds.find((k) => k === kind),
    sort: sort === 'location' || sort === 'onHand' ? sort : undefined,
    dir: params.get('dir') === 'desc' ? 'desc' : undefined,
  };
}

export async function loader({ request }: LoaderFunctionArgs) {
  await requireUser(request, staff);
  await Promise.all([
    queryClient.ensureQueryData(stockQueries.locations()).catch(() => undefined),
    queryClient.ensureInfiniteQueryData(stockQueries.balances(filtersFrom(new URL(request.url).searchParams))).catch(() => undefined),
  ]);
  return null;
}

/**
 * Spare stock. The office sees every location, records receipts, transfers, uses and
 * corrections; a technician sees their van first, as cards for the phone, and moves stock out of it.
 */
export function Component() {
  useDocumentTitle('Stock');
  const user = useUser();
  const office = isOffice(user);
  const [filters, setFilters] = useListFilters(filtersFrom, { sort: 'part', dir: 'asc' });
  const [ledgerFilters, setLedgerFilters] = useListFilters(ledgerFiltersFrom);
  const parts = useQuery({ ...stockQueries.parts(), enabled: office });
  const partOptions = useMemo(() => (parts.data?.items ?? []).map((p) => ({ value: p.id, label: `${p.name} · ${p.sku}` })), [parts.data]);
  const locations = useQuery(stockQueries.locations());
  const [moving, setMoving] = useState<Partial<StockMovementInput> | null>(null);
  const locationOptions = useMemo(
    () => (locations.data?.items ?? []).map((l) => ({ value: l.id, label: `${l.name} (${locationKindLabels[l.kind]})` })),
    [locations.data],
  );
  const vans = (locations.data?.items ?? []).filter((l) => l.kind === 'van' && l.holder?.id === user.id);
  const [params] = useSearchParams();
  const tab = tabs.find((t) => t === params.get('tab')) ?? 'on-hand';
  const [returning, setReturning] = useState(false);
  const [adding, setAdding] = useState(false);
  const [reorderOf, setReorderOf] = useState<StockBalance | null>(null);
  const moveFrom = (row: StockBalance) =>
    setMoving({ kind: office ? 'transfer' : 'consumption', partId: row.partId, batch: row.batch, fromLocationId: row.locationId });

  return (
    <>
      <PageHeader
        title={office ? 'Stock' : 'My van'}
        description={
          office
            ? 'Spares on hand in the warehouse, the vans and the site kits: the sums of the ledger.'
            : 'What you carry, and what is on the shelf.'
        }
        actions={
          tab === 'returns' && office ? (
            <Button variant="primary" icon={<Undo2 className="h-4 w-4" aria-hidden="true" />} onClick={() => setReturning(true)}>
              Send a part to its maker
            </Button>
          ) : (tab === 'parts' || tab === 'locations') && office ? (
            <Button variant="primary" icon={<Plus className="h-4 w-4" aria-hidden="true" />} onClick={() => setAdding(true)}>
              {tab === 'parts' ? 'Add a part' : 'Add a location'}
            </Button>
          ) : (
            <Button variant="primary" icon={<Plus className="h-4 w-4" aria-hidden="true" />} onClick={() => setMoving({})}>
              {office ? 'Record a movement' : 'Take or use stock'}
            </Button>
          )
        }
      />
      {office ? (
        <SectionTabs
          label="Stock sections"
          current={tab}
          tabs={[
            { key: 'on-hand', label: 'On hand', to: paths.stock.getHref() },
            { key: 'ledger', label: 'Ledger', to: paths.stock.getHref({ tab: 'ledger' }) },
            { key: 'returns', label: 'Vendor returns', to: paths.stock.getHref({ tab: 'returns' }) },
            { key: 'restock', label: 'Restock list', to: paths.stock.getHref({ tab: 'restock' }) },
            { key: 'parts', label: 'Parts', to: paths.stock.getHref({ tab: 'parts' }) },
            { key: 'locations', label: 'Locations', to: paths.stock.getHref({ tab: 'locations' }) },
          ]}
        />
      ) : null}
      {!office ? (
        <div className="mb-6 space-y-4">
          {vans.length ? (
            vans.map((van) => (
              <Card key={van.id} title={van.name}>
                <SpareCabinets locationId={van.id} />
                <LocationStockCards location={van} onMove={moveFrom} />
              </Card>
            ))
          ) : (
            <p className="text-stone-700">No van is in your name yet; the office sets one up.</p>
          )}
          <OtherLocation locations={(locations.data?.items ?? []).filter((l) => !vans.includes(l))} onMove={moveFrom} />
        </div>
      ) : tab === 'ledger' ? (
        <LedgerTable
          filters={ledgerFilters}
          onFiltersChange={setLedgerFilters}
          partOptions={partOptions}
          locationOptions={locationOptions}
        />
      ) : tab === 'returns' ? (
        <VendorReturnsTable canEdit />
      ) : tab === 'restock' ? (
        <RestockTable />
      ) : tab === 'parts' ? (
        <PartsTable />
      ) : tab === 'locations' ? (
        <LocationsTable />
      ) : (
        <StockTable
          filters={filters}
          onFiltersChange={setFilters}
          locationOptions={locationOptions}
          onMove={moveFrom}
          onReorderPoint={setReorderOf}
        />
      )}
      {office ? (
        <>
          <OpenReturnDialog open={returning} onClose={() => setReturning(false)} />
          <AddPartDialog open={adding && tab === 'parts'} onClose={() => setAdding(false)} />
          <AddLocationDialog open={adding && tab === 'locations'} onClose={() => setAdding(false)} />
          <ReorderPointDialog row={reorderOf} onClose={() => setReorderOf(null)} />
        </>
      ) : null}
      <MovementDialog
        open={moving !== null}
        onClose={() => setMoving(null)}
        start={moving ?? undefined}
        kinds={office ? undefined : ['consumption', 'transfer']}
      />
    </>
  );
}

/** Another location's shelf, as cards: the warehouse before a visit, or a site kit on site. */
function OtherLocation({ locations, onMove }: { locations: StockLocation[]; onMove: (row: StockBalance) => void }) {
  const [id, setId] = useState('');
  const location = locations.find((l) => l.id === id);
  return (
    <Card title="Another location">
      <div className="space-y-4">
        <FilterSelect
          label="Location"
          anyLabel="Choose a location"
          options={locations.map((l) => ({ value: l.id, label: `${l.name} (${locationKindLabels[l.kind]})` }))}
          value={id}
          onChange={setId}
        />
        {location ? <LocationStockCards location={location} onMove={onMove} /> : null}
      </div>
    </Card>
  );
}
