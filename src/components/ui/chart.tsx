import { scaleLinear, scaleTime } from 'd3-scale';
import { line } from 'd3-shape';
import { useEffect, useId, useRef, useState } from 'react';
import { Button } from './button';

/**
 * One chart for the brew day and for fermentation: a line per series against time or days, a left
 * and an optional right axis, dashed targets and shaded bands, and the same numbers as a summary
 * sentence and a table for anyone who cannot read the picture. Scales, "nice" ticks and line paths
 * come from d3-scale and d3-shape; the drawing is plain SVG at the width the page really has, so
 * its text is drawn at its true size on a phone and on a desk.
 *
 * Every value given here is already in the brewer's display units (°F, gal, °P...).
 */

export interface ChartAxis {
  /** Axis title with its unit, e.g. "Gravity (SG)". */
  label: string;
  format: (value: number) => string;
  /** Values the axis must include besides the points (targets, ranges). */
  include?: number[];
}

export interface ChartPoint {
  x: number;
  y: number;
  /** Drawn hollow: an estimate rather than a measurement. */
  hollow?: boolean;
  /** Tooltip text. */
  title?: string;
}

export interface ChartSeries {
  id: string;
  label: string;
  axis: 'left' | 'right';
  tone: 'cellar' | 'malt';
  dashed?: boolean;
  marker: 'circle' | 'square';
  points: ChartPoint[];
}

export interface ChartTarget {
  axis: 'left' | 'right';
  value: number;
  label: string;
}

export interface ChartBand {
  axis: 'left' | 'right';
  from: number;
  to: number;
  label: string;
}

export interface ChartTable {
  caption: string;
  columns: string[];
  rows: { key: string; cells: string[] }[];
}

export interface ChartProps {
  title: string;
  /** One or two sentences saying what the chart shows: the text alternative everyone can read. */
  summary: string;
  x: { label: string; kind: 'time' | 'number'; format: (value: number) => string; domain?: [number, number] };
  left: ChartAxis;
  right?: ChartAxis;
  series: ChartSeries[];
  targets?: ChartTarget[];
  bands?: ChartBand[];
  table: ChartTable;
  testId?: string;
}

const HEIGHT = 240;
/** Rows of the numbers table drawn at first, and added by each "Show more". */
const TABLE_ROWS = 100;
const M = { left: 52, right: 52, top: 16, bottom: 44 };
const tones = {
  cellar: { stroke: 'stroke-cellar-700', fill: 'fill-cellar-700', text: 'fill-cellar-700', swatch: 'bg-cellar-700' },
  malt: { stroke: 'stroke-malt-700', fill: 'fill-malt-700', text: 'fill-malt-700', swatch: 'bg-malt-700' },
};

/** The width the chart really has (the drawing is not scaled, so text keeps its size). */
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

function yScale(values: number[], plotH: number) {
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  // A flat series still gets a little room above and below.
  const pad = hi - lo > 0 ? (hi - lo) * 0.08 : Math.abs(hi) * 0.01 || 1;
  return scaleLinear()
    .domain([lo - pad, hi + pad])
    .range([M.top + plotH, M.top])
    .nice(5);
}

export function Chart({ title, summary, x, left, right, series, targets = [], bands = [], table, testId }: ChartProps) {
  // Thousands of rows would be drawn even while the table is folded: they come a hundred at a time.
  const [tableLimit, setTableLimit] = useState(TABLE_ROWS);
  const { ref, width } = useWidth();
  const titleId = useId();
  const summaryId = useId();
  const plotW = width - M.left - (right ? M.right : 16);
  const plotH = HEIGHT - M.top - M.bottom;

  const onAxis = (axis: 'left' | 'right') => [
    ...series.filter((s) => s.axis === axis).flatMap((s) => s.points.map((p) => p.y)),
    ...targets.filter((t) => t.axis === axis).map((t) => t.value),
    ...bands.filter((b) => b.axis === axis).flatMap((b) => [b.from, b.to]),
    ...((axis === 'left' ? left : right)?.include ?? []),
  ];
  const leftValues = onAxis('left');
  const rightValues = onAxis('right');
  const yLeft = yScale(leftValues.length ? leftValues : [0, 1], plotH);
  const yRight = right ? yScale(rightValues.length ? rightValues : [0, 1], plotH) : yLeft;
  const y = (axis: 'left' | 'right') => (axis === 'left' ? yLeft : yRight);

  const xs = series.flatMap((s) => s.points.map((p) => p.x));
  const [x0, x1] = x.domain ?? [Math.min(...xs), Math.max(...xs)];
  const xRange: [number, number] = [M.left, M.left + plotW];
  const xTicks: { at: number; label: string }[] = [];
  let xAt: (v: number) => number;
  if (x.kind === 'time') {
    const s = scaleTime()
      .domain([new Date(x0), new Date(x1 > x0 ? x1 : x0 + 3_600_000)])
      .range(xRange)
      .nice();
    xAt = (v) => s(new Date(v));
    for (const t of s.ticks(Math.max(2, Math.floor(plotW / 90)))) xTicks.push({ at: s(t), label: x.format(t.getTime()) });
  } else {
    const s = scaleLinear()
      .domain([x0, x1 > x0 ? x1 : x0 + 1])
      .range(xRange)
      .nice();
    xAt = (v) => s(v);
    for (const t of s.ticks(Math.max(2, Math.floor(plotW / 60)))) xTicks.push({ at: s(t), label: x.format(t) });
  }

  return (
    <figure className="space-y-2 break-inside-avoid" data-testid={testId}>
      <div ref={ref} className="w-full">
        <svg viewBox={`0 0 ${width} ${HEIGHT}`} width="100%" height={HEIGHT} role="img" aria-labelledby={titleId} aria-describedby={summaryId} className="block">
          <title id={titleId}>{title}</title>
          {bands.map((b) => (
            <rect
              key={`band-${b.label}`}
              x={M.left}
              width={plotW}
              y={Math.min(y(b.axis)(b.from), y(b.axis)(b.to))}
              height={Math.abs(y(b.axis)(b.from) - y(b.axis)(b.to))}
              className="fill-malt-50"
            />
          ))}
          {yLeft.ticks(5).map((t) => (
            <g key={`l${t}`}>
              <line x1={M.left} x2={M.left + plotW} y1={yLeft(t)} y2={yLeft(t)} className="stroke-cellar-100" />
              <text x={M.left - 6} y={yLeft(t) + 4} textAnchor="end" className="fill-cellar-900 text-[12px] tabular-nums">
                {left.format(t)}
              </text>
            </g>
          ))}
          {right &&
            yRight.ticks(5).map((t) => (
              <text key={`r${t}`} x={M.left + plotW + 6} y={yRight(t) + 4} className="fill-malt-700 text-[12px] tabular-nums">
                {right.format(t)}
              </text>
            ))}
          {xTicks.map((t) => (
            <text key={`x${t.at}`} x={t.at} y={M.top + plotH + 16} textAnchor="middle" className="fill-ink-soft text-[12px] tabular-nums">
              {t.label}
            </text>
          ))}
          <line x1={M.left} x2={M.left + plotW} y1={M.top + plotH} y2={M.top + plotH} className="stroke-cellar-300" />
          <text x={M.left + plotW / 2} y={HEIGHT - 6} textAnchor="middle" className="fill-ink-soft text-[12px]">
            {x.label}
          </text>
          {targets.map((t) => (
            <g key={`target-${t.label}`}>
              <line
                x1={M.left}
                x2={M.left + plotW}
                y1={y(t.axis)(t.value)}
                y2={y(t.axis)(t.value)}
                strokeDasharray="6 4"
                strokeWidth={2}
                className={t.axis === 'left' ? 'stroke-ok-500' : 'stroke-malt-500'}
              />
              <text
                x={t.axis === 'left' ? M.left + 4 : M.left + plotW - 4}
                y={y(t.axis)(t.value) - 5}
                textAnchor={t.axis === 'left' ? 'start' : 'end'}
                className={`text-[12px] font-semibold ${t.axis === 'left' ? 'fill-ok-700' : 'fill-malt-700'}`}
              >
                {t.label}
              </text>
            </g>
          ))}
          {series.map((s) => {
            const ys = y(s.axis);
            const path = line<ChartPoint>()
              .x((p) => xAt(p.x))
              .y((p) => ys(p.y))(s.points);
            const tone = tones[s.tone];
            return (
              <g key={s.id}>
                {s.points.length > 1 && path && <path d={path} fill="none" strokeWidth={2} strokeDasharray={s.dashed ? '5 3' : undefined} className={tone.stroke} />}
                {s.points.map((p, i) =>
                  s.marker === 'square' ? (
                    <rect key={i} x={xAt(p.x) - 4.5} y={ys(p.y) - 4.5} width={9} height={9} strokeWidth={2} className={`${tone.stroke} ${p.hollow ? 'fill-white' : tone.fill}`}>
                      {p.title && <title>{p.title}</title>}
                    </rect>
                  ) : (
                    <circle key={i} cx={xAt(p.x)} cy={ys(p.y)} r={4.5} strokeWidth={2} className={`${tone.stroke} ${p.hollow ? 'fill-white' : tone.fill}`}>
                      {p.title && <title>{p.title}</title>}
                    </circle>
                  ),
                )}
              </g>
            );
          })}
        </svg>
      </div>
      <figcaption className="space-y-1 text-sm text-ink-soft">
        <ul className="flex flex-wrap gap-x-4 gap-y-1">
          {series.map((s) => (
            <li key={s.id} className="flex items-center gap-1.5">
              <span aria-hidden className={`inline-block size-3 ${s.marker === 'circle' ? 'rounded-full' : ''} ${tones[s.tone].swatch}`} />
              {s.label} ({(s.axis === 'left' ? left : right)?.label}
              {right ? `, ${s.axis}` : ''})
            </li>
          ))}
          {bands.map((b) => (
            <li key={b.label} className="flex items-center gap-1.5">
              <span aria-hidden className="inline-block h-3 w-5 bg-malt-50 ring-1 ring-malt-100" /> {b.label}
            </li>
          ))}
        </ul>
        <p id={summaryId} data-testid="chart-summary">
          {summary}
        </p>
      </figcaption>
      <details className="no-print">
        <summary className="flex min-h-touch cursor-pointer items-center text-sm font-semibold text-cellar-700">The numbers as a table</summary>
        <div className="overflow-x-auto">
          <table className="mt-1 w-full text-left text-sm">
            <caption className="sr-only">{table.caption}</caption>
            <thead>
              <tr className="border-b border-cellar-100">
                {table.columns.map((c) => (
                  <th key={c} scope="col" className="py-1 pr-3 font-semibold text-ink-soft">
                    {c}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {table.rows.slice(0, tableLimit).map((r) => (
                <tr key={r.key} className="border-b border-cellar-50">
                  {r.cells.map((c, i) => (
                    <td key={i} className="py-1 pr-3 tabular-nums">
                      {c}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        {table.rows.length > tableLimit && (
          <Button variant="secondary" className="mt-2 w-full sm:w-auto" onClick={() => setTableLimit(tableLimit + TABLE_ROWS)}>
            {`Show ${Math.min(TABLE_ROWS, table.rows.length - tableLimit)} more rows (${table.rows.length - tableLimit} not shown)`}
          </Button>
        )}
      </details>
    </figure>
  );
}
