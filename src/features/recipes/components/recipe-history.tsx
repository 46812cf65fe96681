import { useState } from 'react';
import { Link } from 'react-router';
import { diffRecipes, type RecipeChange } from '@shared/recipe-history';
import { Card } from '@/components/ui/page';
import { Select } from '@/components/ui/select-field';
import { useRecipeVersion } from '../api/get-recipe-version';
import { useRecipeVersions } from '../api/recipe-versions';

const labels: Record<string, string> = {
  name: 'Name',
  style: 'Style',
  notes: 'Notes',
  batchVolumeL: 'Batch volume (L)',
  preBoilVolumeL: 'Pre-boil volume (L)',
  postBoilVolumeL: 'Post-boil volume (L)',
  boilMinutes: 'Boil length (min)',
  boilOffLPerHour: 'Boil-off (L/h)',
  efficiency: 'Brewhouse efficiency (fraction)',
  targetOg: 'Target OG',
  targetFg: 'Target FG',
  targetIbu: 'Target bitterness (IBU)',
  targetColourSrm: 'Target colour (SRM)',
  souringTargetPh: 'Souring target pH',
  mashPhTarget: 'Mash pH target',
  fermentationTempMinC: 'Lowest fermentation temperature (°C)',
  fermentationTempMaxC: 'Highest fermentation temperature (°C)',
  'yeast.name': 'Yeast',
  'yeast.amount': 'Yeast amount',
};
const rowNames: Record<string, string> = { fermentables: 'Fermentable', hops: 'Hop', mashSteps: 'Mash step' };

/** "hops.1.amountG" → "Hop 2: amountG"; values as stored (SI). */
function describePath(path: string) {
  if (labels[path]) return labels[path];
  const [list, index, field] = path.split('.');
  const row = `${rowNames[list] ?? list} ${Number(index) + 1}`;
  return field ? `${row}: ${field}` : row;
}

function show(value: unknown): string {
  if (value === null || value === undefined || value === '') return '—';
  if (typeof value === 'object') {
    const v = value as Record<string, unknown>;
    return typeof v.name === 'string' ? v.name : JSON.stringify(value);
  }
  return String(value);
}

/** Every saved version of the recipe, and what changed between any two of them. */
export function RecipeHistory({ recipeId, currentVersion }: { recipeId: number; currentVersion: number }) {
  const versions = useRecipeVersions(recipeId);
  const [from, setFrom] = useState<number | null>(null);
  const [to, setTo] = useState<number | null>(null);
  const list = versions.data ?? [];
  const toVersion = to ?? list[0]?.version ?? null;
  const fromVersion = from ?? list[1]?.version ?? null;
  const a = useRecipeVersion(recipeId, fromVersion);
  const b = useRecipeVersion(recipeId, toVersion);
  const changes: RecipeChange[] | null = a.data && b.data ? diffRecipes(a.data.data, b.data.data) : null;

  return (
    <Card>
      <h2 className="text-lg font-semibold text-cellar-900">History</h2>
      {versions.isPending && <p className="mt-2 text-ink-soft">Loading the versions…</p>}
      {versions.isError && <p className="mt-2 text-alert-700">Could not load the versions: {versions.error.message}</p>}
      <ol className="mt-2 space-y-1 text-sm">
        {list.map((v) => (
          <li key={v.version}>
            <Link className="inline-flex min-h-touch items-center font-semibold text-cellar-700 underline" to={v.version === currentVersion ? `/recipes/${recipeId}` : `/recipes/${recipeId}?version=${v.version}`}>
              Version {v.version}
            </Link>{' '}
            <span className="text-ink-soft">
              saved {new Date(v.savedAt).toLocaleString()}
              {v.savedByName ? ` by ${v.savedByName}` : ''}
              {v.version === currentVersion ? ' (current)' : ''}
            </span>
          </li>
        ))}
      </ol>
      {list.length > 1 && (
        <div className="mt-4">
          <h3 className="text-sm font-semibold uppercase tracking-wide text-ink-faint">What changed</h3>
          <div className="mt-2 flex flex-wrap gap-3">
            <VersionSelect label="From version" versions={list} value={fromVersion} onChange={setFrom} />
            <VersionSelect label="To version" versions={list} value={toVersion} onChange={setTo} />
          </div>
          {(a.isError || b.isError) && <p className="mt-2 text-sm text-ink-soft">One of these versions was saved before history was kept.</p>}
          {changes && changes.length === 0 && <p className="mt-2 text-sm text-ink-soft">No differences.</p>}
          {changes && changes.length > 0 && (
            <table className="mt-2 w-full text-left text-sm">
              <caption className="sr-only">
                Changes from version {fromVersion} to version {toVersion}
              </caption>
              <thead>
                <tr>
                  <th scope="col" className="py-1 pr-2">
                    What
                  </th>
                  <th scope="col" className="py-1 pr-2">
                    Version {fromVersion}
                  </th>
                  <th scope="col" className="py-1">
                    Version {toVersion}
                  </th>
                </tr>
              </thead>
              <tbody>
                {changes.map((c) => (
                  <tr key={c.path} className="border-t border-cellar-100">
                    <th scope="row" className="py-1 pr-2 font-normal">
                      {describePath(c.path)}
                      {c.kind !== 'changed' && <span className="text-ink-faint"> ({c.kind})</span>}
                    </th>
                    <td className="py-1 pr-2 tabular-nums">{show(c.before)}</td>
                    <td className="py-1 tabular-nums">{show(c.after)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
        </div>
      )}
    </Card>
  );
}

/** One end of the comparison: a labelled choice among the saved versions. */
function VersionSelect({ label, versions, value, onChange }: { label: string; versions: readonly { version: number }[]; value: number | null | undefined; onChange: (version: number) => void }) {
  return (
    <Select label={label} value={value ?? ''} onChange={(e) => onChange(Number(e.target.value))}>
      {versions.map((v) => (
        <option key={v.version} value={v.version}>
          {v.version}
        </option>
      ))}
    </Select>
  );
}
