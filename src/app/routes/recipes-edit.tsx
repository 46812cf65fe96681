import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { recipeQueryOptions, useRecipe } from '@/features/recipes/api/get-recipe';
import { RecipeForm } from '@/features/recipes/components/recipe-form';
import { Notice } from '@/components/ui/notice';
import { Loading, PageHeader } from '@/components/ui/page';
import { RecipeMissing } from './recipes-view';

export function loader(queryClient: QueryClient) {
  return async ({ params }: LoaderFunctionArgs) => {
    const id = Number(params.id);
    if (Number.isInteger(id) && id > 0) await queryClient.prefetchQuery(recipeQueryOptions(id));
    return null;
  };
}

export function Component() {
  const id = Number(useParams().id);
  const navigate = useNavigate();
  const { data: recipe, isPending, error } = useRecipe(id);
  if (isPending) return <Loading label="Loading the recipe…" />;
  if (error || !recipe) return <RecipeMissing error={error} />;
  if (!recipe.permissions.edit) {
    return (
      <>
        <PageHeader title={recipe.name} />
        <Notice tone="info">Only {recipe.ownerName} can edit this recipe. Clone it to make your own version.</Notice>
      </>
    );
  }
  return (
    <>
      <PageHeader title={`Edit ${recipe.name}`} subtitle={`Version ${recipe.version}. Brew days already started keep the targets they started with.`} />
      {/* Keyed by id so moving between recipes starts a fresh form. */}
      <RecipeForm key={recipe.id} recipe={recipe} onSaved={(saved) => navigate(`/recipes/${saved.id}`)} />
    </>
  );
}
