import type { QueryClient } from '@tanstack/react-query';
import { useQuery } from '@tanstack/react-query';
import { useNavigate } from 'react-router';
import { brewPagesQueryOptions, useBrewPages } from '@/features/brews/api/list-brews';
import { BrewList } from '@/features/brews/components/brew-list';
import { StartBrewForm } from '@/features/brews/components/start-brew-form';
import { recipesQueryOptions } from '@/features/recipes/api/list-recipes';
import { Card, Loading, PageHeader } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';

// Every recipe a brew day can start from: the brewer's own and those shared with their clubs.
const startableRecipes = recipesQueryOptions({ scope: 'all', sort: 'name', dir: 'asc', pageSize: 100 });

export function loader(queryClient: QueryClient) {
  return async () => {
    void queryClient.prefetchInfiniteQuery(brewPagesQueryOptions('mine'));
    void queryClient.prefetchQuery(startableRecipes);
    return null;
  };
}

export function Component() {
  const navigate = useNavigate();
  const mine = useBrewPages('mine');
  const shared = useBrewPages('shared');
  const recipes = useQuery(startableRecipes);
  return (
    <>
      <PageHeader title="Brew days" subtitle="Log every reading stage by stage, decide at the end of the boil, and keep the reasons." />
      <div className="space-y-6">
        <Card>
          <h2 className="mb-3 text-lg font-bold text-cellar-900">Start a brew day</h2>
          {recipes.isPending ? (
            <Loading label="Loading your recipes…" />
          ) : recipes.error ? (
            <Notice tone="error">{recipes.error.message}</Notice>
          ) : (
            <StartBrewForm
              recipes={recipes.data.items.map((r) => ({ id: r.id, name: r.name, ownerName: r.ownerName, isOwner: r.isOwner }))}
              onStarted={(brew) => navigate(`/brews/${brew.id}`)}
            />
          )}
        </Card>
        <section aria-labelledby="mine-heading" className="space-y-2">
          <h2 id="mine-heading" className="text-lg font-bold text-cellar-900">
            My brew days
          </h2>
          {mine.isPending ? <Loading /> : mine.error ? <Notice tone="error">{mine.error.message}</Notice> : <BrewList pages={mine} empty="No brew days yet." />}
        </section>
        <section aria-labelledby="shared-heading" className="space-y-2">
          <h2 id="shared-heading" className="text-lg font-bold text-cellar-900">
            Shared with my clubs
          </h2>
          {shared.isPending ? (
            <Loading />
          ) : shared.error ? (
            <Notice tone="error">{shared.error.message}</Notice>
          ) : (
            <BrewList pages={shared} empty="No club member has shared a brew day with you yet." />
          )}
        </section>
      </div>
    </>
  );
}
