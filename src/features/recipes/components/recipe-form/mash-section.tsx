import { FieldArray, useFormikContext } from 'formik';
import { Plus } from 'lucide-react';
import { Button } from '@/components/ui/button';
import { NumberField } from '@/components/ui/number-field';
import { QuantityField } from '@/components/ui/quantity-field';
import { emptyMashStep, type RecipeFormValues } from './form-values';
import { RemoveButton, RowError, Section } from './section';

/** Mash pH, the souring target of a kettle sour, and the mash steps. */
export function MashSection() {
  const { values } = useFormikContext<RecipeFormValues>();
  return (
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
  );
}
