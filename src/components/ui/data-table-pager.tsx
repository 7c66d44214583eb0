import { Button } from '@/components/ui/button';

interface PagerProps {
  shown: number;
  hasNextPage: boolean;
  onLoadMore?: () => void;
  isLoadingMore: boolean;
}

/** "12 rows shown, more available" and the "Load more" button of keyset pagination. */
export function Pager({ shown, hasNextPage, onLoadMore, isLoadingMore }: PagerProps) {
  return (
    <div className="flex flex-wrap items-center justify-between gap-3 text-sm text-stone-600">
      <p aria-live="polite">
        {shown === 1 ? '1 row shown' : `${shown} rows shown`}
        {hasNextPage ? ', more available' : ''}
      </p>
      {hasNextPage && onLoadMore ? (
        <Button size="sm" onClick={onLoadMore} loading={isLoadingMore}>
          Load more
        </Button>
      ) : null}
    </div>
  );
}
