/** Brew days: what the API answers (the requests and the vocabulary are in inputs.ts). */
import type { InstrumentSnapshot } from '../instruments';
import type { EquipmentProfile } from '../equipment';
import type { RecipeTargets } from '../recipes';
import type { BrewStage, BrewStatus, DecisionChoice, PhotoMime, ReadingKind, ReadingQuantity, ReadingRaw } from './inputs';

export interface ReadingPhoto {
  id: number;
  readingId: number;
  mime: PhotoMime;
  sizeBytes: number;
  sha256: string;
  createdAt: string;
  /** Where the image is served, to those who may read the brew day. */
  url: string;
}

// ---------------------------------------------------------------------------------------------
// Responses

/** A correction as an instrument applied it (see shared/instruments). */
export interface ReadingCorrection {
  [key: string]: unknown;
}

export interface BrewReading {
  id: number;
  brewId: number;
  stage: BrewStage;
  kind: ReadingKind;
  quantity: ReadingQuantity;
  instrumentId: number | null;
  /** The instrument as it was calibrated when the reading was taken. */
  instrument: InstrumentSnapshot | null;
  raw: ReadingRaw;
  /** Corrected gravity (SG), temperature (°C) or pH. */
  corrected: number;
  correction: ReadingCorrection | null;
  warnings: string[];
  /** The kettle or fermenter volume taken with the reading, litres. */
  volumeL: number | null;
  takenAt: string;
  note: string;
  /** Set when the brewer re-applied a newer calibration on purpose. */
  recomputedAt: string | null;
  recomputedFrom: { corrected: number; instrument: InstrumentSnapshot | null; correction: ReadingCorrection | null } | null;
  photos: ReadingPhoto[];
}

export interface BrewStageState {
  stage: BrewStage;
  startedAt: string | null;
  completedAt: string | null;
  skippedAt: string | null;
}

export interface BrewDecision {
  id: number;
  brewId: number;
  /** What the brewer entered, as validated: the late-boil check's input. */
  input: Record<string, unknown>;
  /** The check recomputed on the server from `input`. */
  result: Record<string, unknown>;
  choice: DecisionChoice;
  /** The option chosen, from `result` (null for the brewer's own action). */
  chosen: (Record<string, unknown> & { kind: string }) | null;
  note: string;
  decidedAt: string;
}

export type BrewNoteKind = 'note' | 'recompute';

export interface BrewNote {
  id: number;
  brewId: number;
  kind: BrewNoteKind;
  stage: BrewStage | null;
  body: string;
  /** For a recompute: the reading and its old and new values. */
  details: Record<string, unknown> | null;
  authorId: number | null;
  createdAt: string;
}

export interface BrewSummary {
  id: number;
  name: string;
  status: BrewStatus;
  brewedOn: string;
  recipeId: number | null;
  recipeName: string;
  ownerId: number;
  ownerName: string;
  isOwner: boolean;
  currentStage: BrewStage;
  targetOg: number;
  /** The latest OG reading, corrected; null until one is taken. */
  og: number | null;
  pitchedAt: string | null;
  sharedWithClubIds: number[];
  createdAt: string;
  updatedAt: string;
}

export type DeviationCode =
  | 'mash-ph-low'
  | 'mash-ph-high'
  | 'mash-temp'
  | 'og-low'
  | 'og-high'
  | 'volume-low'
  | 'volume-high'
  | 'pitch-too-warm'
  | 'accepted-off-target'
  | 'bitterness-low'
  | 'bitterness-high'
  | 'colour-lighter'
  | 'colour-darker'
  | 'instrument-uncalibrated'
  | 'instrument-overdue';

export interface BrewDeviation {
  code: DeviationCode;
  stage: BrewStage;
  readingId: number | null;
  decisionId: number | null;
  /** SI: °C, SG, pH or litres, per `quantity`. */
  expected: number | null;
  actual: number | null;
  quantity: 'temperature' | 'gravity' | 'ph' | 'volume' | 'ibu' | 'colour' | null;
  /** For instrument deviations. */
  instrumentName: string | null;
  /** A plain sentence in metric units and SG; the client words it in the brewer's units. */
  message: string;
}

export interface BrewDetail extends BrewSummary {
  targets: RecipeTargets;
  equipment: EquipmentProfile;
  /** The boil-off rate for today: the equipment profile's, unless the brewer changed it. */
  boilOffLPerHour: number;
  notes: string;
  stages: BrewStageState[];
  /** The latest readings (at most READINGS_WINDOW), oldest first; older ones from GET /api/brews/:id/readings. */
  readings: BrewReading[];
  /** How many readings the brew day has in all. */
  readingCount: number;
  /** The cursor for the readings before `readings`; null when they are all here. */
  olderReadings: string | null;
  /** Litres measured with the latest OG reading that has a volume: the wort into the fermenter. */
  fermenterVolumeL: number | null;
  decisions: BrewDecision[];
  log: BrewNote[];
  /** Judged on the server from every reading, not only those sent. */
  deviations: BrewDeviation[];
  permissions: { edit: boolean; share: boolean; delete: boolean; comment: boolean };
}

/** One page of brew days, newest first; no total is counted. */
export interface BrewList {
  items: BrewSummary[];
  /** Null on the last page. */
  nextCursor: string | null;
  pageSize: number;
}

/** One page of older readings, oldest first. */
export interface BrewReadingPage {
  items: BrewReading[];
  /** The cursor for the readings before these; null at the first reading. */
  nextCursor: string | null;
  pageSize: number;
}

/** What a new reading changed on its brew day: the client updates its copy from this instead of reloading the whole day. */
export interface BrewDayChange {
  og: number | null;
  fermenterVolumeL: number | null;
  readingCount: number;
  pitchedAt: string | null;
  currentStage: BrewStage;
  updatedAt: string;
  stages: BrewStageState[];
  deviations: BrewDeviation[];
}

/** POST /api/brews/:id/readings answers the reading and what it changed. */
export interface ReadingCreated extends BrewReading {
  brewDay: BrewDayChange;
}

/** The answer to a deleted brew-day reading: what that changed, so the page drops the reading instead of reloading the day. */
export interface ReadingDeleted {
  readingId: number;
  brewDay: BrewDayChange;
}

export interface BrewSharing {
  brewId: number;
  clubIds: number[];
}
