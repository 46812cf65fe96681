/** The fermentation log: what the API answers (the requests and the vocabulary are in inputs.ts). */
import type { FgState } from '../../brewmath';
import type { Page } from '../common';
import type { InstrumentSnapshot } from '../instruments';
import type { CsvField, CsvMapping, FermentationMethod, FermentationRaw, FermentationReadingKind, PackagingContainer, PackagingSugar, ReadingSource, ReminderKind } from './inputs';

export interface FermentationReading {
  id: number;
  brewId: number;
  kind: FermentationReadingKind;
  method: FermentationMethod;
  instrumentId: number | null;
  /** The instrument as it was calibrated when the reading was taken. */
  instrument: InstrumentSnapshot;
  raw: FermentationRaw;
  /** SG for gravity (at the hydrometer's calibration temperature, or the alcohol-corrected estimate), °C for temperature. */
  corrected: number;
  correction: Record<string, unknown> | null;
  /** An alcohol-corrected refractometer estimate: never proves FG on its own. */
  estimate: boolean;
  warnings: string[];
  takenAt: string;
  /** Days from pitching. */
  day: number;
  note: string;
  source: ReadingSource;
  createdAt: string;
}

export interface FermentationVerdict {
  state: FgState;
  /** In words, for the banner. */
  reason: string;
  /** Refractometer estimates look settled, but only a hydrometer can prove it. */
  needsHydrometer: boolean;
  daysSincePitch: number;
  latestSg: number | null;
  /** When the next gravity reading is worth taking; null once stable. */
  nextCheckAt: string | null;
}

export interface TemperatureExcursion {
  readingId: number | null;
  takenAt: string;
  tempC: number;
  direction: 'warm' | 'cold';
  /** How far outside the recipe's range, °C. */
  byC: number;
}

/** An API answer lists at most this many temperature excursions, the latest; the count covers them all. */
export const EXCURSIONS_LISTED = 20;

export interface TemperatureRange {
  minC: number;
  maxC: number;
  count: number;
  from: string;
  to: string;
}

export interface TemperatureSummary {
  /** The recipe's fermentation range, °C. */
  target: { minC: number; maxC: number } | null;
  last24h: TemperatureRange | null;
  overall: TemperatureRange | null;
  latest: { takenAt: string; tempC: number } | null;
  /** Readings outside the range, oldest first; an API answer lists only the latest few (EXCURSIONS_LISTED). */
  excursions: TemperatureExcursion[];
  /** How many readings were outside the range, listed or not. */
  excursionCount: number;
  /** Within any 24 hours the temperature moved by more than this. */
  largestSwing24hC: number | null;
  swingFlagged: boolean;
}

export interface AbvFigures {
  apparentAttenuation: number;
  /** (OG − FG) × 131.25 */
  abvSimple: number;
  /** The Balling-based estimate in shared/brewmath/abv.ts */
  abvExact: number;
}

export interface FermentationProgress {
  og: number | null;
  ogSource: 'measured' | 'target';
  current: (AbvFigures & { sg: number; estimate: boolean; takenAt: string }) | null;
  target: (AbvFigures & { og: number; fg: number }) | null;
  /** Why a figure is missing, in words. */
  note: string | null;
}

export interface PackagingRecord {
  id: number;
  brewId: number;
  container: PackagingContainer;
  volumeL: number;
  warmestTempC: number;
  targetCo2Volumes: number;
  sugar: PackagingSugar;
  /** Worked out by primingSugarG; null without priming sugar. */
  primingSugarG: number | null;
  residualCo2Volumes: number;
  /** The verdict when it was packaged. */
  verdictState: FgState;
  verdictReason: string;
  override: boolean;
  overrideReason: string;
  note: string;
  packagedAt: string;
  createdAt: string;
}

export interface ScheduledReminder {
  kind: ReminderKind;
  dueAt: string;
  sentAt: string | null;
  outcome: 'sent' | 'skipped' | 'failed' | null;
}

export interface FermentationBrew {
  id: number;
  name: string;
  status: string;
  ownerId: number;
  ownerName: string;
  isOwner: boolean;
  pitchedAt: string | null;
  brewedOn: string | null;
  targetOg: number | null;
  targetFg: number | null;
  fermentationTempMinC: number | null;
  fermentationTempMaxC: number | null;
  batchVolumeL: number | null;
  /** Measured into the fermenter with the brew day's OG reading, when it was given. */
  fermenterVolumeL: number | null;
  /** The brew day's measured OG, corrected. */
  og: number | null;
}

/**
 * One reading as the chart draws it: every reading of the log comes this way (the same narrow
 * row the verdict reads), while whole readings come a page at a time (decision 0024).
 */
export interface FermentationPoint {
  id: number;
  kind: FermentationReadingKind;
  takenAt: string;
  /** SG for gravity, °C for temperature, as in FermentationReading.corrected. */
  corrected: number;
  estimate: boolean;
}

/** One page of older fermentation readings, oldest first. */
export interface FermentationReadingPage extends Page<FermentationReading> {
  pageSize: number;
}

export interface FermentationLog {
  brew: FermentationBrew;
  /**
   * The latest readings (at most READINGS_WINDOW), oldest first; older ones from
   * GET /api/brews/:brewId/fermentation/readings. A mentor's review carries them all.
   */
  readings: FermentationReading[];
  /** How many readings the log has in all. */
  readingCount: number;
  /** The cursor for the readings before `readings`; null when they are all here. */
  olderReadings: string | null;
  /** Every reading, in time order, as the chart draws it. */
  series: FermentationPoint[];
  verdict: FermentationVerdict | null;
  temperature: TemperatureSummary;
  progress: FermentationProgress;
  packaging: PackagingRecord | null;
  /** The owner's reminder setting (null for a club reader). */
  remindersEnabled: boolean | null;
  reminders: ScheduledReminder[];
  /** The server's clock, so "day N" on the page matches the verdict. */
  now: string;
}

/**
 * The answer to a new reading: the reading and the parts of the log it changes (verdict,
 * temperature summary, progress, reminders), never the whole readings list.
 */
export interface FermentationReadingCreated {
  reading: FermentationReading;
  /** The same reading was already saved (a retry after a lost answer). */
  duplicate: boolean;
  /** How many readings the log has now. */
  readingCount: number;
  verdict: FermentationVerdict | null;
  temperature: TemperatureSummary;
  progress: FermentationProgress;
  reminders: ScheduledReminder[];
  now: string;
}

/** The answer to a deleted reading: what it changed, so the page drops it from what it has instead of reloading the log. */
export interface FermentationReadingDeleted {
  readingId: number;
  readingCount: number;
  verdict: FermentationVerdict | null;
  temperature: TemperatureSummary;
  progress: FermentationProgress;
  now: string;
}

export interface CsvRowError {
  /** Spreadsheet row number: the header is row 1. */
  row: number;
  field: CsvField | null;
  message: string;
}

export interface CsvPreviewRow {
  row: number;
  cells: string[];
  reading: {
    takenAt: string;
    kind: FermentationReadingKind;
    method: FermentationMethod;
    value: number;
    unit: string;
    instrument: string | null;
    corrected: number | null;
    duplicate: boolean;
  } | null;
  error: string | null;
}

export interface CsvPreview {
  delimiter: string;
  header: string[] | null;
  columnCount: number;
  rowCount: number;
  mapping: CsvMapping;
  /** The mapping was guessed from the header (the client may change it). */
  suggested: boolean;
  rows: CsvPreviewRow[];
  errors: CsvRowError[];
  errorCount: number;
  /** Rows that are already in the log (or twice in the file): they will be skipped. */
  duplicateCount: number;
  newCount: number;
  /** Why the mapping cannot be used yet, per field (e.g. `columns.value`); null when it can. */
  mappingErrors: Record<string, string> | null;
}

export interface CsvImportResult {
  added: number;
  skipped: number;
  log: FermentationLog;
}
