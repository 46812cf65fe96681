/**
 * The fermentation log: the request shapes shared by the API and the forms (readings, packaging,
 * settings, the CSV import's mapping), and their vocabulary. SI inside (°C, litres, grams, SG);
 * the forms convert at their edges. Messages that quote a limit give it in metric and US units,
 * because the same message reaches brewers of either preference. The answers are in responses.ts.
 */
import { z } from 'zod';
import { READINGS_WINDOW } from '../brews';
import { pageCursorSchema } from '../common';
import { num, pageSizeSchema, ranged, showF, showGal } from '../fields';

// ---------------------------------------------------------------------------------------------
// Vocabulary

export const fermentationReadingKinds = ['gravity', 'temperature'] as const;
export type FermentationReadingKind = (typeof fermentationReadingKinds)[number];

/** The instrument a fermentation reading was taken with. */
export const fermentationMethods = ['hydrometer', 'refractometer', 'thermometer'] as const;
export type FermentationMethod = (typeof fermentationMethods)[number];

export const methodKind: Record<FermentationMethod, FermentationReadingKind> = {
  hydrometer: 'gravity',
  refractometer: 'gravity',
  thermometer: 'temperature',
};

export const readingSources = ['manual', 'csv'] as const;
export type ReadingSource = (typeof readingSources)[number];

export const packagingContainers = ['bottles', 'keg'] as const;
export type PackagingContainer = (typeof packagingContainers)[number];

/** `none`: no priming sugar (a keg carbonated with CO2 from a cylinder). */
export const packagingSugars = ['sucrose', 'dextrose', 'dme', 'none'] as const;
export type PackagingSugar = (typeof packagingSugars)[number];

export const packagingSugarLabels: Record<PackagingSugar, string> = {
  sucrose: 'Table sugar (sucrose)',
  dextrose: 'Dextrose (corn sugar)',
  dme: 'Dry malt extract',
  none: 'None: carbonate with CO2',
};

export const reminderKinds = ['first-fg-check', 'recheck'] as const;
export type ReminderKind = (typeof reminderKinds)[number];

/** Limits a fermenter and its samples can plausibly read. */
export const FERMENTATION_LIMITS = {
  /** Fermenting beer is below water when dry; 0.980 is beyond any beer. */
  sg: { min: 0.98, max: 1.2 },
  brix: { min: 0, max: 40 },
  sampleTempC: { min: 0, max: 60 },
  /** A cold crash near freezing to a runaway warm ferment. */
  fermenterTempC: { min: -5, max: 50 },
  volumeL: { max: 2000 },
  /** residualCo2Volumes covers 0–30 °C. */
  warmestTempC: { min: 0, max: 30 },
  co2Volumes: { min: 1, max: 4.5 },
} as const;

/** Ordinary crown-capped bottles are not meant for more than about 3 volumes (common practice, no source). */
export const BOTTLE_CO2_CAUTION_VOLUMES = 3;

/** How far in the future a reading may be stamped, for a phone whose clock runs a little fast. */
export const FUTURE_SLACK_MS = 5 * 60_000;

// ---------------------------------------------------------------------------------------------
// Field schemas with a brewer's messages

const f = showF;
const gal = showGal;



const L = FERMENTATION_LIMITS;

export const fermentingSgSchema = ranged(
  'the hydrometer reading',
  'Hydrometer reading',
  L.sg.min,
  L.sg.max,
  'Fermenting beer reads between 0.980 and 1.200 on a hydrometer. Check the reading.',
);

export const brixReadingSchema = ranged('the Brix reading', 'Brix', L.brix.min, L.brix.max, 'A brewing refractometer reads 0 to 40 °Bx. Check the reading.');

export const originalBrixSchema = ranged(
  'the original Brix (before fermentation)',
  'Original Brix',
  L.brix.min,
  L.brix.max,
  'A brewing refractometer reads 0 to 40 °Bx. Check the original reading.',
);

const fermentationSampleTempSchema = ranged(
  'the sample temperature',
  'Sample temperature',
  L.sampleTempC.min,
  L.sampleTempC.max,
  `Read the sample between ${L.sampleTempC.min} and ${L.sampleTempC.max} °C (${f(L.sampleTempC.min)} and ${f(L.sampleTempC.max)}).`,
);

export const fermenterTempSchema = ranged(
  'the fermenter temperature',
  'Fermenter temperature',
  L.fermenterTempC.min,
  L.fermenterTempC.max,
  `A fermenter reads between ${L.fermenterTempC.min} and ${L.fermenterTempC.max} °C (${f(L.fermenterTempC.min)} and ${f(L.fermenterTempC.max)}). Check the thermometer.`,
);

const noteSchema = z.string({ error: 'The note must be text.' }).trim().max(500, { error: 'Use at most 500 characters.' }).default('');

const instrumentIdSchema = num({ notNumber: 'Pick an instrument.' })
  .int({ error: 'Pick an instrument.' })
  .positive({ error: 'Pick an instrument.' })
  .nullable()
  .default(null);

/** When the reading was taken; the server's clock when left out. Never in the future. */
export const takenAtSchema = z
  .string({ error: 'Give the date and time of the reading.' })
  .pipe(z.iso.datetime({ offset: true, error: 'Give the date and time of the reading.' }))
  .refine((s) => Date.parse(s) <= Date.now() + FUTURE_SLACK_MS, { error: 'A reading cannot be taken in the future. Check the date and time.' })
  .optional();

// ---------------------------------------------------------------------------------------------
// A reading typed in by hand

const base = { instrumentId: instrumentIdSchema, takenAt: takenAtSchema, note: noteSchema };

export const hydrometerReadingSchema = z.object({
  ...base,
  method: z.literal('hydrometer'),
  /** As read at the bottom of the meniscus, before temperature correction. */
  sg: fermentingSgSchema,
  sampleTempC: fermentationSampleTempSchema,
});

export const refractometerReadingSchema = z
  .object({
    ...base,
    method: z.literal('refractometer'),
    brix: brixReadingSchema,
    /** The Brix of the same wort before fermentation: the alcohol correction needs it. */
    originalBrix: originalBrixSchema,
  })
  .superRefine((v, ctx) => {
    if (typeof v.brix === 'number' && typeof v.originalBrix === 'number' && v.brix > v.originalBrix) {
      ctx.addIssue({
        code: 'custom',
        path: ['brix'],
        message: 'The reading is above the original Brix: fermentation only lowers it. Check which reading is which.',
      });
    }
  });

export const thermometerReadingSchema = z.object({ ...base, method: z.literal('thermometer'), tempC: fermenterTempSchema });

export const fermentationReadingInputSchema = z.discriminatedUnion('method', [hydrometerReadingSchema, refractometerReadingSchema, thermometerReadingSchema], {
  error: 'Choose hydrometer, refractometer or thermometer.',
});
export type FermentationReadingInput = z.input<typeof fermentationReadingInputSchema>;
export type FermentationReadingBody = z.output<typeof fermentationReadingInputSchema>;

/** The brewer's numbers as stored: the instrument's own reading, before any correction. */
export type FermentationRaw =
  | { method: 'hydrometer'; sg: number; sampleTempC: number | null }
  | { method: 'refractometer'; brix: number; originalBrix: number; originalBrixSource: 'entered' | 'from-og' }
  | { method: 'thermometer'; tempC: number };

// ---------------------------------------------------------------------------------------------
// Packaging

export const packagingInputSchema = z
  .object({
    container: z.enum(packagingContainers, { error: 'Choose bottles or a keg.' }),
    volumeL: num('the volume packaged', 'Volume')
      .refine((v) => v > 0, { error: 'The volume must be more than 0.', abort: true })
      .refine((v) => v <= L.volumeL.max, { error: `A volume above ${L.volumeL.max} L (${gal(L.volumeL.max)}) is beyond a home brewery. Check the number.`, abort: true }),
    warmestTempC: ranged(
      'the warmest temperature the beer reached',
      'Warmest temperature',
      L.warmestTempC.min,
      L.warmestTempC.max,
      `The carbonation estimate covers beer that stayed between ${L.warmestTempC.min} and ${L.warmestTempC.max} °C (${f(L.warmestTempC.min)} and ${f(L.warmestTempC.max)}).`,
    ),
    targetCo2Volumes: ranged(
      'the carbonation you want',
      'Carbonation',
      L.co2Volumes.min,
      L.co2Volumes.max,
      `Carbonation is between ${L.co2Volumes.min} and ${L.co2Volumes.max} volumes of CO2; most beers want about 2.0 to 2.7.`,
    ),
    sugar: z.enum(packagingSugars, { error: 'Choose a priming sugar, or none for a keg carbonated with CO2.' }),
    packagedAt: takenAtSchema,
    /** Package although the verdict is not "stable": an explicit, recorded decision. */
    override: z.boolean({ error: 'Say whether you package before the gravity is stable.' }).default(false),
    overrideReason: z.string({ error: 'The reason must be text.' }).trim().max(500, { error: 'Use at most 500 characters.' }).default(''),
    note: noteSchema,
  })
  .superRefine((v, ctx) => {
    if (v.override && v.overrideReason.length < 5) {
      ctx.addIssue({ code: 'custom', path: ['overrideReason'], message: 'Say why you package before the gravity is stable; your mentor will see it.' });
    }
  });
export type PackagingInput = z.input<typeof packagingInputSchema>;
export type PackagingBody = z.output<typeof packagingInputSchema>;

// ---------------------------------------------------------------------------------------------
// Paging the readings

/**
 * GET /api/brews/:brewId/fermentation/readings: the readings before `cursor` (the log's
 * `olderReadings`, or a page's `nextCursor`), a page the size of the brew day's (READINGS_WINDOW).
 */
export const fermentationReadingsQuerySchema = z.object({
  cursor: pageCursorSchema,
  pageSize: pageSizeSchema('reading', 200, READINGS_WINDOW),
});
export interface FermentationReadingsQuery {
  cursor?: string;
  pageSize?: number;
}

// ---------------------------------------------------------------------------------------------
// Settings

export const fermentationSettingsSchema = z.object({
  remindersEnabled: z.boolean({ error: 'Reminders are on or off.' }),
});
export type FermentationSettingsInput = z.input<typeof fermentationSettingsSchema>;

// ---------------------------------------------------------------------------------------------
// CSV import (docs/fermentation-csv.md)

export const csvFields = ['taken_at', 'kind', 'value', 'unit', 'sample_temp_c', 'original_brix', 'instrument', 'note'] as const;
export type CsvField = (typeof csvFields)[number];

export const csvUnits = ['sg', 'plato', 'brix', 'c', 'f'] as const;
export type CsvUnit = (typeof csvUnits)[number];

export const csvFieldLabels: Record<CsvField, string> = {
  taken_at: 'Date and time',
  kind: 'Kind (gravity or temperature)',
  value: 'Value',
  unit: 'Unit',
  sample_temp_c: 'Sample temperature (°C)',
  original_brix: 'Original Brix',
  instrument: 'Instrument name',
  note: 'Note',
};

const columnSchema = num({ notNumber: 'Choose a column.' }).int().min(0).max(199, { error: 'Choose a column.' }).nullable().default(null);

/** Which file column (0-based) feeds each of our fields; null when the file has none. */
export const csvMappingSchema = z
  .object({
    columns: z.object(
      {
        taken_at: columnSchema,
        kind: columnSchema,
        value: columnSchema,
        unit: columnSchema,
        sample_temp_c: columnSchema,
        original_brix: columnSchema,
        instrument: columnSchema,
        note: columnSchema,
      },
      { error: 'Say which column holds what.' },
    ),
    /** Used for every row when the file has no such column. */
    defaults: z
      .object({
        kind: z.enum(fermentationReadingKinds, { error: 'Choose gravity or temperature.' }).nullable().default(null),
        unit: z.enum(csvUnits, { error: 'Choose sg, plato, brix, c or f.' }).nullable().default(null),
      })
      .default({ kind: null, unit: null }),
    /** Whether the first row names the columns (and is not a reading). */
    hasHeader: z.boolean().default(true),
  })
  .superRefine((m, ctx) => {
    if (m.columns.taken_at === null) ctx.addIssue({ code: 'custom', path: ['columns', 'taken_at'], message: 'Choose the column with the date and time.' });
    if (m.columns.value === null) ctx.addIssue({ code: 'custom', path: ['columns', 'value'], message: 'Choose the column with the reading.' });
    if (m.columns.unit === null && m.defaults.unit === null) {
      ctx.addIssue({ code: 'custom', path: ['defaults', 'unit'], message: 'Choose the unit column, or the unit every row is in.' });
    }
    const seen = new Map<number, string>();
    for (const field of csvFields) {
      const col = m.columns[field];
      if (col === null) continue;
      if (seen.has(col)) {
        ctx.addIssue({ code: 'custom', path: ['columns', field], message: `That column already feeds "${csvFieldLabels[seen.get(col) as CsvField]}".` });
      }
      seen.set(col, field);
    }
  });
export type CsvMapping = z.output<typeof csvMappingSchema>;
export type CsvMappingInput = z.input<typeof csvMappingSchema>;

/** Beyond this the file is refused before it is read to the end. */
export const CSV_MAX_ROWS = 20_000;
export const CSV_MAX_BYTES = 5 * 1024 * 1024;
/** At most this many row problems are listed; the count says how many there were. */
export const CSV_MAX_ROW_ERRORS = 100;
