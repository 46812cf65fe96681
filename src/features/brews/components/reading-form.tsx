import { Field, Form, Formik, useFormikContext, type FormikHelpers } from 'formik';
import { useMemo, useRef, useState } from 'react';
import { BrewMathError } from '@shared/brewmath';
import { correctReading, defaultSnapshot, type RawByKind } from '@shared/instruments';
import {
  readingInputSchema,
  readingInstrumentKinds,
  readingKindInSentence,
  readingKindLabels,
  readingQuantity,
  type GravityMethod,
  type ReadingInput,
  type ReadingKind,
} from '@shared/schemas/brews';
import { instrumentKindLabels, type Instrument, type InstrumentKind, type InstrumentSnapshot } from '@shared/schemas/instruments';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { QuantityField } from '@/components/ui/quantity-field';
import { NetworkError } from '@/lib/api-client';
import { applyApiError, zodValidate } from '@/lib/form';
import { useUnits, type Units } from '@/lib/units';
import { useAddReading } from '../api/add-reading';
import { NotSaved } from './not-saved';
import { NumberField } from '@/components/ui/number-field';
import { SaveNotice } from '@/components/ui/save-notice';
import { Figure } from '@/components/ui/figure';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { SelectField } from '@/components/ui/select-field';

type NumberValue = number | '' | null;

export interface ReadingFormValues {
  kind: ReadingKind;
  /** '' for "none of mine": common-practice defaults. */
  instrumentId: string;
  method: GravityMethod;
  tempC: NumberValue;
  ph: NumberValue;
  brix: NumberValue;
  sg: NumberValue;
  sampleTempC: NumberValue;
  volumeL: NumberValue;
  minutesLeft: NumberValue;
  pitched: boolean;
  note: string;
}

const isGravity = (kind: ReadingKind) => kind === 'pre_boil_gravity' || kind === 'late_boil_gravity';
const empty = (v: NumberValue) => v === '' || v === null;
const optional = (v: NumberValue) => (empty(v) ? undefined : v);

function instrumentKind(values: Pick<ReadingFormValues, 'kind' | 'method'>): InstrumentKind {
  return isGravity(values.kind) ? values.method : readingInstrumentKinds[values.kind][0];
}

function firstOf(instruments: readonly Instrument[], kind: InstrumentKind): string {
  const found = instruments.find((i) => i.kind === kind && !i.archived);
  return found ? String(found.id) : '';
}

/** The form's values as the API's body: only the fields of this kind of reading. */
export function toReadingInput(v: ReadingFormValues): Record<string, unknown> {
  const base = { kind: v.kind, instrumentId: v.instrumentId === '' ? null : Number(v.instrumentId), note: v.note };
  switch (v.kind) {
    case 'mash_temp':
      return { ...base, tempC: v.tempC };
    case 'mash_ph':
    case 'souring_ph':
      return { ...base, ph: v.ph };
    case 'pitch_temp':
      return { ...base, tempC: v.tempC, pitched: v.pitched };
    case 'og':
      return { ...base, sg: v.sg, sampleTempC: v.sampleTempC, volumeL: optional(v.volumeL) };
    case 'pre_boil_gravity':
    case 'late_boil_gravity': {
      const gravity = v.method === 'refractometer' ? { brix: v.brix } : { sg: v.sg, sampleTempC: v.sampleTempC };
      return {
        ...base,
        method: v.method,
        ...gravity,
        volumeL: v.kind === 'late_boil_gravity' ? v.volumeL : optional(v.volumeL),
        ...(v.kind === 'late_boil_gravity' && { minutesLeft: v.minutesLeft }),
      };
    }
  }
}

function startValues(kind: ReadingKind, instruments: readonly Instrument[], method: GravityMethod = 'refractometer'): ReadingFormValues {
  const values: ReadingFormValues = {
    kind,
    instrumentId: '',
    method: kind === 'og' ? 'hydrometer' : method,
    tempC: '',
    ph: '',
    brix: '',
    sg: '',
    sampleTempC: '',
    volumeL: '',
    minutesLeft: kind === 'late_boil_gravity' ? 10 : '',
    pitched: true,
    note: '',
  };
  values.instrumentId = firstOf(instruments, instrumentKind(values));
  return values;
}

const validate = (values: ReadingFormValues) => zodValidate(readingInputSchema)(toReadingInput(values));

interface ReadingFormProps {
  brewId: number;
  /** What is read; for the boil, the brewer may switch between pre-boil and late-boil gravity. */
  kinds: readonly ReadingKind[];
  /** The brewer's instruments (the route loads them); archived ones are not offered. */
  instruments: readonly Instrument[];
  onSaved?: () => void;
}

/**
 * One reading: pick the instrument, type what it shows, see the corrected value beside it as you
 * type (the same correctReading the server stores). A save that never reaches the server keeps
 * everything typed and offers a retry with the time of the first attempt.
 */
export function ReadingForm({ brewId, kinds, instruments, onSaved }: ReadingFormProps) {
  const add = useAddReading(brewId);
  const [offline, setOffline] = useState(false);
  const [saved, setSaved] = useState<string | null>(null);
  // The time of the first attempt: a retry minutes later still records when it was read.
  const firstAttempt = useRef<string | null>(null);
  const initial = useMemo(() => startValues(kinds[0], instruments), [kinds, instruments]);

  async function submit(values: ReadingFormValues, helpers: FormikHelpers<ReadingFormValues>) {
    helpers.setStatus(undefined);
    setOffline(false);
    setSaved(null);
    firstAttempt.current ??= new Date().toISOString();
    try {
      const outcome = await add.mutateAsync({ ...(toReadingInput(values) as ReadingInput), takenAt: firstAttempt.current });
      firstAttempt.current = null;
      setSaved(outcome.status === 'queued' ? `${readingKindLabels[values.kind]} kept on this device: waiting to send.` : `${readingKindLabels[values.kind]} saved.`);
      helpers.resetForm({ values: { ...startValues(values.kind, instruments, values.method), instrumentId: values.instrumentId } });
      onSaved?.();
    } catch (error) {
      if (error instanceof NetworkError) setOffline(true);
      else {
        firstAttempt.current = null;
        applyApiError(error, helpers);
      }
    }
  }

  return (
    <Formik<ReadingFormValues> initialValues={initial} validate={validate} onSubmit={submit} enableReinitialize={false}>
      {({ isSubmitting, status, submitForm }) => (
        <Form noValidate aria-label={`New reading: ${kinds.map(readingKindInSentence).join(' or ')}`} className="space-y-4">
          <Fields kinds={kinds} instruments={instruments} />
          <SaveNotice failure={status} />
          {offline ? (
            <NotSaved busy={isSubmitting} onRetry={() => void submitForm()} />
          ) : (
            <Button type="submit" busy={isSubmitting} className="w-full">
              Save reading
            </Button>
          )}
          {saved && !offline && <Notice tone="success">{saved}</Notice>}
        </Form>
      )}
    </Formik>
  );
}

function Fields({ kinds, instruments }: Pick<ReadingFormProps, 'kinds' | 'instruments'>) {
  const { values, setFieldValue } = useFormikContext<ReadingFormValues>();
  const units = useUnits();
  const kind = values.kind;
  const wanted = instrumentKind(values);
  const choices = instruments.filter((i) => i.kind === wanted && !i.archived);

  function switchTo(patch: Partial<ReadingFormValues>) {
    const next = { ...values, ...patch };
    for (const [k, v] of Object.entries(patch)) void setFieldValue(k, v, false);
    if (instrumentKind(next) !== wanted) void setFieldValue('instrumentId', firstOf(instruments, instrumentKind(next)), false);
  }

  return (
    <>
      {kinds.length > 1 && (
        <SegmentedControl
          look="tiles"
          label="What did you read?"
          value={kind}
          options={kinds.map((k) => [k, readingKindLabels[k]])}
          onChange={(k) => switchTo({ kind: k, minutesLeft: k === 'late_boil_gravity' ? 10 : values.minutesLeft })}
        />
      )}
      {isGravity(kind) && (
        <SegmentedControl<GravityMethod>
          look="tiles"
          label="Read with"
          value={values.method}
          options={[
            ['refractometer', 'Refractometer'],
            ['hydrometer', 'Hydrometer (cooled sample)'],
          ]}
          onChange={(method) => switchTo({ method })}
        />
      )}
      <InstrumentPicker kind={wanted} choices={choices} />
      <ValueFields units={units} />
      <Preview units={units} instruments={instruments} />
      <label className="block">
        <span className="mb-1 block text-sm font-semibold text-ink-soft">Note (optional)</span>
        <Field as="textarea" name="note" rows={2} className="block w-full rounded-lg border border-cellar-300 bg-white px-3 py-2 text-base" />
      </label>
    </>
  );
}

function InstrumentPicker({ kind, choices }: { kind: InstrumentKind; choices: readonly Instrument[] }) {
  const label = instrumentKindLabels[kind];
  return (
    <SelectField name="instrumentId" label={label} hint={choices.length === 0 ? `Add your ${label.toLowerCase()} on the instruments page to use its calibration.` : undefined}>
      {choices.map((i) => (
        <option key={i.id} value={String(i.id)}>
          {i.name}
        </option>
      ))}
      <option value="">None of mine: common-practice defaults</option>
    </SelectField>
  );
}

function ValueFields({ units }: { units: Units }) {
  const { values } = useFormikContext<ReadingFormValues>();
  switch (values.kind) {
    case 'mash_temp':
      return <QuantityField name="tempC" kind="temperature" label="Mash temperature, as read" size="large" units={units} hint="Stir first: the top, middle and bottom differ." />;
    case 'mash_ph':
      return <NumberField name="ph" label="Mash pH, as read" size="large" hint="Read a sample cooled to room temperature." />;
    case 'souring_ph':
      return <NumberField name="ph" label="Souring pH, as read" size="large" hint="Read a sample cooled to room temperature, with the meter calibrated in two buffers." />;
    case 'pitch_temp':
      return (
        <>
          <QuantityField name="tempC" kind="temperature" label="Wort temperature, as read" size="large" units={units} />
          <label className="flex min-h-touch items-center gap-3">
            <Field type="checkbox" name="pitched" className="size-6 accent-cellar-700" />
            <span className="font-semibold">The yeast went in now</span>
          </label>
        </>
      );
    case 'og':
      return (
        <>
          <QuantityField name="sg" kind="gravity" label="Hydrometer reading" size="large" units={units} hint="Spin it to shed bubbles; read at the bottom of the meniscus." />
          <div className="grid grid-cols-2 gap-3">
            <QuantityField name="sampleTempC" kind="temperature" label="Sample temperature" units={units} />
            <QuantityField name="volumeL" kind="volume" label="Into the fermenter" hint="Optional" units={units} />
          </div>
        </>
      );
    case 'pre_boil_gravity':
    case 'late_boil_gravity': {
      const late = values.kind === 'late_boil_gravity';
      return (
        <>
          {values.method === 'refractometer' ? (
            <NumberField name="brix" label="Brix" unit="°Bx" size="large" />
          ) : (
            <div className="grid grid-cols-2 gap-3">
              <QuantityField name="sg" kind="gravity" label="Hydrometer reading" size="large" units={units} />
              <QuantityField name="sampleTempC" kind="temperature" label="Sample temperature" units={units} />
            </div>
          )}
          <div className="grid grid-cols-2 gap-3">
            <QuantityField name="volumeL" kind="volume" label="Wort in the kettle (hot)" hint={late ? undefined : 'Optional'} units={units} />
            {late && <NumberField name="minutesLeft" label="Minutes left" unit="min" />}
          </div>
        </>
      );
    }
  }
}

function instrumentRaw(kind: InstrumentKind, values: ReadingFormValues): RawByKind[InstrumentKind] | null {
  const n = (v: NumberValue) => (typeof v === 'number' && Number.isFinite(v) ? v : null);
  switch (kind) {
    case 'thermometer':
      return n(values.tempC) === null ? null : { tempC: n(values.tempC)! };
    case 'ph_meter':
      return n(values.ph) === null ? null : { ph: n(values.ph)! };
    case 'refractometer':
      return n(values.brix) === null ? null : { brix: n(values.brix)! };
    case 'hydrometer':
      return n(values.sg) === null || n(values.sampleTempC) === null ? null : { sg: n(values.sg)!, sampleTempC: n(values.sampleTempC)! };
  }
}

/** As read and corrected, side by side, worked out as the brewer types. */
function Preview({ units, instruments }: { units: Units; instruments: readonly Instrument[] }) {
  const { values, errors } = useFormikContext<ReadingFormValues>();
  const kind = instrumentKind(values);
  const chosen = instruments.find((i) => String(i.id) === values.instrumentId && i.kind === kind);
  const snapshot: InstrumentSnapshot = chosen?.snapshot ?? defaultSnapshot(kind);
  const raw = instrumentRaw(kind, values);
  const fieldOk = (name: keyof ReadingFormValues) => !(errors as Record<string, unknown>)[name];
  const valuesOk = ['tempC', 'ph', 'brix', 'sg', 'sampleTempC'].every((f) => fieldOk(f as keyof ReadingFormValues));

  let corrected: { value: number; warnings: string[] } | null = null;
  let problem: string | null = null;
  if (raw && valuesOk) {
    try {
      const result = correctReading(snapshot, raw, new Date(), { unitSystem: units.unitSystem });
      corrected = { value: result.corrected, warnings: result.warnings };
    } catch (error) {
      if (!(error instanceof BrewMathError)) throw error;
      problem = error.message;
    }
  }
  const quantity = readingQuantity[values.kind];
  const show = (v: number) => (quantity === 'temperature' ? units.format('temperature', v) : quantity === 'ph' ? `pH\u00a0${v.toFixed(2)}` : units.format('gravity', v));
  const rawShown =
    raw === null
      ? '—'
      : 'tempC' in raw
        ? units.format('temperature', raw.tempC)
        : 'ph' in raw
          ? `pH\u00a0${raw.ph.toFixed(2)}`
          : 'brix' in raw
            ? `${raw.brix}\u00a0°Bx`
            : `${units.format('gravity', raw.sg)}`;

  return (
    <div aria-live="polite" className="space-y-2">
      <dl className="grid grid-cols-2 gap-2 rounded-xl bg-cellar-50 p-3">
        <Figure className="min-w-0" labelStyle="plain" size="2xl" label="As read" value={rawShown} valueTestId="raw-value" />
        <Figure className="min-w-0" labelStyle="plain" size="2xl" tone="strong" label="Corrected" value={corrected ? show(corrected.value) : '—'} valueTestId="corrected-value" />
      </dl>
      {problem && <Notice tone="error">{problem}</Notice>}
      {corrected?.warnings.map((w) => (
        <Notice key={w} tone="caution">
          {w}
        </Notice>
      ))}
    </div>
  );
}
