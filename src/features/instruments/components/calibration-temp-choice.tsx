import { Field } from 'formik';
import { QuantityField } from '@/components/ui/quantity-field';
import type { Units } from '@/lib/units';

/**
 * The temperature a hydrometer reads true at: the two printed on most scales, or another.
 * Formik fields `preset` ('20' | '15.56' | 'other') and `calibrationTempC`.
 */
export function CalibrationTempChoice({ preset, units }: { preset: string; units: Units }) {
  const choices: [string, string][] = [
    ['20', units.format('temperature', 20)],
    ['15.56', `${units.format('temperature', 15.56)}${units.unitSystem === 'us' ? '' : ' (60 °F)'}`],
    ['other', 'Other'],
  ];
  return (
    <fieldset>
      <legend className="mb-1 text-sm font-semibold text-ink-soft">Reads true at (printed on its scale)</legend>
      <div className="flex flex-wrap gap-2">
        {choices.map(([value, label]) => (
          <label key={value} className="flex min-h-touch items-center gap-2 rounded-lg bg-white px-3 ring-1 ring-cellar-300">
            <Field type="radio" name="preset" value={value} className="size-5 accent-cellar-500" />
            {label}
          </label>
        ))}
      </div>
      {preset === 'other' && <QuantityField name="calibrationTempC" kind="temperature" label="Calibration temperature" units={units} className="mt-2 max-w-60" />}
    </fieldset>
  );
}
