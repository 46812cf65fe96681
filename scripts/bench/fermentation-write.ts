/**
 * `npx tsx scripts/bench/fermentation-write.ts`: what one new fermentation reading costs when the
 * log is nearly full (MAX_READINGS_PER_LOG), against reading the whole log back. Prints CPU
 * milliseconds per request (process.cpuUsage) and the bytes of each answer. A benchmark that
 * prints figures, never a pass/fail test.
 */
import { defaultSnapshot } from '@shared/instruments';
import { fermentationReadings } from '../../server/db/schema';
import { dedupeKey } from '../../server/fermentation/readings';
import { MAX_READINGS_PER_LOG } from '../../server/lib/reading-limit';
import { startInProcessApp } from './in-process';

const writes = 100;
const reads = 20;
const HOUR_MS = 3_600_000;
const { db, agent, recipeId, stop } = await startInProcessApp('wortwise_bench_ferm');
const brewId = (await agent.post('/api/brews').send({ recipeId }).expect(201)).body.id as number;
const prefill = MAX_READINGS_PER_LOG - writes - 40;
// Pitched long enough ago for an hourly logger to have filled the log.
const pitchedAt = new Date(Math.floor((Date.now() - (prefill + 2 * writes + 100) * HOUR_MS) / 1000) * 1000);
await agent.post(`/api/brews/${brewId}/readings`).send({ kind: 'pitch_temp', tempC: 19, takenAt: pitchedAt.toISOString(), pitched: true }).expect(201);

// A logger's hourly temperatures, written straight to the table (the CSV import would do the same, slower).
const snapshot = defaultSnapshot('thermometer');
const rows = Array.from({ length: prefill }, (_, i) => {
  const takenAt = new Date(pitchedAt.getTime() + (i + 1) * HOUR_MS);
  const tempC = 18 + (i % 7) / 2;
  return {
    brewId,
    kind: 'temperature' as const,
    method: 'thermometer' as const,
    instrumentSnapshot: snapshot,
    raw: { method: 'thermometer' as const, tempC },
    correctedValue: tempC,
    correction: null,
    warnings: [],
    takenAt,
    source: 'csv' as const,
    dedupeKey: dedupeKey(brewId, takenAt, 'thermometer', tempC),
  };
});
for (let i = 0; i < rows.length; i += 500) await db.insert(fermentationReadings).values(rows.slice(i, i + 500));

async function measure(label: string, n: number, one: (i: number) => Promise<{ text: string }>) {
  const cpu = process.cpuUsage();
  let bytes = 0;
  for (let i = 0; i < n; i++) bytes += Buffer.byteLength((await one(i)).text);
  const used = process.cpuUsage(cpu);
  console.log(`${label.padEnd(44)} ${((used.user + used.system) / 1000 / n).toFixed(2)} ms CPU, ${Math.round(bytes / n).toLocaleString('en')} bytes per answer (${n} requests)`);
}

const at = (i: number) => new Date(pitchedAt.getTime() + (prefill + 1 + i) * HOUR_MS + 30 * 60_000).toISOString();
for (let i = 0; i < 10; i++) await agent.get(`/api/brews/${brewId}/fermentation`).expect(200); // warm up
await measure(`POST a reading (log of ${prefill}+ readings)`, writes, (i) =>
  agent.post(`/api/brews/${brewId}/fermentation/readings`).send({ method: 'thermometer', tempC: 19, takenAt: at(i) }).expect(201),
);
await measure(`GET the whole log (${prefill + writes} readings)`, reads, () => agent.get(`/api/brews/${brewId}/fermentation`).expect(200));

await stop();
