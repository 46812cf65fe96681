/**
 * `tsx scripts/bench/trace-summary.ts trace.json`: where the time of each late-boil keystroke goes,
 * from a trace saved by `BENCH_TRACE=trace.json npm run bench:ui`. For each keydown on the page's
 * main thread, the window up to the next animation frame after it (plus what that frame paints):
 * the main thread's top-level tasks, then the JavaScript self time by function over all windows.
 * A diagnostic: it prints, it asserts nothing.
 */
import { readFileSync } from 'node:fs';

interface TraceEvent {
  name: string;
  ph: string;
  ts: number;
  dur?: number;
  pid: number;
  tid: number;
  id?: string;
  args?: { name?: string; data?: Record<string, unknown> };
}

const file = process.argv[2];
if (!file) throw new Error('usage: tsx scripts/bench/trace-summary.ts trace.json');
const raw = JSON.parse(readFileSync(file, 'utf8')) as TraceEvent[] | { traceEvents: TraceEvent[] };
const events = Array.isArray(raw) ? raw : raw.traceEvents;
const show = Number(process.env.SHOW ?? 3);

const keydowns = events.filter((e) => e.name === 'EventDispatch' && (e.args?.data as { type?: string } | undefined)?.type === 'keydown').sort((a, b) => a.ts - b.ts);
if (keydowns.length === 0) throw new Error('no keydown in the trace');
const { pid, tid } = keydowns[0];
const main = events.filter((e) => e.pid === pid && e.tid === tid && e.ph === 'X' && e.dur !== undefined).sort((a, b) => a.ts - b.ts);

const label = (e: TraceEvent) => {
  const d = (e.args?.data ?? {}) as Record<string, unknown>;
  if (e.name === 'EventDispatch') return `EventDispatch ${String(d.type)}`;
  if (e.name === 'Layout') {
    const begin = (e.args as { beginData?: { dirtyObjects?: number; totalObjects?: number } } | undefined)?.beginData;
    return `Layout (${begin?.dirtyObjects ?? '?'} of ${begin?.totalObjects ?? '?'} objects dirty)`;
  }
  if (e.name === 'UpdateLayoutTree') return `UpdateLayoutTree (${String((e.args as { elementCount?: number } | undefined)?.elementCount ?? d.elementCount ?? '?')} elements)`;
  if (e.name === 'FunctionCall') return `FunctionCall ${String(d.functionName ?? '')} ${String(d.url ?? '').split('/').pop()}:${String(d.lineNumber ?? '')}`;
  return e.name;
};

// Each window: keydown → the end of the first frame's paint after the first FireAnimationFrame following it.
const windows: [number, number][] = [];
for (const [i, k] of keydowns.entries()) {
  const next = keydowns[i + 1]?.ts ?? Infinity;
  const raf = main.find((e) => e.ts > k.ts && e.name === 'FireAnimationFrame');
  const end = raf ? (main.find((e) => e.ts > raf.ts && (e.name === 'Paint' || e.name === 'PrePaint' || e.name === 'Commit'))?.ts ?? raf.ts) + 1 : k.ts + 50_000;
  windows.push([k.ts, Math.min(end, next)]);
  if (i < show) {
    console.log(`\nkeystroke ${i + 1}: rAF at +${raf ? ((raf.ts - k.ts) / 1000).toFixed(1) : '?'} ms`);
    // Top-level tasks and their first two levels, as a timeline.
    const inWindow = main.filter((e) => e.ts >= k.ts - 2000 && e.ts < Math.min(end, next) && e.dur! >= 100);
    for (const e of inWindow) {
      const depth = inWindow.filter((p) => p !== e && p.ts <= e.ts && p.ts + p.dur! >= e.ts + e.dur!).length;
      if (depth > Number(process.env.DEPTH ?? 2)) continue;
      console.log(`  ${((e.ts - k.ts) / 1000).toFixed(2).padStart(7)} ms  ${(e.dur! / 1000).toFixed(2).padStart(6)} ms  ${'  '.repeat(depth)}${label(e)}`);
    }
  }
}

// Totals by event name within the windows (top level only: events not inside another).
const totals = new Map<string, number>();
for (const [from, to] of windows) {
  let coveredUntil = -1;
  for (const e of main) {
    if (e.ts < from || e.ts >= to) continue;
    if (e.ts < coveredUntil) continue;
    coveredUntil = e.ts + e.dur!;
    totals.set(label(e), (totals.get(label(e)) ?? 0) + e.dur!);
  }
}
console.log(`\ntop-level tasks over ${windows.length} keystroke windows, ms per keystroke:`);
for (const [name, us] of [...totals].sort((a, b) => b[1] - a[1]).slice(0, 15)) console.log(`  ${(us / 1000 / windows.length).toFixed(2).padStart(7)}  ${name}`);

// JavaScript self time by function from the CPU profile samples inside the windows.
interface Node {
  id: number;
  parent?: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
}
const nodes = new Map<number, Node>();
const self = new Map<string, number>();
const inclusive = new Map<string, number>();
for (const profile of events.filter((e) => e.name === 'Profile' && e.pid === pid)) {
  let t = Number((profile.args?.data as { startTime?: number }).startTime ?? 0);
  for (const chunk of events.filter((e) => e.name === 'ProfileChunk' && e.pid === pid && e.id === profile.id)) {
    const data = chunk.args!.data as { cpuProfile?: { nodes?: Node[]; samples?: number[] }; timeDeltas?: number[] };
    for (const n of data.cpuProfile?.nodes ?? []) nodes.set(n.id, n);
    const samples = data.cpuProfile?.samples ?? [];
    const deltas = data.timeDeltas ?? [];
    for (const [i, id] of samples.entries()) {
      const dt = deltas[i + 1] ?? 0;
      t += deltas[i] ?? 0;
      if (!windows.some(([from, to]) => t >= from && t < to)) continue;
      const name = (n: Node) => `${n.callFrame.functionName || '(anonymous)'} ${(n.callFrame.url ?? '').split('/').pop()}:${n.callFrame.lineNumber + 1}`;
      const leaf = nodes.get(id);
      if (!leaf) continue;
      self.set(name(leaf), (self.get(name(leaf)) ?? 0) + dt);
      const seen = new Set<string>();
      for (let n: Node | undefined = leaf; n; n = n.parent !== undefined ? nodes.get(n.parent) : [...nodes.values()].find((p) => (p as Node & { children?: number[] }).children?.includes(n!.id))) {
        const k = name(n);
        if (seen.has(k)) continue;
        seen.add(k);
        inclusive.set(k, (inclusive.get(k) ?? 0) + dt);
      }
    }
  }
}
const top = (m: Map<string, number>, title: string) => {
  console.log(`\n${title}, ms per keystroke:`);
  for (const [name, us] of [...m].sort((a, b) => b[1] - a[1]).slice(0, Number(process.env.TOP ?? 30))) console.log(`  ${(us / 1000 / windows.length).toFixed(2).padStart(7)}  ${name}`);
};
top(self, 'JavaScript self time');
top(inclusive, 'JavaScript inclusive time');
