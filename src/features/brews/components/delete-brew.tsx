import { Trash2 } from 'lucide-react';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useDeleteBrew } from '../api/delete-brew';

/** Deleting a brew day takes its readings, photos, decisions and notes with it: ask twice. */
export function DeleteBrew({ brewId, onDeleted }: { brewId: number; onDeleted: () => void }) {
  const remove = useDeleteBrew();
  const [confirming, setConfirming] = useState(false);
  return (
    <div className="space-y-2">
      {confirming ? (
        <>
          <Notice tone="caution">This deletes every reading, photo, decision and note of this brew day. It cannot be undone.</Notice>
          <div className="grid grid-cols-2 gap-2">
            <Button variant="danger" busy={remove.isPending} onClick={() => remove.mutate(brewId, { onSuccess: onDeleted })}>
              Delete for good
            </Button>
            <Button variant="secondary" onClick={() => setConfirming(false)}>
              Keep it
            </Button>
          </div>
        </>
      ) : (
        <Button variant="quiet" icon={<Trash2 aria-hidden className="size-5" />} onClick={() => setConfirming(true)}>
          Delete this brew day
        </Button>
      )}
      {remove.error && <Notice tone="error">{remove.error.message}</Notice>}
    </div>
  );
}
