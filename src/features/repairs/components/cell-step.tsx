import type { Position } from '@shared/schemas/cabinets';
import type { WallCabinet } from '@shared/schemas/walls';
import { cellLabel } from '@shared/calc/grid';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { LoadError } from '@/components/ui/load-error';
import { WallMap, WallViewToggle, type WallMapCell } from '@/components/wall-map/wall-map';
import { wallQueries } from '@/resources/walls';

type View = 'front' | 'rear';

/**
 * Step 1: the wall map, rear view by default (the technician stands behind the wall), with the
 * ticket's reported cells marked; a tap on a cabinet picks it.
 */
export function CellStep({
  wall,
  reported,
  view,
  onViewChange,
  value,
  onPick,
}: {
  wall: { id: string; name: string; columns: number; rows: number; cellAspect: number };
  reported: Position[];
  view: View;
  onViewChange: (view: View) => void;
  value: Position | null;
  onPick: (cabinet: WallCabinet) => void;
}) {
  const query = useQuery(wallQueries.cabinets(wall.id));
  const [empty, setEmpty] = useState<Position | null>(null);
  const cabinets = useMemo(() => query.data?.items ?? [], [query.data]);
  const reportedKeys = useMemo(() => new Set(reported.map((p) => `${p.column}:${p.row}`)), [reported]);
  const cells = useMemo<WallMapCell[]>(
    () =>
      cabinets.map((c) => ({
        column: c.column,
        row: c.row,
        serial: c.serial,
        tone: reportedKeys.has(`${c.column}:${c.row}`) || c.openTickets > 0 ? 'open_ticket' : c.status,
      })),
    [cabinets, reportedKeys],
  );
  const selected = useMemo(() => (value ? [value] : []), [value]);

  if (query.isError) {
    return <LoadError title="The wall’s cabinets could not be loaded." error={query.error} onRetry={() => query.refetch()} />;
  }

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="text-base text-stone-800">Tap the cabinet you worked on.</p>
        <WallViewToggle view={view} onChange={onViewChange} />
      </div>
      {reported.length ? (
        <p className="text-sm text-stone-700">
          Reported on the ticket: <span className="font-medium text-state-open-ticket">{reported.map(cellLabel).join(', ')}</span>
        </p>
      ) : null}
      {empty ? (
        <Alert tone="info" live>
          {cellLabel(empty)} holds no cabinet. Tap a cabinet.
        </Alert>
      ) : null}
      <WallMap
        columns={wall.columns}
        rows={wall.rows}
        cells={cells}
        cellAspect={wall.cellAspect}
        view={view}
        selected={selected}
        onCellActivate={(p) => {
          const cabinet = cabinets.find((c) => c.column === p.column && c.row === p.row);
          setEmpty(cabinet ? null : p);
          if (cabinet) onPick(cabinet);
        }}
        ariaLabel={`Wall map of ${wall.name}, ${wall.columns} columns by ${wall.rows} rows`}
      />
    </div>
  );
}
