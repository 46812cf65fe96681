import { ChevronRight } from 'lucide-react';
import { Link } from 'react-router';
import { DAY_MS } from '@shared/dates';
import { brewStatusLabels } from '@shared/schemas/brews';
import type { Page } from '@shared/schemas/common';
import type { ReviewedItem, ReviewQueueItem } from '@shared/schemas/comments';
import { ShowMore, type NextPages } from '@/components/ui/show-more';
import { useUnits } from '@/lib/units';

function ago(what: string, iso: string): string {
  const days = Math.floor((Date.now() - Date.parse(iso)) / DAY_MS);
  if (days <= 0) return `${what} today`;
  if (days === 1) return `${what} yesterday`;
  return `${what} ${days} days ago`;
}

const isReviewed = (q: ReviewQueueItem | ReviewedItem): q is ReviewedItem => 'reviewedAt' in q;

interface ReviewPages extends NextPages {
  data: { pages: readonly Page<ReviewQueueItem | ReviewedItem>[] };
}

/**
 * Brew days as big links to their review, a page at a time: those waiting for a mentor's first
 * comment (newest share first) or, with `label="Reviewed"`, those a mentor has commented on
 * (latest comment first). "Show more" adds the next page below.
 */
export function ReviewQueue({ pages, label = 'Waiting for a review' }: { pages: ReviewPages; label?: string }) {
  const units = useUnits();
  const items = pages.data.pages.flatMap((p) => p.items);
  return (
    <div className="space-y-2">
      <ul className="space-y-2" aria-label={label}>
        {items.map((q) => (
          <li key={q.brewId}>
            <Link
              to={`/reviews/${q.brewId}`}
              className="flex min-h-touch items-center gap-3 rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100 hover:ring-cellar-300"
              data-testid={isReviewed(q) ? 'reviewed-item' : 'queue-item'}
            >
              <span className="min-w-0 flex-1">
                <span className="flex flex-wrap items-baseline justify-between gap-x-3">
                  <span className="text-lg font-bold text-cellar-900">{q.brewName}</span>
                  <span className="text-sm text-ink-faint">
                    {q.brewedOn} · {isReviewed(q) ? ago('commented', q.reviewedAt) : ago('shared', q.sharedAt)}
                  </span>
                </span>
                <span className="mt-1 block text-sm text-ink-soft">
                  {q.brewerName} · {q.recipeName} · {q.clubs.map((c) => c.name).join(', ')}
                </span>
                <span className="mt-2 flex flex-wrap gap-2 text-sm">
                  <span className="rounded-md bg-paper px-2 py-0.5 tabular-nums ring-1 ring-cellar-100">
                    OG {units.format('gravity', q.og)} · target {units.format('gravity', q.targetOg)}
                  </span>
                  <span className={`rounded-md px-2 py-0.5 font-semibold ${q.deviationCount > 0 ? 'bg-malt-50 text-malt-700' : 'bg-ok-50 text-ok-700'}`}>
                    {q.deviationCount === 0 ? 'On target' : q.deviationCount === 1 ? '1 thing to look at' : `${q.deviationCount} things to look at`}
                  </span>
                  <span className="rounded-md bg-paper px-2 py-0.5 ring-1 ring-cellar-100">{brewStatusLabels[q.status]}</span>
                </span>
              </span>
              <ChevronRight aria-hidden className="size-5 shrink-0 text-ink-faint" />
            </Link>
          </li>
        ))}
      </ul>
      <ShowMore pages={pages} label="Show more brew days" />
    </div>
  );
}
