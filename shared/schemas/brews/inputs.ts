/**
 * Brew days: the request shapes shared by the API and the brew-day forms, and their vocabulary.
 * SI inside (°C, litres, SG); the forms convert at their edges. Messages that quote a limit give it
 * in both metric and US units, because the same message reaches brewers of either preference. The
 * answers are in responses.ts.
 */
import { z } from 'zod';
import { idSchema, pageCursorSchema } from '../common';
import { num, pageSizeSchema, ranged, showF, showGal } from '../fields';
import { boilCheckInputSchema } from '../boil-check';
import type { InstrumentKind } from '../instruments';

// ---------------------------------------------------------------------------------------------
// Vocabulary

/** The stages of a brew day, in the order they happen. Souring is optional: see `stagesFor`. */
export const brewStages = ['mash', 'souring', 'boil', 'chill', 'og'] as const;
export type BrewStage = (typeof brewStages)[number];

/** A brew day's stages: souring (kettle souring before the boil) only when its recipe set a souring target pH. */
export function stagesFor(targets: { souringTargetPh?: number | null } | null | undefined): readonly BrewStage[] {
  return targets?.souringTargetPh != null ? brewStages : brewStages.filter((s) => s !== 'souring');
}

export const brewStageLabels: Record<BrewStage, string> = {
  mash: 'Mash',
  souring: 'Souring',
  boil: 'Boil',
  chill: 'Chill and pitch',
  og: 'Original gravity',
};

/** The reading's name inside a sentence ("the mash pH reading"): lower case, but pH stays pH. */
export const readingKindInSentence = (kind: ReadingKind) => readingKindLabels[kind].toLowerCase().replace(/\bph\b/, 'pH');

export const brewStatuses = ['brewing', 'fermenting', 'packaged'] as const;
export type BrewStatus = (typeof brewStatuses)[number];

export const brewStatusLabels: Record<BrewStatus, string> = {
  brewing: 'Brew day',
  fermenting: 'Fermenting',
  packaged: 'Packaged',
};

export const readingKinds = ['mash_temp', 'mash_ph', 'souring_ph', 'pre_boil_gravity', 'late_boil_gravity', 'pitch_temp', 'og'] as const;
export type ReadingKind = (typeof readingKinds)[number];

export const readingKindLabels: Record<ReadingKind, string> = {
  mash_temp: 'Mash temperature',
  mash_ph: 'Mash pH',
  souring_ph: 'Souring pH',
  pre_boil_gravity: 'Pre-boil gravity',
  late_boil_gravity: 'Late-boil gravity',
  pitch_temp: 'Pitch temperature',
  og: 'Original gravity',
};

/** Where each reading is taken. */
export const readingStage: Record<ReadingKind, BrewStage> = {
  mash_temp: 'mash',
  mash_ph: 'mash',
  souring_ph: 'souring',
  pre_boil_gravity: 'boil',
  late_boil_gravity: 'boil',
  pitch_temp: 'chill',
  og: 'og',
};

/** Which instruments can take each reading. */
export const readingInstrumentKinds: Record<ReadingKind, readonly InstrumentKind[]> = {
  mash_temp: ['thermometer'],
  mash_ph: ['ph_meter'],
  souring_ph: ['ph_meter'],
  pre_boil_gravity: ['refractometer', 'hydrometer'],
  late_boil_gravity: ['refractometer', 'hydrometer'],
  pitch_temp: ['thermometer'],
  og: ['hydrometer'],
};

/** What the corrected value of a reading measures. */
export type ReadingQuantity = 'temperature' | 'ph' | 'gravity';
export const readingQuantity: Record<ReadingKind, ReadingQuantity> = {
  mash_temp: 'temperature',
  mash_ph: 'ph',
  souring_ph: 'ph',
  pre_boil_gravity: 'gravity',
  late_boil_gravity: 'gravity',
  pitch_temp: 'temperature',
  og: 'gravity',
};

export const gravityMethods = ['refractometer', 'hydrometer'] as const;
export type GravityMethod = (typeof gravityMethods)[number];

// ---------------------------------------------------------------------------------------------
// Field schemas with a brewer's messages

const f = showF;
const gal = showGal;



export const READING_LIMITS = {
  mashTempC: { min: 0, max: 100 },
  pitchTempC: { min: -5, max: 60 },
  ph: { min: 3, max: 9 },
  /** Wort being soured: from the mash's pH down past any kettle-sour target (recipes allow 2.8 to 4.6). */
  souringPh: { min: 2.5, max: 7 },
  brix: { min: 0, max: 40 },
  sg: { min: 1, max: 1.2 },
  sampleTempC: { min: 0, max: 60 },
  volumeL: { max: 2000 },
  minutesLeft: { max: 360 },
} as const;

const L = READING_LIMITS;

export const mashTempSchema = ranged(
  'the mash temperature',
  'Mash temperature',
  L.mashTempC.min,
  L.mashTempC.max,
  `A mash reads between ${L.mashTempC.min} and ${L.mashTempC.max} °C (${f(L.mashTempC.min)} and ${f(L.mashTempC.max)}). Check the thermometer.`,
);

export const pitchTempSchema = ranged(
  'the wort temperature',
  'Wort temperature',
  L.pitchTempC.min,
  L.pitchTempC.max,
  `Chilled wort reads between ${L.pitchTempC.min} and ${L.pitchTempC.max} °C (${f(L.pitchTempC.min)} and ${f(L.pitchTempC.max)}). Check the thermometer.`,
);

export const phSchema = ranged(
  'the pH',
  'pH',
  L.ph.min,
  L.ph.max,
  `A mash reads between pH ${L.ph.min} and ${L.ph.max}; anything else is a misreading or a meter fault. Check the meter.`,
);

export const souringPhSchema = ranged(
  'the pH',
  'pH',
  L.souringPh.min,
  L.souringPh.max,
  `Souring wort reads between pH ${L.souringPh.min} and ${L.souringPh.max}; anything else is a misreading or a meter fault. Check the meter.`,
);

export const brixSchema = ranged(
  'the Brix reading',
  'Brix',
  L.brix.min,
  L.brix.max,
  `A brewing refractometer reads ${L.brix.min} to ${L.brix.max} °Bx. Check the reading.`,
);

export const wortSgSchema = ranged(
  'the hydrometer reading',
  'Hydrometer reading',
  L.sg.min,
  L.sg.max,
  'Unfermented wort reads between 1.000 and 1.200 on a hydrometer. Check the reading.',
);

export const sampleTempSchema = ranged(
  'the sample temperature',
  'Sample temperature',
  L.sampleTempC.min,
  L.sampleTempC.max,
  `Read the sample between ${L.sampleTempC.min} and ${L.sampleTempC.max} °C (${f(L.sampleTempC.min)} and ${f(L.sampleTempC.max)}): a hydrometer cannot be read in hot wort. Cool the sample first.`,
);

export const kettleVolumeSchema = num('the volume', 'Volume')
  .refine((v) => v > 0, { error: 'The volume must be more than 0.', abort: true })
  .refine((v) => v <= L.volumeL.max, { error: `A volume above ${L.volumeL.max} L (${gal(L.volumeL.max)}) is beyond a home brewery. Check the number.`, abort: true });

export const minutesLeftSchema = num('the minutes left', 'Minutes left')
  .refine((v) => v >= 0, { error: 'Minutes left cannot be below 0. Enter 0 if the boil has ended.', abort: true })
  .refine((v) => v <= L.minutesLeft.max, { error: `Minutes left above ${L.minutesLeft.max} is longer than any boil. Check the number.`, abort: true });

const noteSchema = z.string({ error: 'The note must be text.' }).trim().max(1000, { error: 'Use at most 1000 characters.' }).default('');
const instrumentIdSchema = num({ notNumber: 'Pick an instrument.' })
  .int({ error: 'Pick an instrument.' })
  .positive({ error: 'Pick an instrument.' })
  .nullable()
  .default(null);
/**
 * When something happened on the brewer's device (read, decided, written, a stage changed): an
 * entry kept offline is sent later with its own time. The server's clock when left out. Not in the future.
 */
const pastInstantSchema = (what: string) =>
  z.iso
    .datetime({ offset: true, error: 'Give the time as an ISO date and time.' })
    .refine((s) => Date.parse(s) <= Date.now() + 5 * 60_000, { error: `${what} cannot be in the future.` })
    .optional();
const takenAtSchema = pastInstantSchema('The time of the reading');

// ---------------------------------------------------------------------------------------------
// Readings

const base = { instrumentId: instrumentIdSchema, takenAt: takenAtSchema, note: noteSchema };

/** A gravity read either way: Brix on a refractometer, or SG and sample temperature on a hydrometer. */
const gravityFields = {
  method: z.enum(gravityMethods, { error: 'Choose refractometer or hydrometer.' }),
  brix: brixSchema.optional(),
  sg: wortSgSchema.optional(),
  sampleTempC: sampleTempSchema.optional(),
};

function requireGravity(v: { method?: GravityMethod; brix?: number; sg?: number; sampleTempC?: number }, ctx: z.RefinementCtx) {
  if (v.method === 'refractometer' && v.brix === undefined) {
    ctx.addIssue({ code: 'custom', path: ['brix'], message: 'Enter the Brix reading.', input: v });
  }
  if (v.method === 'hydrometer') {
    if (v.sg === undefined) ctx.addIssue({ code: 'custom', path: ['sg'], message: 'Enter the hydrometer reading.', input: v });
    if (v.sampleTempC === undefined) ctx.addIssue({ code: 'custom', path: ['sampleTempC'], message: 'Enter the sample temperature.', input: v });
  }
}

export const mashTempReadingSchema = z.object({ ...base, kind: z.literal('mash_temp'), tempC: mashTempSchema });
export const mashPhReadingSchema = z.object({ ...base, kind: z.literal('mash_ph'), ph: phSchema });
export const souringPhReadingSchema = z.object({ ...base, kind: z.literal('souring_ph'), ph: souringPhSchema });
export const preBoilReadingSchema = z
  .object({ ...base, kind: z.literal('pre_boil_gravity'), ...gravityFields, volumeL: kettleVolumeSchema.optional() })
  .superRefine(requireGravity);
export const lateBoilReadingSchema = z
  .object({ ...base, kind: z.literal('late_boil_gravity'), ...gravityFields, volumeL: kettleVolumeSchema, minutesLeft: minutesLeftSchema })
  .superRefine(requireGravity);
export const pitchTempReadingSchema = z.object({
  ...base,
  kind: z.literal('pitch_temp'),
  tempC: pitchTempSchema,
  /** The yeast went in with this reading: sets the brew day's pitch time when not yet set. */
  pitched: z.boolean({ error: 'Say whether the yeast went in.' }).default(true),
});
export const ogReadingSchema = z.object({
  ...base,
  kind: z.literal('og'),
  sg: wortSgSchema,
  sampleTempC: sampleTempSchema,
  /** Litres that went into the fermenter, cold. */
  volumeL: kettleVolumeSchema.optional(),
});

export const readingInputSchema = z.discriminatedUnion(
  'kind',
  [mashTempReadingSchema, mashPhReadingSchema, souringPhReadingSchema, preBoilReadingSchema, lateBoilReadingSchema, pitchTempReadingSchema, ogReadingSchema],
  { error: 'Choose what was read: mash temperature, mash pH, souring pH, pre-boil or late-boil gravity, pitch temperature or OG.' },
);
export type ReadingInput = z.input<typeof readingInputSchema>;
export type ReadingBody = z.output<typeof readingInputSchema>;

/** The brewer's numbers of a reading, as stored (everything they typed except the instrument and note). */
export type ReadingRaw = Record<string, number | boolean | string>;

// ---------------------------------------------------------------------------------------------
// Brew days

const nameSchema = z.string({ error: 'Give the brew day a name.' }).trim().min(1, { error: 'Give the brew day a name.' }).max(120, { error: 'Use at most 120 characters.' });
const dateSchema = z
  .string({ error: 'Enter the date.' })
  .regex(/^\d{4}-\d{2}-\d{2}$/, { error: 'Enter a date as YYYY-MM-DD.' })
  .pipe(z.iso.date({ error: 'Enter a real calendar date.' }));

export const startBrewSchema = z.object({
  recipeId: num({ notNumber: 'Choose a recipe.' }).int({ error: 'Choose a recipe.' }).positive({ error: 'Choose a recipe.' }),
  /** Defaults to the recipe's name and today's date. */
  name: nameSchema.optional(),
  brewedOn: dateSchema.optional(),
});
export type StartBrewInput = z.input<typeof startBrewSchema>;

export const updateBrewSchema = z.object({
  name: nameSchema.optional(),
  brewedOn: dateSchema.optional(),
  status: z.enum(brewStatuses, { error: 'Choose brew day, fermenting or packaged.' }).optional(),
  notes: z.string().trim().max(5000, { error: 'Use at most 5000 characters.' }).optional(),
  /** The boil-off rate used today, when it differs from the equipment profile's. */
  boilOffLPerHour: num('the boil-off rate', 'Boil-off rate')
    .refine((v) => v >= 0, { error: 'The boil-off rate cannot be negative.', abort: true })
    .refine((v) => v <= 30, { error: 'A boil-off above 30 L (7.93 gal) per hour is beyond a home kettle.', abort: true })
    .optional(),
});
export type UpdateBrewInput = z.input<typeof updateBrewSchema>;

export const brewStageActions = ['start', 'complete', 'skip'] as const;
export type BrewStageAction = (typeof brewStageActions)[number];
export const stageActionSchema = z.object({
  action: z.enum(brewStageActions, { error: 'Choose start, complete or skip.' }),
  at: pastInstantSchema('The time of the stage change'),
});
export const stageParamsSchema = z.object({
  id: idSchema,
  stage: z.enum(brewStages, { error: 'Unknown stage: use mash, souring, boil, chill or og.' }),
});

/** GET /api/brews: newest first, paged by key like the recipe list; ask again with `cursor: nextCursor`. */
export const listBrewsQuerySchema = z.object({
  scope: z.enum(['mine', 'shared'], { error: 'Choose mine or shared.' }).default('mine'),
  cursor: pageCursorSchema,
  pageSize: pageSizeSchema('brew day', 100, 20),
});
/** What a client asks for; the server fills in the defaults. */
export interface ListBrewsQuery {
  scope?: 'mine' | 'shared';
  cursor?: string;
  pageSize?: number;
}

/** How many of the latest readings the brew-day GET carries; older ones come a page at a time. */
export const READINGS_WINDOW = 50;

/** GET /api/brews/:id/readings: the readings before `cursor` (the brew day's `olderReadings`, or a page's `nextCursor`). */
export const brewReadingsQuerySchema = z.object({
  cursor: pageCursorSchema,
  pageSize: pageSizeSchema('reading', 200, READINGS_WINDOW),
});
export interface BrewReadingsQuery {
  cursor?: string;
  pageSize?: number;
}

export const brewNoteInputSchema = z.object({
  body: z.string({ error: 'Write the note.' }).trim().min(1, { error: 'Write the note.' }).max(2000, { error: 'Use at most 2000 characters.' }),
  stage: z.enum(brewStages, { error: 'Unknown stage.' }).nullable().default(null),
  writtenAt: pastInstantSchema('The time of the note'),
});
export type BrewNoteInput = z.input<typeof brewNoteInputSchema>;

const idNum = idSchema;
export const readingParamsSchema = z.object({ id: idNum, readingId: idNum });
export const photoParamsSchema = z.object({ id: idNum, readingId: idNum, photoId: idNum });
export const noteParamsSchema = z.object({ id: idNum, noteId: idNum });

// ---------------------------------------------------------------------------------------------
// Decisions: the choice after a late-boil check

export const choiceKinds = ['as-is', 'extract', 'water', 'boil-longer', 'own'] as const;
export type ChoiceKind = (typeof choiceKinds)[number];
export const extractKinds = ['dme', 'lme', 'sucrose', 'dextrose'] as const;

export const decisionChoiceSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('as-is') }),
    z.object({ kind: z.literal('extract'), extract: z.enum(extractKinds, { error: 'Choose dry or liquid malt extract, table sugar or dextrose.' }) }),
    z.object({ kind: z.literal('water') }),
    z.object({ kind: z.literal('boil-longer') }),
    z.object({
      kind: z.literal('own'),
      description: z
        .string({ error: 'Say what you did instead.' })
        .trim()
        .min(1, { error: 'Say what you did instead.' })
        .max(500, { error: 'Use at most 500 characters.' }),
    }),
  ],
  { error: 'Choose one of the options, or describe your own action.' },
);
export type DecisionChoice = z.output<typeof decisionChoiceSchema>;

/**
 * POST /api/brews/:id/decisions. Only the check's input and the choice are taken: the server
 * recomputes every number with runBoilCheck, and any result the client sends is dropped.
 */
export const decisionInputSchema = z.object({
  input: boilCheckInputSchema,
  choice: decisionChoiceSchema,
  note: noteSchema,
  decidedAt: pastInstantSchema('The time of the decision'),
});
export type DecisionInput = z.input<typeof decisionInputSchema>;

// ---------------------------------------------------------------------------------------------
// Sharing

export const brewSharingSchema = z.object({
  clubIds: z
    .array(num({ notNumber: 'Each club is a number.' }).int().positive({ error: 'Each club is a number.' }), { error: 'Give a list of clubs (empty for private).' })
    .max(50, { error: 'Share with at most 50 clubs.' }),
});
export type BrewSharingInput = z.input<typeof brewSharingSchema>;

// ---------------------------------------------------------------------------------------------
// Photos

export const PHOTO_MAX_BYTES = 5 * 1024 * 1024;
export const photoMimeTypes = ['image/jpeg', 'image/png', 'image/webp'] as const;
export type PhotoMime = (typeof photoMimeTypes)[number];
