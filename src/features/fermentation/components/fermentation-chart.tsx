import { useEffect, useRef, useState } from 'react';
import type { FermentationLog } from '@shared/schemas/fermentation';
import { useUnits } from '@/lib/units';
import { DAY_MS } from '@shared/dates';

const HEIGHT = 240;
const M = { left: 46, right: 42, top: 14, bottom: 40 };

/** The width the chart really has, so its text is drawn at its true size on a phone and a desk alike. */
function useWidth() {
  const ref = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(360);
  useEffect(() => {
    const el = ref.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(([entry]) => setWidth(Math.max(280, Math.round(entry.contentRect.width))));
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  return { ref, width };
}

function niceStep(span: number, target: number, steps: number[]) {
  return steps.find((s) => span / s <= target) ?? steps[steps.length - 1];
}

/** Gravity and fermenter temperature over the days since pitching, with the target FG drawn in. Plain SVG. */
export function FermentationChart({ log }: { log: FermentationLog }) {
  const units = useUnits();
  const { ref, width } = useWidth();
  const pitched = log.brew.pitchedAt ? Date.parse(log.brew.pitchedAt) : null;
  if (pitched === null) return null;
  const dayOf = (iso: string) => (Date.parse(iso) - pitched) / DAY_MS;
  const gravity = log.readings.filter((r) => r.kind === 'gravity').map((r) => ({ d: dayOf(r.takenAt), v: r.corrected, estimate: r.estimate }));
  const temps = log.readings.filter((r) => r.kind === 'temperature').map((r) => ({ d: dayOf(r.takenAt), v: r.corrected }));
  const targetFg = log.brew.targetFg;
  const range = log.temperature.target;

  const lastDay = Math.max(14, log.verdict?.daysSincePitch ?? 0, ...gravity.map((g) => g.d), ...temps.map((t) => t.d));
  const dayStep = niceStep(lastDay, 8, [1, 2, 7, 14, 28]);
  const xMax = Math.ceil(lastDay / dayStep) * dayStep;

  const gValues = [...gravity.map((g) => g.v), ...(targetFg !== null ? [targetFg] : []), ...(log.progress.og !== null ? [log.progress.og] : [])];
  const gMin = Math.min(...(gValues.length ? gValues : [1.0])) - 0.002;
  const gMax = Math.max(...(gValues.length ? gValues : [1.05])) + 0.002;
  const tValues = [...temps.map((t) => t.v), ...(range ? [range.minC, range.maxC] : [])];
  const tMin = Math.floor(Math.min(...(tValues.length ? tValues : [16])) - 1);
  const tMax = Math.ceil(Math.max(...(tValues.length ? tValues : [22])) + 1);

  const plotW = width - M.left - M.right;
  const plotH = HEIGHT - M.top - M.bottom;
  const x = (d: number) => M.left + (d / xMax) * plotW;
  const yG = (v: number) => M.top + (1 - (v - gMin) / (gMax - gMin)) * plotH;
  const yT = (v: number) => M.top + (1 - (v - tMin) / (tMax - tMin)) * plotH;
  const path = (pts: { x: number; y: number }[]) => pts.map((p, i) => `${i ? 'L' : 'M'}${p.x.toFixed(1)},${p.y.toFixed(1)}`).join(' ');

  // Ticks at round numbers in the brewer's own units.
  const ticks = (kind: 'gravity' | 'temperature', lo: number, hi: number, steps: number[]) => {
    const a = units.toDisplay(kind, lo);
    const b = units.toDisplay(kind, hi);
    const step = niceStep(Math.abs(b - a), 6, steps);
    const out: { si: number; label: string }[] = [];
    for (let v = Math.ceil(Math.min(a, b) / step) * step; v <= Math.max(a, b) + 1e-9; v += step) {
      const shown = Number(v.toFixed(4));
      out.push({ si: units.fromDisplay(kind, shown), label: kind === 'gravity' && units.gravityUnit === 'sg' ? shown.toFixed(3) : String(shown) });
    }
    return out;
  };
  const gTicks = ticks('gravity', gMin, gMax, units.gravityUnit === 'sg' ? [0.002, 0.005, 0.01, 0.02] : [0.5, 1, 2, 5]);
  const tTicks = ticks('temperature', tMin, tMax, [1, 2, 5, 10]);
  const dTicks: number[] = [];
  for (let d = 0; d <= xMax; d += dayStep) dTicks.push(d);

  const summary = `Gravity and temperature over ${Math.floor(lastDay)} days: ${gravity.length} gravity readings, ${temps.length} temperature readings${
    targetFg !== null ? `, target FG ${units.format('gravity', targetFg)}` : ''
  }.`;

  return (
    <div ref={ref} className="w-full">
      <svg viewBox={`0 0 ${width} ${HEIGHT}`} width="100%" height={HEIGHT} role="img" aria-label={summary} className="block">
        <title>{summary}</title>
        {range && <rect x={M.left} width={plotW} y={yT(range.maxC)} height={Math.max(0, yT(range.minC) - yT(range.maxC))} className="fill-malt-50" />}
        {gTicks.map((t) => (
          <g key={`g${t.label}`}>
            <line x1={M.left} x2={M.left + plotW} y1={yG(t.si)} y2={yG(t.si)} className="stroke-cellar-100" />
            <text x={M.left - 4} y={yG(t.si) + 4} textAnchor="end" className="fill-cellar-700 text-[11px] tabular-nums">
              {t.label}
            </text>
          </g>
        ))}
        {tTicks.map((t) => (
          <text key={`t${t.label}`} x={M.left + plotW + 4} y={yT(t.si) + 4} className="fill-malt-700 text-[11px] tabular-nums">
            {t.label}°
          </text>
        ))}
        {dTicks.map((d) => (
          <text key={`d${d}`} x={x(d)} y={M.top + plotH + 16} textAnchor="middle" className="fill-ink-soft text-[11px]">
            {d}
          </text>
        ))}
        <text x={M.left + plotW / 2} y={HEIGHT - 4} textAnchor="middle" className="fill-ink-faint text-[10px]">
          days since pitching
        </text>
        <line x1={M.left} x2={M.left + plotW} y1={M.top + plotH} y2={M.top + plotH} className="stroke-cellar-300" />
        {targetFg !== null && (
          <g>
            <line x1={M.left} x2={M.left + plotW} y1={yG(targetFg)} y2={yG(targetFg)} strokeDasharray="6 4" strokeWidth={2} className="stroke-ok-500" />
            <text x={M.left + 4} y={yG(targetFg) - 5} className="fill-ok-700 text-[11px] font-semibold">
              target FG {units.format('gravity', targetFg)}
            </text>
          </g>
        )}
        {temps.length > 1 && <path d={path(temps.map((t) => ({ x: x(t.d), y: yT(t.v) })))} fill="none" strokeWidth={1.5} className="stroke-malt-500" />}
        {temps.map((t, i) => (
          <circle key={`tc${i}`} cx={x(t.d)} cy={yT(t.v)} r={2.5} className="fill-malt-500" />
        ))}
        {gravity.length > 1 && <path d={path(gravity.map((g) => ({ x: x(g.d), y: yG(g.v) })))} fill="none" strokeWidth={2.5} className="stroke-cellar-700" />}
        {gravity.map((g, i) => (
          <circle key={`gc${i}`} cx={x(g.d)} cy={yG(g.v)} r={4.5} strokeWidth={2} className={g.estimate ? 'fill-white stroke-cellar-700' : 'fill-cellar-700 stroke-cellar-700'} />
        ))}
      </svg>
      <ul className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft">
        <li className="flex items-center gap-1">
          <span aria-hidden className="inline-block size-3 rounded-full bg-cellar-700" /> gravity ({units.unit('gravity')}, left)
        </li>
        <li className="flex items-center gap-1">
          <span aria-hidden className="inline-block size-3 rounded-full border-2 border-cellar-700 bg-white" /> refractometer estimate
        </li>
        <li className="flex items-center gap-1">
          <span aria-hidden className="inline-block size-3 rounded-full bg-malt-500" /> fermenter temperature ({units.unit('temperature')}, right)
        </li>
        {range && (
          <li className="flex items-center gap-1">
            <span aria-hidden className="inline-block h-3 w-5 bg-malt-50 ring-1 ring-malt-100" /> recipe temperature range
          </li>
        )}
        {targetFg !== null && (
          <li className="flex items-center gap-1">
            <span aria-hidden className="inline-block h-0 w-5 border-t-2 border-dashed border-ok-500" /> target FG
          </li>
        )}
      </ul>
    </div>
  );
}
