/**
 * What a brew day's fermentation readings decide: the final-gravity verdict, the temperature
 * summary against the recipe's range and the progress figures. Shared by the log, a new reading,
 * packaging and the CSV import.
 */
import { sql, asc, eq } from 'drizzle-orm';
import { expectedFinalGravity } from '@shared/brewmath';
import { fermentationProgress, fermentationVerdict, temperatureSummary } from '@shared/fermentation';
import { EXCURSIONS_LISTED, type FermentationBrew, type FermentationVerdict, type TemperatureSummary } from '@shared/schemas/fermentation';
import type { InstrumentSnapshot } from '@shared/schemas/instruments';
import type { RecipeTargets } from '@shared/schemas/recipes';
import type { StoredBrew } from '../brews/service';
import type { DbOrTx } from '../db/client';
import { prepared } from '../db/prepared';
import { fermentationReadings, type FermentationReadingRow } from '../db/schema';

const iso = (d: Date) => d.toISOString();

export function targetsOf(stored: StoredBrew): Partial<RecipeTargets> {
  return stored.row.targetsSnapshot ?? {};
}

/** Where the recipe should finish, from the targets the brew day started with. */
export function expectedFgOf(stored: StoredBrew): number | null {
  const t = targetsOf(stored);
  return expectedFinalGravity({ fgSg: typeof t.targetFg === 'number' ? t.targetFg : null });
}

/** The columns the verdict and the temperature summary read: a write asks for these, not whole rows. */
export type DerivedRow = Pick<FermentationReadingRow, 'id' | 'kind' | 'takenAt' | 'correctedValue' | 'estimate'> &
  (Pick<FermentationReadingRow, 'instrumentSnapshot'> | { resolutionSg: number | null });

function resolutionOf(row: DerivedRow): number | null {
  if ('resolutionSg' in row) return row.resolutionSg;
  const snapshot = row.instrumentSnapshot as InstrumentSnapshot | null;
  return snapshot?.kind === 'hydrometer' ? (snapshot.resolutionSg ?? null) : null;
}

export function verdictFor(rows: readonly DerivedRow[], pitchedAt: Date | null, now: Date, expectedFgSg: number | null = null): FermentationVerdict | null {
  if (!pitchedAt) return null;
  const gravity = rows
    .filter((r) => r.kind === 'gravity')
    .map((r) => ({ takenAt: r.takenAt, sg: r.correctedValue, estimate: r.estimate, resolutionSg: resolutionOf(r) }));
  return fermentationVerdict(gravity, pitchedAt, now, { expectedFgSg });
}

/** derivedRows' statement, built once per database handle (server/db/prepared.ts). */
const derivedRowsOfBrew = (db: DbOrTx) =>
  db
    .select({
      id: fermentationReadings.id,
      kind: fermentationReadings.kind,
      takenAt: fermentationReadings.takenAt,
      correctedValue: fermentationReadings.correctedValue,
      estimate: fermentationReadings.estimate,
      // The one figure the verdict reads from the snapshot, and only for gravity readings: a
      // temperature logger's thousands of snapshots are never parsed.
      resolutionSg: sql<number | null>`CASE WHEN ${fermentationReadings.kind} = 'gravity' THEN CAST(JSON_VALUE(${fermentationReadings.instrumentSnapshot}, '$.resolutionSg') AS DOUBLE) END`,
    })
    .from(fermentationReadings)
    .where(eq(fermentationReadings.brewId, sql.placeholder('brewId')))
    .orderBy(asc(fermentationReadings.takenAt), asc(fermentationReadings.id));

export async function derivedRows(db: DbOrTx, brewId: number): Promise<DerivedRow[]> {
  return prepared(db, derivedRowsOfBrew).execute({ brewId });
}

export function rangeOf(brew: FermentationBrew): { minC: number; maxC: number } | null {
  return brew.fermentationTempMinC !== null && brew.fermentationTempMaxC !== null ? { minC: brew.fermentationTempMinC, maxC: brew.fermentationTempMaxC } : null;
}

export function temperatureOf(rows: readonly Pick<DerivedRow, 'id' | 'kind' | 'takenAt' | 'correctedValue'>[], range: { minC: number; maxC: number } | null, now: Date) {
  const temps = rows.filter((r) => r.kind === 'temperature').map((r) => ({ id: r.id, takenAt: r.takenAt, tempC: r.correctedValue }));
  return temperatureSummary(temps, range, now);
}

/** A logger left in a warm room can put thousands of readings out of range: the answer lists the latest few and counts them all. */
function listedOnly(summary: TemperatureSummary): TemperatureSummary {
  return summary.excursions.length <= EXCURSIONS_LISTED ? summary : { ...summary, excursions: summary.excursions.slice(-EXCURSIONS_LISTED) };
}

/** What the readings decide: the verdict, the temperature summary and the progress figures. */
export function derivedParts(stored: StoredBrew, brew: FermentationBrew, og: number | null, rows: readonly DerivedRow[], now: Date) {
  let latest: DerivedRow | null = null;
  for (const r of rows) if (r.kind === 'gravity') latest = r;
  return {
    verdict: verdictFor(rows, stored.row.pitchedAt, now, expectedFgOf(stored)),
    temperature: listedOnly(temperatureOf(rows, rangeOf(brew), now)),
    progress: fermentationProgress({
      og,
      targetOg: brew.targetOg,
      targetFg: brew.targetFg,
      current: latest ? { sg: latest.correctedValue, estimate: latest.estimate, takenAt: iso(latest.takenAt) } : null,
    }),
  };
}
