import { getIn, useFormikContext } from 'formik';
import { Trash2 } from 'lucide-react';
import { useId, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/page';
import type { RecipeFormValues } from './form-values';

/** One card of the recipe form: a group named by its heading. */
export function Section({ title, children, description }: { title: string; children: ReactNode; description?: ReactNode }) {
  const id = useId();
  return (
    <Card>
      <div role="group" aria-labelledby={id}>
        <h2 id={id} className="text-lg font-semibold text-cellar-900">
          {title}
        </h2>
        {description && <p className="mt-1 text-sm text-ink-soft">{description}</p>}
        <div className="mt-4">{children}</div>
      </div>
    </Card>
  );
}

/** The error of a whole list (fermentables, hops, mash steps), once the brewer has been there or tried to save. */
export function RowError({ name }: { name: string }) {
  const { errors, touched, submitCount } = useFormikContext<RecipeFormValues>();
  const error = getIn(errors, name);
  if (typeof error !== 'string' || (!getIn(touched, name) && submitCount === 0)) return null;
  return (
    <p role="alert" className="mt-2 text-sm font-semibold text-alert-700">
      {error}
    </p>
  );
}

/** Removes one row of a list; says "Remove" in words on a phone. */
export function RemoveButton({ label, onClick }: { label: string; onClick: () => void }) {
  return (
    <Button variant="quiet" aria-label={label} title={label} onClick={onClick} className="self-end text-alert-700">
      <Trash2 aria-hidden className="size-5" />
      <span className="sm:hidden">Remove</span>
    </Button>
  );
}
