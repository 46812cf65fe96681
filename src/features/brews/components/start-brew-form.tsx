import { Form, Formik } from 'formik';
import { startBrewSchema, type BrewDetail } from '@shared/schemas/brews';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import { useStartBrew } from '../api/start-brew';
import { SaveNotice } from '@/components/ui/save-notice';
import { localDay } from '@shared/dates';
import { SelectField } from '@/components/ui/select-field';

export interface RecipeChoice {
  id: number;
  name: string;
  ownerName: string;
  isOwner: boolean;
}

interface StartValues {
  recipeId: string;
  name: string;
  brewedOn: string;
}

const toInput = (v: StartValues) => ({
  recipeId: v.recipeId === '' ? undefined : Number(v.recipeId),
  name: v.name.trim() === '' ? undefined : v.name,
  brewedOn: v.brewedOn === '' ? undefined : v.brewedOn,
});

/** Start a brew day from one of my recipes or one shared with my clubs: its targets are copied as they are now. */
export function StartBrewForm({ recipes, onStarted }: { recipes: readonly RecipeChoice[]; onStarted: (brew: BrewDetail) => void }) {
  const start = useStartBrew();
  if (recipes.length === 0) {
    return <p className="text-ink-soft">Write a recipe first, or ask your club to share one: a brew day is judged against a recipe’s targets.</p>;
  }
  return (
    <Formik<StartValues>
      initialValues={{ recipeId: String(recipes[0].id), name: '', brewedOn: localDay() }}
      validate={(v) => zodValidate(startBrewSchema)(toInput(v))}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          onStarted(await start.mutateAsync(startBrewSchema.parse(toInput(values))));
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status, submitForm }) => (
        <Form noValidate aria-label="Start a brew day" className="space-y-4">
          <SelectField name="recipeId" label="Recipe">
            {recipes.map((r) => (
              <option key={r.id} value={String(r.id)}>
                {r.isOwner ? r.name : `${r.name} (by ${r.ownerName})`}
              </option>
            ))}
          </SelectField>
          <div className="grid gap-3 sm:grid-cols-2">
            <TextField name="name" label="Name (optional)" hint="The recipe’s name if left empty." />
            <TextField name="brewedOn" type="date" label="Brew date" />
          </div>
          <SaveNotice failure={status} busy={isSubmitting} onRetry={() => void submitForm()} />
          <Button type="submit" busy={isSubmitting} className="w-full sm:w-auto">
            Start the brew day
          </Button>
        </Form>
      )}
    </Formik>
  );
}
