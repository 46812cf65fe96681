import { Form, Formik, useFormikContext } from 'formik';
import { Droplets, Microscope, Thermometer } from 'lucide-react';
import { useState, useEffect, useRef } from 'react';
import { DEFAULT_WCF, sgToBrix } from '@shared/brewmath';
import { fermentationReadingInputSchema, type FermentationMethod, type FermentationReadingInput } from '@shared/schemas/fermentation';
import type { Instrument } from '@shared/schemas/instruments';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { QuantityField } from '@/components/ui/quantity-field';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import { useUnits } from '@/lib/units';
import { useAddFermentationReading } from '../api/add-reading';
import { dayLabel, fromLocalInput, methodLabels, toLocalInput } from './words';
import { SaveNotice } from '@/components/ui/save-notice';
import { typedNumber } from '@shared/schemas/fields';

interface Values {
  method: FermentationMethod;
  instrumentId: string;
  sg: number | '';
  sampleTempC: number | '';
  brix: string;
  originalBrix: string;
  tempC: number | '';
  takenAt: string;
  note: string;
}

const orUndefined = (v: number | '') => (v === '' ? undefined : v);

export function toReadingInput(v: Values): FermentationReadingInput {
  const base = { instrumentId: v.instrumentId ? Number(v.instrumentId) : null, takenAt: fromLocalInput(v.takenAt), note: v.note };
  switch (v.method) {
    case 'hydrometer':
      return { ...base, method: 'hydrometer', sg: orUndefined(v.sg) as number, sampleTempC: orUndefined(v.sampleTempC) as number };
    case 'refractometer':
      return { ...base, method: 'refractometer', brix: typedNumber(v.brix) as number, originalBrix: typedNumber(v.originalBrix) as number };
    case 'thermometer':
      return { ...base, method: 'thermometer', tempC: orUndefined(v.tempC) as number };
  }
}

const validate = (values: Values) => zodValidate(fermentationReadingInputSchema)(toReadingInput(values));

const methods: { method: FermentationMethod; label: string; Icon: typeof Droplets }[] = [
  { method: 'hydrometer', label: 'Hydrometer', Icon: Droplets },
  { method: 'refractometer', label: 'Refractometer', Icon: Microscope },
  { method: 'thermometer', label: 'Fermenter temp', Icon: Thermometer },
];

/** Log a gravity or fermenter temperature reading; what was typed stays if the save fails. */
/** The brewer's instruments come from the instruments feature's one cache entry, handed in by src/app. */
export interface InstrumentChoices {
  instruments: Instrument[] | undefined;
  instrumentsFailed: boolean;
}

export function ReadingForm({ brewId, og, pitchedAt, instruments, instrumentsFailed }: { brewId: number; og: number | null; pitchedAt: string } & InstrumentChoices) {
  const add = useAddFermentationReading(brewId);
  const units = useUnits();
  const [saved, setSaved] = useState<string | null>(null);
  const initial: Values = {
    method: 'hydrometer',
    instrumentId: '',
    sg: '',
    sampleTempC: '',
    brix: '',
    originalBrix: og !== null ? sgToBrix(og, DEFAULT_WCF).toFixed(1) : '',
    tempC: '',
    takenAt: toLocalInput(new Date()),
    note: '',
  };
  return (
    <Formik<Values>
      initialValues={initial}
      validate={validate}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        setSaved(null);
        try {
          const outcome = await add.mutateAsync(toReadingInput(values));
          const resetValues = { ...values, sg: '' as const, sampleTempC: values.sampleTempC, brix: '', tempC: '' as const, note: '', takenAt: toLocalInput(new Date()) };
          if (outcome.status === 'queued') {
            setSaved(`Kept on this device: waiting to send (${dayLabel(outcome.item.takenAt, pitchedAt)}).`);
            helpers.resetForm({ values: resetValues });
            return;
          }
          const result = outcome.data;
          const r = result.reading;
          const value = r.kind === 'gravity' ? units.format('gravity', r.corrected) : units.format('temperature', r.corrected);
          setSaved(`${result.duplicate ? 'Already in the log' : 'Saved'}: ${dayLabel(r.takenAt, pitchedAt)}, ${value}${r.estimate ? ' (estimate)' : ''}.`);
          helpers.resetForm({
            values: { ...values, sg: '', sampleTempC: values.sampleTempC, brix: '', tempC: '', note: '', takenAt: toLocalInput(new Date()) },
          });
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status, submitForm }) => (
        <Form noValidate className="space-y-4" aria-label="Add a reading">
          <MethodPicker />
          <InstrumentPicker instruments={instruments} instrumentsFailed={instrumentsFailed} />
          <MethodFields og={og} />
          <TextField name="takenAt" type="datetime-local" label="Taken at" />
          <TextField name="note" label="Note (optional)" maxLength={500} />
          <SaveNotice failure={status} busy={isSubmitting} onRetry={() => void submitForm()} />
          {saved && <Notice tone="success">{saved}</Notice>}
          <Button type="submit" busy={isSubmitting} className="w-full sm:w-auto">
            Save reading
          </Button>
        </Form>
      )}
    </Formik>
  );
}

function MethodPicker() {
  const { values, setFieldValue, setErrors } = useFormikContext<Values>();
  return (
    <fieldset>
      <legend className="mb-1 text-sm font-semibold text-ink-soft">What did you read?</legend>
      <div className="grid grid-cols-3 gap-2">
        {methods.map(({ method, label, Icon }) => {
          const active = values.method === method;
          return (
            <label
              key={method}
              className={`flex min-h-touch cursor-pointer flex-col items-center justify-center gap-1 rounded-lg px-1 py-2 text-center text-sm font-semibold ring-1 ring-inset ${
                active ? 'bg-cellar-700 text-white ring-cellar-700' : 'bg-white text-cellar-700 ring-cellar-300'
              }`}
            >
              <input
                type="radio"
                name="method"
                value={method}
                checked={active}
                className="sr-only"
                onChange={() => {
                  void setFieldValue('method', method);
                  void setFieldValue('instrumentId', '');
                  setErrors({});
                }}
              />
              <Icon aria-hidden className="size-5" />
              {label}
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}

function InstrumentPicker({ instruments, instrumentsFailed: isError }: InstrumentChoices) {
  const { values, handleChange, errors, setFieldValue } = useFormikContext<Values>();
  const mine = (instruments ?? []).filter((i) => i.kind === values.method && !i.archived);
  const error = errors.instrumentId;
  // Start from the brewer's own instrument of this kind; "no profile" stays one tap away.
  const chosenFor = useRef<string | null>(null);
  const firstId = mine[0] ? String(mine[0].id) : '';
  useEffect(() => {
    if (chosenFor.current === values.method || !firstId) return;
    chosenFor.current = values.method;
    if (values.instrumentId === '') void setFieldValue('instrumentId', firstId, false);
  }, [values.method, values.instrumentId, firstId, setFieldValue]);
  return (
    <div>
      <label htmlFor="reading-instrument" className="mb-1 block text-sm font-semibold text-ink-soft">
        {methodLabels[values.method]}
      </label>
      <select
        id="reading-instrument"
        name="instrumentId"
        value={values.instrumentId}
        onChange={handleChange}
        aria-invalid={Boolean(error) || undefined}
        className="block min-h-touch w-full rounded-lg border border-cellar-300 bg-white px-3 py-2 text-base"
      >
        <option value="">No profile: common-practice defaults</option>
        {mine.map((i) => (
          <option key={i.id} value={String(i.id)}>
            {i.name}
          </option>
        ))}
      </select>
      {isError && <p className="mt-1 text-sm text-ink-faint">Your instruments could not be loaded; the defaults still work.</p>}
      {error && (
        <p role="alert" className="mt-1 text-sm font-semibold text-alert-700">
          {error}
        </p>
      )}
    </div>
  );
}

function MethodFields({ og }: { og: number | null }) {
  const { values } = useFormikContext<Values>();
  switch (values.method) {
    case 'hydrometer':
      return (
        <div className="grid gap-4 sm:grid-cols-2">
          <QuantityField name="sg" kind="gravity" label="Hydrometer reading" size="large" hint="As read at the bottom of the meniscus." />
          <QuantityField name="sampleTempC" kind="temperature" label="Sample temperature" hint="Corrected to the hydrometer's calibration temperature." />
        </div>
      );
    case 'refractometer':
      return (
        <div className="space-y-3">
          <div className="grid gap-4 sm:grid-cols-2">
            <TextField name="brix" label="Refractometer reading" suffix="°Bx" inputMode="decimal" autoComplete="off" className="[&_input]:text-2xl [&_input]:font-bold" />
            <TextField
              name="originalBrix"
              label="Original Brix (before fermentation)"
              suffix="°Bx"
              inputMode="decimal"
              autoComplete="off"
              hint={og !== null ? 'Filled in from the brew day’s OG; change it if you read the wort yourself.' : 'Your refractometer reading of the wort before pitching.'}
            />
          </div>
          <p className="text-sm text-ink-soft">
            Alcohol skews a refractometer, so this gives an alcohol-corrected <strong>estimate</strong> (Terrill 2011). It can show the beer is still moving,
            but only a hydrometer can prove it has finished.
          </p>
        </div>
      );
    case 'thermometer':
      return <QuantityField name="tempC" kind="temperature" label="Fermenter temperature" size="large" />;
  }
}
