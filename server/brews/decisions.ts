/**
 * Late-boil decisions. The brewer sends what they entered in the check and which option they
 * chose; every number stored is recomputed here with runBoilCheck, the same module the form
 * ran, so a decision can be trusted when a mentor reads it days later. A result sent by the
 * client is never read (the schema drops it).
 */
import { eq } from 'drizzle-orm';
import { EXTRACT_NAMES, predictBoilBalance, runBoilCheck } from '@shared/boil-check';
import type { RecipeTargets } from '@shared/schemas/recipes';
import type { BoilCheckParsed } from '@shared/schemas/boil-check';
import type { BrewDecision, DecisionChoice } from '@shared/schemas/brews';
import type { Actor } from '../auth/permissions';
import type { Db } from '../db/client';
import { lockBrewRow } from '../db/locks';
import { brewDecisions } from '../db/schema';
import { mathFields } from '../lib/brewmath-fields';
import { BadRequest } from '../lib/errors';
import { loadBrewForActor, toDecision, touchStage } from './service';

const capitalise = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

function recompute(input: BoilCheckParsed) {
  // The check's inputs sit under "input." in a decision.
  return mathFields(() => runBoilCheck(input), { prefix: 'input.' });
}

/** The option the brewer chose, from the recomputed result; a 400 saying why when it cannot be done. */
function chosenOption(outcome: ReturnType<typeof runBoilCheck>, input: BoilCheckParsed, choice: DecisionChoice) {
  if (choice.kind === 'own') return null;
  const refuse = (field: string, message: string): never => {
    throw new BadRequest(message, { [field]: message });
  };
  if (choice.kind === 'extract' && !(input.extractsOnHand ?? []).includes(choice.extract)) {
    refuse('choice.extract', `${capitalise(EXTRACT_NAMES[choice.extract])} is not among the extracts on hand.`);
  }
  const option = outcome.result.options.find((o) => o.kind === choice.kind && (choice.kind !== 'extract' || (o.kind === 'extract' && o.extract === choice.extract)));
  if (!option) return refuse('choice', 'That option is not part of this check.');
  if (!option.feasible) return refuse('choice', option.reason);
  return option;
}

export async function addDecision(
  db: Db,
  actor: Actor,
  brewId: number,
  body: { input: BoilCheckParsed; choice: DecisionChoice; note: string },
  now = new Date(),
): Promise<BrewDecision> {
  const brew = await loadBrewForActor(db, actor, brewId, 'update');
  const outcome = recompute(body.input);
  const chosen = chosenOption(outcome, body.input, body.choice);
  // Bitterness and colour of each option, from the brew day's own recipe snapshot (never the client's).
  const balance = predictBoilBalance(body.input, outcome, brew.row.targetsSnapshot as RecipeTargets);
  const chosenBalance = chosen && balance ? balance.options[outcome.result.options.indexOf(chosen)] : null;
  const id = await db.transaction(async (tx) => {
    await lockBrewRow(tx, brewId);
    const [{ id }] = await tx
      .insert(brewDecisions)
      .values({ brewId, input: body.input, result: { ...outcome, chosen, balance, chosenBalance }, choice: body.choice, note: body.note, decidedAt: now })
      .$returningId();
    await touchStage(tx, brewId, 'boil', now);
    return id;
  });
  const [row] = await db.select().from(brewDecisions).where(eq(brewDecisions.id, id));
  return toDecision(row);
}
