/**
 * `npm run bench:requests`: CPU time per API request and bytes per stored row, the two figures the
 * capacity estimate in docs/deploy.md rests on. Runs the real app in this process against a
 * private database on the local MariaDB, sends a brew-day mix (readings written, the brew day
 * read back), and prints CPU milliseconds per request from process.cpuUsage(). A benchmark that
 * prints figures, never a pass/fail test.
 */
import { startInProcessApp } from './bench/in-process';

const rounds = Number(process.env.BENCH_ROUNDS ?? 300);
const { pool, agent, recipeId, stop } = await startInProcessApp('wortwise_bench');

async function measure(label: string, one: (i: number) => Promise<unknown>) {
  for (let i = 0; i < 20; i++) await one(i); // warm up
  const cpu = process.cpuUsage();
  const start = performance.now();
  for (let i = 0; i < rounds; i++) await one(i);
  const used = process.cpuUsage(cpu);
  const wall = performance.now() - start;
  const cpuMs = (used.user + used.system) / 1000 / rounds;
  console.log(`${label.padEnd(34)} ${cpuMs.toFixed(2)} ms CPU, ${(wall / rounds).toFixed(2)} ms wall per request (${rounds} requests)`);
  return cpuMs;
}

const brewId = (await agent.post('/api/brews').send({ recipeId }).expect(201)).body.id as number;
const write = await measure('POST a reading', (i) => agent.post(`/api/brews/${brewId}/readings`).send({ kind: 'og', sg: 1.04 + (i % 20) / 1000, sampleTempC: 20 }).expect(201));
const smallBrew = (await agent.post('/api/brews').send({ recipeId }).expect(201)).body.id as number;
for (let i = 0; i < 15; i++) await agent.post(`/api/brews/${smallBrew}/readings`).send({ kind: 'og', sg: 1.05, sampleTempC: 20 }).expect(201);
const read = await measure('GET a brew day with 15 readings', () => agent.get(`/api/brews/${smallBrew}`).expect(200));
const calc = await measure('POST the late-boil check', () =>
  agent.post('/api/calc/boil-correction').send({}).expect(400),
);
console.log(`mix of 1 write : 3 reads         ${((write + 3 * read) / 4).toFixed(2)} ms CPU per request (late-boil check refused: ${calc.toFixed(2)} ms)`);

// Bytes per row as InnoDB reports them (data and indexes), for the storage estimate.
await pool.query('ANALYZE TABLE brew_readings, brews, brew_stages');
const [rows] = await pool.query(
  `SELECT TABLE_NAME AS name, TABLE_ROWS AS n, AVG_ROW_LENGTH AS avgRow, INDEX_LENGTH AS idx, DATA_LENGTH AS data
   FROM information_schema.TABLES WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME IN ('brew_readings', 'brews', 'brew_stages')`,
);
for (const r of rows as { name: string; n: number; avgRow: number; idx: number; data: number }[]) {
  console.log(`${r.name.padEnd(34)} ${r.n} rows, ${r.avgRow} bytes a row, ${Math.round((r.data + r.idx) / Math.max(1, r.n))} bytes a row with indexes`);
}
const [[json]] = (await pool.query('SELECT AVG(LENGTH(instrument_snapshot) + LENGTH(correction) + LENGTH(warnings)) AS jsonBytes FROM brew_readings')) as unknown as [[{ jsonBytes: number }]];
console.log(`JSON in a reading row               ${Math.round(Number(json.jsonBytes))} bytes`);

await stop();
