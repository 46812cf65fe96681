import { Form, Formik } from 'formik';
import { useState } from 'react';
import { calibrateInstrumentSchema, DEFAULT_PH_BUFFERS, type CalibrateInstrumentBody, type Instrument } from '@shared/schemas/instruments';
import { SaveFooter } from '@/components/ui/save-footer';
import { cautionTexts } from '@/components/ui/cautions';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import { useCalibrateInstrument } from '../api/calibrate-instrument';
import { formNumber, type FormNumber } from './describe';
import { NumberField } from '@/components/ui/number-field';
import { localDay } from '@shared/dates';

interface PhValues {
  calibratedOn: string;
  bufferLowPh: FormNumber;
  bufferHighPh: FormNumber;
}

const toBody = (v: PhValues): CalibrateInstrumentBody => ({
  method: 'ph-two-point',
  calibratedOn: v.calibratedOn,
  bufferLowPh: formNumber(v.bufferLowPh) as number,
  bufferHighPh: formNumber(v.bufferHighPh) as number,
});

/** Recording a two-point calibration done on the meter: the date and the two buffers. */
export function PhCalibration({ instrument, onDone }: { instrument: Instrument; onDone: () => void }) {
  const calibrate = useCalibrateInstrument(instrument.id);
  const [saved, setSaved] = useState(false);
  if (saved) {
    return (
      <Notice tone="success" title="Calibration recorded">
        The reminder counts from this date.{' '}
        <button type="button" className="min-h-touch font-semibold underline" onClick={onDone}>
          Close
        </button>
      </Notice>
    );
  }
  return (
    <Formik<PhValues>
      initialValues={{
        calibratedOn: localDay(),
        bufferLowPh: instrument.bufferLowPh ?? DEFAULT_PH_BUFFERS.low,
        bufferHighPh: instrument.bufferHighPh ?? DEFAULT_PH_BUFFERS.high,
      }}
      validate={(v) => zodValidate(calibrateInstrumentSchema)(toBody(v))}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await calibrate.mutateAsync(toBody(values));
          setSaved(true);
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status }) => (
        <Form noValidate className="space-y-4">
          <p className="text-sm text-ink-soft">
            Calibrate the meter itself in two fresh buffers as its maker describes, then record it here. Rinse the electrode between buffers and keep it in storage
            solution, never dry or in plain water.
          </p>
          <Notice tone="caution">{cautionTexts.phSolutions}</Notice>
          <div className="grid gap-3 sm:grid-cols-3">
            <TextField name="calibratedOn" type="date" label="Calibrated on" max={localDay()} />
            <NumberField name="bufferLowPh" label="First buffer" unit="pH" />
            <NumberField name="bufferHighPh" label="Second buffer" unit="pH" />
          </div>
          <SaveFooter status={status} submitLabel="Record calibration" busy={isSubmitting} onCancel={onDone} />
        </Form>
      )}
    </Formik>
  );
}
