import { Link } from 'react-router';
import { brewStageLabels, brewStatusLabels, type BrewList as BrewPage } from '@shared/schemas/brews';
import { ShowMore, type NextPages } from '@/components/ui/show-more';
import { useUnits } from '@/lib/units';

interface BrewPages extends NextPages {
  data: { pages: readonly BrewPage[] };
}

/** Brew days, newest first, a page at a time: each a big link to its page; "Show more" adds the next page below. */
export function BrewList({ pages, empty }: { pages: BrewPages; empty: string }) {
  const units = useUnits();
  const brews = pages.data.pages.flatMap((p) => p.items);
  if (brews.length === 0) return <p className="text-ink-soft">{empty}</p>;
  return (
    <div className="space-y-2">
      <ul className="space-y-2">
        {brews.map((b) => (
          <li key={b.id}>
            <Link to={`/brews/${b.id}`} className="block min-h-touch rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100 hover:ring-cellar-300">
              <span className="flex flex-wrap items-baseline justify-between gap-2">
                <span className="text-lg font-bold text-cellar-900">{b.name}</span>
                <span className="text-sm text-ink-faint">{b.brewedOn}</span>
              </span>
              <span className="mt-1 block text-sm text-ink-soft">
                {b.isOwner ? '' : `${b.ownerName} · `}
                {b.status === 'brewing' ? `${brewStatusLabels[b.status]}: ${brewStageLabels[b.currentStage].toLowerCase()}` : brewStatusLabels[b.status]} · target OG{' '}
                {units.format('gravity', b.targetOg)}
                {b.og !== null && <> · OG {units.format('gravity', b.og)}</>}
              </span>
            </Link>
          </li>
        ))}
      </ul>
      <ShowMore pages={pages} label="Show more brew days" />
    </div>
  );
}
