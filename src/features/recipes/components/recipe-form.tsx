import { useQueryClient } from '@tanstack/react-query';
import { FieldArray, Form, Formik, getIn, useField, useFormikContext, type FormikErrors } from 'formik';
import { Plus, RefreshCw, Save, Trash2 } from 'lucide-react';
import { useEffect, useId, useRef, useState, type ReactNode } from 'react';
import { KG_PER_LB, LITRES_PER_US_GALLON } from '@shared/brewmath';
import {
  boilOffMismatch,
  defaultPotentialPointsLPerKg,
  fermentableKindLabels,
  fermentableKinds,
  impliedBoilOffLPerHour,
  recipeInputSchema,
  type Recipe,
  type RecipeData,
  type RecipeFermentableKind,
} from '@shared/schemas/recipes';
import {
  COLOUR_AGREEMENT_SRM,
  estimateRecipeColour,
  estimateRecipeIbu,
  estimateRecipeOg,
  IBU_AGREEMENT,
  recipeBuGu,
  OG_AGREEMENT_SG,
  targetAbv,
} from '@shared/recipes/estimates';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Card } from '@/components/ui/page';
import { QuantityField } from '@/components/ui/quantity-field';
import { TextField } from '@/components/ui/text-field';
import { SaveNotice } from '@/components/ui/save-notice';
import { toSaveFailure } from '@/lib/save-failure';
import { applyApiError, zodValidate } from '@/lib/form';
import { useUnits, type Units } from '@/lib/units';
import { useCreateRecipe } from '../api/create-recipe';
import { recipeQueryOptions } from '../api/get-recipe';
import { useUpdateRecipe } from '../api/update-recipe';
import { NumberField } from '@/components/ui/number-field';
import { TextAreaField } from '@/components/ui/text-area-field';
import { emptyFermentable, emptyHop, emptyMashStep, newRecipeValues, toFormValues, toRecipeInput, type RecipeFormValues } from './recipe-form-values';
import { clearRecipeDraft, currentTabId, readRecipeDraft, RecipeDraftKeeper } from './recipe-draft';
import { colourFieldProps, formatColour, useColourScale } from '@/lib/colour';

/** 1 point per pound per US gallon in points·L/kg: from the exact gallon and pound. */
const PPG = LITRES_PER_US_GALLON / KG_PER_LB;


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
            <GravitySection />
            <FermentablesSection />
            <HopsSection />
            <MashAndFermentationSection />

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

function Section({ title, children, description }: { title: string; children: ReactNode; description?: ReactNode }) {
  const id = useId();
  return (
    <Card>
      <div role="group" aria-labelledby={id}>
        <h2 id={id} className="text-lg font-semibold text-cellar-900">
          {title}
        </h2>
        {description && <p className="mt-1 text-sm text-ink-soft">{description}</p>}
        <div className="mt-4">{children}</div>
      </div>
    </Card>
  );
}


function BasicsSection() {
  return (
    <Section title="Recipe">
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField name="name" label="Recipe name" autoComplete="off" />
        <TextField name="style" label="Style" autoComplete="off" hint="Free text, e.g. Pale ale." />
        <div className="sm:col-span-2">
          <TextAreaField name="notes" label="Notes" />
        </div>
      </div>
    </Section>
  );
}

function BoilSection() {
  const { values, setFieldValue, setFieldTouched } = useFormikContext<RecipeFormValues>();
  const units = useUnits();
  const { preBoilVolumeL: pre, postBoilVolumeL: post, boilMinutes } = values;
  const implied = typeof pre === 'number' && typeof post === 'number' && typeof boilMinutes === 'number' && boilMinutes > 0 && post <= pre ? impliedBoilOffLPerHour(pre, post, boilMinutes) : null;
  const mismatch = boilOffMismatch(pre, post, boilMinutes, values.boilOffLPerHour);
  return (
    <Section title="Volumes and boil" description="Pre- and post-boil volumes as measured hot in the kettle; the batch volume is what goes into the fermenter.">
      <div className="grid gap-4 sm:grid-cols-3">
        <QuantityField name="batchVolumeL" kind="volume" label="Batch volume into the fermenter" />
        <QuantityField name="preBoilVolumeL" kind="volume" label="Pre-boil volume" />
        <QuantityField name="postBoilVolumeL" kind="volume" label="Post-boil volume" />
        <NumberField name="boilMinutes" label="Boil length" unit="min" />
        <div>
          <QuantityField name="boilOffLPerHour" kind="rate" label="Boil-off rate" />
          {implied !== null && mismatch?.field === 'boilOffLPerHour' && (
            <Button
              variant="quiet"
              className="mt-1 px-2 text-sm"
              onClick={() => {
                void setFieldValue('boilOffLPerHour', Number(implied.toFixed(3)));
                void setFieldTouched('boilOffLPerHour', true, false);
              }}
            >
              Use {units.format('rate', implied)}, from the volumes
            </Button>
          )}
        </div>
        <NumberField
          name="efficiency"
          label="Brewhouse efficiency"
          unit="%"
          toShown={(f) => f * 100}
          shownToStored={(p) => p / 100}
          decimals={2}
          hint="Share of the grain’s extract that reaches the fermenter."
        />
      </div>
    </Section>
  );
}

function formatGap(units: Units, estimate: number, target: number) {
  if (units.gravityUnit === 'plato') {
    const gap = Math.abs(units.toDisplay('gravity', estimate) - units.toDisplay('gravity', target));
    return `${gap.toFixed(1)}\u00a0°P`;
  }
  const points = Math.round(Math.abs(estimate - target) * 1000);
  return points === 1 ? '1 point' : `${points} points`;
}

/** What the targets panel reads: the form's values or a saved recipe. */
interface PanelValues {
  fermentables: readonly { amountKg?: unknown; kind?: unknown; potentialPointsLPerKg?: unknown; colourLovibond?: unknown }[];
  hops?: readonly { amountG?: unknown; minutes?: unknown; alphaAcidPercent?: unknown }[];
  efficiency: unknown;
  batchVolumeL: unknown;
  preBoilVolumeL?: unknown;
  postBoilVolumeL?: unknown;
  targetOg: unknown;
  targetFg: unknown;
  targetIbu?: unknown;
  targetColourSrm?: unknown;
}

/** Estimated OG from the fermentables beside the target, and what the target pair means. */
export function TargetsPanel({
  values,
  units,
  estimateOnly = false,
}: {
  values: PanelValues;
  units: Units;
  /** Where the targets are already shown large (the read view): only what the fermentables give. */
  estimateOnly?: boolean;
}) {
  const estimate = estimateRecipeOg(values);
  const abv = targetAbv(values.targetOg, values.targetFg);
  const target = typeof values.targetOg === 'number' ? values.targetOg : null;
  let agreement: ReactNode = null;
  if (estimate.og !== null && target !== null && target > 1) {
    const gap = estimate.og - target;
    agreement =
      Math.abs(gap) <= OG_AGREEMENT_SG + 1e-9 ? (
        <Notice tone="success">Agrees with the target OG, within {formatGap(units, target + OG_AGREEMENT_SG, target)}.</Notice>
      ) : gap < 0 ? (
        <Notice tone="caution">
          The fermentables give {formatGap(units, estimate.og, target)} less than the target. Add fermentables, raise the efficiency or lower the target.
        </Notice>
      ) : (
        <Notice tone="caution">
          The fermentables give {formatGap(units, estimate.og, target)} more than the target. Use less, or raise the target.
        </Notice>
      );
  }
  return (
    <div className="space-y-3" aria-live="polite">
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <Figure label="Estimated OG" value={estimate.og === null ? '—' : units.format('gravity', estimate.og)} />
        {!estimateOnly && <Figure label="Target OG" value={target === null ? '—' : units.format('gravity', target)} />}
        {!estimateOnly && <Figure label="ABV (simple)" value={abv ? `${abv.abvPercent.toFixed(1)}\u00a0%` : '—'} />}
        <Figure label="Apparent attenuation" value={abv ? `${Math.round(abv.apparentAttenuation * 100)}\u00a0%` : '—'} />
      </dl>
      {estimate.og === null && <p className="text-sm text-ink-faint">{estimate.reason}</p>}
      {agreement}
      <BitternessColourFigures values={values} estimateOnly={estimateOnly} />
    </div>
  );
}

/** Estimated bitterness (Tinseth) and colour (Morey) beside their targets, and BU:GU. */
function BitternessColourFigures({ values, estimateOnly }: { values: PanelValues; estimateOnly: boolean }) {
  const scale = useColourScale();
  const ibu = estimateRecipeIbu(values);
  const colour = estimateRecipeColour(values);
  const targetIbu = typeof values.targetIbu === 'number' ? values.targetIbu : null;
  const targetSrm = typeof values.targetColourSrm === 'number' ? values.targetColourSrm : null;
  const targetOg = typeof values.targetOg === 'number' ? values.targetOg : null;
  const buGu = recipeBuGu(targetIbu ?? ibu.ibu, targetOg);
  const notes: ReactNode[] = [];
  if (ibu.ibu !== null && targetIbu !== null && Math.abs(ibu.ibu - targetIbu) > IBU_AGREEMENT) {
    notes.push(`The hops give ${Math.round(ibu.ibu)} IBU, ${ibu.ibu < targetIbu ? 'below' : 'above'} the ${Math.round(targetIbu)} IBU target.`);
  }
  if (colour.srm !== null && targetSrm !== null && Math.abs(colour.srm - targetSrm) > COLOUR_AGREEMENT_SRM) {
    notes.push(`The grist gives ${formatColour(colour.srm, scale)}, ${colour.srm < targetSrm ? 'paler' : 'darker'} than the ${formatColour(targetSrm, scale)} target.`);
  }
  return (
    <>
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <Figure label="Estimated bitterness" value={ibu.ibu === null ? '—' : `${Math.round(ibu.ibu)}\u00a0IBU`} />
        {!estimateOnly && <Figure label="Target bitterness" value={targetIbu === null ? '—' : `${Math.round(targetIbu)}\u00a0IBU`} />}
        <Figure label="BU:GU" value={buGu === null ? '—' : buGu.toFixed(2)} />
        <Figure label="Estimated colour" value={formatColour(colour.srm, scale)} />
        {!estimateOnly && <Figure label="Target colour" value={formatColour(targetSrm, scale)} />}
      </dl>
      <p className="text-sm text-ink-faint">
        Bitterness by Tinseth&apos;s formula, colour by Morey&apos;s equation; BU:GU is bitterness over the OG&apos;s gravity points (about 0.5 is balanced, common practice).
        {ibu.reason ? ` ${ibu.reason}` : ''}
        {colour.reason ? ` ${colour.reason}` : ''}
        {ibu.assumptions.length > 0 ? ` ${ibu.assumptions.join(' ')}` : ''}
        {colour.beyondFit ? ' Beyond about 50 SRM Morey\'s equation is a rough figure only.' : ''}
      </p>
      {notes.length > 0 && <Notice tone="caution">{notes.map((n, i) => <p key={i}>{n}</p>)}</Notice>}
    </>
  );
}

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div className="rounded-lg bg-cellar-50 p-3">
      <dt className="text-xs font-semibold uppercase tracking-wide text-ink-faint">{label}</dt>
      <dd className="mt-1 text-2xl font-bold tabular-nums text-cellar-900">{value}</dd>
    </div>
  );
}

function GravitySection() {
  const { values } = useFormikContext<RecipeFormValues>();
  const units = useUnits();
  const scale = useColourScale();
  return (
    <Section title="Targets" description="What the brew day is judged against. ABV by (OG − FG) × 131.25. Bitterness and colour are optional.">
      <div className="grid gap-4 sm:grid-cols-2">
        <QuantityField name="targetOg" kind="gravity" label="Target OG" />
        <QuantityField name="targetFg" kind="gravity" label="Target FG" />
        <NumberField name="targetIbu" label="Target bitterness" unit="IBU" decimals={0} />
        <NumberField name="targetColourSrm" label="Target colour" {...colourFieldProps(scale)} />
      </div>
      <div className="mt-4">
        <TargetsPanel values={values} units={units} />
      </div>
    </Section>
  );
}

function RowError({ name }: { name: string }) {
  const { errors, touched, submitCount } = useFormikContext<RecipeFormValues>();
  const error = getIn(errors, name);
  if (typeof error !== 'string' || (!getIn(touched, name) && submitCount === 0)) return null;
  return (
    <p role="alert" className="mt-2 text-sm font-semibold text-alert-700">
      {error}
    </p>
  );
}

function KindSelect({ index }: { index: number }) {
  const name = `fermentables.${index}.kind`;
  const [field, meta] = useField<RecipeFermentableKind>(name);
  const { setFieldValue, values } = useFormikContext<RecipeFormValues>();
  const id = useId();
  const invalid = Boolean(meta.touched && meta.error);
  return (
    <div>
      <label htmlFor={id} className="mb-1 block text-sm font-semibold text-ink-soft">
        Kind
      </label>
      <select
        id={id}
        {...field}
        onChange={(e) => {
          const next = e.target.value as RecipeFermentableKind;
          const current = values.fermentables[index];
          // Swap in the new kind's usual potential unless the author typed their own.
          if (current.potentialPointsLPerKg === '' || current.potentialPointsLPerKg === defaultPotentialPointsLPerKg[current.kind]) {
            void setFieldValue(`fermentables.${index}.potentialPointsLPerKg`, defaultPotentialPointsLPerKg[next] ?? '');
          }
          void setFieldValue(name, next);
        }}
        aria-invalid={invalid || undefined}
        className="block min-h-touch w-full rounded-lg border border-cellar-300 bg-white px-3 py-2 text-base"
      >
        {fermentableKinds.map((k) => (
          <option key={k} value={k}>
            {fermentableKindLabels[k]}
          </option>
        ))}
      </select>
      {invalid && (
        <p role="alert" className="mt-1 text-sm font-semibold text-alert-700">
          {meta.error}
        </p>
      )}
    </div>
  );
}

function FermentablesSection() {
  const { values } = useFormikContext<RecipeFormValues>();
  const units = useUnits();
  const scale = useColourScale();
  const us = units.unitSystem === 'us';
  return (
    <Section
      title="Fermentables"
      description={
        (us
          ? 'Potential in gravity points per pound per gallon (ppg): pale malt about 36, dry malt extract 44, table sugar 46. Efficiency applies to grain only.'
          : 'Potential in gravity points × litres per kilogram: pale malt about 300, dry malt extract 367, table sugar 384. Efficiency applies to grain only.') +
        (scale === 'ebc' ? ' Colour in EBC from the maltster (pale malt about 6, crystal 60 to 300); leave it empty if unknown.' : ' Colour in °L from the maltster (pale malt about 3, crystal 30 to 150); leave it empty if unknown.')
      }
    >
      <FieldArray name="fermentables">
        {(helpers) => (
          <div className="space-y-3">
            {values.fermentables.map((_f, i) => (
              <fieldset key={i} className="rounded-lg border border-cellar-100 p-3">
                <legend className="px-1 text-sm font-semibold text-ink-soft">Fermentable {i + 1}</legend>
                <div className="grid gap-3 sm:grid-cols-[2fr_1.4fr_1fr_1fr_1fr_auto] sm:items-start">
                  <TextField name={`fermentables.${i}.name`} label="Name" autoComplete="off" />
                  <KindSelect index={i} />
                  <QuantityField name={`fermentables.${i}.amountKg`} kind="mass" label="Amount" />
                  <NumberField name={`fermentables.${i}.colourLovibond`} label="Colour" {...colourFieldProps(scale, true)} />
                  <NumberField
                    name={`fermentables.${i}.potentialPointsLPerKg`}
                    label="Potential"
                    unit={us ? 'ppg' : 'pts·L/kg'}
                    toShown={us ? (v) => v / PPG : undefined}
                    shownToStored={us ? (v) => v * PPG : undefined}
                    decimals={us ? 1 : 0}
                  />
                  <RemoveButton label={`Remove fermentable ${i + 1}`} onClick={() => helpers.remove(i)} />
                </div>
              </fieldset>
            ))}
            <RowError name="fermentables" />
            <Button variant="secondary" icon={<Plus aria-hidden className="size-5" />} onClick={() => helpers.push(emptyFermentable())}>
              Add a fermentable
            </Button>
          </div>
        )}
      </FieldArray>
    </Section>
  );
}

function RemoveButton({ label, onClick }: { label: string; onClick: () => void }) {
  return (
    <Button variant="quiet" aria-label={label} title={label} onClick={onClick} className="self-end text-alert-700">
      <Trash2 aria-hidden className="size-5" />
      <span className="sm:hidden">Remove</span>
    </Button>
  );
}

function HopsSection() {
  const { values } = useFormikContext<RecipeFormValues>();
  return (
    <Section title="Hops" description="Minutes are minutes of boil left when the hop goes in; 0 for additions at flame-out or later.">
      <FieldArray name="hops">
        {(helpers) => (
          <div className="space-y-3">
            {values.hops.length === 0 && <p className="text-sm text-ink-faint">No hops yet.</p>}
            {values.hops.map((_h, i) => (
              <fieldset key={i} className="rounded-lg border border-cellar-100 p-3">
                <legend className="px-1 text-sm font-semibold text-ink-soft">Hop {i + 1}</legend>
                <div className="grid gap-3 sm:grid-cols-[2fr_1fr_1fr_1fr_auto] sm:items-start">
                  <TextField name={`hops.${i}.name`} label="Name" autoComplete="off" />
                  <QuantityField name={`hops.${i}.amountG`} kind="smallMass" label="Amount" />
                  <NumberField name={`hops.${i}.minutes`} label="Minutes" unit="min" />
                  <NumberField name={`hops.${i}.alphaAcidPercent`} label="Alpha acid" unit="%" />
                  <RemoveButton label={`Remove hop ${i + 1}`} onClick={() => helpers.remove(i)} />
                </div>
              </fieldset>
            ))}
            <RowError name="hops" />
            <Button variant="secondary" icon={<Plus aria-hidden className="size-5" />} onClick={() => helpers.push(emptyHop())}>
              Add a hop
            </Button>
          </div>
        )}
      </FieldArray>
    </Section>
  );
}

function MashAndFermentationSection() {
  const { values } = useFormikContext<RecipeFormValues>();
  return (
    <>
      <Section title="Mash" description="Read mash pH on a cooled sample; about 5.2 to 5.6 is the usual band.">
        <NumberField name="mashPhTarget" label="Target mash pH" unit="pH" className="max-w-xs" decimals={2} />
        <NumberField
          name="souringTargetPh"
          label="Souring target pH (kettle sours only)"
          unit="pH"
          className="mt-4 max-w-xs"
          decimals={2}
          hint="Leave empty unless the wort is soured before the boil; about 3.2 to 3.6 is usual."
        />
        <FieldArray name="mashSteps">
          {(helpers) => (
            <div className="mt-4 space-y-3">
              {values.mashSteps.length === 0 && <p className="text-sm text-ink-faint">No mash steps (an extract brew, perhaps).</p>}
              {values.mashSteps.map((_m, i) => (
                <fieldset key={i} className="rounded-lg border border-cellar-100 p-3">
                  <legend className="px-1 text-sm font-semibold text-ink-soft">Step {i + 1}</legend>
                  <div className="grid gap-3 sm:grid-cols-[1fr_1fr_auto] sm:items-start">
                    <QuantityField name={`mashSteps.${i}.tempC`} kind="temperature" label="Temperature" />
                    <NumberField name={`mashSteps.${i}.minutes`} label="Length" unit="min" />
                    <RemoveButton label={`Remove step ${i + 1}`} onClick={() => helpers.remove(i)} />
                  </div>
                </fieldset>
              ))}
              <RowError name="mashSteps" />
              <Button variant="secondary" icon={<Plus aria-hidden className="size-5" />} onClick={() => helpers.push(emptyMashStep())}>
                Add a mash step
              </Button>
            </div>
          )}
        </FieldArray>
      </Section>
      <Section title="Yeast and fermentation">
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField name="yeast.name" label="Yeast" autoComplete="off" />
          <TextField name="yeast.amount" label="How much yeast" autoComplete="off" hint="e.g. 1 sachet, rehydrated." />
          <QuantityField name="fermentationTempMinC" kind="temperature" label="Lowest fermentation temperature" />
          <QuantityField name="fermentationTempMaxC" kind="temperature" label="Highest fermentation temperature" />
        </div>
      </Section>
    </>
  );
}
