import { ArrowDown, ArrowUp, Search, Users } from 'lucide-react';
import { useEffect, useId, useState } from 'react';
import { Link } from 'react-router';
import type { ListRecipesQuery, RecipeListItem, RecipeScope, RecipeSort } from '@shared/schemas/recipes';
import { Button } from '@/components/ui/button';
import { ShowMore } from '@/components/ui/show-more';
import { Figure } from '@/components/ui/figure';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/page';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { Select } from '@/components/ui/select-field';
import { useUnits } from '@/lib/units';
import { useRecipePages } from '../api/list-recipes';

export const RECIPES_PAGE_SIZE = 20;

const sortLabels: Record<RecipeSort, string> = {
  updated: 'Last changed',
  name: 'Name',
  style: 'Style',
  og: 'Target OG',
  abv: 'ABV',
};

const scopeLabels: Record<RecipeScope, string> = { all: 'All', mine: 'Mine', shared: 'Shared with me' };

/** Newest first for dates, A→Z and weakest first for the rest. */
const defaultDir = (sort: RecipeSort) => (sort === 'updated' ? 'desc' : 'asc');

interface RecipeListProps {
  query: ListRecipesQuery;
  onQueryChange: (next: ListRecipesQuery) => void;
}

/** Search, sort and paging all happen on the server; the query lives in the page's URL; "Show more" adds the next page below. */
export function RecipeList({ query, onQueryChange }: RecipeListProps) {
  const sort = query.sort ?? 'updated';
  const dir = query.dir ?? defaultDir(sort);
  const { data, isPending, isError, error, isPlaceholderData, refetch, hasNextPage, fetchNextPage, isFetchingNextPage } = useRecipePages({
    ...query,
    pageSize: RECIPES_PAGE_SIZE,
  });
  const items = data?.pages.flatMap((p) => p.items) ?? [];
  const set = (patch: ListRecipesQuery) => onQueryChange({ ...query, ...patch });

  function sortBy(next: RecipeSort) {
    if (next === sort) set({ sort: next, dir: dir === 'asc' ? 'desc' : 'asc' });
    else set({ sort: next, dir: undefined });
  }

  return (
    <div className="space-y-4">
      <Toolbar query={query} sort={sort} dir={dir} onChange={set} />
      {isPending ? (
        <Loading label="Loading recipes…" />
      ) : isError ? (
        <Notice tone="error" title="Could not load recipes">
          <p>{error.message}</p>
          <Button variant="secondary" className="mt-2" onClick={() => void refetch()}>
            Try again
          </Button>
        </Notice>
      ) : items.length === 0 ? (
        <p className="rounded-xl bg-white p-6 text-center text-ink-soft ring-1 ring-cellar-100">
          {query.q ? `No recipes match “${query.q}”.` : query.scope === 'shared' ? 'Nothing is shared with your clubs yet.' : 'No recipes yet. Create one, or import a Wortwise recipe file.'}
        </p>
      ) : (
        <div className={isPlaceholderData ? 'opacity-60 transition-opacity' : ''} aria-busy={isPlaceholderData || undefined}>
          <p className="mb-2 text-sm text-ink-faint" aria-live="polite">
            {hasNextPage ? `The first ${items.length} recipes; more below.` : items.length === 1 ? '1 recipe' : `${items.length} recipes`}
          </p>
          <RecipeCards items={items} />
          <RecipeTable items={items} sort={sort} dir={dir} onSort={sortBy} />
        </div>
      )}
      <ShowMore pages={{ hasNextPage, isFetchingNextPage, fetchNextPage }} label="Show more recipes" hidden={isPlaceholderData} />
    </div>
  );
}

function Toolbar({ query, sort, dir, onChange }: { query: ListRecipesQuery; sort: RecipeSort; dir: 'asc' | 'desc'; onChange: (patch: ListRecipesQuery) => void }) {
  const [text, setText] = useState(query.q ?? '');
  const searchId = useId();
  // Ask the server once typing pauses, not on every key.
  useEffect(() => {
    const next = text.trim() || undefined;
    if (next === (query.q ?? undefined)) return;
    const timer = setTimeout(() => onChange({ q: next }), 300);
    return () => clearTimeout(timer);
  }, [text, query.q, onChange]);

  return (
    <div className="flex flex-col gap-3 sm:flex-row sm:flex-wrap sm:items-end">
      <div className="min-w-0 flex-1">
        <label htmlFor={searchId} className="mb-1 block text-sm font-semibold text-ink-soft">
          Search recipes
        </label>
        <div className="relative">
          <Search aria-hidden className="pointer-events-none absolute left-3 top-1/2 size-5 -translate-y-1/2 text-ink-faint" />
          <input
            id={searchId}
            type="search"
            value={text}
            onChange={(e) => setText(e.target.value)}
            placeholder="Name or style"
            className="block min-h-touch w-full rounded-lg border border-cellar-300 bg-white py-2 pl-10 pr-3 text-base"
          />
        </div>
      </div>
      <SegmentedControl
        label="Whose recipes"
        fill
        value={query.scope ?? 'all'}
        options={(Object.keys(scopeLabels) as RecipeScope[]).map((scope) => [scope, scopeLabels[scope]] as const)}
        onChange={(scope) => onChange({ scope: scope === 'all' ? undefined : scope })}
      />
      <Select
        label="Sort by"
        className="sm:hidden"
        value={`${sort}:${dir}`}
        onChange={(e) => {
          const [s, d] = e.target.value.split(':') as [RecipeSort, 'asc' | 'desc'];
          onChange({ sort: s, dir: d });
        }}
      >
        {(Object.keys(sortLabels) as RecipeSort[]).flatMap((s) =>
          (['asc', 'desc'] as const).map((d) => (
            <option key={`${s}:${d}`} value={`${s}:${d}`}>
              {sortLabels[s]}, {s === 'updated' ? (d === 'desc' ? 'newest first' : 'oldest first') : s === 'name' || s === 'style' ? (d === 'asc' ? 'A to Z' : 'Z to A') : d === 'asc' ? 'lowest first' : 'highest first'}
            </option>
          )),
        )}
      </Select>
    </div>
  );
}

function SharedBadge({ item }: { item: RecipeListItem }) {
  if (item.isOwner && item.sharedWithClubIds.length === 0) return null;
  return (
    <span className="inline-flex items-center gap-1 rounded-full bg-malt-50 px-2 py-0.5 text-xs font-semibold text-malt-700">
      <Users aria-hidden className="size-3.5" />
      {item.isOwner ? 'Shared with club' : `From ${item.ownerName}`}
    </span>
  );
}

/** Phones: one card per recipe, the numbers big enough to read at arm's length. */
function RecipeCards({ items }: { items: RecipeListItem[] }) {
  const units = useUnits();
  return (
    <ul className="space-y-3 sm:hidden">
      {items.map((r) => (
        <li key={r.id}>
          <Link to={`/recipes/${r.id}`} className="block rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100 active:bg-cellar-50">
            <div className="flex flex-wrap items-baseline justify-between gap-x-2">
              <span className="text-lg font-semibold text-cellar-900">{r.name}</span>
              <span className="text-sm text-ink-faint">{r.style}</span>
            </div>
            <dl className="mt-2 grid grid-cols-4 gap-2 text-center">
              <Figure size="sm" label="OG" value={units.format('gravity', r.targetOg)} />
              <Figure size="sm" label="FG" value={units.format('gravity', r.targetFg)} />
              <Figure size="sm" label="ABV" value={`${r.abvPercent.toFixed(1)}\u00a0%`} />
              <Figure size="sm" label="Batch" value={units.format('volume', r.batchVolumeL)} />
            </dl>
            <div className="mt-2">
              <SharedBadge item={r} />
            </div>
          </Link>
        </li>
      ))}
    </ul>
  );
}

/** Desks: a table whose headers sort (on the server). */
function RecipeTable({ items, sort, dir, onSort }: { items: RecipeListItem[]; sort: RecipeSort; dir: 'asc' | 'desc'; onSort: (s: RecipeSort) => void }) {
  const units = useUnits();
  const header = (key: RecipeSort | null, label: string, className = '') => {
    const active = key === sort;
    return (
      <th scope="col" aria-sort={active ? (dir === 'asc' ? 'ascending' : 'descending') : undefined} className={`px-3 py-2 font-semibold ${className}`}>
        {key ? (
          <button type="button" onClick={() => onSort(key)} className="-mx-2 inline-flex min-h-touch min-w-touch items-center gap-1 px-2 hover:text-cellar-900">
            {label}
            {active && (dir === 'asc' ? <ArrowUp aria-hidden className="size-4" /> : <ArrowDown aria-hidden className="size-4" />)}
          </button>
        ) : (
          label
        )}
      </th>
    );
  };
  return (
    <div className="hidden overflow-hidden rounded-xl bg-white shadow-sm ring-1 ring-cellar-100 sm:block">
      <table className="w-full text-left">
        <thead className="bg-cellar-50 text-sm text-ink-soft">
          <tr>
            {header('name', 'Name')}
            {header('style', 'Style')}
            {header(null, 'Batch', 'text-right')}
            {header('og', 'OG', 'text-right')}
            {header(null, 'FG', 'text-right')}
            {header('abv', 'ABV', 'text-right')}
            {header('updated', 'Changed', 'text-right')}
          </tr>
        </thead>
        <tbody className="divide-y divide-cellar-100">
          {items.map((r) => (
            <tr key={r.id} className="hover:bg-cellar-50">
              <td className="px-3 py-2">
                <Link to={`/recipes/${r.id}`} className="inline-flex min-h-touch items-center font-semibold text-cellar-700 underline-offset-2 hover:underline">
                  {r.name}
                </Link>
                <div className="mt-0.5">
                  <SharedBadge item={r} />
                </div>
              </td>
              <td className="px-3 py-2 text-ink-soft">{r.style}</td>
              <td className="px-3 py-2 text-right tabular-nums">{units.format('volume', r.batchVolumeL)}</td>
              <td className="px-3 py-2 text-right tabular-nums">{units.format('gravity', r.targetOg)}</td>
              <td className="px-3 py-2 text-right tabular-nums">{units.format('gravity', r.targetFg)}</td>
              <td className="px-3 py-2 text-right tabular-nums">{r.abvPercent.toFixed(1)}&nbsp;%</td>
              <td className="px-3 py-2 text-right text-sm text-ink-faint">{new Date(r.updatedAt).toLocaleDateString()}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
