import { Field, Formik, useFormikContext } from 'formik';
import { useId } from 'react';
import { BrewMathError } from '@shared/brewmath';
import { correctReading, type CorrectedReading } from '@shared/instruments';
import type { InstrumentSnapshot } from '@shared/schemas/instruments';
import { Notice } from '@/components/ui/notice';
import { QuantityField } from '@/components/ui/quantity-field';
import type { Units } from '@/lib/units';
import { correctionInWords, formNumber, type FormNumber } from './describe';
import { NumberField } from '@/components/ui/number-field';
import { Figure } from '@/components/ui/figure';

interface CheckValues {
  sg: FormNumber;
  sampleTempC: FormNumber;
  brix: FormNumber;
  originalBrix: FormNumber;
  fermentationStarted: boolean;
  tempC: FormNumber;
  ph: FormNumber;
}

const empty: CheckValues = { sg: '', sampleTempC: '', brix: '', originalBrix: '', fermentationStarted: false, tempC: '', ph: '' };

type Outcome = { raw: string; result: CorrectedReading; corrected: string } | { error: string } | null;

const isNum = (v: FormNumber) => typeof v === 'number' && Number.isFinite(v);

/** The same correctReading the brew-day log stores with, applied as the brewer types. */
function work(snapshot: InstrumentSnapshot, v: CheckValues, units: Units): Outcome {
  try {
    switch (snapshot.kind) {
      case 'hydrometer': {
        if (!isNum(v.sg) || !isNum(v.sampleTempC)) return null;
        const result = correctReading(snapshot, { sg: v.sg as number, sampleTempC: v.sampleTempC as number }, new Date(), { unitSystem: units.unitSystem });
        return { raw: `${units.format('gravity', v.sg as number)} at ${units.format('temperature', v.sampleTempC as number)}`, result, corrected: units.format('gravity', result.corrected) };
      }
      case 'refractometer': {
        if (!isNum(v.brix)) return null;
        if (v.fermentationStarted && !isNum(v.originalBrix) && v.originalBrix !== '') return null;
        const result = correctReading(snapshot, { brix: v.brix as number, originalBrix: formNumber(v.originalBrix), fermentationStarted: v.fermentationStarted });
        return { raw: `${v.brix} °Bx`, result, corrected: units.format('gravity', result.corrected) };
      }
      case 'thermometer': {
        if (!isNum(v.tempC)) return null;
        const result = correctReading(snapshot, { tempC: v.tempC as number });
        return { raw: units.format('temperature', v.tempC as number), result, corrected: units.format('temperature', result.corrected) };
      }
      case 'ph_meter': {
        if (!isNum(v.ph)) return null;
        const result = correctReading(snapshot, { ph: v.ph as number }, new Date());
        return { raw: `pH ${(v.ph as number).toFixed(2)}`, result, corrected: `pH ${result.corrected.toFixed(2)}` };
      }
    }
  } catch (error) {
    if (error instanceof BrewMathError) return { error: error.message };
    throw error;
  }
}

/**
 * "Check a reading": type a raw value, see it corrected with this instrument's calibration,
 * exactly as a reading taken now would be stored. Nothing is saved.
 */
export function CheckReading({ snapshot, units }: { snapshot: InstrumentSnapshot; units: Units }) {
  return (
    <Formik<CheckValues> initialValues={empty} onSubmit={() => {}}>
      <CheckReadingBody snapshot={snapshot} units={units} />
    </Formik>
  );
}

function CheckReadingBody({ snapshot, units }: { snapshot: InstrumentSnapshot; units: Units }) {
  const { values } = useFormikContext<CheckValues>();
  const headingId = useId();
  const outcome = work(snapshot, values, units);
  return (
    // A group, not a region: every instrument card has one, and landmarks must have distinct names.
    <div role="group" aria-labelledby={headingId} className="rounded-lg bg-cellar-50 p-3" data-testid="check-reading">
      <h4 id={headingId} className="mb-2 font-semibold text-cellar-900">
        Check a reading
      </h4>
      <div className="grid grid-cols-2 gap-2">
        {snapshot.kind === 'hydrometer' && (
          <>
            <QuantityField name="sg" kind="gravity" label="Hydrometer reads" units={units} />
            <QuantityField name="sampleTempC" kind="temperature" label="Sample at" units={units} />
          </>
        )}
        {snapshot.kind === 'refractometer' && (
          <>
            <NumberField name="brix" label="Refractometer reads" unit="°Bx" />
            <div className="flex items-end">
              <label className="flex min-h-touch items-center gap-2 text-sm">
                <Field type="checkbox" name="fermentationStarted" className="size-5 accent-cellar-500" />
                Fermenting already
              </label>
            </div>
            {values.fermentationStarted && <NumberField name="originalBrix" label="Brix before fermentation" unit="°Bx" className="col-span-2" />}
          </>
        )}
        {snapshot.kind === 'thermometer' && <QuantityField name="tempC" kind="temperature" label="Thermometer shows" units={units} className="col-span-2 sm:col-span-1" />}
        {snapshot.kind === 'ph_meter' && <NumberField name="ph" label="Meter shows" unit="pH" className="col-span-2 sm:col-span-1" />}
      </div>

      <dl className="mt-3 grid grid-cols-2 gap-2" aria-live="polite">
        <Figure className="rounded-lg bg-white p-2" label="Raw" value={outcome && 'raw' in outcome ? outcome.raw : '—'} size="xl" valueTestId="raw" />
        <Figure
          className="rounded-lg bg-white p-2 ring-2 ring-cellar-300"
          label={outcome && 'result' in outcome && outcome.result.correction.kind === 'wcf-alcohol' && outcome.result.correction.rough ? 'Rough estimate' : 'Corrected'}
          value={outcome && 'corrected' in outcome ? outcome.corrected : '—'}
          size="xl"
          tone="strong"
          valueTestId="corrected"
        />
      </dl>
      {outcome && 'result' in outcome && (
        <>
          <p className="mt-2 text-sm text-ink-soft" data-testid="correction">
            {correctionInWords(outcome.result.correction, units)}
          </p>
          {outcome.result.warnings.map((w) => (
            <Notice key={w} tone="caution" className="mt-2">
              {w}
            </Notice>
          ))}
        </>
      )}
      {outcome && 'error' in outcome && (
        <Notice tone="error" className="mt-2">
          {outcome.error}
        </Notice>
      )}
    </div>
  );
}
