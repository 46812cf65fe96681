import { ChevronDown } from 'lucide-react';
import { Button } from './button';

/** What a TanStack infinite query gives a list paged by key (`useInfiniteQuery`). */
export interface NextPages {
  hasNextPage: boolean;
  isFetchingNextPage: boolean;
  fetchNextPage: () => Promise<unknown>;
}

/**
 * The button under a list paged by key: "Show more …" adds the next page below what is shown
 * (nothing is counted, so there are no page numbers). Nothing is drawn on the last page.
 */
export function ShowMore({ pages, label, hidden = false }: { pages: NextPages; label: string; hidden?: boolean }) {
  if (!pages.hasNextPage || hidden) return null;
  return (
    <div className="flex justify-center">
      <Button variant="secondary" disabled={pages.isFetchingNextPage} onClick={() => void pages.fetchNextPage()} icon={<ChevronDown aria-hidden className="size-5" />}>
        {pages.isFetchingNextPage ? 'Loading more…' : label}
      </Button>
    </div>
  );
}
