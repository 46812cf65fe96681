import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useAcceptInvitation, type Accepted } from '../api/accept-invitation';

/** For a signed-in brewer whose address the invitation was sent to. */
export function AcceptButton({ token, clubName, onJoined }: { token: string; clubName: string; onJoined: (accepted: Accepted) => void }) {
  const accept = useAcceptInvitation(token);
  return (
    <div className="space-y-3">
      {accept.error && <Notice tone="error">{accept.error.message}</Notice>}
      <Button className="w-full" busy={accept.isPending} onClick={() => accept.mutate(undefined, { onSuccess: onJoined })}>
        Join {clubName}
      </Button>
    </div>
  );
}
