import { Check, CircleDashed, SkipForward, Undo2 } from 'lucide-react';
import type { ReactNode } from 'react';
import { MASH_PH_BAND, SOURING_PH_BAND } from '@shared/brewmath';
import { brewStageLabels, readingKindInSentence, readingStage, type BrewDetail, type BrewStage, type BrewStageState, type ReadingKind } from '@shared/schemas/brews';
import type { Instrument } from '@shared/schemas/instruments';
import { Button } from '@/components/ui/button';
import { cautionTexts } from '@/components/ui/cautions';
import { Notice } from '@/components/ui/notice';
import { NetworkError } from '@/lib/api-client';
import { useUnits, type Units } from '@/lib/units';
import { useLoadedReadings } from '../api/older-readings';
import { useSetStage } from '../api/set-stage';
import { DecisionCard } from './decision-card';
import { timeText } from './describe';
import { NoteForm } from './note-form';
import { OlderReadings } from './older-readings';
import { ReadingCard } from './reading-card';
import { ReadingForm } from './reading-form';
import { SouringProgress } from './souring-progress';

const shortLabels: Record<BrewStage, string> = { mash: 'Mash', souring: 'Sour', boil: 'Boil', chill: 'Chill', og: 'OG' };

const stageKinds: Record<BrewStage, readonly ReadingKind[][]> = {
  mash: [['mash_temp'], ['mash_ph']],
  souring: [['souring_ph']],
  boil: [['pre_boil_gravity', 'late_boil_gravity']],
  chill: [['pitch_temp']],
  og: [['og']],
};

function formTitle(kinds: readonly ReadingKind[]): string {
  if (kinds.length > 1) return 'Log a boil gravity';
  return `New reading: ${readingKindInSentence(kinds[0])}`;
}

type StageStatus = 'done' | 'skipped' | 'started' | 'not-started';

function statusOf(s: BrewStageState): StageStatus {
  if (s.completedAt) return 'done';
  if (s.skippedAt) return 'skipped';
  if (s.startedAt) return 'started';
  return 'not-started';
}

const statusWords: Record<StageStatus, string> = { done: 'done', skipped: 'skipped', started: 'under way', 'not-started': 'not started' };

/** Big stage tabs (four, or five with souring), each saying whether it is done, skipped or under way. */
export function StageTabs({ brew, selected, onSelect }: { brew: BrewDetail; selected: BrewStage; onSelect: (stage: BrewStage) => void }) {
  return (
    <div role="tablist" aria-label="Stages" className={`no-print grid gap-1 ${brew.stages.length > 4 ? 'grid-cols-5' : 'grid-cols-4'}`}>
      {brew.stages.map((s, i) => {
        const status = statusOf(s);
        const active = s.stage === selected;
        return (
          <button
            key={s.stage}
            type="button"
            role="tab"
            id={`stage-tab-${s.stage}`}
            aria-selected={active}
            aria-controls={`stage-panel-${s.stage}`}
            title={brewStageLabels[s.stage]}
            onClick={() => onSelect(s.stage)}
            className={`flex min-h-14 flex-col items-center justify-center rounded-lg px-1 py-1 text-sm font-semibold ring-1 ${active ? 'bg-cellar-700 text-white ring-cellar-700' : 'bg-white text-cellar-700 ring-cellar-300'}`}
          >
            <span className="flex items-center gap-1">
              {status === 'done' ? <Check aria-hidden className="size-4" /> : status === 'skipped' ? <SkipForward aria-hidden className="size-4" /> : <span>{i + 1}</span>}
              {shortLabels[s.stage]}
            </span>
            <span className={`text-xs font-normal ${active ? 'text-cellar-100' : 'text-ink-faint'}`}>{statusWords[status]}</span>
          </button>
        );
      })}
    </div>
  );
}

function Targets({ brew, stage, units }: { brew: BrewDetail; stage: BrewStage; units: Units }) {
  const t = brew.targets;
  const lines: string[] = [];
  if (stage === 'mash') {
    if (t.mashSteps.length > 0) lines.push(`Steps: ${t.mashSteps.map((s) => `${units.format('temperature', s.tempC)} for ${s.minutes} min`).join(', then ')}`);
    lines.push(`Mash pH ${MASH_PH_BAND.min.toFixed(1)}–${MASH_PH_BAND.max.toFixed(1)} (recipe aims ${t.mashPhTarget.toFixed(2)})`);
  } else if (stage === 'souring') {
    lines.push(`Sour to pH ${t.souringTargetPh?.toFixed(2) ?? '—'} or below before the boil (common practice ${SOURING_PH_BAND.min.toFixed(1)}–${SOURING_PH_BAND.max.toFixed(1)})`);
  } else if (stage === 'boil') {
    lines.push(`${t.boilMinutes} min boil, ${units.format('volume', t.preBoilVolumeL)} before, ${units.format('volume', t.postBoilVolumeL)} after`);
    lines.push(`Boil-off today: ${units.format('rate', brew.boilOffLPerHour)}`);
  } else if (stage === 'chill') {
    lines.push(`Pitch at or below ${units.format('temperature', t.fermentationTempMaxC)}; ferment at ${units.format('temperature', t.fermentationTempMinC)}–${units.format('temperature', t.fermentationTempMaxC)}`);
  } else {
    lines.push(`OG ${units.format('gravity', t.targetOg)}, ${units.format('volume', t.batchVolumeL)} into the fermenter`);
  }
  return (
    <div className="rounded-xl bg-cellar-50 p-3 text-cellar-900">
      <p className="text-xs font-semibold uppercase tracking-wide">Target</p>
      {lines.map((l) => (
        <p key={l} className="font-semibold">
          {l}
        </p>
      ))}
    </div>
  );
}

const cautions: Partial<Record<BrewStage, { title: string; body: string }>> = {
  mash: { title: 'Hot mash', body: 'Stir and sample with a long spoon. Keep the pH electrode in its storage solution between readings.' },
  souring: {
    title: 'Soured wort is acidic',
    body: `Keep it covered, and keep it warm only as your souring method says. Wear eye protection when sampling, and clean and sanitise everything it touched afterwards. ${cautionTexts.chemicals} Follow the product labels and local rules.`,
  },
  boil: { title: 'Hot wort and steam burn', body: 'Sample with a long spoon or tube, keep your face out of the steam, and never put a hydrometer in boiling wort.' },
  chill: { title: 'Clean from here on', body: `Anything that touches cooled wort must be sanitised. Yeast pitched into wort that is too hot dies. ${cautionTexts.chemicals}` },
};

function StageActions({ brew, stage }: { brew: BrewDetail; stage: BrewStageState }) {
  const setStage = useSetStage(brew.id);
  const status = statusOf(stage);
  const run = (action: 'start' | 'complete' | 'skip') => setStage.mutate({ stage: stage.stage, action });
  const times = [
    stage.startedAt && `started ${timeText(stage.startedAt)}`,
    stage.completedAt && `done ${timeText(stage.completedAt)}`,
    stage.skippedAt && `skipped ${timeText(stage.skippedAt)}`,
  ].filter(Boolean);
  return (
    <div className="no-print space-y-2">
      {times.length > 0 && <p className="text-sm text-ink-soft">{`${times.join(', ')}.`.replace(/^./, (c) => c.toUpperCase())}</p>}
      <div className="grid grid-cols-2 gap-2">
        {status === 'done' || status === 'skipped' ? (
          <Button variant="secondary" className="col-span-2" busy={setStage.isPending} icon={<Undo2 aria-hidden className="size-5" />} onClick={() => run('start')}>
            Return to this stage
          </Button>
        ) : (
          <>
            <Button busy={setStage.isPending} icon={<Check aria-hidden className="size-5" />} onClick={() => run('complete')}>
              Stage done
            </Button>
            <Button variant="secondary" busy={setStage.isPending} icon={<SkipForward aria-hidden className="size-5" />} onClick={() => run('skip')}>
              Skip
            </Button>
          </>
        )}
      </div>
      {setStage.error && <Notice tone="error">{setStage.error instanceof NetworkError ? 'Not saved — no connection. Try again.' : setStage.error.message}</Notice>}
    </div>
  );
}

interface BrewDayProps {
  brew: BrewDetail;
  instruments: readonly Instrument[];
  selected: BrewStage;
  onSelect: (stage: BrewStage) => void;
  /** The late-boil check, composed by the route (it belongs to another feature). */
  boilCheck?: ReactNode;
}

/** The brew day on a phone: one stage at a time, its target, its readings and their forms. */
export function BrewDay({ brew, instruments, selected, onSelect, boilCheck }: BrewDayProps) {
  const units = useUnits();
  const stage = brew.stages.find((s) => s.stage === selected)!;
  const loaded = useLoadedReadings(brew);
  const readings = loaded.readings.filter((r) => readingStage[r.kind] === selected);
  const canEdit = brew.permissions.edit;
  // The late-boil check carries its own hot-wort caution; say it once.
  const caution = selected === 'boil' && boilCheck ? undefined : cautions[selected];
  const stageList = brew.stages.map((s) => s.stage);
  const next = stageList[stageList.indexOf(selected) + 1];
  return (
    <div className="space-y-4">
      <StageTabs brew={brew} selected={selected} onSelect={onSelect} />
      <section role="tabpanel" id={`stage-panel-${selected}`} aria-labelledby={`stage-tab-${selected}`} className="space-y-4">
        <h2 className="flex items-center gap-2 text-xl font-bold text-cellar-900">
          <CircleDashed aria-hidden className="size-5" /> {brewStageLabels[selected]}
        </h2>
        <Targets brew={brew} stage={selected} units={units} />
        {caution && (
          <Notice tone="caution" title={caution.title}>
            {caution.body}
          </Notice>
        )}
        {canEdit && <StageActions brew={brew} stage={stage} />}

        {selected === 'boil' && boilCheck && (
          <section aria-label="Late-boil check" className="space-y-2">
            <h3 className="text-lg font-bold text-cellar-900">Late-boil check</h3>
            <p className="text-ink-soft">About ten minutes before the end of the boil: read a drop, see what to add or how long to keep boiling, and choose.</p>
            {boilCheck}
          </section>
        )}
        {selected === 'boil' && brew.decisions.length > 0 && (
          <section aria-label="Decisions" className="space-y-2">
            <h3 className="text-lg font-bold text-cellar-900">Decisions</h3>
            {brew.decisions.map((d) => (
              <DecisionCard key={d.id} decision={d} deviations={brew.deviations} />
            ))}
          </section>
        )}

        {selected === 'souring' && brew.targets.souringTargetPh != null && <SouringProgress readings={readings} targetPh={brew.targets.souringTargetPh} />}

        {(readings.length > 0 || loaded.hasOlder) && (
          <section aria-label="Readings" className="space-y-2">
            <h3 className="text-lg font-bold text-cellar-900">Readings</h3>
            <OlderReadings loaded={loaded} />
            {readings.map((r) => (
              <ReadingCard key={r.id} brewId={brew.id} reading={r} deviations={brew.deviations} canEdit={canEdit} />
            ))}
          </section>
        )}

        {canEdit &&
          stageKinds[selected].map((kinds) => (
            <details key={kinds.join()} open={selected !== 'boil'} className="rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100">
              <summary className="flex min-h-touch cursor-pointer items-center text-lg font-bold text-cellar-900">
                {formTitle(kinds)}
              </summary>
              <div className="mt-3">
                <ReadingForm brewId={brew.id} kinds={kinds} instruments={instruments} />
              </div>
            </details>
          ))}

        {canEdit && <NoteForm brewId={brew.id} stage={selected} />}
        {next && (
          <Button variant="quiet" className="no-print w-full" onClick={() => onSelect(next)}>
            Next: {brewStageLabels[next]}
          </Button>
        )}
      </section>
    </div>
  );
}
