import { useQuery } from '@tanstack/react-query';
import { LowStockList } from '@/features/board/components/low-stock-list';
import { VisitsToday } from '@/features/board/components/visits-today';
import { WaitingList } from '@/features/board/components/waiting-list';
import { WallsAttention } from '@/features/board/components/walls-attention';
import { boardQueries } from '@/resources/board';

/**
 * The office's Today board, around what the trade looks after: the walls that need attention
 * (worst first, each with its grid, its open tickets and its next visit) in the main column; the
 * day's visits, the new tickets to acknowledge and the low stock beside it (below it on a phone).
 * The counts are a sentence under the greeting (BoardSentence, placed by the page).
 */
export function TodayBoard() {
  const board = useQuery(boardQueries.walls());
  return (
    <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <WallsAttention data={board.data} isPending={board.isPending} error={board.error} onRetry={() => void board.refetch()} />
      <div className="min-w-0 space-y-5">
        <VisitsToday />
        <WaitingList />
        <LowStockList />
      </div>
    </div>
  );
}
