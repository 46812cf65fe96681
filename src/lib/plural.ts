const rules = new Intl.PluralRules('en');

/** "1 reading", "2 readings", "0 readings": the count and the right form of the noun. */
export function countOf(count: number, one: string, other = `${one}s`): string {
  return `${count} ${rules.select(count) === 'one' ? one : other}`;
}
