import { Form, Formik, useFormikContext } from 'formik';
import { CookingPot, Star, Trash2 } from 'lucide-react';
import { useEffect, useId } from 'react';
import { boilOffRateLPerHour, BrewMathError } from '@shared/brewmath';
import { equipmentProfileInputSchema, type EquipmentProfile, type EquipmentProfileInput } from '@shared/schemas/equipment';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { SaveNotice } from '@/components/ui/save-notice';
import { QuantityField } from '@/components/ui/quantity-field';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import type { Units } from '@/lib/units';
import { useDeleteEquipment, useSaveEquipment } from '../api/save-equipment';
import { formNumber, type FormNumber } from './describe';
import { NumberField } from '@/components/ui/number-field';

const M_PER_FT = 0.3048;

interface KettleValues {
  name: string;
  boilOffLPerHour: FormNumber;
  trubLossL: FormNumber;
  deadSpaceL: FormNumber;
  coolingShrinkage: FormNumber;
  elevationM: FormNumber;
  kettleCapacityL: FormNumber;
  measuring: boolean;
  measurement: { startL: FormNumber; endL: FormNumber; minutes: FormNumber };
}

function toValues(p: EquipmentProfile): KettleValues {
  return {
    name: p.name,
    boilOffLPerHour: p.boilOffLPerHour,
    trubLossL: p.trubLossL,
    deadSpaceL: p.deadSpaceL,
    coolingShrinkage: p.coolingShrinkage,
    elevationM: p.elevationM ?? '',
    kettleCapacityL: p.kettleCapacityL ?? '',
    measuring: false,
    measurement: { startL: '', endL: '', minutes: 60 },
  };
}

function toInput(v: KettleValues): EquipmentProfileInput {
  return {
    name: v.name,
    boilOffLPerHour: formNumber(v.boilOffLPerHour) as number,
    trubLossL: formNumber(v.trubLossL) as number,
    deadSpaceL: formNumber(v.deadSpaceL) as number,
    coolingShrinkage: formNumber(v.coolingShrinkage) as number,
    elevationM: formNumber(v.elevationM),
    kettleCapacityL: formNumber(v.kettleCapacityL),
    ...(v.measuring && {
      boilOffMeasurement: { startL: v.measurement.startL as number, endL: v.measurement.endL as number, minutes: v.measurement.minutes as number },
    }),
  };
}

/** The measured rate, from the same function the server saves with; null while incomplete. */
function measuredRate(v: KettleValues): { rate: number } | { error: string } | null {
  const { startL, endL, minutes } = v.measurement;
  if (![startL, endL, minutes].every((n) => typeof n === 'number' && Number.isFinite(n))) return null;
  try {
    return { rate: boilOffRateLPerHour({ startL: startL as number, endL: endL as number, minutes: minutes as number }) };
  } catch (error) {
    if (error instanceof BrewMathError) return { error: error.message };
    throw error;
  }
}

/** A kettle profile: boil-off (typed or measured), losses, cooling shrinkage and elevation. */
export function EquipmentCard({ profile, units, canDelete, onSaved }: { profile: EquipmentProfile; units: Units; canDelete: boolean; onSaved?: () => void }) {
  const save = useSaveEquipment(profile.id);
  const remove = useDeleteEquipment();
  const headingId = useId();
  return (
    <article aria-labelledby={headingId} className="rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100">
      <header className="mb-3 flex items-start gap-3">
        <CookingPot aria-hidden className="mt-1 size-7 shrink-0 text-cellar-500" />
        <div className="min-w-0 flex-1">
          <h3 id={headingId} className="break-words text-lg font-bold text-cellar-900">
            {profile.source === 'saved' ? profile.name : 'Your kettle'}
          </h3>
          <p className="text-sm text-ink-faint">{profile.source === 'saved' ? (profile.isDefault ? 'Default for new brew days' : 'Kettle profile') : 'Not saved yet'}</p>
        </div>
        <div className="text-right">
          <p className="text-2xl font-bold tabular-nums text-cellar-900">{units.format('rate', profile.boilOffLPerHour)}</p>
          <p className="text-xs text-ink-faint">boil-off</p>
        </div>
      </header>
      {profile.note && (
        <Notice tone="info" className="mb-3">
          {profile.note}
        </Notice>
      )}
      <Formik<KettleValues>
        initialValues={toValues(profile)}
        enableReinitialize
        validate={(v) => zodValidate(equipmentProfileInputSchema)(toInput(v))}
        onSubmit={async (values, helpers) => {
          helpers.setStatus(undefined);
          try {
            await save.mutateAsync(toInput(values));
            onSaved?.();
          } catch (error) {
            applyApiError(error, helpers);
          }
        }}
      >
        <KettleForm units={units} justSaved={save.isSuccess} saveLabel={profile.id === null ? 'Save as my kettle' : 'Save kettle'} />
      </Formik>
      {profile.id !== null && (!profile.isDefault || canDelete || remove.isError || save.isError) && (
        <div className="mt-3 flex flex-wrap gap-2 border-t border-cellar-100 pt-3">
          {!profile.isDefault && (
            <Button variant="secondary" icon={<Star aria-hidden className="size-5" />} onClick={() => save.mutate({ ...profileInput(profile), isDefault: true })}>
              Make default
            </Button>
          )}
          {canDelete && (
            <Button variant="quiet" icon={<Trash2 aria-hidden className="size-5" />} busy={remove.isPending} onClick={() => remove.mutate(profile.id!)}>
              Remove
            </Button>
          )}
          {(remove.isError || (save.isError && !save.isPending)) && <Notice tone="error">{(remove.error ?? save.error)?.message}</Notice>}
        </div>
      )}
    </article>
  );
}

function profileInput(p: EquipmentProfile): EquipmentProfileInput {
  const { name, boilOffLPerHour, trubLossL, deadSpaceL, coolingShrinkage, elevationM, kettleCapacityL } = p;
  return { name, boilOffLPerHour, trubLossL, deadSpaceL, coolingShrinkage, elevationM, kettleCapacityL };
}

function KettleForm({ units, saveLabel, justSaved }: { units: Units; saveLabel: string; justSaved: boolean }) {
  const { values, setFieldValue, isSubmitting, status, dirty } = useFormikContext<KettleValues>();
  const measured = values.measuring ? measuredRate(values) : null;
  const us = units.unitSystem === 'us';

  // The measured rate fills the rate field, so what is shown is what will be saved.
  useEffect(() => {
    if (measured && 'rate' in measured && measured.rate !== values.boilOffLPerHour) void setFieldValue('boilOffLPerHour', measured.rate);
  }, [measured, values.boilOffLPerHour, setFieldValue]);

  const saved = justSaved && !dirty;
  return (
    <Form noValidate className="space-y-4">
      <TextField name="name" label="Name" />
      <div className="grid gap-3 sm:grid-cols-2">
        <div>
          <QuantityField name="boilOffLPerHour" kind="rate" label="Boil-off rate" units={units} disabled={values.measuring} />
          {!values.measuring && (
            <Button variant="quiet" className="mt-1 text-sm" onClick={() => setFieldValue('measuring', true)}>
              Measure it on your next boil
            </Button>
          )}
        </div>
        <QuantityField name="kettleCapacityL" kind="volume" label="Kettle size (optional)" units={units} />
      </div>

      {values.measuring && (
        <fieldset className="rounded-lg bg-cellar-50 p-3">
          <legend className="px-1 font-semibold text-cellar-900">Measure the boil-off</legend>
          <p className="mb-2 text-sm text-ink-soft">
            Read the volume in the kettle when the boil starts and again at the end, both hot, the same way (a marked paddle or the kettle's sight glass).
            Boiling wort and steam burn: keep hands and face clear of the kettle.
          </p>
          <div className="grid grid-cols-2 gap-2 sm:grid-cols-3">
            <QuantityField name="measurement.startL" kind="volume" label="At the start" units={units} />
            <QuantityField name="measurement.endL" kind="volume" label="At the end" units={units} />
            <NumberField name="measurement.minutes" label="Boil time" unit="min" className="col-span-2 sm:col-span-1" />
          </div>
          {measured && 'rate' in measured && (
            <p className="mt-2 text-sm" data-testid="measured-boil-off">
              Boil-off: <strong className="text-lg tabular-nums text-cellar-900">{units.format('rate', measured.rate)}</strong>
            </p>
          )}
          {measured && 'error' in measured && (
            <Notice tone="error" className="mt-2">
              {measured.error}
            </Notice>
          )}
          <Button variant="quiet" className="mt-1 text-sm" onClick={() => setFieldValue('measuring', false)}>
            Type the rate instead
          </Button>
        </fieldset>
      )}

      <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <QuantityField name="trubLossL" kind="volume" label="Trub loss" units={units} />
        <QuantityField name="deadSpaceL" kind="volume" label="Dead space" units={units} />
        <NumberField name="coolingShrinkage" label="Cooling shrinkage" unit="%" scale={100} hint="About 4 % is usual." />
        <NumberField name="elevationM" label="Elevation" unit={us ? 'ft' : 'm'} scale={us ? 1 / M_PER_FT : 1} />
      </div>
      <SaveNotice failure={status} />
      {saved && <Notice tone="success">Saved. New brew days start from it.</Notice>}
      <Button type="submit" busy={isSubmitting}>
        {saveLabel}
      </Button>
    </Form>
  );
}
