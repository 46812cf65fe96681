import type { QueryClient } from '@tanstack/react-query';
import { Copy, Download, Pencil, Printer, Trash2 } from 'lucide-react';
import { useState } from 'react';
import { useLocation, useNavigate, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { type RecipeImportResult } from '@shared/schemas/recipes';
import { targetAbv } from '@shared/recipes/estimates';
import { useRecipeVersion } from '@/features/recipes/api/get-recipe-version';
import { RecipeHistory } from '@/features/recipes/components/recipe-history';
import { useCloneRecipe } from '@/features/recipes/api/clone-recipe';
import { useDeleteRecipe } from '@/features/recipes/api/delete-recipe';
import { recipeExportUrl } from '@/features/recipes/api/export-recipe';
import { recipeQueryOptions, useRecipe } from '@/features/recipes/api/get-recipe';
import { describeFilePath } from '@/features/recipes/components/import-panel';
import { RecipeView } from '@/features/recipes/components/recipe-view';
import { SharingPanel } from '@/features/recipes/components/sharing-panel';
import { Button, buttonClass } from '@/components/ui/button';
import { ButtonLink } from '@/components/ui/button-link';
import { Notice } from '@/components/ui/notice';
import { Card, Loading, PageHeader } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { useMe } from '@/lib/auth';

export function loader(queryClient: QueryClient) {
  return async ({ params }: LoaderFunctionArgs) => {
    const id = Number(params.id);
    if (Number.isInteger(id) && id > 0) await queryClient.prefetchQuery(recipeQueryOptions(id));
    return null;
  };
}

/** Not found and not shared with you look the same: nobody learns another brewer's recipe exists. */
export function RecipeMissing({ error }: { error: Error | null }) {
  const notFound = !error || (error instanceof ApiError && (error.status === 404 || error.status === 400));
  return (
    <div className="py-12 text-center">
      <h1 className="text-2xl font-bold text-cellar-900">{notFound ? 'Recipe not found' : 'Could not load the recipe'}</h1>
      <p className="mt-2 text-ink-soft">{notFound ? 'It does not exist, or it is not shared with you.' : error?.message}</p>
      <ButtonLink to="/recipes" className="mt-6">
        Back to recipes
      </ButtonLink>
    </div>
  );
}

export function Component() {
  const id = Number(useParams().id);
  const navigate = useNavigate();
  const location = useLocation();
  const { data: me } = useMe();
  const { data: recipe, isPending, error } = useRecipe(id);
  const clone = useCloneRecipe();
  const remove = useDeleteRecipe();
  const [confirmDelete, setConfirmDelete] = useState(false);
  const [search] = useSearchParams();
  const askedVersion = Number(search.get('version'));
  const oldVersion = useRecipeVersion(id, Number.isInteger(askedVersion) && askedVersion > 0 ? askedVersion : null);
  const imported = (location.state as { imported?: boolean; ignored?: RecipeImportResult['ignored'] } | null) ?? null;

  if (isPending) return <Loading label="Loading the recipe…" />;
  if (error || !recipe) return <RecipeMissing error={error} />;

  const mine = recipe.ownerId === me?.id;
  return (
    <>
      <PageHeader
        title={recipe.name}
        subtitle={
          <>
            {recipe.style || 'No style given'}
            {!mine && <> · by {recipe.ownerName}</>} · version {recipe.version}
          </>
        }
        actions={
          <div className="no-print flex flex-wrap gap-2">
            {recipe.permissions.edit && (
              <ButtonLink to={`/recipes/${recipe.id}/edit`}>
                <Pencil aria-hidden className="size-5" /> Edit
              </ButtonLink>
            )}
            {recipe.permissions.clone && (
              <Button
                variant="secondary"
                busy={clone.isPending}
                icon={<Copy aria-hidden className="size-5" />}
                onClick={() => clone.mutate(recipe.id, { onSuccess: (copy) => navigate(`/recipes/${copy.id}`) })}
              >
                Clone
              </Button>
            )}
            <Button variant="secondary" icon={<Printer aria-hidden className="size-5" />} onClick={() => window.print()}>
              Print
            </Button>
          </div>
        }
      />
      {imported?.imported && (
        <Notice tone="success" title="Recipe imported" className="mb-4">
          {imported.ignored && imported.ignored.length > 0 ? (
            <>
              <p>These parts of the file are not part of a Wortwise recipe and were left out:</p>
              <ul className="mt-1 list-disc pl-5">
                {imported.ignored.map((i) => (
                  <li key={i.path}>{describeFilePath(i.path)}</li>
                ))}
              </ul>
            </>
          ) : (
            <p>Everything in the file was read.</p>
          )}
        </Notice>
      )}
      {clone.isError && (
        <Notice tone="error" className="mb-4">
          {clone.error.message}
        </Notice>
      )}

      {oldVersion.data && oldVersion.data.version !== recipe.version ? (
        <>
          <Notice tone="info" title={`Version ${oldVersion.data.version}, saved ${new Date(oldVersion.data.savedAt).toLocaleString()}`} className="mb-4">
            <p>
              An earlier version of this recipe, as it was saved. The current one is version {recipe.version}.{' '}
              <ButtonLink to={`/recipes/${recipe.id}`} variant="secondary" className="mt-2">
                Show the current version
              </ButtonLink>
            </p>
          </Notice>
          <RecipeView
            recipe={{ ...recipe, ...oldVersion.data.data, version: oldVersion.data.version, abvPercent: targetAbv(oldVersion.data.data.targetOg, oldVersion.data.data.targetFg)?.abvPercent ?? 0 }}
          />
        </>
      ) : (
        <>
          {oldVersion.isError && (
            <Notice tone="caution" className="mb-4">
              {oldVersion.error.message}
            </Notice>
          )}
          <RecipeView recipe={recipe} />
        </>
      )}

      <div className="no-print mt-4 grid gap-4 lg:grid-cols-2">
        <Card>
          <h2 className="text-lg font-semibold text-cellar-900">Export</h2>
          <p className="mt-1 text-sm text-ink-soft">Our own JSON (imports back into Wortwise) or a CSV for spreadsheets, both in SI units.</p>
          <div className="mt-3 flex flex-wrap gap-2">
            <a href={recipeExportUrl(recipe.id, 'json')} download className={buttonClass('secondary')}>
              <Download aria-hidden className="size-5" /> JSON
            </a>
            <a href={recipeExportUrl(recipe.id, 'csv')} download className={buttonClass('secondary')}>
              <Download aria-hidden className="size-5" /> CSV
            </a>
          </div>
        </Card>
        <RecipeHistory recipeId={recipe.id} currentVersion={recipe.version} />
        {recipe.permissions.share && (
          <Card>
            <SharingPanel recipe={recipe} clubs={me?.clubs ?? []} />
          </Card>
        )}
        {recipe.permissions.delete && (
          <Card>
            <h2 className="text-lg font-semibold text-cellar-900">Delete</h2>
            <p className="mt-1 text-sm text-ink-soft">Brew days started from this recipe keep their own copy of its targets.</p>
            {remove.isError && (
              <Notice tone="error" className="mt-2">
                {remove.error.message}
              </Notice>
            )}
            {confirmDelete ? (
              <div className="mt-3 flex flex-wrap gap-2">
                <Button variant="danger" busy={remove.isPending} onClick={() => remove.mutate(recipe.id, { onSuccess: () => navigate('/recipes', { replace: true }) })}>
                  Yes, delete “{recipe.name}”
                </Button>
                <Button variant="quiet" onClick={() => setConfirmDelete(false)}>
                  Keep it
                </Button>
              </div>
            ) : (
              <Button variant="secondary" className="mt-3 text-alert-700" icon={<Trash2 aria-hidden className="size-5" />} onClick={() => setConfirmDelete(true)}>
                Delete recipe
              </Button>
            )}
          </Card>
        )}
      </div>
    </>
  );
}
