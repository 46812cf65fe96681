import { useId } from 'react';
import { readingKindLabels, type BrewDetail } from '@shared/schemas/brews';
import { useUnits, type Units } from '@/lib/units';
import { timeText } from './describe';

export interface ChartPoint {
  at: number;
  value: number;
  label: string;
}

interface StoredDecision {
  currentSg?: number;
  result?: { projected?: { endSg: number; fermenterVolumeL: number } };
}

/** Gravity and volume through the day, SI, from readings and the late-boil decisions. */
export function chartSeries(brew: Pick<BrewDetail, 'readings' | 'decisions'>): { gravity: ChartPoint[]; volume: ChartPoint[] } {
  const gravity: ChartPoint[] = [];
  const volume: ChartPoint[] = [];
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
  const byTime = (a: ChartPoint, b: ChartPoint) => a.at - b.at;
  return { gravity: gravity.sort(byTime), volume: volume.sort(byTime) };
}

// Sized for a phone: at 375 px the 12-unit labels read at about 10 px; larger screens and paper scale it up.
const W = 420;
const H = 260;
const M = { left: 48, right: 44, top: 14, bottom: 34 };

function scale(domain: [number, number], range: [number, number]) {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  return (v: number) => r0 + ((v - d0) / (d1 - d0 || 1)) * (r1 - r0);
}

function extent(values: number[], pad: number): [number, number] {
  const min = Math.min(...values);
  const max = Math.max(...values);
  const span = max - min || Math.abs(max) * 0.05 || 1;
  return [min - span * pad, max + span * pad];
}

function ticks([a, b]: [number, number], count = 4) {
  return Array.from({ length: count + 1 }, (_, i) => a + ((b - a) * i) / count);
}

/**
 * Plain SVG, no chart package: gravity (left axis) and volume (right axis) against the time of
 * day, with the snapshot's target OG and batch volume as dashed lines.
 */
export function BrewChart({ brew }: { brew: BrewDetail }) {
  const units = useUnits();
  const titleId = useId();
  const { gravity, volume } = chartSeries(brew);
  if (gravity.length === 0 && volume.length === 0) {
    return <p className="text-ink-soft">No gravity or volume readings yet: the chart fills in as you log them.</p>;
  }
  const shownG = (sg: number) => units.toDisplay('gravity', sg);
  const shownV = (l: number) => units.toDisplay('volume', l);
  const times = [...gravity, ...volume].map((p) => p.at);
  let [t0, t1] = [Math.min(...times), Math.max(...times)];
  if (t1 - t0 < 30 * 60_000) [t0, t1] = [t0 - 15 * 60_000, t1 + 15 * 60_000];
  const x = scale([t0, t1], [M.left, W - M.right]);
  const gDomain = extent([...gravity.map((p) => shownG(p.value)), shownG(brew.targets.targetOg)], 0.15);
  const vDomain = extent([...volume.map((p) => shownV(p.value)), shownV(brew.targets.batchVolumeL)], 0.15);
  const yG = scale(gDomain, [H - M.bottom, M.top]);
  const yV = scale(vDomain, [H - M.bottom, M.top]);
  const gDecimals = units.gravityUnit === 'plato' ? 1 : 3;
  const path = (points: ChartPoint[], fx: (p: ChartPoint) => number, fy: (p: ChartPoint) => number) => points.map((p, i) => `${i === 0 ? 'M' : 'L'}${fx(p).toFixed(1)},${fy(p).toFixed(1)}`).join(' ');
  const gx = (p: ChartPoint) => x(p.at);
  const gy = (p: ChartPoint) => yG(shownG(p.value));
  const vy = (p: ChartPoint) => yV(shownV(p.value));
  const targetG = yG(shownG(brew.targets.targetOg));
  const targetV = yV(shownV(brew.targets.batchVolumeL));

  return (
    <figure className="space-y-2 break-inside-avoid">
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-labelledby={titleId} className="h-auto w-full" data-testid="brew-chart">
        <title id={titleId}>
          Gravity ({units.unit('gravity')}) and volume ({units.unit('volume')}) through the brew day
        </title>
        <rect x={M.left} y={M.top} width={W - M.left - M.right} height={H - M.top - M.bottom} fill="#fff" stroke="#d6e7e2" />
        {ticks(gDomain).map((t) => (
          <g key={`g${t}`}>
            <line x1={M.left} x2={W - M.right} y1={yG(t)} y2={yG(t)} stroke="#eef5f3" />
            <text x={M.left - 6} y={yG(t) + 4} textAnchor="end" fontSize="12" fill="#1f3b36">
              {t.toFixed(gDecimals)}
            </text>
          </g>
        ))}
        {ticks(vDomain).map((t) => (
          <text key={`v${t}`} x={W - M.right + 6} y={yV(t) + 4} fontSize="12" fill="#8c5a12">
            {t.toFixed(1)}
          </text>
        ))}
        {[t0, (t0 + t1) / 2, t1].map((t) => (
          <text key={`t${t}`} x={x(t)} y={H - M.bottom + 18} textAnchor="middle" fontSize="12" fill="#4a5753">
            {timeText(new Date(t).toISOString())}
          </text>
        ))}
        <text x={12} y={M.top + 4} fontSize="12" fill="#1f3b36" transform={`rotate(-90 12 ${M.top + 4})`} textAnchor="end">
          Gravity ({units.unit('gravity')})
        </text>
        <text x={W - 8} y={M.top + 4} fontSize="12" fill="#8c5a12" transform={`rotate(-90 ${W - 8} ${M.top + 4})`} textAnchor="end">
          Volume ({units.unit('volume')})
        </text>
        <line x1={M.left} x2={W - M.right} y1={targetG} y2={targetG} stroke="#3d7c6d" strokeDasharray="6 4" />
        <text x={M.left + 4} y={targetG - 4} fontSize="11" fill="#3d7c6d">
          target OG
        </text>
        <line x1={M.left} x2={W - M.right} y1={targetV} y2={targetV} stroke="#d6962a" strokeDasharray="2 4" />
        <text x={W - M.right - 4} y={targetV - 4} fontSize="11" fill="#8c5a12" textAnchor="end">
          target volume
        </text>
        {gravity.length > 1 && <path d={path(gravity, gx, gy)} fill="none" stroke="#1f3b36" strokeWidth="2" />}
        {volume.length > 1 && <path d={path(volume, gx, vy)} fill="none" stroke="#d6962a" strokeWidth="2" strokeDasharray="5 3" />}
        {gravity.map((p) => (
          <circle key={`gp${p.at}${p.label}`} cx={gx(p)} cy={gy(p)} r="5" fill="#1f3b36">
            <title>{`${p.label}: ${units.format('gravity', p.value)} at ${timeText(new Date(p.at).toISOString())}`}</title>
          </circle>
        ))}
        {volume.map((p) => (
          <rect key={`vp${p.at}${p.label}`} x={gx(p) - 5} y={vy(p) - 5} width="10" height="10" fill="#d6962a">
            <title>{`${p.label}: ${units.format('volume', p.value)} at ${timeText(new Date(p.at).toISOString())}`}</title>
          </rect>
        ))}
      </svg>
      <figcaption className="flex flex-wrap gap-x-4 gap-y-1 text-sm text-ink-soft">
        <span>
          <span aria-hidden className="mr-1 inline-block size-3 rounded-full bg-cellar-700 align-middle" />
          Gravity, corrected
        </span>
        <span>
          <span aria-hidden className="mr-1 inline-block size-3 bg-malt-500 align-middle" />
          Volume: hot in the kettle, then into the fermenter
        </span>
      </figcaption>
      <ChartTable gravity={gravity} volume={volume} units={units} />
    </figure>
  );
}

/** The same points as a table, for screen readers. */
function ChartTable({ gravity, volume, units }: { gravity: ChartPoint[]; volume: ChartPoint[]; units: Units }) {
  const rows = [
    ...gravity.map((p) => ({ ...p, shown: units.format('gravity', p.value) })),
    ...volume.map((p) => ({ ...p, shown: units.format('volume', p.value) })),
  ].sort((a, b) => a.at - b.at);
  return (
    <table className="sr-only">
      <caption>Gravity and volume points</caption>
      <thead>
        <tr>
          <th>Time</th>
          <th>What</th>
          <th>Value</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={`${r.at}${r.label}${r.shown}`}>
            <td>{timeText(new Date(r.at).toISOString())}</td>
            <td>{r.label}</td>
            <td>{r.shown}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
