import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { count, eq } from 'drizzle-orm';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { makeInstrument } from '../brews/test-scene';
import { fermentationReadings } from '../db/schema';
import { makeFermentationScene, type FermentationScene } from './test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

async function readingCount(brewId: number) {
  const [row] = await h.ctx.db.select({ n: count() }).from(fermentationReadings).where(eq(fermentationReadings.brewId, brewId));
  return row.n;
}

type Agent = FermentationScene['owner']['agent'];
const preview = (agent: Agent, brewId: number, text: string | Buffer, mapping?: unknown, filename = 'readings.csv') => {
  const req = agent.post(`/api/brews/${brewId}/fermentation/import/preview`).attach('file', Buffer.isBuffer(text) ? text : Buffer.from(text), { filename, contentType: 'text/csv' });
  return mapping === undefined ? req : req.field('mapping', JSON.stringify(mapping));
};
const importFile = (agent: Agent, brewId: number, text: string | Buffer, mapping: unknown) =>
  agent
    .post(`/api/brews/${brewId}/fermentation/import`)
    .attach('file', Buffer.isBuffer(text) ? text : Buffer.from(text), { filename: 'readings.csv', contentType: 'text/csv' })
    .field('mapping', JSON.stringify(mapping));

function ourFile(s: FermentationScene) {
  return [
    'taken_at,kind,value,unit,sample_temp_c,original_brix,instrument,note',
    `${s.day(1)},temperature,66.2,f,,,Fermenter probe,"cool cellar, lid on"`,
    `${s.day(3)},gravity,1.020,sg,20,,,`,
    `${s.day(12)},gravity,4.1,plato,20,,,first FG check`,
    `${s.day(14)},gravity,6.1,brix,,12.4,,quick look`,
    `${s.day(15)},gravity,1.0105,sg,20,,Trial jar,`,
    `${s.day(17)},gravity,1.0105,sg,20,,Trial jar,"said ""done"""`,
  ].join('\r\n');
}

describe('importing readings from CSV', () => {
  it('previews the file with a suggested mapping, imports every row, and adds nothing the second time', async () => {
    const s = await makeFermentationScene(h);
    await makeInstrument(s, { kind: 'thermometer', name: 'Fermenter probe', offsetC: 0.5 });
    await makeInstrument(s, { kind: 'hydrometer', name: 'Trial jar', calibrationTempC: 20 });
    const file = ourFile(s);

    const pre = await preview(s.owner.agent, s.brewId, file);
    expect(pre.status).toBe(200);
    expect(pre.body).toMatchObject({ delimiter: ',', rowCount: 6, errorCount: 0, duplicateCount: 0, newCount: 6, suggested: true, mappingErrors: null });
    expect(pre.body.mapping.columns).toEqual({ taken_at: 0, kind: 1, value: 2, unit: 3, sample_temp_c: 4, original_brix: 5, instrument: 6, note: 7 });
    // 66.2 °F = 19 °C exactly; the probe reads 0.5 °C high, so 18.5 °C.
    expect(pre.body.rows[0].reading).toMatchObject({ kind: 'temperature', method: 'thermometer', value: 66.2, unit: 'f', instrument: 'Fermenter probe' });
    expect(pre.body.rows[0].reading.corrected).toBeCloseTo(18.5, 9);
    expect(await readingCount(s.brewId)).toBe(0);

    const first = await importFile(s.owner.agent, s.brewId, file, pre.body.mapping);
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({ added: 6, skipped: 0 });
    const log = first.body.log;
    expect(log.readings.map((r: { source: string }) => r.source)).toEqual(Array(6).fill('csv'));
    // 4.1 °P is SG 1.0160 by the ASBC polynomial (shared/brewmath/gravity.ts).
    expect(log.readings[2].raw.sg).toBeCloseTo(1.016, 3);
    expect(log.readings[3]).toMatchObject({ estimate: true, raw: { brix: 6.1, originalBrix: 12.4 } });
    expect(log.readings[5].note).toBe('said "done"');
    // Common practice, no source: two hydrometer readings two days apart after day 12 agree.
    expect(log.verdict.state).toBe('stable');

    const again = await importFile(s.owner.agent, s.brewId, file, pre.body.mapping);
    expect(again.status).toBe(200);
    expect(again.body).toMatchObject({ added: 0, skipped: 6 });
    const dupPreview = await preview(s.owner.agent, s.brewId, file);
    expect(dupPreview.body).toMatchObject({ duplicateCount: 6, newCount: 0 });
    expect(await readingCount(s.brewId)).toBe(6);
  });

  it('lets the brewer map other column names, and reads semicolons with decimal commas', async () => {
    const s = await makeFermentationScene(h);
    const file = ['When;Reading;Comment', `${s.day(12).slice(0, 16).replace('T', ' ')};1,014;from the logger`, `${s.day(14).slice(0, 16).replace('T', ' ')};1,013;`].join('\n');
    const pre = await preview(s.owner.agent, s.brewId, file);
    expect(pre.status).toBe(200);
    expect(pre.body.delimiter).toBe(';');
    expect(pre.body.header).toEqual(['When', 'Reading', 'Comment']);
    expect(pre.body.mapping.columns).toMatchObject({ taken_at: 0, value: 1, note: 2, unit: null });
    // No unit column: the mapping cannot be used until the brewer says what the values are.
    expect(pre.body.mappingErrors).toEqual({ 'defaults.unit': 'Choose the unit column, or the unit every row is in.' });
    const mapping = { ...pre.body.mapping, defaults: { kind: 'gravity', unit: 'sg' } };
    const checked = await preview(s.owner.agent, s.brewId, file, mapping);
    expect(checked.body).toMatchObject({ errorCount: 0, newCount: 2, suggested: false });
    const res = await importFile(s.owner.agent, s.brewId, file, mapping);
    expect(res.status).toBe(201);
    expect(res.body.log.readings.map((r: { corrected: number }) => r.corrected)).toEqual([1.014, 1.013]);
    expect(res.body.log.readings[0].warnings.join(' ')).toMatch(/No sample temperature/);
  });

  it('lists every bad row and imports nothing when one row is wrong', async () => {
    const s = await makeFermentationScene(h);
    const file = [
      'taken_at,kind,value,unit,sample_temp_c',
      `${s.day(12)},gravity,1.014,sg,20`,
      `${s.day(-2)},gravity,1.050,sg,20`,
      `${new Date(Date.now() + 5 * 86_400_000).toISOString()},temperature,19,c,`,
      `${s.day(13)},gravity,one point oh,sg,20`,
      `yesterday,gravity,1.012,sg,20`,
      `${s.day(14)},gravity,1.012,c,20`,
      `${s.day(15)},gravity,1.012,sg,20`,
    ].join('\n');
    const mapping = (await preview(s.owner.agent, s.brewId, file)).body.mapping;
    const pre = await preview(s.owner.agent, s.brewId, file, mapping);
    expect(pre.body.errorCount).toBe(5);
    const res = await importFile(s.owner.agent, s.brewId, file, mapping);
    expect(res.status).toBe(400);
    expect(res.body.error).toBe('bad_rows');
    expect(res.body.message).toMatch(/^5 rows need attention, so nothing was imported/);
    expect(res.body.fields).toMatchObject({
      'rows.3': expect.stringMatching(/^Row 3: .* is before the yeast was pitched/),
      'rows.4': expect.stringMatching(/^Row 4: .* is in the future/),
      'rows.5': 'Row 5: "one point oh" is not a number.',
      'rows.6': expect.stringMatching(/^Row 6: "yesterday" is not a date and time/),
      'rows.7': expect.stringMatching(/^Row 7: a gravity reading cannot be in "c"/),
    });
    expect(await readingCount(s.brewId)).toBe(0);
  });

  it('refuses a file that is not CSV with 415, and a broken quote with the row', async () => {
    const s = await makeFermentationScene(h);
    const png = Buffer.from('89504e470d0a1a0a0000000d4948445200000001000000010806000000', 'hex');
    const image = await preview(s.owner.agent, s.brewId, png, undefined, 'photo.png');
    expect(image.status).toBe(415);
    expect(image.body.message).toMatch(/not CSV text/);
    const workbook = await preview(s.owner.agent, s.brewId, Buffer.from('504b0304140006000800000021', 'hex'), undefined, 'log.xlsx');
    expect(workbook.status).toBe(415);
    expect(workbook.body.message).toMatch(/spreadsheet workbook/);
    const broken = await preview(s.owner.agent, s.brewId, `taken_at,value,unit\n${s.day(12)},"1.012,sg\n`);
    expect(broken.status).toBe(400);
    expect(broken.body.message).toMatch(/Row 2: a quoted field is never closed/);
    const none = await s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/import/preview`);
    expect(none.status).toBe(400);
    expect(none.body.fields.file).toBe('Choose a CSV file to upload.');
  });

  it('refuses 100,000 rows quickly with 413, imports nothing, and keeps answering', async () => {
    const s = await makeFermentationScene(h);
    const lines = ['taken_at,kind,value,unit'];
    const start = s.pitchedAt.getTime();
    for (let i = 0; i < 100_000; i++) lines.push(`${new Date(start + i * 60_000).toISOString()},temperature,19,c`);
    const file = lines.join('\n');
    const mapping = { columns: { taken_at: 0, kind: 1, value: 2, unit: 3 }, defaults: {}, hasHeader: true };
    const began = performance.now();
    const [res, health] = await Promise.all([importFile(s.owner.agent, s.brewId, file, mapping), request(h.app).get('/api/health')]);
    const ms = performance.now() - began;
    console.info(`100,000-row CSV (${(file.length / 1e6).toFixed(1)} MB) refused in ${ms.toFixed(0)} ms`);
    expect(res.status).toBe(413);
    expect(res.body.message).toMatch(/more than 20,000 rows/);
    expect(health.status).toBe(200);
    await request(h.app).get('/api/health').expect(200);
    expect(await readingCount(s.brewId)).toBe(0);
  });

  it('refuses a file over 5 MB', async () => {
    const s = await makeFermentationScene(h);
    const res = await preview(s.owner.agent, s.brewId, Buffer.alloc(6 * 1024 * 1024, 0x41));
    expect(res.status).toBe(413);
  });

  it('lets only the owner import; club members get 403, others 404', async () => {
    const s = await makeFermentationScene(h, { shared: true });
    const file = `taken_at,kind,value,unit\n${s.day(12)},gravity,1.012,sg\n`;
    const mapping = { columns: { taken_at: 0, kind: 1, value: 2, unit: 3 }, defaults: {}, hasHeader: true };
    expect((await importFile(s.member.agent, s.brewId, file, mapping)).status).toBe(403);
    expect((await importFile(s.mentor.agent, s.brewId, file, mapping)).status).toBe(403);
    expect((await importFile(s.other.agent, s.brewId, file, mapping)).status).toBe(404);
    expect((await preview(s.other.agent, s.brewId, file)).status).toBe(404);
    expect(await readingCount(s.brewId)).toBe(0);
  });
});

describe('exporting the log as CSV', () => {
  it('writes our columns, and importing the export adds nothing', async () => {
    const s = await makeFermentationScene(h, { shared: true });
    await makeInstrument(s, { kind: 'thermometer', name: '=Probe', offsetC: 0 });
    const thermo = await s.owner.agent.get('/api/instruments').expect(200);
    const probe = thermo.body.find((i: { name: string }) => i.name === '=Probe').id;
    const add = (body: Record<string, unknown>) => s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send(body).expect(201);
    await add({ method: 'thermometer', instrumentId: probe, tempC: 19.25, takenAt: s.day(2), note: '+ a little warm' });
    await add({ method: 'hydrometer', sg: 1.0123, sampleTempC: 22.5, takenAt: s.day(12) });
    await add({ method: 'refractometer', brix: 6.05, originalBrix: 12.4, takenAt: s.day(13) });

    const res = await s.member.agent.get(`/api/brews/${s.brewId}/fermentation.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename=".*-fermentation\.csv"/);
    const lines = res.text.trim().split('\r\n');
    expect(lines[0]).toBe('taken_at,kind,value,unit,sample_temp_c,original_brix,instrument,note,corrected,estimate,source');
    expect(lines[1]).toBe(`${s.day(2)},temperature,19.25,c,,,'=Probe,'+ a little warm,19.25,no,manual`);
    expect(lines[2].startsWith(`${s.day(12)},gravity,1.01230,sg,22.50,,,,`)).toBe(true);
    expect(lines[3]).toMatch(/,gravity,6\.05,brix,,12\.40,,,1\.\d{4},yes,manual$/);

    const pre = await preview(s.owner.agent, s.brewId, res.text);
    expect(pre.body).toMatchObject({ errorCount: 0, duplicateCount: 3, newCount: 0 });
    const again = await importFile(s.owner.agent, s.brewId, res.text, pre.body.mapping);
    expect(again.body).toMatchObject({ added: 0, skipped: 3 });
    expect(await readingCount(s.brewId)).toBe(3);
  });
});
