/**
 * Cross-feature cache links, composed here because features never import each other: a mutation
 * marks what it makes stale elsewhere (`meta: staleElsewhere(…)`, src/lib/query-client.ts) and this
 * file refreshes the other features' queries once it succeeds.
 */
import type { QueryClient, QueryKey } from '@tanstack/react-query';
import { brewKeys } from '@/features/brews/api/keys';
import type { StaleElsewhere } from '@/lib/query-client';

const linked: Record<StaleElsewhere, readonly QueryKey[]> = {
  // Packaging (fermentation) moves the brew day's status (brews).
  'brew-status': [brewKeys.all],
};

export function linkFeatureCaches(queryClient: QueryClient): () => void {
  return queryClient.getMutationCache().subscribe((event) => {
    if (event.type !== 'updated' || event.action.type !== 'success') return;
    const what = event.mutation.meta?.staleElsewhere as StaleElsewhere | undefined;
    if (what) for (const queryKey of linked[what]) void queryClient.invalidateQueries({ queryKey });
  });
}
