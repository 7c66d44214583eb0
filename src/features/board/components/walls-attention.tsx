import type { BoardWalls } from '@shared/schemas/board';
import { MonitorCheck } from 'lucide-react';
import { EmptyState } from '@/components/ui/empty-state';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { TicketLine, WallCard } from '@/features/board/components/wall-card';

interface WallsAttentionProps {
  data: BoardWalls | undefined;
  isPending: boolean;
  error: unknown;
  onRetry: () => void;
}

/** The board's main column: one card per wall with open tickets, the worst first; then the tickets on no wall. */
export function WallsAttention({ data, isPending, error, onRetry }: WallsAttentionProps) {
  return (
    <section aria-labelledby="board-walls" className="min-w-0 space-y-4">
      <h2 id="board-walls" className="text-lg font-semibold">
        Walls that need attention
      </h2>
      {data ? (
        <WallList data={data} />
      ) : error ? (
        <LoadError title="The walls could not be loaded." error={error} onRetry={onRetry} />
      ) : isPending ? (
        <p className="flex items-center gap-2 py-8 text-stone-600">
          <Spinner label="" /> Loading the walls…
        </p>
      ) : null}
    </section>
  );
}

function WallList({ data }: { data: BoardWalls }) {
  if (data.walls.length === 0 && data.notOnWall.length === 0) {
    return (
      <div className="rounded-md border border-stone-200 bg-white shadow-card">
        <EmptyState icon={MonitorCheck} title="No wall has an open ticket." description="New faults reported by clients show here." />
      </div>
    );
  }
  return (
    <>
      <ol className="space-y-4" aria-label="Walls, the most urgent first">
        {data.walls.map((w) => (
          <li key={w.id}>
            <WallCard wall={w} />
          </li>
        ))}
      </ol>
      {data.notOnWall.length > 0 ? (
        <section aria-labelledby="board-not-on-wall" className="rounded-md border border-stone-200 bg-white shadow-card">
          <h3 id="board-not-on-wall" className="px-4 pb-1 pt-3 text-md font-semibold sm:px-5">
            Not on a wall
          </h3>
          <ul className="divide-y divide-stone-100" aria-label="Open tickets on no wall">
            {data.notOnWall.map((t) => (
              <TicketLine key={t.id} ticket={t} place={`${t.client.name} · ${t.site.name}`} />
            ))}
          </ul>
        </section>
      ) : null}
    </>
  );
}
