import type { QueryClient } from '@tanstack/react-query';
import { Plus, Upload, X } from 'lucide-react';
import { useCallback, useState } from 'react';
import { useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { recipeScopes, recipeSorts, type ListRecipesQuery, type RecipeScope, type RecipeSort } from '@shared/schemas/recipes';
import { recipePagesQueryOptions } from '@/features/recipes/api/list-recipes';
import { ImportPanel } from '@/features/recipes/components/import-panel';
import { RECIPES_PAGE_SIZE, RecipeList } from '@/features/recipes/components/recipe-list';
import { Button } from '@/components/ui/button';
import { ButtonLink } from '@/components/ui/button-link';
import { Card, PageHeader } from '@/components/ui/page';

/** The list's query lives in the URL, so back, reload and a shared link all show the same page. */
function queryFromParams(params: URLSearchParams): ListRecipesQuery {
  const sort = params.get('sort');
  const dir = params.get('dir');
  const scope = params.get('scope');
  return {
    q: params.get('q') || undefined,
    sort: recipeSorts.includes(sort as RecipeSort) ? (sort as RecipeSort) : undefined,
    dir: dir === 'asc' || dir === 'desc' ? dir : undefined,
    scope: recipeScopes.includes(scope as RecipeScope) ? (scope as RecipeScope) : undefined,
  };
}

function paramsFromQuery(query: ListRecipesQuery) {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries(query)) if (v !== undefined && v !== '') params.set(k, String(v));
  return params;
}

export function loader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const query = queryFromParams(new URL(request.url).searchParams);
    // Start the request early; the page shows its own loading and error states.
    void queryClient.prefetchInfiniteQuery(recipePagesQueryOptions({ ...query, pageSize: RECIPES_PAGE_SIZE }));
    return null;
  };
}

export function Component() {
  const [params, setParams] = useSearchParams();
  const navigate = useNavigate();
  const [importing, setImporting] = useState(false);
  const query = queryFromParams(params);
  const onQueryChange = useCallback((next: ListRecipesQuery) => setParams(paramsFromQuery(next), { replace: true }), [setParams]);
  return (
    <>
      <PageHeader
        title="Recipes"
        subtitle="Your recipes and those your clubs share with you: the targets each brew day is judged against."
        actions={
          <>
            <Button variant="secondary" aria-expanded={importing} onClick={() => setImporting((v) => !v)} icon={importing ? <X aria-hidden className="size-5" /> : <Upload aria-hidden className="size-5" />}>
              {importing ? 'Close import' : 'Import'}
            </Button>
            <ButtonLink to="/recipes/new">
              <Plus aria-hidden className="size-5" /> New recipe
            </ButtonLink>
          </>
        }
      />
      {importing && (
        <Card className="mb-4">
          <ImportPanel onImported={({ recipe, ignored }) => navigate(`/recipes/${recipe.id}`, { state: { imported: true, ignored } })} />
        </Card>
      )}
      <RecipeList query={query} onQueryChange={onQueryChange} />
    </>
  );
}
