import { Field } from 'formik';
import { HYDROMETER_RESOLUTION_PRESETS_SG } from '@shared/schemas/instruments';

const labels: Record<(typeof HYDROMETER_RESOLUTION_PRESETS_SG)[number], string> = {
  0.0005: '0.0005 (a fine lab hydrometer)',
  0.001: '0.001 (most brewing hydrometers)',
  0.002: '0.002 (a coarse or wide-range one)',
};

/**
 * The gap between two marks on the hydrometer's scale. The final-gravity verdict counts two
 * readings as the same only when they are closer than half of it. Formik field `resolutionSg` (text).
 */
export function HydrometerResolutionChoice() {
  return (
    <label className="block max-w-80">
      <span className="mb-1 block text-sm font-semibold text-ink-soft">Scale step (gap between two marks)</span>
      <Field as="select" name="resolutionSg" className="block min-h-touch w-full rounded-lg border border-cellar-300 bg-white px-3">
        {HYDROMETER_RESOLUTION_PRESETS_SG.map((step) => (
          <option key={step} value={String(step)}>
            {labels[step]}
          </option>
        ))}
      </Field>
    </label>
  );
}
