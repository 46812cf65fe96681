import { LogOut } from 'lucide-react';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useLeaveClub } from '../api/leave-club';

export function LeaveClub({ clubId, clubName, onLeft }: { clubId: number; clubName: string; onLeft: () => void }) {
  const leave = useLeaveClub(clubId);
  const [confirming, setConfirming] = useState(false);
  return (
    <div className="space-y-3">
      {leave.error && <Notice tone="error">{leave.error.message}</Notice>}
      {confirming ? (
        <div className="flex flex-wrap items-center gap-2">
          <p className="w-full text-ink-soft">Leave {clubName}? What you shared with the club stops being visible to it. An organiser can invite you back.</p>
          <Button variant="danger" busy={leave.isPending} onClick={() => leave.mutate(undefined, { onSuccess: onLeft })}>
            Leave the club
          </Button>
          <Button variant="secondary" onClick={() => setConfirming(false)}>
            Stay
          </Button>
        </div>
      ) : (
        <Button variant="secondary" icon={<LogOut aria-hidden className="size-5" />} onClick={() => setConfirming(true)}>
          Leave {clubName}
        </Button>
      )}
    </div>
  );
}
