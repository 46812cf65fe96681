/**
 * Records how the beer was packaged, and undoes it. Access goes through the brew day: only its
 * owner packages.
 */
import { eq } from 'drizzle-orm';
import { primingSugarG, residualCo2Volumes } from '@shared/brewmath';
import type { PackagingBody } from '@shared/schemas/fermentation';
import type { Actor } from '../auth/permissions';
import { loadBrewForActor } from '../brews/service';
import type { Db } from '../db/client';
import { lockBrewRow } from '../db/locks';
import { brewNotes, brews, packagingRecords } from '../db/schema';
import { isDuplicateKey } from '../lib/db-errors';
import { Conflict, NotFound } from '../lib/errors';
import { checkTakenAt, requirePitched } from './readings';
import { assembleLog } from './service';
import { derivedRows, expectedFgOf, verdictFor } from './verdict';

/**
 * Records how the beer was packaged. Before the verdict is "stable" the brewer must say so
 * explicitly (`override` and a reason); the override is kept with the record and written to the
 * brew day's log, where a club mentor reads it.
 */
export async function recordPackaging(db: Db, actor: Actor, brewId: number, body: PackagingBody, now = new Date()) {
  const stored = await loadBrewForActor(db, actor, brewId, 'update');
  const pitchedAt = requirePitched(stored);
  const packagedAt = body.packagedAt ? new Date(body.packagedAt) : now;
  checkTakenAt(packagedAt, pitchedAt, now, 'packagedAt');
  const rows = await derivedRows(db, brewId);
  const verdict = verdictFor(rows, pitchedAt, now, expectedFgOf(stored))!;
  if (verdict.state === 'stuck' && !body.override) {
    throw new Conflict('The gravity is steady but well above where this recipe should finish: a stuck fermentation can restart in the bottle and burst it.', {
      override: `Stuck, not finished: ${verdict.reason} To package anyway, tick the override and say why.`,
    });
  }
  if (verdict.state !== 'stable' && !body.override) {
    throw new Conflict('The final gravity is not proven stable yet: bottles filled before fermentation ends can burst.', {
      override: `Not stable yet: ${verdict.reason} To package anyway, tick the override and say why.`,
    });
  }
  // The math's parameter names are the form's field names: a BrewMathError is a 400 under them as is.
  const residual = residualCo2Volumes(body.warmestTempC);
  const grams =
    body.sugar === 'none'
      ? null
      : primingSugarG({ volumeL: body.volumeL, warmestTempC: body.warmestTempC, targetCo2Volumes: body.targetCo2Volumes, sugar: body.sugar as 'sucrose' });
  const override = verdict.state !== 'stable' && body.override;
  try {
    await db.transaction(async (tx) => {
      await lockBrewRow(tx, brewId);
      await tx.insert(packagingRecords).values({
        brewId,
        container: body.container,
        volumeL: body.volumeL,
        warmestTempC: body.warmestTempC,
        targetCo2Volumes: body.targetCo2Volumes,
        sugar: body.sugar,
        primingSugarG: grams,
        residualCo2Volumes: residual,
        verdictState: verdict.state,
        verdictReason: verdict.reason,
        override,
        overrideReason: override ? body.overrideReason : '',
        note: body.note,
        packagedAt,
        createdBy: actor.id,
      });
      await tx.update(brews).set({ status: 'packaged', updatedAt: now }).where(eq(brews.id, brewId));
      if (override) {
        await tx.insert(brewNotes).values({
          brewId,
          kind: 'note',
          stage: null,
          body: `Packaged before the final gravity was proven stable (verdict: ${verdict.state}). Reason given: ${body.overrideReason}`,
          details: { source: 'fermentation', packagingOverride: true, verdict: verdict.state, verdictReason: verdict.reason },
          authorId: actor.id,
        });
      }
    });
  } catch (error) {
    if (isDuplicateKey(error)) throw new Conflict('This brew is already packaged. Undo that record first to change it.');
    throw error;
  }
  return assembleLog(db, actor, { ...stored, row: { ...stored.row, status: 'packaged' } }, now);
}

export async function deletePackaging(db: Db, actor: Actor, brewId: number) {
  const stored = await loadBrewForActor(db, actor, brewId, 'update');
  await db.transaction(async (tx) => {
    await lockBrewRow(tx, brewId);
    const deleted = await tx.delete(packagingRecords).where(eq(packagingRecords.brewId, brewId));
    if ((deleted[0] as { affectedRows?: number }).affectedRows === 0) throw new NotFound('This brew has no packaging record.');
    await tx.update(brews).set({ status: 'fermenting', updatedAt: new Date() }).where(eq(brews.id, brewId));
  });
  return assembleLog(db, actor, { ...stored, row: { ...stored.row, status: 'fermenting' } });
}
