import { createHash } from 'node:crypto';
import { crc32, deflateSync } from 'node:zlib';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { PHOTO_MAX_BYTES } from '@shared/schemas/brews';
import { readingPhotos } from '../db/schema';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { sniffImageType } from './photos';
import { makeScene, startBrewDay, type Scene } from './test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

/**
 * A real 1 × 1 PNG, built by the rules of the PNG specification (W3C PNG, 2nd edition): the
 * 8-byte signature, then IHDR, IDAT (zlib-deflated scanlines, each with a filter byte) and IEND
 * chunks, each as length, type, data and the CRC-32 of type and data.
 */
function tinyPng(rgb: [number, number, number] = [200, 140, 40]): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const length = Buffer.alloc(4);
    length.writeUInt32BE(data.length);
    const typeAndData = Buffer.concat([Buffer.from(type, 'latin1'), data]);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(typeAndData));
    return Buffer.concat([length, typeAndData, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(1, 0); // width
  ihdr.writeUInt32BE(1, 4); // height
  ihdr[8] = 8; // bit depth
  ihdr[9] = 2; // colour type: truecolour
  const scanline = Buffer.from([0, ...rgb]); // filter type 0, then one RGB pixel
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(scanline)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

async function withReading(scene: Scene) {
  const brewId = await startBrewDay(scene);
  const reading = await scene.owner.agent.post(`/api/brews/${brewId}/readings`).send({ kind: 'og', sg: 1.05, sampleTempC: 20 }).expect(201);
  return { brewId, readingId: reading.body.id as number, base: `/api/brews/${brewId}/readings/${reading.body.id}/photos` };
}

async function photoCount(readingId: number) {
  return (await h.ctx.db.select({ id: readingPhotos.id }).from(readingPhotos).where(eq(readingPhotos.readingId, readingId))).length;
}

describe('sniffImageType', () => {
  it('knows JPEG, PNG and WebP by their first bytes (JFIF/Exif SOI marker, PNG signature, RIFF…WEBP), and nothing else', () => {
    expect(sniffImageType(tinyPng())).toBe('image/png');
    expect(sniffImageType(Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 0x10, 0x4a, 0x46, 0x49, 0x46]))).toBe('image/jpeg');
    expect(sniffImageType(Buffer.concat([Buffer.from('RIFF'), Buffer.from([0x24, 0, 0, 0]), Buffer.from('WEBPVP8 ')]))).toBe('image/webp');
    expect(sniffImageType(Buffer.from('RIFF\x24\x00\x00\x00WAVEfmt ', 'latin1'))).toBeNull();
    expect(sniffImageType(Buffer.from('GIF89a'))).toBeNull();
    expect(sniffImageType(Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>'))).toBeNull();
  });
});

describe('photos of a reading', () => {
  it('stores a PNG with its checksum and serves it to the owner and the club it is shared with, privately and unsniffed', async () => {
    const scene = await makeScene(h);
    const { brewId, readingId, base } = await withReading(scene);
    const png = tinyPng();
    // The client's name and type are not what decides: the bytes are.
    const res = await scene.owner.agent.post(base).attach('photo', png, { filename: 'hydrometer.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ readingId, mime: 'image/png', sizeBytes: png.length, sha256: createHash('sha256').update(png).digest('hex') });
    expect(res.body.url).toBe(`${base}/${res.body.id}`);

    const got = await scene.owner.agent.get(res.body.url).buffer(true).parse((r, cb) => {
      const parts: Buffer[] = [];
      r.on('data', (c: Buffer) => parts.push(c));
      r.on('end', () => cb(null, Buffer.concat(parts)));
    });
    expect(got.status).toBe(200);
    expect(got.headers['content-type']).toBe('image/png');
    expect(got.headers['x-content-type-options']).toBe('nosniff');
    expect(got.headers['cache-control']).toMatch(/^private/);
    expect(Buffer.compare(got.body as Buffer, png)).toBe(0);

    const brew = await scene.owner.agent.get(`/api/brews/${brewId}`).expect(200);
    expect(brew.body.readings[0].photos).toMatchObject([{ id: res.body.id, mime: 'image/png' }]);

    await scene.other.agent.get(res.body.url).expect(404);
    await scene.member.agent.get(res.body.url).expect(404);
    await request(h.app).get(res.body.url).expect(401);
    await scene.owner.agent.put(`/api/brews/${brewId}/sharing`).send({ clubIds: [scene.club.id] }).expect(200);
    await scene.member.agent.get(res.body.url).expect(200);
    // Reading is not writing.
    const memberUpload = await scene.member.agent.post(base).attach('photo', png, 'mine.png');
    expect(memberUpload.status).toBe(403);
    await scene.member.agent.delete(res.body.url).expect(403);
    await scene.owner.agent.delete(res.body.url).expect(204);
    await scene.owner.agent.get(res.body.url).expect(404);
  });

  it('refuses a text file named .png with 415 and saves nothing', async () => {
    const scene = await makeScene(h);
    const { readingId, base } = await withReading(scene);
    const res = await scene.owner.agent.post(base).attach('photo', Buffer.from('OG 1.050 at 20 C, looked fine.\n'), { filename: 'reading.png', contentType: 'image/png' });
    expect(res.status).toBe(415);
    expect(res.body.message).toBe('That file is not a JPEG, PNG or WebP image. Choose a photo taken with your camera.');
    expect(res.body.fields).toEqual({ photo: res.body.message });
    expect(await photoCount(readingId)).toBe(0);
  });

  it('refuses a photo over 5 MB with 413 and saves nothing', async () => {
    const scene = await makeScene(h);
    const { readingId, base } = await withReading(scene);
    const big = Buffer.concat([tinyPng(), Buffer.alloc(PHOTO_MAX_BYTES)]);
    const res = await scene.owner.agent.post(base).attach('photo', big, 'big.png');
    expect(res.status).toBe(413);
    expect(res.body.message).toBe('The photo is larger than 5 MB. Take it at a lower resolution or crop it, then try again.');
    expect(await photoCount(readingId)).toBe(0);
  });

  it('asks for a file when none is sent, and refuses an upload to another brewer’s reading', async () => {
    const scene = await makeScene(h);
    const { readingId, base } = await withReading(scene);
    const none = await scene.owner.agent.post(base).field('note', 'no file');
    expect(none.status).toBe(400);
    expect(none.body.fields).toEqual({ photo: 'Choose a photo to upload.' });
    const wrongField = await scene.owner.agent.post(base).attach('picture', tinyPng(), 'a.png');
    expect(wrongField.status).toBe(400);
    await scene.other.agent.post(base).attach('photo', tinyPng(), 'a.png').expect(404);
    await request(h.app).post(base).attach('photo', tinyPng(), 'a.png').expect(401);
    expect(await photoCount(readingId)).toBe(0);
  });
});
