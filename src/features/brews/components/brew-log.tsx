import { Trash2 } from 'lucide-react';
import { useMemo, type ReactNode } from 'react';
import { describeDeviation } from '@shared/brew-deviations';
import { brewStageLabels, brewStatusLabels, readingKindInSentence, readingKindLabels, type BrewDetail, type BrewNote, type BrewReading } from '@shared/schemas/brews';
import { Notice } from '@/components/ui/notice';
import { useUnits, type Units } from '@/lib/units';
import { useDeleteNote } from '../api/delete-note';
import { useLoadedReadings } from '../api/older-readings';
import { BrewChart } from './brew-chart';
import { DecisionCard } from './decision-card';
import { OlderReadings } from './older-readings';
import { correctedText, correctionText, instrumentText, rawText, timeText, deviationTitle } from './describe';
import './brew-sheet.css';

interface Entry {
  at: string;
  /** At the same minute: a stage starts before what happens in it, and ends after. */
  rank: number;
  key: string;
  node: ReactNode;
}

function StageEntry({ text }: { text: string }) {
  return <p className="font-semibold text-cellar-700">{text}</p>;
}

function ReadingEntry({ reading, brew, units }: { reading: BrewReading; brew: BrewDetail; units: Units }) {
  const deviations = brew.deviations.filter((d) => d.readingId === reading.id);
  return (
    <div>
      <p className="font-bold text-cellar-900">{readingKindLabels[reading.kind]}</p>
      <p className="tabular-nums">
        As read <strong>{rawText(reading, units)}</strong> · corrected <strong>{correctedText(reading, units)}</strong>
        {reading.volumeL !== null && <> · {units.format('volume', reading.volumeL)}</>}
      </p>
      <p className="text-sm text-ink-soft">
        {instrumentText(reading)}
        {correctionText(reading, units) && <> · {correctionText(reading, units)}</>}
        {reading.recomputedAt && <> · recomputed with a newer calibration</>}
      </p>
      {reading.note && <p className="whitespace-pre-line">{reading.note}</p>}
      {deviations.map((d) => (
        <Notice key={d.code} tone="caution" className="mt-1" title={deviationTitle(d)}>
          {describeDeviation(d, units)}
        </Notice>
      ))}
      {reading.photos.length > 0 && (
        <ul className="mt-2 flex flex-wrap gap-2">
          {reading.photos.map((p) => (
            <li key={p.id}>
              <a href={p.url} target="_blank" rel="noreferrer">
                <img src={p.url} alt={`Photo of the ${readingKindInSentence(reading.kind)} reading`} className="size-20 rounded-lg object-cover ring-1 ring-cellar-100" />
              </a>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

function NoteEntry({ note, brewId, canEdit }: { note: BrewNote; brewId: number; canEdit: boolean }) {
  const remove = useDeleteNote(brewId);
  return (
    <div className="flex items-start justify-between gap-2">
      <div className="min-w-0">
        <p className="font-bold text-cellar-900">{note.kind === 'recompute' ? 'Reading recomputed' : `Note${note.stage ? ` (${brewStageLabels[note.stage].toLowerCase()})` : ''}`}</p>
        <p className="whitespace-pre-line">{note.body}</p>
      </div>
      {canEdit && note.kind === 'note' && (
        <button
          type="button"
          aria-label="Delete this note"
          className="no-print flex min-h-touch min-w-touch shrink-0 items-center justify-center rounded-lg text-alert-700 hover:bg-alert-50"
          onClick={() => remove.mutate(note.id)}
        >
          <Trash2 aria-hidden className="size-5" />
        </button>
      )}
    </div>
  );
}

/** Everything that happened, in time order. */
export function timelineEntries(brew: BrewDetail, units: Units): Entry[] {
  const entries: Entry[] = [];
  for (const s of brew.stages) {
    const label = brewStageLabels[s.stage];
    if (s.startedAt) entries.push({ at: s.startedAt, rank: 0, key: `s-${s.stage}-start`, node: <StageEntry text={`${label} started`} /> });
    if (s.completedAt) entries.push({ at: s.completedAt, rank: 2, key: `s-${s.stage}-done`, node: <StageEntry text={`${label} done`} /> });
    if (s.skippedAt) entries.push({ at: s.skippedAt, rank: 2, key: `s-${s.stage}-skip`, node: <StageEntry text={`${label} skipped`} /> });
  }
  for (const r of brew.readings) entries.push({ at: r.takenAt, rank: 1, key: `r-${r.id}`, node: <ReadingEntry reading={r} brew={brew} units={units} /> });
  for (const d of brew.decisions) entries.push({ at: d.decidedAt, rank: 1, key: `d-${d.id}`, node: <DecisionCard decision={d} deviations={brew.deviations} level={3} /> });
  for (const n of brew.log) entries.push({ at: n.createdAt, rank: 1, key: `n-${n.id}`, node: <NoteEntry note={n} brewId={brew.id} canEdit={brew.permissions.edit} /> });
  return entries.sort((a, b) => Date.parse(a.at) - Date.parse(b.at) || a.rank - b.rank || a.key.localeCompare(b.key));
}

/**
 * The brew-day log, which is also the printed brew sheet: targets, where the day left them, the
 * chart and the timeline. Print styles (brew-sheet.css) drop the navigation and buttons and keep
 * it within an A4 or US Letter page's width.
 */
/** The volume measured with the latest OG reading, the one taken in the fermenter. */
export function measuredIntoFermenter(brew: Pick<BrewDetail, 'readings'>): number | null {
  const og = brew.readings.filter((r) => r.kind === 'og' && r.volumeL !== null).at(-1);
  return og?.volumeL ?? null;
}

export function BrewLog({ brew }: { brew: BrewDetail }) {
  const units = useUnits();
  const t = brew.targets;
  // The latest readings came with the day; older ones join a page at a time, when asked for.
  const loaded = useLoadedReadings(brew);
  const shown = useMemo(() => ({ ...brew, readings: loaded.readings }), [brew, loaded.readings]);
  const entries = useMemo(() => timelineEntries(shown, units), [shown, units]);
  // A copy kept on the device before the server sent the figure: all its readings came with it.
  const fermenterVolume = brew.fermenterVolumeL !== undefined ? brew.fermenterVolumeL : measuredIntoFermenter(brew);
  return (
    <div className="brew-sheet space-y-6">
      <section aria-label="Targets" className="sheet-block grid grid-cols-2 gap-3 rounded-xl bg-white p-4 ring-1 ring-cellar-100 sm:grid-cols-4">
        <Fact label="Target OG" value={units.format('gravity', t.targetOg)} />
        <Fact label="OG" value={units.format('gravity', brew.og)} />
        <Fact label="Target volume" value={units.format('volume', t.batchVolumeL)} />
        <Fact label="Into the fermenter" value={fermenterVolume === null ? 'not measured' : units.format('volume', fermenterVolume)} />
        <Fact label="Target FG" value={units.format('gravity', t.targetFg)} />
        <Fact label="Status" value={brewStatusLabels[brew.status]} />
        <Fact label="Brewed" value={brew.brewedOn} />
        <Fact label="Pitched" value={brew.pitchedAt ? new Date(brew.pitchedAt).toLocaleString([], { dateStyle: 'medium', timeStyle: 'short' }) : '—'} />
        <Fact label="Kettle" value={`${brew.equipment.name}, ${units.format('rate', brew.boilOffLPerHour)}`} />
      </section>

      <section aria-labelledby="deviations-heading" className="sheet-block space-y-2">
        <h2 id="deviations-heading" className="text-xl font-bold text-cellar-900">
          Where the day left its targets
        </h2>
        {brew.deviations.length === 0 ? (
          <p className="text-ink-soft">Nothing outside the targets so far.</p>
        ) : (
          <ul className="space-y-1" data-testid="deviations">
            {brew.deviations.map((d, i) => (
              <li key={`${d.code}-${d.readingId ?? d.decisionId ?? i}`} className="rounded-lg bg-malt-50 px-3 py-2 text-malt-700">
                <strong>{brewStageLabels[d.stage]}:</strong> {describeDeviation(d, units)}
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="chart-heading" className="sheet-block space-y-2">
        <h2 id="chart-heading" className="text-xl font-bold text-cellar-900">
          Gravity and volume through the day
        </h2>
        <BrewChart brew={shown} />
        {loaded.hasOlder && <p className="text-sm text-ink-soft">The chart draws the readings shown in the timeline below.</p>}
      </section>

      <section aria-labelledby="timeline-heading" className="space-y-2">
        <h2 id="timeline-heading" className="text-xl font-bold text-cellar-900">
          Timeline
        </h2>
        <OlderReadings loaded={loaded} />
        {entries.length === 0 ? (
          <p className="text-ink-soft">Nothing logged yet.</p>
        ) : (
          <ol className="space-y-3" aria-label="Timeline">
            {entries.map((e) => (
              <li key={e.key} className="sheet-entry grid grid-cols-[3.5rem_minmax(0,1fr)] gap-3">
                <time dateTime={e.at} className="pt-1 text-sm tabular-nums text-ink-faint">
                  {timeText(e.at)}
                </time>
                <div className="min-w-0 border-l-2 border-cellar-100 pl-3">{e.node}</div>
              </li>
            ))}
          </ol>
        )}
      </section>
      {brew.notes && (
        <section aria-labelledby="notes-heading" className="sheet-block space-y-1">
          <h2 id="notes-heading" className="text-xl font-bold text-cellar-900">
            Notes
          </h2>
          <p className="whitespace-pre-line">{brew.notes}</p>
        </section>
      )}
    </div>
  );
}

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <div className="min-w-0">
      <p className="text-sm text-ink-faint">{label}</p>
      <p className="font-bold tabular-nums">{value}</p>
    </div>
  );
}
