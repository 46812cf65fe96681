import { useFormikContext } from 'formik';
import { impliedBoilOffLPerHour, boilOffMismatch } from '@shared/schemas/recipes';
import { Button } from '@/components/ui/button';
import { NumberField } from '@/components/ui/number-field';
import { QuantityField } from '@/components/ui/quantity-field';
import { useUnits } from '@/lib/units';
import type { RecipeFormValues } from './form-values';
import { Section } from './section';

/** Volumes, boil length and boil-off (with the rate the volumes imply when they disagree), efficiency. */
export function BoilSection() {
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
