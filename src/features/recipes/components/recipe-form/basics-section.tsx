import { TextAreaField } from '@/components/ui/text-area-field';
import { TextField } from '@/components/ui/text-field';
import { Section } from './section';

/** Name, style and notes. */
export function BasicsSection() {
  return (
    <Section title="Recipe">
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField name="name" label="Recipe name" autoComplete="off" />
        <TextField name="style" label="Style" autoComplete="off" hint="Free text, e.g. Pale ale." />
        <div className="sm:col-span-2">
          <TextAreaField name="notes" label="Notes" />
        </div>
      </div>
    </Section>
  );
}
