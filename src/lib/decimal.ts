/**
 * A number as a brewer types it: surrounding spaces ignored and a decimal comma read as a point
 * ("1,048" is 1.048, as much of Europe writes it). Empty text is `undefined`; text that is not a
 * number is `NaN`, so a schema says "… must be a number" rather than "Enter …".
 */
export function parseDecimal(text: string): number | undefined {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '') return undefined;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : Number.NaN;
}
