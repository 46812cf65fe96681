/**
 * Every route the app mounts, called by eight kinds of people, against one scene: a brewer's
 * shared and private brew days and recipes, their instruments and kettle, and a club.
 *
 * The table below is written by hand, one row per route (brewer routes have a "shared" and a
 * "private" case). The first test walks Express's router stack (`app.router.stack`, each
 * mounted Router's `handle.stack`, the mount path from the layer's `rawPath` and each route's
 * `route.path` and `route.methods`: router 2.x, as Express 5 ships it) and fails when a route is
 * mounted that the table does not cover, or the table names a route that no longer exists. So a
 * new endpoint cannot ship without someone deciding who may call it.
 *
 * The rules (PRODUCT.md, "Roles"; DEVELOPERS.md, "Conventions"): what is not yours and not shared
 * with a club you are in is a 404; what you may see but not change is a 403; signing in is needed
 * for everything but the public routes (401). Site admins manage accounts and clubs, not other
 * people's brewing.
 *
 * Calls that would change the scene for the next person (deleting, leaving, unsharing) get fresh
 * things of their own, made with the factories and services before each call.
 */
import { createHash } from 'node:crypto';
import { crc32, deflateSync } from 'node:zlib';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { decisionInputSchema, readingInputSchema } from '@shared/schemas/brews';
import { fermentationReadingInputSchema, packagingInputSchema } from '@shared/schemas/fermentation';
import { recipeInputSchema } from '@shared/schemas/recipes';
import { createHarness, type TestHarness } from '../tests/support/api';
import { loadSessionUser, type SessionUser } from './auth/session';
import { addDecision } from './brews/decisions';
import { addReading as addBrewReading } from './brews/readings';
import { addNote, setBrewSharing, startBrew } from './brews/service';
import { testRecipe } from './brews/test-scene';
import { makeInvitation } from './clubs/test-scene';
import { addMember, makeClub, makeUser } from './db/factories';
import { comments } from './db/schema';
import { createEquipment } from './equipment/service';
import { recordPackaging } from './fermentation/packaging';
import { addReading as addFermentationReading } from './fermentation/readings';
import { createInstrument } from './instruments/service';
import { createRecipe, setRecipeSharing } from './recipes/service';
import { lateBoilInput } from './reviews/test-scene';
import { DAY_MS } from '@shared/dates';

type Who = 'owner' | 'otherBrewer' | 'clubMember' | 'mentor' | 'otherMentor' | 'organiser' | 'admin' | 'anonymous';
const people: Who[] = ['owner', 'otherBrewer', 'clubMember', 'mentor', 'otherMentor', 'organiser', 'admin', 'anonymous'];
type Agent = ReturnType<typeof request.agent>;
type Expected = Record<Who, number>;

// ---------------------------------------------------------------------------------------------
// Expected answers, by kind of route

const all = (code: number): Expected => Object.fromEntries(people.map((p) => [p, code])) as Expected;
/** Any signed-in person; anonymous visitors are asked to sign in. */
const signedIn = (code: number): Expected => ({ ...all(code), anonymous: 401 });
/** The owner's private things, and things never shared (instruments, kettles). */
const ownerOnly = (code: number): Expected => ({ ...all(404), owner: code, anonymous: 401 });
/** Reading something shared with the club: its members of every role, and the owner. */
const sharedRead = (code: number): Expected => ({ ...ownerOnly(code), clubMember: code, mentor: code, organiser: code });
/** Changing something shared with the club: the owner only; the club sees it and is refused. */
const sharedWrite = (code: number): Expected => ({ ...ownerOnly(code), clubMember: 403, mentor: 403, organiser: 403 });
/** Running the club: its organisers and site admins; other members are refused, outsiders do not see it. */
const manage = (code: number): Expected => ({ ...all(404), organiser: code, admin: code, owner: 403, clubMember: 403, mentor: 403, anonymous: 401 });

// ---------------------------------------------------------------------------------------------
// The scene

/**
 * A real 1 × 1 PNG (W3C PNG specification, 2nd edition): signature, IHDR, IDAT with one
 * deflated scanline, IEND; each chunk is length, type, data and the CRC-32 of type and data.
 */
function tinyPng(): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const length = Buffer.alloc(4);
    length.writeUInt32BE(data.length);
    const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body));
    return Buffer.concat([length, body, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(1, 0);
  ihdr.writeUInt32BE(1, 4);
  ihdr[8] = 8;
  ihdr[9] = 2;
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(Buffer.from([0, 90, 120, 60]))),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

let h: TestHarness;
let scene: Awaited<ReturnType<typeof makeMatrixScene>>;
let counter = 0;
const next = () => ++counter;

async function makeMatrixScene() {
  const db = h.ctx.db;
  const tag = createHash('sha256').update(String(Date.now() + Math.random())).digest('hex').slice(0, 8);
  const person = (name: string, siteRole: 'user' | 'admin' = 'user') =>
    makeUser(db, { email: `${name.toLowerCase().replace(/ /g, '.')}-${tag}@example.org`, displayName: name, siteRole });
  const users = {
    owner: await person('Olive Owner'),
    otherBrewer: await person('Bram Otherbrewer'),
    clubMember: await person('Kit Member'),
    mentor: await person('Mina Mentor'),
    otherMentor: await person('Oscar Othermentor'),
    organiser: await person('Gwen Organiser'),
    admin: await person('Ada Admin', 'admin'),
  };
  const club = await makeClub(db, { name: `Matrix club ${tag}`, createdBy: users.organiser.id });
  const otherClub = await makeClub(db, { name: `Other matrix club ${tag}` });
  await addMember(db, club.id, users.owner.id, 'member');
  await addMember(db, club.id, users.clubMember.id, 'member');
  await addMember(db, club.id, users.mentor.id, 'mentor');
  await addMember(db, club.id, users.organiser.id, 'organiser');
  // The owner is in the other club too, but shares nothing with it: its mentor sees nothing.
  await addMember(db, otherClub.id, users.owner.id, 'member');
  await addMember(db, otherClub.id, users.otherMentor.id, 'mentor');

  const agents = {} as Record<Who, Agent>;
  for (const who of people) agents[who] = who === 'anonymous' ? request.agent(h.app) : await h.signIn(users[who].email);
  const owner = (await loadSessionUser(db, users.owner.id))!;
  const mentor = (await loadSessionUser(db, users.mentor.id))!;

  const instrument = await createInstrument(db, owner, { kind: 'hydrometer', name: 'Matrix hydrometer', calibrationTempC: 20 });
  const kettle = { name: 'Matrix kettle', boilOffLPerHour: 4, trubLossL: 1, deadSpaceL: 0.5, coolingShrinkage: 0.04 };
  const equipment = await createEquipment(db, owner, kettle);

  const recipe = async (shared: boolean) => {
    const id = await createRecipe(db, owner, recipeInputSchema.parse(testRecipe));
    if (shared) await setRecipeSharing(db, owner, id, [club.id]);
    return id;
  };
  const sharedRecipe = await recipe(true);
  const privateRecipe = await recipe(false);

  /** A brew day pitched 20 days ago. */
  const bareBrew = async (shared: boolean) => {
    const id = await startBrew(db, owner, { recipeId: sharedRecipe });
    const pitchedAt = new Date(Math.floor((Date.now() - 20 * DAY_MS) / 1000) * 1000);
    await addBrewReading(db, owner, id, readingInputSchema.parse({ kind: 'pitch_temp', tempC: 19, takenAt: pitchedAt.toISOString(), pitched: true }));
    if (shared) await setBrewSharing(db, owner, id, [club.id]);
    return { id, pitchedAt };
  };
  /** …with a reading (and its photo), a decision, a note, a fermentation reading and a comment. */
  const brew = async (shared: boolean) => {
    const { id, pitchedAt } = await bareBrew(shared);
    const reading = await addBrewReading(
      db,
      owner,
      id,
      readingInputSchema.parse({ kind: 'late_boil_gravity', method: 'hydrometer', instrumentId: instrument.id, sg: 1.046, sampleTempC: 20, volumeL: 24, minutesLeft: 10 }),
    );
    const decision = await addDecision(db, owner, id, decisionInputSchema.parse({ input: lateBoilInput, choice: { kind: 'as-is' } }));
    const note = await addNote(db, owner, id, { body: 'Matrix note.', stage: null });
    const fermentation = await addFermentationReading(db, owner, id, fermentationReadingInputSchema.parse({ method: 'thermometer', tempC: 19, takenAt: new Date(pitchedAt.getTime() + DAY_MS).toISOString() }));
    const photo = await agents.owner.post(`/api/brews/${id}/readings/${reading.id}/photos`).attach('photo', tinyPng(), 'reading.png').expect(201);
    const [{ id: commentId }] = await db
      .insert(comments)
      .values({ brewId: id, authorId: shared ? users.mentor.id : users.owner.id, body: 'A comment.' })
      .$returningId();
    return { id, pitchedAt, readingId: reading.id, decisionId: decision.id, noteId: note.id, fermentationReadingId: fermentation.reading.id, photoId: photo.body.id as number, commentId };
  };
  const sharedBrew = await brew(true);
  const privateBrew = await brew(false);

  const recipeFile = (await agents.owner.get(`/api/recipes/${sharedRecipe}/export`).expect(200)).text;
  const csvFor = (b: { pitchedAt: Date }, n: number) =>
    Buffer.from(`taken_at,kind,value,unit\r\n${new Date(b.pitchedAt.getTime() + 2 * DAY_MS + n * 60_000).toISOString()},temperature,19.${n % 10},c\r\n`);
  const preview = await agents.owner
    .post(`/api/brews/${sharedBrew.id}/fermentation/import/preview`)
    .attach('file', csvFor(sharedBrew, 0), { filename: 'readings.csv', contentType: 'text/csv' })
    .expect(200);

  return { tag, users, agents, owner, mentor, club, otherClub, instrument, equipment, kettle, sharedRecipe, privateRecipe, recipe, sharedBrew, privateBrew, bareBrew, recipeFile, csvFor, csvMapping: preview.body.mapping };
}

type Scene = typeof scene;
type SceneBrew = Scene['sharedBrew'];

// Fresh things for calls that change or remove what they touch.
const fresh = {
  brewReading: async (brewId: number) =>
    (await addBrewReading(h.ctx.db, scene.owner, brewId, readingInputSchema.parse({ kind: 'mash_temp', tempC: 60 + (next() % 10) }))).id,
  note: async (brewId: number) => (await addNote(h.ctx.db, scene.owner, brewId, { body: `Note ${next()}`, stage: null })).id,
  /** A photo on a fresh reading (a reading keeps only a few photos); remembers the reading. */
  photo: async (brewId: number) => {
    const readingId = await fresh.brewReading(brewId);
    const res = await scene.agents.owner.post(`/api/brews/${brewId}/readings/${readingId}/photos`).attach('photo', tinyPng(), 'p.png').expect(201);
    photoReadings.set(res.body.id, readingId);
    return res.body.id as number;
  },
  fermentationReading: async (b: { id: number; pitchedAt: Date }) =>
    (
      await addFermentationReading(
        h.ctx.db,
        scene.owner,
        b.id,
        fermentationReadingInputSchema.parse({ method: 'thermometer', tempC: 18.5, takenAt: new Date(b.pitchedAt.getTime() + 3 * DAY_MS + next() * 1000).toISOString() }),
      )
    ).reading.id,
  packagedBrew: async (shared: boolean) => {
    const b = await scene.bareBrew(shared);
    const body = packagingInputSchema.parse({ container: 'keg', volumeL: 19, warmestTempC: 20, targetCo2Volumes: 2.4, sugar: 'none', override: true, overrideReason: 'Matrix test.' });
    await recordPackaging(h.ctx.db, scene.owner, b.id, body);
    return b.id;
  },
  comment: async (brewId: number, author: SessionUser) => {
    const [{ id }] = await h.ctx.db.insert(comments).values({ brewId, authorId: author.id, body: `Comment ${next()}` }).$returningId();
    return id;
  },
  clubMember: async () => {
    const user = await makeUser(h.ctx.db, { displayName: 'Fresh Member' });
    await addMember(h.ctx.db, scene.club.id, user.id, 'member');
    return user.id;
  },
  /** A club with the same people in the same roles (the other club's mentor stays outside), for leaving it. */
  clubLikeTheScene: async () => {
    const c = await makeClub(h.ctx.db, { name: `Leave-me club ${next()}` });
    const u = scene.users;
    await addMember(h.ctx.db, c.id, u.owner.id, 'member');
    await addMember(h.ctx.db, c.id, u.clubMember.id, 'member');
    await addMember(h.ctx.db, c.id, u.mentor.id, 'mentor');
    await addMember(h.ctx.db, c.id, u.organiser.id, 'organiser');
    return c.id;
  },
};

// ---------------------------------------------------------------------------------------------
// The table

interface Case {
  route: string;
  label?: string;
  /** Public: reachable without signing in (health, calculators, sign-in and sign-up, invitations, password reset). */
  isPublic?: boolean;
  /** Sign in afresh for the call: it changes or ends the session. */
  freshAgent?: boolean;
  /** Runs before each person's call; its result is handed to `call`. */
  prepare?: () => Promise<number>;
  call: (a: Agent, id: number) => request.Test | Promise<request.Response>;
  expected: Expected;
}

const bothBrews = (route: string, call: (a: Agent, b: SceneBrew) => request.Test, shared: Expected, priv: Expected = ownerOnly(Object.values(shared).find((c) => c < 300)!)): Case[] => [
  { route, label: 'shared', call: (a) => call(a, scene.sharedBrew), expected: shared },
  { route, label: 'private', call: (a) => call(a, scene.privateBrew), expected: priv },
];

const boilCorrection = { volumeL: 24, sg: 1.046, minutesLeft: 10, boilOffLPerHour: 3, targetSg: 1.05 };

const cases: Case[] = [
  // Public
  { route: 'GET /api/health', isPublic: true, call: (a) => a.get('/api/health'), expected: all(200) },
  { route: 'POST /api/calc/boil-correction', isPublic: true, call: (a) => a.post('/api/calc/boil-correction').send(boilCorrection), expected: all(200) },
  {
    route: 'POST /api/auth/signup',
    isPublic: true,
    freshAgent: true,
    call: (a) => a.post('/api/auth/signup').send({ email: `signup-${scene.tag}-${next()}@example.org`, password: 'a-long-password', displayName: 'New Brewer' }),
    expected: all(201),
  },
  {
    route: 'POST /api/auth/login',
    isPublic: true,
    freshAgent: true,
    call: (a) => a.post('/api/auth/login').send({ email: scene.users.otherBrewer.email, password: scene.users.otherBrewer.password }),
    expected: all(200),
  },
  { route: 'POST /api/auth/logout', isPublic: true, freshAgent: true, call: (a) => a.post('/api/auth/logout'), expected: all(204) },
  {
    route: 'POST /api/auth/logout-everywhere',
    freshAgent: true,
    call: async (a) => {
      const me = await a.get('/api/auth/me');
      const res = await a.post('/api/auth/logout-everywhere');
      // That signed this person out on every agent: sign their shared agent in again.
      const who = people.find((p): p is Exclude<Who, 'anonymous'> => p !== 'anonymous' && scene.users[p].email === me.body?.email);
      if (who) scene.agents[who] = await h.signIn(scene.users[who].email);
      return res;
    },
    expected: signedIn(204),
  },
  { route: 'GET /api/auth/me', call: (a) => a.get('/api/auth/me'), expected: signedIn(200) },
  { route: 'PATCH /api/auth/me', call: (a) => a.patch('/api/auth/me').send({}), expected: signedIn(200) },
  {
    route: 'POST /api/auth/password-reset',
    isPublic: true,
    call: (a) => a.post('/api/auth/password-reset').send({ email: `nobody-${scene.tag}@example.org` }),
    expected: all(202),
  },
  // An unknown link: the same 404 for everybody, signed in or not.
  { route: 'GET /api/auth/password-reset/:token', isPublic: true, call: (a) => a.get('/api/auth/password-reset/no-such-link-token-0000000000000000000000'), expected: all(404) },
  {
    route: 'POST /api/auth/password-reset/:token',
    isPublic: true,
    freshAgent: true,
    call: (a) => a.post('/api/auth/password-reset/no-such-link-token-0000000000000000000000').send({ password: 'a-long-password' }),
    expected: all(404),
  },
  {
    route: 'GET /api/invitations/:token',
    isPublic: true,
    call: (a) => a.get(`/api/invitations/${invitationToken}`),
    expected: all(200),
  },
  {
    route: 'POST /api/invitations/:token/accept',
    isPublic: true,
    freshAgent: true,
    prepare: async () => {
      const { token } = await makeInvitation(h.ctx.db, { clubId: scene.club.id, email: `invitee-${scene.tag}-${next()}@example.org` });
      tokens.set(counter, token);
      return counter;
    },
    // A newcomer signs up through it; a signed-in person with another address is refused.
    call: (a, n) => a.post(`/api/invitations/${tokens.get(n)}/accept`).send({ displayName: 'Invited Brewer', password: 'a-long-password' }),
    expected: { ...all(403), anonymous: 200 },
  },

  // Admin: everyone but site admins gets the 404 of a route that does not exist.
  { route: 'GET /api/admin/users', call: (a) => a.get('/api/admin/users'), expected: { ...all(404), admin: 200 } },
  { route: 'GET /api/admin/mail', call: (a) => a.get('/api/admin/mail'), expected: { ...all(404), admin: 200 } },

  // Clubs
  { route: 'GET /api/clubs', call: (a) => a.get('/api/clubs'), expected: signedIn(200) },
  { route: 'POST /api/clubs', call: (a) => a.post('/api/clubs').send({ name: `New club ${next()}` }), expected: signedIn(201) },
  { route: 'GET /api/clubs/:id', call: (a) => a.get(`/api/clubs/${scene.club.id}`), expected: { ...sharedRead(200), admin: 200 } },
  { route: 'PATCH /api/clubs/:id', call: (a) => a.patch(`/api/clubs/${scene.club.id}`).send({ description: 'Renamed by the matrix.' }), expected: manage(200) },
  { route: 'GET /api/clubs/:id/invitations', call: (a) => a.get(`/api/clubs/${scene.club.id}/invitations`), expected: manage(200) },
  {
    route: 'POST /api/clubs/:id/invitations',
    call: (a) => a.post(`/api/clubs/${scene.club.id}/invitations`).send({ email: `invited-${scene.tag}-${next()}@example.org` }),
    expected: manage(201),
  },
  {
    route: 'DELETE /api/clubs/:id/invitations/:invitationId',
    prepare: async () => (await makeInvitation(h.ctx.db, { clubId: scene.club.id, email: `withdrawn-${scene.tag}-${next()}@example.org` })).id,
    call: (a, id) => a.delete(`/api/clubs/${scene.club.id}/invitations/${id}`),
    expected: manage(204),
  },
  {
    route: 'PATCH /api/clubs/:id/members/:userId',
    prepare: fresh.clubMember,
    call: (a, id) => a.patch(`/api/clubs/${scene.club.id}/members/${id}`).send({ role: 'mentor' }),
    expected: manage(200),
  },
  { route: 'DELETE /api/clubs/:id/members/:userId', prepare: fresh.clubMember, call: (a, id) => a.delete(`/api/clubs/${scene.club.id}/members/${id}`), expected: manage(204) },
  {
    route: 'POST /api/clubs/:id/leave',
    prepare: fresh.clubLikeTheScene,
    call: (a, id) => a.post(`/api/clubs/${id}/leave`),
    // The only organiser may not leave (409); a site admin who is not a member has nothing to leave (403).
    expected: { ...sharedRead(204), organiser: 409, admin: 403 },
  },

  // Recipes
  { route: 'GET /api/recipes', call: (a) => a.get('/api/recipes'), expected: signedIn(200) },
  { route: 'POST /api/recipes', call: (a) => a.post('/api/recipes').send(testRecipe), expected: signedIn(201) },
  { route: 'POST /api/recipes/import', call: (a) => a.post('/api/recipes/import').attach('file', Buffer.from(scene.recipeFile), 'recipe.json'), expected: signedIn(201) },
  { route: 'GET /api/recipes/:id', label: 'shared', call: (a) => a.get(`/api/recipes/${scene.sharedRecipe}`), expected: sharedRead(200) },
  { route: 'GET /api/recipes/:id', label: 'private', call: (a) => a.get(`/api/recipes/${scene.privateRecipe}`), expected: ownerOnly(200) },
  ...[true, false].map(
    (shared): Case => ({
      route: 'PUT /api/recipes/:id',
      label: shared ? 'shared' : 'private',
      prepare: () => scene.recipe(shared),
      call: (a, id) => a.put(`/api/recipes/${id}`).send({ ...testRecipe, name: 'Updated by the matrix', version: 1 }),
      expected: shared ? sharedWrite(200) : ownerOnly(200),
    }),
  ),
  ...[true, false].map(
    (shared): Case => ({
      route: 'DELETE /api/recipes/:id',
      label: shared ? 'shared' : 'private',
      prepare: () => scene.recipe(shared),
      call: (a, id) => a.delete(`/api/recipes/${id}`),
      expected: shared ? sharedWrite(204) : ownerOnly(204),
    }),
  ),
  { route: 'POST /api/recipes/:id/clone', label: 'shared', call: (a) => a.post(`/api/recipes/${scene.sharedRecipe}/clone`), expected: sharedRead(201) },
  { route: 'POST /api/recipes/:id/clone', label: 'private', call: (a) => a.post(`/api/recipes/${scene.privateRecipe}/clone`), expected: ownerOnly(201) },
  { route: 'PUT /api/recipes/:id/sharing', label: 'shared', call: (a) => a.put(`/api/recipes/${scene.sharedRecipe}/sharing`).send({ clubIds: [scene.club.id] }), expected: sharedWrite(200) },
  {
    route: 'PUT /api/recipes/:id/sharing',
    label: 'private',
    prepare: () => scene.recipe(false),
    call: (a, id) => a.put(`/api/recipes/${id}/sharing`).send({ clubIds: [scene.club.id] }),
    expected: ownerOnly(200),
  },
  { route: 'GET /api/recipes/:id/export', label: 'shared', call: (a) => a.get(`/api/recipes/${scene.sharedRecipe}/export`), expected: sharedRead(200) },
  { route: 'GET /api/recipes/:id/export', label: 'private', call: (a) => a.get(`/api/recipes/${scene.privateRecipe}/export?format=csv`), expected: ownerOnly(200) },
  { route: 'GET /api/recipes/:id/versions', label: 'shared', call: (a) => a.get(`/api/recipes/${scene.sharedRecipe}/versions`), expected: sharedRead(200) },
  { route: 'GET /api/recipes/:id/versions', label: 'private', call: (a) => a.get(`/api/recipes/${scene.privateRecipe}/versions`), expected: ownerOnly(200) },
  { route: 'GET /api/recipes/:id/versions/:version', label: 'shared', call: (a) => a.get(`/api/recipes/${scene.sharedRecipe}/versions/1`), expected: sharedRead(200) },
  { route: 'GET /api/recipes/:id/versions/:version', label: 'private', call: (a) => a.get(`/api/recipes/${scene.privateRecipe}/versions/1`), expected: ownerOnly(200) },

  // Instruments and kettles: never shared.
  { route: 'GET /api/instruments', call: (a) => a.get('/api/instruments'), expected: signedIn(200) },
  { route: 'POST /api/instruments', call: (a) => a.post('/api/instruments').send({ kind: 'hydrometer', name: 'Another hydrometer', calibrationTempC: 20 }), expected: signedIn(201) },
  { route: 'GET /api/instruments/:id', call: (a) => a.get(`/api/instruments/${scene.instrument.id}`), expected: ownerOnly(200) },
  { route: 'PATCH /api/instruments/:id', call: (a) => a.patch(`/api/instruments/${scene.instrument.id}`).send({ notes: 'Checked by the matrix.' }), expected: ownerOnly(200) },
  { route: 'GET /api/instruments/:id/calibrations', call: (a) => a.get(`/api/instruments/${scene.instrument.id}/calibrations`), expected: ownerOnly(200) },
  {
    route: 'POST /api/instruments/:id/calibrations',
    call: (a) => a.post(`/api/instruments/${scene.instrument.id}/calibrations`).send({ method: 'set', calibrationTempC: 20 }),
    expected: ownerOnly(201),
  },
  { route: 'GET /api/equipment', call: (a) => a.get('/api/equipment'), expected: signedIn(200) },
  { route: 'GET /api/equipment/default', call: (a) => a.get('/api/equipment/default'), expected: signedIn(200) },
  { route: 'POST /api/equipment', call: (a) => a.post('/api/equipment').send({ ...scene.kettle, name: `Kettle ${next()}` }), expected: signedIn(201) },
  { route: 'GET /api/equipment/:id', call: (a) => a.get(`/api/equipment/${scene.equipment.id}`), expected: ownerOnly(200) },
  { route: 'PATCH /api/equipment/:id', call: (a) => a.patch(`/api/equipment/${scene.equipment.id}`).send({ trubLossL: 1.2 }), expected: ownerOnly(200) },
  {
    route: 'DELETE /api/equipment/:id',
    prepare: async () => (await createEquipment(h.ctx.db, scene.owner, { ...scene.kettle, name: `Spare kettle ${next()}` })).id!,
    call: (a, id) => a.delete(`/api/equipment/${id}`),
    expected: ownerOnly(204),
  },

  // Brew days
  { route: 'GET /api/brews', call: (a) => a.get('/api/brews'), expected: signedIn(200) },
  // Starting a brew day needs a recipe you may read: the shared one.
  { route: 'POST /api/brews', call: (a) => a.post('/api/brews').send({ recipeId: scene.sharedRecipe }), expected: sharedRead(201) },
  ...bothBrews('GET /api/brews/:id', (a, b) => a.get(`/api/brews/${b.id}`), sharedRead(200)),
  ...bothBrews('GET /api/brews/:id/readings', (a, b) => a.get(`/api/brews/${b.id}/readings`), sharedRead(200)),
  ...bothBrews('PATCH /api/brews/:id', (a, b) => a.patch(`/api/brews/${b.id}`).send({ notes: 'Owner notes.' }), sharedWrite(200)),
  ...[true, false].map(
    (shared): Case => ({
      route: 'DELETE /api/brews/:id',
      label: shared ? 'shared' : 'private',
      prepare: async () => (await scene.bareBrew(shared)).id,
      call: (a, id) => a.delete(`/api/brews/${id}`),
      expected: shared ? sharedWrite(204) : ownerOnly(204),
    }),
  ),
  { route: 'PUT /api/brews/:id/sharing', label: 'shared', call: (a) => a.put(`/api/brews/${scene.sharedBrew.id}/sharing`).send({ clubIds: [scene.club.id] }), expected: sharedWrite(200) },
  {
    route: 'PUT /api/brews/:id/sharing',
    label: 'private',
    prepare: async () => (await scene.bareBrew(false)).id,
    call: (a, id) => a.put(`/api/brews/${id}/sharing`).send({ clubIds: [scene.club.id] }),
    expected: ownerOnly(200),
  },
  ...bothBrews('POST /api/brews/:id/stages/:stage', (a, b) => a.post(`/api/brews/${b.id}/stages/mash`).send({ action: 'start' }), sharedWrite(200)),
  ...bothBrews('POST /api/brews/:id/readings', (a, b) => a.post(`/api/brews/${b.id}/readings`).send({ kind: 'mash_temp', tempC: 66 }), sharedWrite(201)),
  ...[true, false].map(
    (shared): Case => ({
      route: 'DELETE /api/brews/:id/readings/:readingId',
      label: shared ? 'shared' : 'private',
      prepare: () => fresh.brewReading(shared ? scene.sharedBrew.id : scene.privateBrew.id),
      call: (a, id) => a.delete(`/api/brews/${shared ? scene.sharedBrew.id : scene.privateBrew.id}/readings/${id}`),
      expected: shared ? sharedWrite(200) : ownerOnly(200),
    }),
  ),
  ...bothBrews('POST /api/brews/:id/readings/:readingId/recompute', (a, b) => a.post(`/api/brews/${b.id}/readings/${b.readingId}/recompute`), sharedWrite(200)),
  ...bothBrews(
    'POST /api/brews/:id/readings/:readingId/photos',
    (a, b) => a.post(`/api/brews/${b.id}/readings/${b.readingId}/photos`).attach('photo', tinyPng(), 'p.png'),
    sharedWrite(201),
  ),
  ...bothBrews('GET /api/brews/:id/readings/:readingId/photos/:photoId', (a, b) => a.get(`/api/brews/${b.id}/readings/${b.readingId}/photos/${b.photoId}`), sharedRead(200)),
  ...[true, false].map(
    (shared): Case => ({
      route: 'DELETE /api/brews/:id/readings/:readingId/photos/:photoId',
      label: shared ? 'shared' : 'private',
      prepare: () => fresh.photo(shared ? scene.sharedBrew.id : scene.privateBrew.id),
      call: (a, id) => a.delete(`/api/brews/${shared ? scene.sharedBrew.id : scene.privateBrew.id}/readings/${photoReadings.get(id)}/photos/${id}`),
      expected: shared ? sharedWrite(204) : ownerOnly(204),
    }),
  ),
  ...bothBrews('POST /api/brews/:id/decisions', (a, b) => a.post(`/api/brews/${b.id}/decisions`).send({ input: lateBoilInput, choice: { kind: 'as-is' } }), sharedWrite(201)),
  ...bothBrews('POST /api/brews/:id/notes', (a, b) => a.post(`/api/brews/${b.id}/notes`).send({ body: 'A note.' }), sharedWrite(201)),
  ...[true, false].map(
    (shared): Case => ({
      route: 'DELETE /api/brews/:id/notes/:noteId',
      label: shared ? 'shared' : 'private',
      prepare: () => fresh.note(shared ? scene.sharedBrew.id : scene.privateBrew.id),
      call: (a, id) => a.delete(`/api/brews/${shared ? scene.sharedBrew.id : scene.privateBrew.id}/notes/${id}`),
      expected: shared ? sharedWrite(204) : ownerOnly(204),
    }),
  ),

  // Fermentation
  { route: 'GET /api/fermentation/settings', call: (a) => a.get('/api/fermentation/settings'), expected: signedIn(200) },
  { route: 'PUT /api/fermentation/settings', call: (a) => a.put('/api/fermentation/settings').send({ remindersEnabled: true }), expected: signedIn(200) },
  ...bothBrews('GET /api/brews/:brewId/fermentation.csv', (a, b) => a.get(`/api/brews/${b.id}/fermentation.csv`), sharedRead(200)),
  ...bothBrews('GET /api/brews/:brewId/fermentation', (a, b) => a.get(`/api/brews/${b.id}/fermentation`), sharedRead(200)),
  ...bothBrews('GET /api/brews/:brewId/fermentation/readings', (a, b) => a.get(`/api/brews/${b.id}/fermentation/readings`), sharedRead(200)),
  ...bothBrews(
    'POST /api/brews/:brewId/fermentation/readings',
    (a, b) => a.post(`/api/brews/${b.id}/fermentation/readings`).send({ method: 'thermometer', tempC: 18.2, takenAt: new Date(b.pitchedAt.getTime() + 4 * DAY_MS).toISOString() }),
    sharedWrite(201),
  ),
  ...[true, false].map(
    (shared): Case => ({
      route: 'DELETE /api/brews/:brewId/fermentation/readings/:readingId',
      label: shared ? 'shared' : 'private',
      prepare: () => fresh.fermentationReading(shared ? scene.sharedBrew : scene.privateBrew),
      call: (a, id) => a.delete(`/api/brews/${shared ? scene.sharedBrew.id : scene.privateBrew.id}/fermentation/readings/${id}`),
      expected: shared ? sharedWrite(200) : ownerOnly(200),
    }),
  ),
  ...[true, false].map(
    (shared): Case => ({
      route: 'POST /api/brews/:brewId/fermentation/packaging',
      label: shared ? 'shared' : 'private',
      prepare: async () => (await scene.bareBrew(shared)).id,
      call: (a, id) =>
        a
          .post(`/api/brews/${id}/fermentation/packaging`)
          .send({ container: 'keg', volumeL: 19, warmestTempC: 20, targetCo2Volumes: 2.4, sugar: 'none', override: true, overrideReason: 'Matrix test.' }),
      expected: shared ? sharedWrite(201) : ownerOnly(201),
    }),
  ),
  ...[true, false].map(
    (shared): Case => ({
      route: 'DELETE /api/brews/:brewId/fermentation/packaging',
      label: shared ? 'shared' : 'private',
      prepare: () => fresh.packagedBrew(shared),
      call: (a, id) => a.delete(`/api/brews/${id}/fermentation/packaging`),
      expected: shared ? sharedWrite(200) : ownerOnly(200),
    }),
  ),
  ...bothBrews(
    'POST /api/brews/:brewId/fermentation/import/preview',
    (a, b) => a.post(`/api/brews/${b.id}/fermentation/import/preview`).attach('file', scene.csvFor(b, 1), { filename: 'r.csv', contentType: 'text/csv' }),
    sharedWrite(200),
  ),
  ...bothBrews(
    'POST /api/brews/:brewId/fermentation/import',
    (a, b) =>
      a
        .post(`/api/brews/${b.id}/fermentation/import`)
        .attach('file', scene.csvFor(b, 2), { filename: 'r.csv', contentType: 'text/csv' })
        .field('mapping', JSON.stringify(scene.csvMapping)),
    sharedWrite(201),
  ),

  // The mentor's review
  { route: 'GET /api/reviews/queue', call: (a) => a.get('/api/reviews/queue'), expected: signedIn(200) },
  { route: 'GET /api/reviews/reviewed', call: (a) => a.get('/api/reviews/reviewed'), expected: signedIn(200) },
  ...bothBrews('GET /api/brews/:brewId/review', (a, b) => a.get(`/api/brews/${b.id}/review`), sharedRead(200)),
  ...bothBrews('GET /api/brews/:brewId/comments', (a, b) => a.get(`/api/brews/${b.id}/comments`), sharedRead(200)),
  ...bothBrews(
    'POST /api/brews/:brewId/comments',
    (a, b) => a.post(`/api/brews/${b.id}/comments`).send({ body: 'From the matrix.', target: { kind: 'decision', id: b.decisionId } }),
    // Mentors of the club comment, and the brewer replies; members and the organiser read only.
    { ...sharedWrite(201), mentor: 201 },
  ),
  {
    route: 'DELETE /api/brews/:brewId/comments/:commentId',
    label: 'shared, a mentor’s comment',
    prepare: () => fresh.comment(scene.sharedBrew.id, scene.mentor),
    call: (a, id) => a.delete(`/api/brews/${scene.sharedBrew.id}/comments/${id}`),
    // Only the author deletes; the brewer and the club see it and are refused.
    expected: { ...sharedWrite(204), owner: 403, mentor: 204 },
  },
  {
    route: 'DELETE /api/brews/:brewId/comments/:commentId',
    label: 'private, the brewer’s own',
    prepare: () => fresh.comment(scene.privateBrew.id, scene.owner),
    call: (a, id) => a.delete(`/api/brews/${scene.privateBrew.id}/comments/${id}`),
    expected: ownerOnly(204),
  },
];

let invitationToken = '';
const tokens = new Map<number, string>();
const photoReadings = new Map<number, number>();

// ---------------------------------------------------------------------------------------------
// Which routes the app mounts

interface StackLayer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: StackLayer[] };
  rawPath?: string | string[];
}

/** Every METHOD /path the Express app routes, found by walking its router stack. */
function mountedRoutes(app: { router: { stack: StackLayer[] } }): string[] {
  const found: string[] = [];
  const join = (prefix: string, path: string) => (prefix + (path === '/' ? '' : path)).replace(/\/+$/, '') || '/';
  const walk = (stack: StackLayer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const [method, on] of Object.entries(layer.route.methods)) if (on && method !== '_all') found.push(`${method.toUpperCase()} ${join(prefix, layer.route.path)}`);
      } else if (layer.handle?.stack) {
        if (typeof layer.rawPath !== 'string') throw new Error('A router mounted on several paths: teach mountedRoutes about it.');
        walk(layer.handle.stack, join(prefix, layer.rawPath));
      }
    }
  };
  walk(app.router.stack, '');
  return found.filter((r) => r.split(' ')[1].startsWith('/api/'));
}

// ---------------------------------------------------------------------------------------------

beforeAll(async () => {
  h = await createHarness();
  scene = await makeMatrixScene();
  invitationToken = (await makeInvitation(h.ctx.db, { clubId: scene.club.id, email: `pending-${scene.tag}@example.org` })).token;
}, 60_000);

async function agentFor(who: Who, freshAgent: boolean | undefined): Promise<Agent> {
  if (!freshAgent) return scene.agents[who];
  return who === 'anonymous' ? request.agent(h.app) : h.signIn(scene.users[who].email);
}

describe('the authorization matrix', () => {
  it('covers every route the app mounts, and only those', () => {
    const mounted = mountedRoutes(h.app as unknown as { router: { stack: StackLayer[] } });
    // The walk itself must find routes of every router, or the comparison below proves nothing.
    expect(mounted).toContain('GET /api/health');
    expect(mounted).toContain('DELETE /api/brews/:brewId/comments/:commentId');
    expect(new Set(mounted).size).toBe(mounted.length);
    const listed = [...new Set(cases.map((c) => c.route))];
    expect(listed.filter((r) => !mounted.includes(r)), 'listed but not mounted').toEqual([]);
    expect(mounted.filter((r) => !listed.includes(r)), 'mounted but not in the matrix').toEqual([]);
  });

  it('lists the public routes explicitly: the same answer for anonymous visitors and everyone else', () => {
    const publicRoutes = [...new Set(cases.filter((c) => c.isPublic).map((c) => c.route))];
    expect(publicRoutes).toEqual([
      'GET /api/health',
      'POST /api/calc/boil-correction',
      'POST /api/auth/signup',
      'POST /api/auth/login',
      'POST /api/auth/logout',
      'POST /api/auth/password-reset',
      'GET /api/auth/password-reset/:token',
      'POST /api/auth/password-reset/:token',
      'GET /api/invitations/:token',
      'POST /api/invitations/:token/accept',
    ]);
    for (const c of cases) {
      if (c.isPublic) expect(c.expected.anonymous, c.route).not.toBe(401);
      else expect([401, 404], c.route).toContain(c.expected.anonymous);
    }
  });

  for (const c of cases) {
    it(`${c.route}${c.label ? ` (${c.label})` : ''}`, async () => {
      const got = {} as Expected;
      for (const who of people) {
        const id = c.prepare ? await c.prepare() : 0;
        const agent = await agentFor(who, c.freshAgent);
        const res = await c.call(agent, id);
        got[who] = res.status;
        if (res.status >= 500) throw new Error(`${c.route} as ${who}: ${res.status} ${JSON.stringify(res.body)}`);
      }
      expect(got).toEqual(c.expected);
    });
  }
});
