import { Button } from '@/components/ui/button';

interface PagerProps {
  shown: number;
  hasNextPage: boolean;
  onLoadMore?: () => void;
  isLoadingMore: boolean;
  /** What is counted, one and many (rows by default). */
  noun?: [one: string, many: string];
}

/** "12 rows shown, more available" and the "Load more" button of keyset pagination. */
export function Pager({ shown, hasNextPage, onLoadMore, isLoadingMore, noun = ['row', 'rows'] }: PagerProps) {
  return (
    <div className="flex flex-wrap items-center justify-between gap-3 text-sm text-stone-600">
      <p aria-live="polite">
        {shown === 1 ? `1 ${noun[0]} shown` : `${shown} ${noun[1]} shown`}
        {hasNextPage ? ', more available' : ''}
      </p>
      {hasNextPage && onLoadMore ? (
        // Small on a desk; a full 44 px target on a phone.
        <Button size="sm" className="max-sm:h-touch max-sm:px-4" onClick={onLoadMore} loading={isLoadingMore}>
          Load more
        </Button>
      ) : null}
    </div>
  );
}
