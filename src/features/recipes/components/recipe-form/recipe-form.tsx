import { useQueryClient } from '@tanstack/react-query';
import { Form, Formik, useFormikContext, type FormikErrors } from 'formik';
import { Plus, RefreshCw, Save, Trash2 } from 'lucide-react';
import { useEffect, useRef, useState } from 'react';
import { recipeInputSchema, type Recipe, type RecipeData } from '@shared/schemas/recipes';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { SaveNotice } from '@/components/ui/save-notice';
import { applyApiError, zodValidate } from '@/lib/form';
import { toSaveFailure } from '@/lib/save-failure';
import { useCreateRecipe } from '../../api/create-recipe';
import { recipeQueryOptions } from '../../api/get-recipe';
import { useUpdateRecipe } from '../../api/update-recipe';
import { BasicsSection } from './basics-section';
import { BoilSection } from './boil-section';
import { clearRecipeDraft, currentTabId, readRecipeDraft, RecipeDraftKeeper } from './draft';
import { FermentablesSection } from './fermentables-section';
import { FermentationSection } from './fermentation-section';
import { newRecipeValues, toFormValues, toRecipeInput, type RecipeFormValues } from './form-values';
import { HopsSection } from './hops-section';
import { MashSection } from './mash-section';
import { TargetsSection } from './targets-section';

interface RecipeFormProps {
  /** The recipe being edited; absent for a new one. */
  recipe?: Recipe;
  onSaved: (recipe: Recipe) => void;
}

const validateInput = zodValidate(recipeInputSchema);
const validate = (values: RecipeFormValues) => validateInput(toRecipeInput(values)) as FormikErrors<RecipeFormValues>;

/**
 * The recipe form: every number in the brewer's units (stored SI), errors inline beside their
 * field with the words the API would use, the estimated OG and ABV live beside the targets. A
 * failed save keeps everything typed; a save over a newer version is refused, never merged.
 */
export function RecipeForm({ recipe, onSaved }: RecipeFormProps) {
  const create = useCreateRecipe();
  const update = useUpdateRecipe(recipe?.id ?? 0);
  const queryClient = useQueryClient();
  const [version, setVersion] = useState(recipe?.version ?? 0);
  const [draft, setDraft] = useState(() => readRecipeDraft(recipe?.id, recipe?.version ?? 0));
  // Only the tab that wrote the draft gets it back by itself (a reload); another tab is offered it.
  const [restored, setRestored] = useState(() => draft !== null && draft.tabId === currentTabId());

  async function save(values: RecipeFormValues, asNew = false) {
    const data = recipeInputSchema.parse(toRecipeInput(values)) as RecipeData;
    if (recipe && !asNew) return update.mutateAsync({ ...data, version });
    return create.mutateAsync(data);
  }

  return (
    <Formik<RecipeFormValues>
      initialValues={restored && draft ? draft.values : recipe ? toFormValues(recipe) : newRecipeValues()}
      validate={validate}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          const saved = await save(values);
          clearRecipeDraft(recipe?.id);
          onSaved(saved);
        } catch (error) {
          // Field messages under the inputs, and one SaveFailure (offline, conflict or error) in the status.
          applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status, submitForm, resetForm, values, setStatus }) => {
        async function loadLatest() {
          const latest = await queryClient.fetchQuery({ ...recipeQueryOptions(recipe!.id), staleTime: 0 });
          setVersion(latest.version);
          resetForm({ values: toFormValues(latest), status: undefined });
        }
        async function saveAsNew() {
          setStatus(undefined);
          try {
            const saved = await save(values, true);
            clearRecipeDraft(recipe?.id);
            onSaved(saved);
          } catch (error) {
            setStatus(toSaveFailure(error));
          }
        }
        return (
          <Form noValidate className="space-y-4 pb-24" aria-label={recipe ? `Edit ${recipe.name}` : 'New recipe'}>
            <RecipeDraftKeeper recipeId={recipe?.id} version={version} />
            {draft && (
              <Notice tone="info" title={restored ? 'Your unsaved changes are back' : 'There are unsaved changes from another tab or an earlier visit'}>
                <p>Kept in this browser since {new Date(draft.savedAt).toLocaleString()}. Save to keep them for good.</p>
                {!restored && (
                  <Button
                    variant="secondary"
                    className="mr-2 mt-2"
                    icon={<RefreshCw aria-hidden className="size-5" />}
                    onClick={() => {
                      setRestored(true);
                      resetForm({ values: draft.values, status: undefined });
                    }}
                  >
                    Restore them
                  </Button>
                )}
                <Button
                  variant="secondary"
                  className="mt-2"
                  icon={<Trash2 aria-hidden className="size-5" />}
                  onClick={() => {
                    clearRecipeDraft(recipe?.id);
                    setDraft(null);
                    resetForm({ values: recipe ? toFormValues(recipe) : newRecipeValues(), status: undefined });
                  }}
                >
                  Discard them
                </Button>
              </Notice>
            )}
            <BasicsSection />
            <BoilSection />
            <TargetsSection />
            <FermentablesSection />
            <HopsSection />
            <MashSection />
            <FermentationSection />

            <div className="no-print sticky bottom-0 z-10 -mx-3 border-t border-cellar-100 bg-paper/95 px-3 py-3 backdrop-blur sm:-mx-6 sm:px-6">
              <SaveNotice
                className="mb-3"
                failure={status}
                busy={isSubmitting}
                onRetry={() => void submitForm()}
                conflictTitle="Not saved: this recipe changed elsewhere"
                conflictActions={
                  <>
                    <Button variant="secondary" icon={<RefreshCw aria-hidden className="size-5" />} onClick={() => void loadLatest()}>
                      Load the latest version
                    </Button>
                    <Button variant="secondary" icon={<Plus aria-hidden className="size-5" />} onClick={() => void saveAsNew()}>
                      Save mine as a new recipe
                    </Button>
                  </>
                }
              />
              <FormErrorSummary />
              <Button type="submit" busy={isSubmitting} className="w-full sm:w-auto" icon={<Save aria-hidden className="size-5" />}>
                {recipe ? 'Save recipe' : 'Create recipe'}
              </Button>
            </div>
          </Form>
        );
      }}
    </Formik>
  );
}

/** After a submit attempt, says how many fields still need attention (they may be off screen on a phone). */
function FormErrorSummary() {
  const { errors, submitCount, isValid, isSubmitting } = useFormikContext<RecipeFormValues>();
  const focusedFor = useRef(0);
  // On a phone the first problem is often off screen: take the brewer to it, once per attempt.
  useEffect(() => {
    if (submitCount > focusedFor.current && !isSubmitting && !isValid) {
      focusedFor.current = submitCount;
      document.querySelector<HTMLElement>('form [aria-invalid="true"]')?.focus();
    }
  }, [submitCount, isSubmitting, isValid]);
  if (submitCount === 0 || isValid) return null;
  const count = countErrors(errors);
  return (
    <p role="alert" className="mb-2 text-sm font-semibold text-alert-700">
      {count === 1 ? 'One field needs attention' : `${count} fields need attention`}: see the messages in red above.
    </p>
  );
}

function countErrors(errors: unknown): number {
  if (typeof errors === 'string') return 1;
  if (Array.isArray(errors)) return errors.reduce((n: number, e) => n + countErrors(e), 0);
  if (errors && typeof errors === 'object') return Object.values(errors).reduce((n: number, e) => n + countErrors(e), 0);
  return 0;
}
