import { FieldArray, useFormikContext } from 'formik';
import { Plus } from 'lucide-react';
import { KG_PER_LB, LITRES_PER_US_GALLON } from '@shared/brewmath';
import { defaultPotentialPointsLPerKg, fermentableKindLabels, fermentableKinds, type RecipeFermentableKind } from '@shared/schemas/recipes';
import { Button } from '@/components/ui/button';
import { NumberField } from '@/components/ui/number-field';
import { QuantityField } from '@/components/ui/quantity-field';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { colourFieldProps, useColourScale } from '@/lib/colour';
import { useUnits } from '@/lib/units';
import { emptyFermentable, type RecipeFormValues } from './form-values';
import { RemoveButton, RowError, Section } from './section';

/** 1 point per pound per US gallon in points·L/kg: from the exact gallon and pound. */
const PPG = LITRES_PER_US_GALLON / KG_PER_LB;

/** Malts, extracts and sugars: amount, colour and potential (in ppg for US brewers). */
export function FermentablesSection() {
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

function KindSelect({ index }: { index: number }) {
  const name = `fermentables.${index}.kind`;
  const { setFieldValue, values } = useFormikContext<RecipeFormValues>();
  return (
    <SelectField
      name={name}
      label="Kind"
      onChange={(e) => {
        const next = e.target.value as RecipeFermentableKind;
        const current = values.fermentables[index];
        // Swap in the new kind's usual potential unless the author typed their own.
        if (current.potentialPointsLPerKg === '' || current.potentialPointsLPerKg === defaultPotentialPointsLPerKg[current.kind]) {
          void setFieldValue(`fermentables.${index}.potentialPointsLPerKg`, defaultPotentialPointsLPerKg[next] ?? '');
        }
        void setFieldValue(name, next);
      }}
    >
      {fermentableKinds.map((k) => (
        <option key={k} value={k}>
          {fermentableKindLabels[k]}
        </option>
      ))}
    </SelectField>
  );
}
