import { Field, Form, Formik } from 'formik';
import { useState } from 'react';
import { calibrateInstrumentSchema, DEFAULT_HYDROMETER_CALIBRATION_C, type CalibrateInstrumentBody, type Instrument } from '@shared/schemas/instruments';
import { SaveFooter } from '@/components/ui/save-footer';
import { CalibrationTempChoice } from './calibration-temp-choice';
import { HydrometerResolutionChoice } from './hydrometer-resolution-choice';
import { Notice } from '@/components/ui/notice';
import { QuantityField } from '@/components/ui/quantity-field';
import { applyApiError, zodValidate } from '@/lib/form';
import type { Units } from '@/lib/units';
import { useCalibrateInstrument } from '../api/calibrate-instrument';
import { formNumber, type FormNumber } from './describe';
import { NumberField } from '@/components/ui/number-field';
import { SelectField } from '@/components/ui/select-field';

interface SettingsValues {
  preset: string;
  calibrationTempC: FormNumber;
  resolutionSg: string;
  wcf: FormNumber;
  offsetC: FormNumber;
  resolutionPh: string;
  reminderDays: FormNumber;
  note: string;
}

function toBody(kind: Instrument['kind'], v: SettingsValues): CalibrateInstrumentBody {
  const note = v.note.trim() || null;
  switch (kind) {
    case 'hydrometer':
      return {
        method: 'set',
        note,
        calibrationTempC: (v.preset === 'other' ? formNumber(v.calibrationTempC) : Number(v.preset)) as number,
        resolutionSg: Number(v.resolutionSg),
      };
    case 'refractometer':
      return { method: 'set', note, wcf: formNumber(v.wcf) as number };
    case 'thermometer':
      return { method: 'set', note, offsetC: formNumber(v.offsetC) as number };
    case 'ph_meter':
      return { method: 'set', note, resolutionPh: Number(v.resolutionPh), reminderDays: formNumber(v.reminderDays) as number };
  }
}

const titles: Record<Instrument['kind'], string> = {
  hydrometer: 'Save hydrometer settings',
  refractometer: 'Save this factor',
  thermometer: 'Save this offset',
  ph_meter: 'Save settings',
};

/**
 * Typing a value in: a hydrometer's calibration temperature (printed on its paper scale), a
 * factor or offset measured elsewhere, a pH meter's resolution and reminder interval. Logged like
 * any calibration.
 */
export function SettingsForm({ instrument, units, onDone }: { instrument: Instrument; units: Units; onDone: () => void }) {
  const calibrate = useCalibrateInstrument(instrument.id);
  const [saved, setSaved] = useState(false);
  const cal = instrument.calibrationTempC ?? DEFAULT_HYDROMETER_CALIBRATION_C;
  const preset = cal === 20 ? '20' : cal === 15.56 ? '15.56' : 'other';
  const initial: SettingsValues = {
    preset,
    calibrationTempC: cal,
    resolutionSg: String(instrument.resolutionSg ?? 0.001),
    wcf: instrument.wcf ?? '',
    offsetC: instrument.offsetC ?? 0,
    resolutionPh: String(instrument.resolutionPh ?? 0.01),
    reminderDays: instrument.reminderDays ?? 30,
    note: '',
  };
  if (saved) {
    return (
      <Notice tone="success" title="Saved">
        Readings from now on use it; earlier readings keep what they were taken with.{' '}
        <button type="button" className="min-h-touch font-semibold underline" onClick={onDone}>
          Close
        </button>
      </Notice>
    );
  }
  return (
    <Formik<SettingsValues>
      initialValues={initial}
      validate={(v) => zodValidate(calibrateInstrumentSchema)(toBody(instrument.kind, v))}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await calibrate.mutateAsync(toBody(instrument.kind, values));
          setSaved(true);
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      {({ values, isSubmitting, status }) => (
        <Form noValidate className="space-y-4">
          {instrument.kind === 'hydrometer' && (
            <>
              <CalibrationTempChoice preset={values.preset} units={units} />
              <HydrometerResolutionChoice />
            </>
          )}
          {instrument.kind === 'refractometer' && (
            <NumberField name="wcf" label="Wort correction factor" hint="Between 0.9 and 1.2; most refractometers need about 1.00 to 1.10." className="max-w-60" />
          )}
          {instrument.kind === 'thermometer' && (
            <QuantityField
              name="offsetC"
              kind="temperatureDelta"
              label="Offset (+ reads high, − reads low)"
              hint="Found by a check against a trusted thermometer. Over 10 °C: replace it."
              units={units}
              className="max-w-60"
            />
          )}
          {instrument.kind === 'ph_meter' && (
            <div className="grid gap-3 sm:grid-cols-2">
              <SelectField name="resolutionPh" label="Resolution (smallest step shown)">
                <option value="0.1">0.1 pH (not good enough for mash pH)</option>
                <option value="0.01">0.01 pH</option>
                <option value="0.001">0.001 pH</option>
              </SelectField>
              <NumberField name="reminderDays" label="Remind me to calibrate every" unit="days" />
            </div>
          )}
          <label className="block">
            <span className="mb-1 block text-sm font-semibold text-ink-soft">Note for the log (optional)</span>
            <Field name="note" maxLength={200} className="block min-h-touch w-full rounded-lg border border-cellar-300 bg-white px-3" />
          </label>
          <SaveFooter status={status} submitLabel={titles[instrument.kind]} busy={isSubmitting} onCancel={onDone} />
        </Form>
      )}
    </Formik>
  );
}
