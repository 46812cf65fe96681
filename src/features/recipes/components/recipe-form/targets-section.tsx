import { useFormikContext } from 'formik';
import { NumberField } from '@/components/ui/number-field';
import { QuantityField } from '@/components/ui/quantity-field';
import { colourFieldProps, useColourScale } from '@/lib/colour';
import { useUnits } from '@/lib/units';
import type { RecipeFormValues } from './form-values';
import { Section } from './section';
import { TargetsPanel } from './targets-panel';

/** OG and FG, bitterness and colour, with the estimates from the ingredients beside them. */
export function TargetsSection() {
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
