import { FieldArray, Form, Formik, useFormikContext } from 'formik';
import { Plus, Trash2 } from 'lucide-react';
import { useState } from 'react';
import { BrewMathError } from '@shared/brewmath';
import { wcfCalibration, type WcfCalibrationResult } from '@shared/instruments';
import { calibrateInstrumentSchema, DEFAULT_HYDROMETER_CALIBRATION_C, MAX_WCF_PAIRS, type CalibrateInstrumentBody, type Instrument } from '@shared/schemas/instruments';
import { Button } from '@/components/ui/button';
import { SaveFooter } from '@/components/ui/save-footer';
import { Notice } from '@/components/ui/notice';
import { QuantityField } from '@/components/ui/quantity-field';
import { applyApiError, zodValidate } from '@/lib/form';
import type { Units } from '@/lib/units';
import { useCalibrateInstrument } from '../api/calibrate-instrument';
import { formNumber, type FormNumber } from './describe';
import { NumberField } from '@/components/ui/number-field';
import { Figure } from '@/components/ui/figure';
import { SelectField } from '@/components/ui/select-field';

interface PairValues {
  brix: FormNumber;
  sg: FormNumber;
  sampleTempC: FormNumber;
}

interface WcfValues {
  /** A hydrometer's id, or "assume:20" / "assume:15.56" when the brewer has none profiled. */
  hydrometer: string;
  pairs: PairValues[];
}

const emptyPair: PairValues = { brix: '', sg: '', sampleTempC: '' };

function toBody(values: WcfValues, hydrometers: Instrument[]): CalibrateInstrumentBody {
  const chosen = values.hydrometer.startsWith('assume:') ? null : hydrometers.find((h) => String(h.id) === values.hydrometer);
  const assumed = values.hydrometer.startsWith('assume:') ? Number(values.hydrometer.slice(7)) : DEFAULT_HYDROMETER_CALIBRATION_C;
  return {
    method: 'wcf-pairs',
    hydrometerId: chosen?.id ?? null,
    hydrometerCalibrationTempC: chosen?.calibrationTempC ?? assumed,
    pairs: values.pairs.map((p) => ({ brix: p.brix as number, sg: p.sg as number, sampleTempC: formNumber(p.sampleTempC) })),
  };
}

type Preview = { ok: WcfCalibrationResult } | { error: string } | null;

function preview(body: CalibrateInstrumentBody): Preview {
  if (body.method !== 'wcf-pairs' || !calibrateInstrumentSchema.safeParse(body).success) return null;
  try {
    return { ok: wcfCalibration(body) };
  } catch (error) {
    if (error instanceof BrewMathError) return { error: error.message };
    throw error;
  }
}

/**
 * Measuring a refractometer's wort correction factor: several pairs of readings of the same
 * unfermented wort, refractometer Brix beside the hydrometer, each pair's factor shown, then the
 * mean and spread. Nothing is saved until the brewer accepts the factor.
 */
export function WcfCalibration({ instrument, hydrometers, units, onDone }: { instrument: Instrument; hydrometers: Instrument[]; units: Units; onDone: () => void }) {
  const calibrate = useCalibrateInstrument(instrument.id);
  const [saved, setSaved] = useState<number | null>(null);
  const initial: WcfValues = { hydrometer: hydrometers[0] ? String(hydrometers[0].id) : 'assume:20', pairs: [emptyPair, emptyPair, emptyPair] };
  const validate = (values: WcfValues) => zodValidate(calibrateInstrumentSchema)(toBody(values, hydrometers));

  if (saved !== null) {
    return (
      <Notice tone="success" title={`Saved: factor ${saved.toFixed(3)}`}>
        Readings from now on use it. Earlier readings keep the factor they were taken with.{' '}
        <button type="button" className="min-h-touch font-semibold underline" onClick={onDone}>
          Close
        </button>
      </Notice>
    );
  }

  return (
    <Formik<WcfValues>
      initialValues={initial}
      validate={validate}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          const res = await calibrate.mutateAsync(toBody(values, hydrometers));
          setSaved(res.instrument.snapshot.kind === 'refractometer' ? res.instrument.snapshot.wcf : 0);
        } catch (error) {
          // What was typed stays; the button below is the retry.
          applyApiError(error, helpers);
        }
      }}
    >
      <WcfForm hydrometers={hydrometers} units={units} onCancel={onDone} />
    </Formik>
  );
}

function WcfForm({ hydrometers, units, onCancel }: { hydrometers: Instrument[]; units: Units; onCancel: () => void }) {
  const { values, isSubmitting, status } = useFormikContext<WcfValues>();
  const result = preview(toBody(values, hydrometers));
  return (
    <Form noValidate className="space-y-4">
      <p className="text-sm text-ink-soft">
        Take a few drops and a trial jar from the <strong>same unfermented wort</strong> (before pitching), read both, and enter each pair. Three or more pairs,
        from different brews if you can, show whether the readings agree.
      </p>
      <SelectField name="hydrometer" label="Hydrometer used">
        {hydrometers.map((h) => (
          <option key={h.id} value={String(h.id)}>
            {h.name} ({units.format('temperature', h.calibrationTempC ?? DEFAULT_HYDROMETER_CALIBRATION_C)})
          </option>
        ))}
        <option value="assume:20">Another, true at {units.format('temperature', 20)}</option>
        <option value="assume:15.56">Another, true at {units.format('temperature', 15.56)}</option>
      </SelectField>

      <FieldArray name="pairs">
        {({ push, remove }) => (
          <ol className="space-y-3">
            {values.pairs.map((_, i) => {
              const pair = result && 'ok' in result ? result.ok.pairs[i] : null;
              return (
                <li key={i} className="rounded-lg bg-white p-3 ring-1 ring-cellar-100">
                  <div className="mb-2 flex items-center justify-between">
                    <h5 className="font-semibold text-cellar-900">Pair {i + 1}</h5>
                    {values.pairs.length > 1 && (
                      <Button variant="quiet" aria-label={`Remove pair ${i + 1}`} onClick={() => remove(i)} icon={<Trash2 aria-hidden className="size-5" />} />
                    )}
                  </div>
                  <div className="grid grid-cols-2 gap-2 sm:grid-cols-3">
                    <NumberField name={`pairs.${i}.brix`} label="Refractometer" unit="°Bx" />
                    <QuantityField name={`pairs.${i}.sg`} kind="gravity" label="Hydrometer" units={units} />
                    <QuantityField name={`pairs.${i}.sampleTempC`} kind="temperature" label="Sample temp. (optional)" units={units} className="col-span-2 sm:col-span-1" />
                  </div>
                  {pair && (
                    <p className="mt-2 text-sm text-ink-soft" data-testid={`pair-factor-${i}`}>
                      {pair.sampleTempC !== null && <>Hydrometer corrected to {units.format('gravity', pair.correctedSg)}; </>}
                      factor <strong className="text-ink">{pair.factor.toFixed(3)}</strong>
                    </p>
                  )}
                </li>
              );
            })}
            {values.pairs.length < MAX_WCF_PAIRS && (
              <li>
                <Button variant="secondary" icon={<Plus aria-hidden className="size-5" />} onClick={() => push(emptyPair)}>
                  Add a pair
                </Button>
              </li>
            )}
          </ol>
        )}
      </FieldArray>

      {result && 'error' in result && <Notice tone="error">{result.error}</Notice>}
      {result && 'ok' in result && (
        <div className="rounded-lg bg-white p-3 ring-2 ring-cellar-300">
          <dl className="grid grid-cols-3 gap-2 text-center">
            <Figure label="Factor (mean)" value={result.ok.wcf.toFixed(3)} size="2xl" tone="strong" valueTestId="wcf-mean" />
            <Figure label="Spread" value={result.ok.spread.toFixed(3)} size="2xl" valueTestId="wcf-spread" />
            <Figure label="Pairs" value={result.ok.count} size="2xl" />
          </dl>
          {result.ok.warnings.map((w) => (
            <Notice key={w} tone="caution" className="mt-2">
              {w}
            </Notice>
          ))}
        </div>
      )}

      <SaveFooter status={status} keptNote="Your readings are still here: try again." submitLabel={result && 'ok' in result ? `Use factor ${result.ok.wcf.toFixed(3)}` : 'Enter the pairs to see the factor'} busy={isSubmitting} disabled={!result || !('ok' in result)} onCancel={onCancel} />
    </Form>
  );
}
