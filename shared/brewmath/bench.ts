/**
 * `npm run bench:math`: calls per second for the brewing math on this machine. A plain loop with
 * performance.now and a warm-up; it prints figures and asserts nothing, since timings vary.
 */
import { performance } from 'node:perf_hooks';
import { boilCorrection, brixToSg, correctHydrometer, platoToSg, projectBoil } from './index';

// Inputs vary per call so the JIT cannot fold a constant answer; the sink keeps results alive.
let sink = 0;

function measure(name: string, call: (i: number) => number, iterations = 2_000_000): void {
  for (let i = 0; i < 200_000; i++) sink += call(i);
  const start = performance.now();
  for (let i = 0; i < iterations; i++) sink += call(i);
  const seconds = (performance.now() - start) / 1000;
  const perSecond = Math.round(iterations / seconds).toLocaleString('en-US');
  console.log(`${name.padEnd(20)} ${perSecond.padStart(14)} calls/s`);
}

const low = { volumeL: 25, sg: 1.044, minutesLeft: 10, boilOffLPerHour: 4, targetSg: 1.05, targetVolumeL: 21, targetFg: 1.012 };
const high = { ...low, sg: 1.056, kettleCapacityL: 30 };

console.log(`Brewing math on Node ${process.version}`);
measure('boilCorrection (low)', (i) => boilCorrection({ ...low, sg: 1.04 + (i & 63) * 0.0001 }).options.length);
measure('boilCorrection (high)', (i) => boilCorrection({ ...high, sg: 1.054 + (i & 63) * 0.0001 }).options.length);
measure('projectBoil', (i) => projectBoil({ volumeL: 25, sg: 1.04 + (i & 63) * 0.0001, minutesLeft: 10, boilOffLPerHour: 4 }).sg);
measure('correctHydrometer', (i) => correctHydrometer(1.05, 15 + (i & 31) * 0.5, 20));
measure('brixToSg', (i) => brixToSg(10 + (i & 63) * 0.1, 1.04));
measure('platoToSg', (i) => platoToSg((i & 255) * 0.1));
if (sink === 42) console.log('');
