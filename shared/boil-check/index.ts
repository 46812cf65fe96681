/**
 * The late-boil check (check.ts), its words (words.ts) and a brew day's bitterness and colour per
 * option (balance.ts). Client code that does not need all three imports the file it needs, so the
 * public check's bundle carries no bitterness or colour math.
 */
export * from './check';
export * from './words';
export * from './balance';
