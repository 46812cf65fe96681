import { Users } from 'lucide-react';
import { useState } from 'react';
import type { Recipe } from '@shared/schemas/recipes';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useUpdateSharing } from '../api/update-sharing';

interface SharingPanelProps {
  recipe: Recipe;
  /** The owner's clubs: a recipe can be shared only with these. */
  clubs: { id: number; name: string }[];
}

/** Private by default; members of a chosen club can view and clone the recipe, never edit it. */
export function SharingPanel({ recipe, clubs }: SharingPanelProps) {
  const [chosen, setChosen] = useState<number[]>(recipe.sharedWithClubIds);
  const update = useUpdateSharing(recipe.id);
  const dirty = [...chosen].sort().join() !== [...recipe.sharedWithClubIds].sort().join();

  if (clubs.length === 0) {
    return <p className="text-ink-soft">This recipe is private. Join a club to share it with its members.</p>;
  }
  return (
    <form
      onSubmit={(e) => {
        e.preventDefault();
        update.mutate({ clubIds: chosen });
      }}
      className="space-y-3"
    >
      <fieldset>
        <legend className="flex items-center gap-2 font-semibold text-cellar-900">
          <Users aria-hidden className="size-5" /> Share with your clubs
        </legend>
        <p className="mt-1 text-sm text-ink-soft">Members can view and clone it; only you can edit it. Leave all unticked to keep it private.</p>
        <div className="mt-2 space-y-1">
          {clubs.map((club) => (
            <label key={club.id} className="flex min-h-touch cursor-pointer items-center gap-3 rounded-lg px-2 hover:bg-cellar-50">
              <input
                type="checkbox"
                className="size-5 accent-cellar-700"
                checked={chosen.includes(club.id)}
                onChange={(e) => setChosen((c) => (e.target.checked ? [...c, club.id] : c.filter((id) => id !== club.id)))}
              />
              {club.name}
            </label>
          ))}
        </div>
      </fieldset>
      {update.isError && <Notice tone="error">{update.error.message}</Notice>}
      {update.isSuccess && !dirty && <Notice tone="success">{chosen.length === 0 ? 'The recipe is private.' : 'Sharing saved.'}</Notice>}
      <Button type="submit" variant="secondary" busy={update.isPending} disabled={!dirty}>
        Save sharing
      </Button>
    </form>
  );
}
