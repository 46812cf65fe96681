import { Field, Form, Formik } from 'formik';
import {
  createInstrumentSchema,
  DEFAULT_PH_REMINDER_DAYS,
  instrumentKindLabels,
  instrumentKinds,
  type CreateInstrumentInput,
  type Instrument,
  type InstrumentKind,
} from '@shared/schemas/instruments';
import { SaveFooter } from '@/components/ui/save-footer';
import { CalibrationTempChoice } from './calibration-temp-choice';
import { HydrometerResolutionChoice } from './hydrometer-resolution-choice';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import type { Units } from '@/lib/units';
import { useCreateInstrument } from '../api/create-instrument';
import { formNumber, type FormNumber } from './describe';
import { kindIcons } from './instrument-card';
import { NumberField } from '@/components/ui/number-field';
import { SelectField } from '@/components/ui/select-field';

interface AddValues {
  kind: InstrumentKind;
  name: string;
  preset: string;
  calibrationTempC: FormNumber;
  resolutionSg: string;
  wcf: FormNumber;
  resolutionPh: string;
  reminderDays: FormNumber;
  calibratedOn: string;
}

const namePlaceholders: Record<InstrumentKind, string> = {
  hydrometer: 'e.g. Glass hydrometer',
  refractometer: 'e.g. Pocket refractometer',
  thermometer: 'e.g. Probe on a lead',
  ph_meter: 'e.g. Pen pH meter',
};

function toInput(v: AddValues): CreateInstrumentInput {
  switch (v.kind) {
    case 'hydrometer':
      return {
        kind: v.kind,
        name: v.name,
        calibrationTempC: (v.preset === 'other' ? formNumber(v.calibrationTempC) : Number(v.preset)) as number,
        resolutionSg: Number(v.resolutionSg),
      };
    case 'refractometer':
      return { kind: v.kind, name: v.name, ...(v.wcf === '' || v.wcf === null ? {} : { wcf: v.wcf }) };
    case 'thermometer':
      return { kind: v.kind, name: v.name };
    case 'ph_meter':
      return { kind: v.kind, name: v.name, resolutionPh: Number(v.resolutionPh), reminderDays: formNumber(v.reminderDays) as number, calibratedOn: v.calibratedOn || null };
  }
}

export function AddInstrumentForm({ units, onAdded, onCancel }: { units: Units; onAdded: (instrument: Instrument) => void; onCancel: () => void }) {
  const create = useCreateInstrument();
  return (
    <Formik<AddValues>
      initialValues={{ kind: 'hydrometer', name: '', preset: '20', calibrationTempC: 20, resolutionSg: '0.001', wcf: '', resolutionPh: '0.01', reminderDays: DEFAULT_PH_REMINDER_DAYS, calibratedOn: '' }}
      validate={(v) => zodValidate(createInstrumentSchema)(toInput(v))}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          onAdded(await create.mutateAsync(toInput(values)));
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      {({ values, isSubmitting, status }) => (
        <Form noValidate className="space-y-4">
          <fieldset>
            <legend className="mb-1 text-sm font-semibold text-ink-soft">Kind</legend>
            <div className="grid grid-cols-2 gap-2 sm:grid-cols-4">
              {instrumentKinds.map((kind) => {
                const Icon = kindIcons[kind];
                return (
                  <label
                    key={kind}
                    className={`relative flex min-h-touch cursor-pointer items-center gap-2 rounded-lg px-3 py-2 ring-1 has-focus-visible:outline-2 has-focus-visible:outline-malt-500 ${values.kind === kind ? 'bg-cellar-50 ring-2 ring-cellar-500' : 'bg-white ring-cellar-300'}`}
                  >
                    <Field type="radio" name="kind" value={kind} className="absolute inset-0 cursor-pointer appearance-none rounded-lg" />
                    <Icon aria-hidden className="size-5 text-cellar-500" />
                    {instrumentKindLabels[kind]}
                  </label>
                );
              })}
            </div>
          </fieldset>
          <TextField name="name" label="Name" placeholder={namePlaceholders[values.kind]} />

          {values.kind === 'hydrometer' && (
            <>
              <CalibrationTempChoice preset={values.preset} units={units} />
              <HydrometerResolutionChoice />
            </>
          )}
          {values.kind === 'refractometer' && (
            <NumberField
              name="wcf"
              label="Wort correction factor (optional)"
              hint="Leave empty to start from the common-practice 1.04, then calibrate it from paired readings."
              className="max-w-80"
            />
          )}
          {values.kind === 'thermometer' && (
            <Notice tone="info">
              After adding it, check it in an ice bath (and boiling water if you can). Built-in gauges and stick-on strips can be several degrees off.
            </Notice>
          )}
          {values.kind === 'ph_meter' && (
            <div className="grid gap-3 sm:grid-cols-3">
              <SelectField name="resolutionPh" label="Resolution">
                <option value="0.1">0.1 pH (too coarse)</option>
                <option value="0.01">0.01 pH</option>
                <option value="0.001">0.001 pH</option>
              </SelectField>
              <NumberField name="reminderDays" label="Calibrate every" unit="days" />
              <TextField name="calibratedOn" type="date" label="Last calibrated (optional)" />
            </div>
          )}
          {values.kind === 'ph_meter' && values.resolutionPh === '0.1' && (
            <Notice tone="caution">Mash pH needs 0.01 or finer: paper strips and pool meters are not good enough.</Notice>
          )}

          <SaveFooter status={status} submitLabel="Add instrument" busy={isSubmitting} onCancel={onCancel} />
        </Form>
      )}
    </Formik>
  );
}
