import { QuantityField } from '@/components/ui/quantity-field';
import { TextField } from '@/components/ui/text-field';
import { Section } from './section';

/** The yeast and the temperature range the fermentation is checked against. */
export function FermentationSection() {
  return (
    <Section title="Yeast and fermentation">
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField name="yeast.name" label="Yeast" autoComplete="off" />
        <TextField name="yeast.amount" label="How much yeast" autoComplete="off" hint="e.g. 1 sachet, rehydrated." />
        <QuantityField name="fermentationTempMinC" kind="temperature" label="Lowest fermentation temperature" />
        <QuantityField name="fermentationTempMaxC" kind="temperature" label="Highest fermentation temperature" />
      </div>
    </Section>
  );
}
