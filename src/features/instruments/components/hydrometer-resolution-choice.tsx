import { HYDROMETER_RESOLUTION_PRESETS_SG } from '@shared/schemas/instruments';
import { SelectField } from '@/components/ui/select-field';

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
    <SelectField name="resolutionSg" label="Scale step (gap between two marks)" className="max-w-80">
      {HYDROMETER_RESOLUTION_PRESETS_SG.map((step) => (
        <option key={step} value={String(step)}>
          {labels[step]}
        </option>
      ))}
    </SelectField>
  );
}
