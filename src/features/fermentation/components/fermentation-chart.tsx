import type { FermentationLog } from '@shared/schemas/fermentation';
import { Chart } from '@/components/ui/chart';
import { countOf } from '@/lib/plural';
import { useUnits } from '@/lib/units';
import { DAY_MS } from '@shared/dates';

const dayText = (d: number) => String(Number(d.toFixed(1)));

/**
 * Gravity (left) and fermenter temperature (right) over the days since pitching, with the target
 * FG and the recipe's range marked: every reading of the log, from its compact series (decision 0024).
 */
export function FermentationChart({ log }: { log: FermentationLog }) {
  const units = useUnits();
  const pitched = log.brew.pitchedAt ? Date.parse(log.brew.pitchedAt) : null;
  if (pitched === null) return null;
  const dayOf = (iso: string) => (Date.parse(iso) - pitched) / DAY_MS;
  // Every reading as a point (a log kept on the device before the series existed has them all as readings).
  const points = log.series ?? log.readings;
  const gravity = points.filter((r) => r.kind === 'gravity').map((r) => ({ d: dayOf(r.takenAt), v: r.corrected, estimate: r.estimate }));
  const temps = points.filter((r) => r.kind === 'temperature').map((r) => ({ d: dayOf(r.takenAt), v: r.corrected }));
  const targetFg = log.brew.targetFg;
  const range = log.temperature.target;
  const lastDay = Math.max(14, log.verdict?.daysSincePitch ?? 0, ...gravity.map((g) => g.d), ...temps.map((t) => t.d));
  const g = (sg: number) => units.toDisplay('gravity', sg);
  const t = (c: number) => units.toDisplay('temperature', c);
  const gDecimals = units.gravityUnit === 'plato' ? 1 : 3;

  const lastG = gravity.at(-1);
  const summary = [
    `${countOf(gravity.length, 'gravity reading')} and ${countOf(temps.length, 'temperature reading')} over ${countOf(Math.floor(Math.max(0, ...gravity.map((x) => x.d), ...temps.map((x) => x.d))), 'day')} since pitching.`,
    lastG && `Latest gravity ${units.format('gravity', lastG.v)} on day ${dayText(lastG.d)}${targetFg !== null ? `, target FG ${units.format('gravity', targetFg)}` : ''}.`,
    temps.length > 0 && `Fermenter between ${units.format('temperature', Math.min(...temps.map((x) => x.v)))} and ${units.format('temperature', Math.max(...temps.map((x) => x.v)))}${range ? `, recipe range ${units.format('temperature', range.minC)} to ${units.format('temperature', range.maxC)}` : ''}.`,
  ]
    .filter(Boolean)
    .join(' ');
  const rows = [
    ...gravity.map((x) => ({ d: x.d, what: x.estimate ? 'Gravity (refractometer estimate)' : 'Gravity', shown: units.format('gravity', x.v) })),
    ...temps.map((x) => ({ d: x.d, what: 'Fermenter temperature', shown: units.format('temperature', x.v) })),
  ].sort((a, b) => a.d - b.d);

  return (
    <Chart
      testId="fermentation-chart"
      title={`Gravity (${units.unit('gravity')}) and fermenter temperature (${units.unit('temperature')}) since pitching`}
      summary={summary}
      x={{ label: 'Days since pitching', kind: 'number', format: dayText, domain: [0, lastDay] }}
      left={{ label: `Gravity, ${units.unit('gravity')}`, format: (v) => v.toFixed(gDecimals), include: log.progress.og !== null ? [g(log.progress.og)] : [] }}
      right={{ label: `Temperature, ${units.unit('temperature')}`, format: (v) => String(Number(v.toFixed(1))) }}
      series={[
        {
          id: 'gravity',
          label: 'Gravity (hollow: refractometer estimate)',
          axis: 'left',
          tone: 'cellar',
          marker: 'circle',
          points: gravity.map((x) => ({ x: x.d, y: g(x.v), hollow: x.estimate, title: `Day ${dayText(x.d)}: ${units.format('gravity', x.v)}` })),
        },
        {
          id: 'temperature',
          label: 'Fermenter temperature',
          axis: 'right',
          tone: 'malt',
          marker: 'square',
          points: temps.map((x) => ({ x: x.d, y: t(x.v), title: `Day ${dayText(x.d)}: ${units.format('temperature', x.v)}` })),
        },
      ]}
      targets={targetFg !== null ? [{ axis: 'left', value: g(targetFg), label: `target FG ${units.format('gravity', targetFg)}` }] : []}
      bands={range ? [{ axis: 'right', from: t(range.minC), to: t(range.maxC), label: 'Recipe temperature range' }] : []}
      table={{
        caption: 'Fermentation readings by day since pitching',
        columns: ['Day', 'What', 'Value'],
        rows: rows.map((r, i) => ({ key: `${i}`, cells: [dayText(r.d), r.what, r.shown] })),
      }}
    />
  );
}
