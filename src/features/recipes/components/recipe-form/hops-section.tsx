import { FieldArray, useFormikContext } from 'formik';
import { Plus } from 'lucide-react';
import { Button } from '@/components/ui/button';
import { NumberField } from '@/components/ui/number-field';
import { QuantityField } from '@/components/ui/quantity-field';
import { TextField } from '@/components/ui/text-field';
import { emptyHop, type RecipeFormValues } from './form-values';
import { RemoveButton, RowError, Section } from './section';

/** Hop additions by minutes of boil left. */
export function HopsSection() {
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
