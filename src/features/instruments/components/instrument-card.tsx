import { Form, Formik } from 'formik';
import { Archive, ArchiveRestore, Beaker, Droplets, History, Pencil, SlidersHorizontal, TestTube, Thermometer, type LucideIcon } from 'lucide-react';
import { useId, useState, type ReactNode } from 'react';
import { phCalibrationStatus } from '@shared/instruments';
import { instrumentKindLabels, THERMOMETER_OFFSET_FLAG_C, updateInstrumentSchema, type Instrument, type InstrumentKind } from '@shared/schemas/instruments';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import type { Units } from '@/lib/units';
import { useUpdateInstrument } from '../api/update-instrument';
import { CalibrationHistory } from './calibration-history';
import { CheckReading } from './check-reading';
import { headline } from './describe';
import { PhCalibration } from './ph-calibration';
import { SettingsForm } from './settings-form';
import { ThermometerCheck } from './thermometer-check';
import { WcfCalibration } from './wcf-calibration';
import { SaveNotice } from '@/components/ui/save-notice';

export const kindIcons: Record<InstrumentKind, LucideIcon> = {
  hydrometer: TestTube,
  refractometer: Droplets,
  thermometer: Thermometer,
  ph_meter: Beaker,
};

type Panel = 'calibrate' | 'settings' | 'history' | 'edit' | null;

const calibrateLabels: Partial<Record<InstrumentKind, string>> = {
  refractometer: 'Calibrate from paired readings',
  thermometer: 'Check in ice and boiling water',
  ph_meter: 'Record a calibration',
};
const settingsLabels: Record<InstrumentKind, string> = {
  hydrometer: 'Calibration temperature and scale step',
  refractometer: 'Type in a factor',
  thermometer: 'Type in an offset',
  ph_meter: 'Resolution and reminder',
};

export interface InstrumentCardProps {
  instrument: Instrument;
  /** The brewer's hydrometers, offered in the refractometer's paired readings. */
  hydrometers: Instrument[];
  units: Units;
  elevationM: number | null;
}

export function InstrumentCard({ instrument, hydrometers, units, elevationM }: InstrumentCardProps) {
  const [panel, setPanel] = useState<Panel>(null);
  const Icon = kindIcons[instrument.kind];
  const { value, label } = headline(instrument, units);
  const headingId = useId();
  const panelId = useId();
  const toggle = (p: Exclude<Panel, null>) => setPanel((cur) => (cur === p ? null : p));
  const close = () => setPanel(null);
  const calibrateLabel = calibrateLabels[instrument.kind];

  return (
    <article aria-labelledby={headingId} className="rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100" data-testid={`instrument-${instrument.id}`}>
      <header className="flex items-start gap-3">
        <Icon aria-hidden className="mt-1 size-7 shrink-0 text-cellar-500" />
        <div className="min-w-0 flex-1">
          <h3 id={headingId} className="break-words text-lg font-bold text-cellar-900">
            {instrument.name}
          </h3>
          <p className="text-sm text-ink-faint">
            {instrumentKindLabels[instrument.kind]}
            {instrument.archived && ' · archived'}
          </p>
        </div>
        <div className="text-right">
          <p className="text-2xl font-bold tabular-nums text-cellar-900" data-testid="headline">
            {value}
          </p>
          <p className="text-xs text-ink-faint">{label}</p>
        </div>
      </header>
      {instrument.notes && <p className="mt-2 text-sm text-ink-soft">{instrument.notes}</p>}

      <div className="mt-3 space-y-2">
        <StatusNotices instrument={instrument} units={units} />
      </div>

      {!instrument.archived && (
        <div className="mt-3 flex flex-wrap gap-2">
          {calibrateLabel && (
            <PanelButton active={panel === 'calibrate'} controls={panelId} onClick={() => toggle('calibrate')} icon={<SlidersHorizontal aria-hidden className="size-5" />}>
              {calibrateLabel}
            </PanelButton>
          )}
          <PanelButton active={panel === 'settings'} controls={panelId} onClick={() => toggle('settings')} icon={instrument.kind === 'hydrometer' ? <SlidersHorizontal aria-hidden className="size-5" /> : undefined}>
            {settingsLabels[instrument.kind]}
          </PanelButton>
          <PanelButton active={panel === 'history'} controls={panelId} onClick={() => toggle('history')} icon={<History aria-hidden className="size-5" />}>
            Log
          </PanelButton>
          <PanelButton active={panel === 'edit'} controls={panelId} onClick={() => toggle('edit')} icon={<Pencil aria-hidden className="size-5" />}>
            Rename or archive
          </PanelButton>
        </div>
      )}

      {panel && (
        <div id={panelId} className="mt-3 rounded-lg bg-paper p-3 ring-1 ring-cellar-100">
          {panel === 'calibrate' && instrument.kind === 'refractometer' && <WcfCalibration instrument={instrument} hydrometers={hydrometers} units={units} onDone={close} />}
          {panel === 'calibrate' && instrument.kind === 'thermometer' && <ThermometerCheck instrument={instrument} units={units} elevationM={elevationM} onDone={close} />}
          {panel === 'calibrate' && instrument.kind === 'ph_meter' && <PhCalibration instrument={instrument} onDone={close} />}
          {panel === 'settings' && <SettingsForm instrument={instrument} units={units} onDone={close} />}
          {panel === 'history' && <CalibrationHistory instrumentId={instrument.id} units={units} />}
          {panel === 'edit' && <EditForm instrument={instrument} onDone={close} />}
        </div>
      )}

      {instrument.archived ? (
        <RestoreButton instrument={instrument} />
      ) : (
        <div className="mt-3">
          <CheckReading snapshot={instrument.snapshot} units={units} />
        </div>
      )}
    </article>
  );
}

function PanelButton({ active, controls, onClick, icon, children }: { active: boolean; controls: string; onClick: () => void; icon?: ReactNode; children: ReactNode }) {
  return (
    <Button variant={active ? 'primary' : 'secondary'} aria-expanded={active} aria-controls={active ? controls : undefined} onClick={onClick} icon={icon} className="text-sm">
      {children}
    </Button>
  );
}

function StatusNotices({ instrument, units }: { instrument: Instrument; units: Units }) {
  const s = instrument.snapshot;
  if (s.kind === 'ph_meter') {
    const status = phCalibrationStatus(s);
    if (status.overdue) return <Notice tone="caution" title="Calibration due">{status.message}</Notice>;
    return (
      <p className="text-sm text-ink-soft">
        Two-point calibration {status.daysSince === 0 ? 'today' : `${status.daysSince} days ago`}
        {s.bufferLowPh && s.bufferHighPh ? ` (pH ${s.bufferLowPh.toFixed(2)} and ${s.bufferHighPh.toFixed(2)})` : ''}; next due {status.dueOn}.
        {s.resolutionPh > 0.01 && ' This meter is too coarse for mash pH: 0.01 or finer is needed.'}
      </p>
    );
  }
  if (s.kind === 'thermometer') {
    return (
      <>
        {Math.abs(s.offsetC) > THERMOMETER_OFFSET_FLAG_C && (
          <Notice tone="caution" title="More than 1 °C off">
            Every reading is corrected by {units.format('temperatureDelta', Math.abs(s.offsetC))}, but a thermometer this far out may drift further. Check it often, or
            replace it.
          </Notice>
        )}
        {s.checkedOn === null && (
          <Notice tone="info" title="Not checked yet">
            Built-in gauges of all-in-one systems and stick-on fermenter strips can be several degrees off, up to about 5 °C. Check every thermometer you read
            from in an ice bath.
          </Notice>
        )}
      </>
    );
  }
  if (s.kind === 'refractometer' && s.wcfSource === 'default') {
    return (
      <Notice tone="info" title="Factor not measured yet">
        Using the common-practice 1.04. Calibrate from a few paired hydrometer readings of unfermented wort for numbers you can trust.
      </Notice>
    );
  }
  if (s.kind === 'hydrometer') {
    return <p className="text-sm text-ink-soft">Cool the sample near {units.format('temperature', s.calibrationTempC)} before reading; never read boiling wort.</p>;
  }
  return null;
}

function EditForm({ instrument, onDone }: { instrument: Instrument; onDone: () => void }) {
  const update = useUpdateInstrument(instrument.id);
  return (
    <Formik
      initialValues={{ name: instrument.name, notes: instrument.notes ?? '' }}
      validate={zodValidate(updateInstrumentSchema)}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await update.mutateAsync({ name: values.name, notes: values.notes || null });
          onDone();
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status }) => (
        <Form noValidate className="space-y-3">
          <TextField name="name" label="Name" />
          <TextField name="notes" label="Notes (optional)" />
          <SaveNotice failure={status} />
          <div className="flex flex-wrap gap-2">
            <Button type="submit" busy={isSubmitting}>
              Save
            </Button>
            <Button
              variant="secondary"
              icon={<Archive aria-hidden className="size-5" />}
              busy={update.isPending && !isSubmitting}
              onClick={() => update.mutate({ archived: true }, { onSuccess: onDone })}
            >
              Archive
            </Button>
          </div>
          <p className="text-sm text-ink-faint">Archived instruments are no longer offered for new readings; readings taken with them keep their calibration.</p>
          {update.isError && !isSubmitting && <Notice tone="error">{update.error.message}</Notice>}
        </Form>
      )}
    </Formik>
  );
}

function RestoreButton({ instrument }: { instrument: Instrument }) {
  const update = useUpdateInstrument(instrument.id);
  return (
    <div className="mt-3">
      <Button variant="secondary" busy={update.isPending} icon={<ArchiveRestore aria-hidden className="size-5" />} onClick={() => update.mutate({ archived: false })}>
        Restore
      </Button>
      {update.isError && <Notice tone="error">{update.error.message}</Notice>}
    </div>
  );
}
