import { Form, Formik, useFormikContext } from 'formik';
import { useState } from 'react';
import { BrewMathError } from '@shared/brewmath';
import { thermometerCheck, type ThermometerCheckResult } from '@shared/instruments';
import { calibrateInstrumentSchema, type CalibrateInstrumentBody, type Instrument } from '@shared/schemas/instruments';
import { SaveFooter } from '@/components/ui/save-footer';
import { Notice } from '@/components/ui/notice';
import { QuantityField } from '@/components/ui/quantity-field';
import { applyApiError, zodValidate } from '@/lib/form';
import type { Units } from '@/lib/units';
import { useCalibrateInstrument } from '../api/calibrate-instrument';
import { formNumber, signedDelta, type FormNumber } from './describe';
import { NumberField } from '@/components/ui/number-field';
import { Figure } from '@/components/ui/figure';

interface CheckValues {
  iceReadingC: FormNumber;
  boilingReadingC: FormNumber;
  elevationM: FormNumber;
}

const M_PER_FT = 0.3048;

function toBody(v: CheckValues): CalibrateInstrumentBody {
  return { method: 'thermometer-check', iceReadingC: formNumber(v.iceReadingC), boilingReadingC: formNumber(v.boilingReadingC), elevationM: formNumber(v.elevationM) };
}

type Preview = { ok: ThermometerCheckResult } | { error: string } | null;

function preview(body: CalibrateInstrumentBody): Preview {
  if (body.method !== 'thermometer-check' || !calibrateInstrumentSchema.safeParse(body).success) return null;
  try {
    return { ok: thermometerCheck(body) };
  } catch (error) {
    if (error instanceof BrewMathError) return { error: error.message };
    throw error;
  }
}

/** The thermometer check: a stirred ice bath (0 °C) and/or water at a rolling boil at the brewer's elevation. */
export function ThermometerCheck({ instrument, units, elevationM, onDone }: { instrument: Instrument; units: Units; elevationM: number | null; onDone: () => void }) {
  const calibrate = useCalibrateInstrument(instrument.id);
  const [saved, setSaved] = useState<number | null>(null);
  if (saved !== null) {
    return (
      <Notice tone="success" title={`Saved: offset ${signedDelta(units, saved)}`}>
        Readings from now on are corrected by it; earlier readings keep the offset they were taken with.{' '}
        <button type="button" className="min-h-touch font-semibold underline" onClick={onDone}>
          Close
        </button>
      </Notice>
    );
  }
  return (
    <Formik<CheckValues>
      initialValues={{ iceReadingC: '', boilingReadingC: '', elevationM: elevationM ?? '' }}
      validate={(v) => zodValidate(calibrateInstrumentSchema)(toBody(v))}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          const res = await calibrate.mutateAsync(toBody(values));
          setSaved(res.instrument.offsetC ?? 0);
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      <CheckForm units={units} onCancel={onDone} />
    </Formik>
  );
}

function CheckForm({ units, onCancel }: { units: Units; onCancel: () => void }) {
  const { values, isSubmitting, status } = useFormikContext<CheckValues>();
  const result = preview(toBody(values));
  const us = units.unitSystem === 'us';
  return (
    <Form noValidate className="space-y-4">
      <Notice tone="caution" title="Boiling water and steam burn">
        Use a pot you can reach safely, keep children and pets away, and hold the probe by its handle.
      </Notice>
      <div className="grid gap-3 sm:grid-cols-2">
        <QuantityField
          name="iceReadingC"
          kind="temperature"
          label="Reading in an ice bath"
          hint="Crushed ice topped up with cold water, stirred for a minute: truly 0 °C."
          units={units}
        />
        <QuantityField name="boilingReadingC" kind="temperature" label="Reading in boiling water" hint="At a rolling boil, probe clear of the pot's bottom." units={units} />
        <NumberField
          name="elevationM"
          label="Your elevation"
          unit={us ? 'ft' : 'm'}
          scale={us ? 1 / M_PER_FT : 1}
          hint="Water boils cooler the higher you live. Kept on your kettle profile."
        />
      </div>

      {result && 'error' in result && <Notice tone="error">{result.error}</Notice>}
      {result && 'ok' in result && (
        <div className="rounded-lg bg-white p-3 ring-2 ring-cellar-300">
          <dl className="grid grid-cols-2 gap-2 sm:grid-cols-3">
            {result.ok.iceOffsetC !== null && <Figure label="In ice" value={signedDelta(units, result.ok.iceOffsetC)} size="lg" />}
            {result.ok.boilingOffsetC !== null && (
              <Figure
                label="At the boil"
                value={signedDelta(units, result.ok.boilingOffsetC)}
                size="lg"
                hint={`water boils at ${units.format('temperature', result.ok.expectedBoilingC!)} here`}
              />
            )}
            <Figure
              label={result.ok.scale === 1 ? 'Offset' : 'Offset at 0 °C'}
              value={signedDelta(units, result.ok.offsetC)}
              size="2xl"
              tone={result.ok.flagged ? 'alert' : 'strong'}
              valueTestId="offset"
              hint={result.ok.scale !== 1 ? 'two-point: corrected along the line through both checks' : undefined}
            />
          </dl>
          {result.ok.warnings.map((w) => (
            <Notice key={w} tone="caution" className="mt-2">
              {w}
            </Notice>
          ))}
        </div>
      )}
      <SaveFooter status={status} keptNote="Your readings are still here: try again." submitLabel={result && 'ok' in result ? `Save offset ${signedDelta(units, result.ok.offsetC)}` : 'Enter a reading to see the offset'} busy={isSubmitting} disabled={!result || !('ok' in result)} onCancel={onCancel} />
    </Form>
  );
}
