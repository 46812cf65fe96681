import { readingKindLabels, type BrewDetail } from '@shared/schemas/brews';
import { Chart } from '@/components/ui/chart';
import { countOf } from '@/lib/plural';
import { useUnits } from '@/lib/units';
import { timeText } from './describe';

export interface BrewChartPoint {
  at: number;
  value: number;
  label: string;
}

interface StoredDecision {
  currentSg?: number;
  result?: { projected?: { endSg: number; fermenterVolumeL: number } };
}

/** Gravity and volume through the day, SI, from readings and the late-boil decisions. */
export function chartSeries(brew: Pick<BrewDetail, 'readings' | 'decisions'>): { gravity: BrewChartPoint[]; volume: BrewChartPoint[] } {
  const gravity: BrewChartPoint[] = [];
  const volume: BrewChartPoint[] = [];
  for (const r of brew.readings) {
    const at = Date.parse(r.takenAt);
    if (r.quantity === 'gravity') gravity.push({ at, value: r.corrected, label: readingKindLabels[r.kind] });
    if (r.volumeL !== null) volume.push({ at, value: r.volumeL, label: r.kind === 'og' ? 'Into the fermenter' : `${readingKindLabels[r.kind]}, hot` });
  }
  for (const d of brew.decisions) {
    const at = Date.parse(d.decidedAt);
    const stored = d.result as StoredDecision;
    const input = d.input as { volumeL?: number; minutesLeft?: number };
    const end = at + (input.minutesLeft ?? 0) * 60_000;
    const chosen = d.chosen as { endSg?: number; fermenterVolumeL?: number } | null;
    const predicted = chosen ?? stored.result?.projected;
    if (typeof stored.currentSg === 'number') gravity.push({ at, value: stored.currentSg, label: 'Late-boil check' });
    if (typeof input.volumeL === 'number') volume.push({ at, value: input.volumeL, label: 'Late-boil check, hot' });
    if (predicted && typeof predicted.endSg === 'number') gravity.push({ at: end, value: predicted.endSg, label: 'Predicted after the decision' });
    if (predicted && typeof predicted.fermenterVolumeL === 'number') volume.push({ at: end, value: predicted.fermenterVolumeL, label: 'Predicted into the fermenter' });
  }
  const byTime = (a: BrewChartPoint, b: BrewChartPoint) => a.at - b.at;
  return { gravity: gravity.sort(byTime), volume: volume.sort(byTime) };
}

const clock = (ms: number) => timeText(new Date(ms).toISOString());

/** Gravity (left) and volume (right) through the brew day, with the snapshot's target OG and batch volume marked. */
export function BrewChart({ brew }: { brew: BrewDetail }) {
  const units = useUnits();
  const { gravity, volume } = chartSeries(brew);
  if (gravity.length === 0 && volume.length === 0) {
    return <p className="text-ink-soft">No gravity or volume readings yet: the chart fills in as you log them.</p>;
  }
  const shownG = (sg: number) => units.toDisplay('gravity', sg);
  const shownV = (l: number) => units.toDisplay('volume', l);
  const gDecimals = units.gravityUnit === 'plato' ? 1 : 3;
  const times = [...gravity, ...volume].map((p) => p.at);
  let [t0, t1] = [Math.min(...times), Math.max(...times)];
  if (t1 - t0 < 30 * 60_000) [t0, t1] = [t0 - 15 * 60_000, t1 + 15 * 60_000];
  const pointTitle = (p: BrewChartPoint, shown: string) => `${p.label}: ${shown} at ${clock(p.at)}`;
  const lastG = gravity.at(-1);
  const lastV = volume.at(-1);
  const summary = [
    `${countOf(gravity.length, 'gravity point')} and ${countOf(volume.length, 'volume point')} from ${clock(t0)} to ${clock(t1)}.`,
    lastG && `Last gravity ${units.format('gravity', lastG.value)} (${lastG.label.toLowerCase()}) against a target OG of ${units.format('gravity', brew.targets.targetOg)}.`,
    lastV && `Last volume ${units.format('volume', lastV.value)} (${lastV.label.toLowerCase()}) against ${units.format('volume', brew.targets.batchVolumeL)} planned into the fermenter.`,
  ]
    .filter(Boolean)
    .join(' ');
  const rows = [
    ...gravity.map((p) => ({ ...p, shown: units.format('gravity', p.value) })),
    ...volume.map((p) => ({ ...p, shown: units.format('volume', p.value) })),
  ].sort((a, b) => a.at - b.at);

  return (
    <Chart
      testId="brew-chart"
      title={`Gravity (${units.unit('gravity')}) and volume (${units.unit('volume')}) through the brew day`}
      summary={summary}
      x={{ label: 'Time of day', kind: 'time', format: clock, domain: [t0, t1] }}
      left={{ label: `Gravity, ${units.unit('gravity')}`, format: (v) => v.toFixed(gDecimals) }}
      right={{ label: `Volume, ${units.unit('volume')}`, format: (v) => String(Number(v.toFixed(1))) }}
      series={[
        {
          id: 'gravity',
          label: 'Gravity, corrected',
          axis: 'left',
          tone: 'cellar',
          marker: 'circle',
          points: gravity.map((p) => ({ x: p.at, y: shownG(p.value), title: pointTitle(p, units.format('gravity', p.value)) })),
        },
        {
          id: 'volume',
          label: 'Volume: hot in the kettle, then into the fermenter',
          axis: 'right',
          tone: 'malt',
          dashed: true,
          marker: 'square',
          points: volume.map((p) => ({ x: p.at, y: shownV(p.value), title: pointTitle(p, units.format('volume', p.value)) })),
        },
      ]}
      targets={[
        { axis: 'left', value: shownG(brew.targets.targetOg), label: `target OG ${units.format('gravity', brew.targets.targetOg)}` },
        { axis: 'right', value: shownV(brew.targets.batchVolumeL), label: `target ${units.format('volume', brew.targets.batchVolumeL)}` },
      ]}
      table={{
        caption: 'Gravity and volume points through the brew day',
        columns: ['Time', 'What', 'Value'],
        rows: rows.map((r) => ({ key: `${r.at}${r.label}${r.shown}`, cells: [clock(r.at), r.label, r.shown] })),
      }}
    />
  );
}
