import { useNavigate } from 'react-router';
import { RecipeForm } from '@/features/recipes/components/recipe-form';
import { PageHeader } from '@/components/ui/page';

export function Component() {
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title="New recipe" subtitle="Quantities in your units; Wortwise stores them in SI and shows them to others in theirs." />
      <RecipeForm onSaved={(recipe) => navigate(`/recipes/${recipe.id}`, { replace: true })} />
    </>
  );
}
