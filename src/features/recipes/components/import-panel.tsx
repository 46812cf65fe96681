import { Upload } from 'lucide-react';
import { useId, useRef, useState } from 'react';
import type { RecipeImportResult } from '@shared/schemas/recipes';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useImportRecipe } from '../api/import-recipe';

const fieldLabels: Record<string, string> = {
  name: 'name',
  style: 'style',
  notes: 'notes',
  batchVolumeL: 'batch volume',
  preBoilVolumeL: 'pre-boil volume',
  postBoilVolumeL: 'post-boil volume',
  boilMinutes: 'boil length',
  boilOffLPerHour: 'boil-off rate',
  efficiency: 'brewhouse efficiency',
  targetOg: 'target OG',
  targetFg: 'target FG',
  mashPhTarget: 'mash pH target',
  fermentationTempMinC: 'lowest fermentation temperature',
  fermentationTempMaxC: 'highest fermentation temperature',
  amountKg: 'amount',
  amountG: 'amount',
  potentialPointsLPerKg: 'potential',
  minutes: 'minutes',
  alphaAcidPercent: 'alpha acid',
  tempC: 'temperature',
  kind: 'kind',
  amount: 'amount',
  fermentables: 'fermentables',
  hops: 'hops',
  mashSteps: 'mash steps',
  yeast: 'yeast',
};
const listLabels: Record<string, string> = { fermentables: 'Fermentable', hops: 'Hop', mashSteps: 'Mash step', yeast: 'Yeast' };

/** "recipe.fermentables.0.amountKg" → "Fermentable 1: amount (recipe.fermentables.0.amountKg)". */
export function describeFilePath(path: string) {
  const parts = path.split('.');
  if (parts[0] === 'recipe') parts.shift();
  let words: string;
  if (parts.length >= 2 && listLabels[parts[0]]) {
    const index = /^\d+$/.test(parts[1]) ? ` ${Number(parts[1]) + 1}` : '';
    const rest = index ? parts.slice(2) : parts.slice(1);
    words = `${listLabels[parts[0]]}${index}${rest.length ? `: ${rest.map((p) => fieldLabels[p] ?? p).join(' ')}` : ''}`;
  } else {
    const label = parts.map((p) => fieldLabels[p] ?? p).join(' ');
    words = label.charAt(0).toUpperCase() + label.slice(1);
  }
  return `${words} (${path})`;
}

/** Upload one of our recipe files: either it is saved whole, or nothing is and every problem is listed. */
export function ImportPanel({ onImported }: { onImported: (result: RecipeImportResult) => void }) {
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const importRecipe = useImportRecipe();
  const error = importRecipe.error;
  const problems = error instanceof ApiError ? Object.entries(error.fields) : [];

  return (
    <form
      className="space-y-3"
      onSubmit={(e) => {
        e.preventDefault();
        if (file) importRecipe.mutate(file, { onSuccess: onImported });
      }}
    >
      <div>
        <label htmlFor={inputId} className="mb-1 block font-semibold text-cellar-900">
          Wortwise recipe file (.json)
        </label>
        <input
          ref={input}
          id={inputId}
          type="file"
          accept=".json,application/json"
          onChange={(e) => {
            importRecipe.reset();
            setFile(e.target.files?.[0] ?? null);
          }}
          className="block min-h-touch w-full text-base file:mr-3 file:min-h-touch file:rounded-lg file:border-0 file:bg-cellar-50 file:px-4 file:font-semibold file:text-cellar-700"
        />
        <p className="mt-1 text-sm text-ink-faint">A file exported from Wortwise (format described in our recipe file guide). Nothing is saved unless the whole file is valid.</p>
      </div>
      {error && (
        <Notice tone="error" title={error.message}>
          {problems.length > 0 && (
            <ul className="mt-1 list-disc space-y-1 pl-5">
              {problems.map(([path, message]) => (
                <li key={path}>
                  <strong>{describeFilePath(path)}</strong>: {message}
                </li>
              ))}
            </ul>
          )}
        </Notice>
      )}
      <Button type="submit" variant="secondary" busy={importRecipe.isPending} disabled={!file} icon={<Upload aria-hidden className="size-5" />}>
        Import recipe
      </Button>
    </form>
  );
}
