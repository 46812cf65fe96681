import { useState } from 'react';
import type { BrewDetail } from '@shared/schemas/brews';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useMe } from '@/lib/auth';
import { useUpdateBrewSharing } from '../api/update-sharing';

/** Share the brew day with clubs the brewer belongs to: their members read it, mentors comment. */
export function BrewSharingPanel({ brew }: { brew: BrewDetail }) {
  const { data: me } = useMe();
  const update = useUpdateBrewSharing(brew.id);
  const [chosen, setChosen] = useState<number[]>(brew.sharedWithClubIds);
  const [saved, setSaved] = useState(false);
  const clubs = me?.clubs ?? [];
  if (clubs.length === 0) return <p className="text-ink-soft">Join a club to share your brew day with its mentors.</p>;
  const toggle = (id: number) => {
    setSaved(false);
    setChosen((c) => (c.includes(id) ? c.filter((x) => x !== id) : [...c, id]));
  };
  return (
    <div className="space-y-2">
      <fieldset>
        <legend className="mb-1 font-semibold text-cellar-900">Share with</legend>
        {clubs.map((c) => (
          <label key={c.id} className="flex min-h-touch items-center gap-3">
            <input type="checkbox" className="size-6 accent-cellar-700" checked={chosen.includes(c.id)} onChange={() => toggle(c.id)} />
            <span>{c.name}</span>
          </label>
        ))}
      </fieldset>
      <p className="text-sm text-ink-soft">Members of these clubs can read this brew day; their mentors can comment. Only you can change it.</p>
      <Button
        variant="secondary"
        busy={update.isPending}
        onClick={() => update.mutate({ clubIds: chosen }, { onSuccess: () => setSaved(true) })}
      >
        Save sharing
      </Button>
      {saved && <Notice tone="success">{chosen.length === 0 ? 'Private: only you can see it.' : 'Shared.'}</Notice>}
      {update.error && <Notice tone="error">{update.error.message}</Notice>}
    </div>
  );
}
