import type { PendingInvitation } from '@shared/schemas/clubs';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/page';
import { useInviteMember } from '../api/invite-member';
import { useInvitations } from '../api/list-invitations';
import { useRevokeInvitation } from '../api/revoke-invitation';
import { formatDay, roleLabels } from './role-words';

export function PendingInvitations({ clubId }: { clubId: number }) {
  const { data, isPending, error } = useInvitations(clubId, true);
  const revoke = useRevokeInvitation(clubId);
  const resend = useInviteMember(clubId);
  if (isPending) return <Loading label="Loading invitations…" />;
  if (error) return <Notice tone="error">{error.message}</Notice>;
  if (data.length === 0) return <p className="text-ink-soft">No invitations waiting for an answer.</p>;
  const actionError = revoke.error ?? resend.error;
  return (
    <div>
      {actionError && (
        <Notice tone="error" className="mb-3">
          {actionError.message}
        </Notice>
      )}
      {resend.data && !resend.data.mailSent && (
        <Notice tone="caution" className="mb-3">
          The invitation to {resend.data.invitation.email} is saved, but the e-mail did not go out. Try again in a little while.
        </Notice>
      )}
      <ul className="divide-y divide-cellar-100">
        {data.map((inv) => (
          <PendingRow
            key={inv.id}
            invitation={inv}
            busy={(revoke.isPending && revoke.variables === inv.id) || (resend.isPending && resend.variables?.email === inv.email)}
            onResend={() => {
              revoke.reset();
              resend.mutate({ email: inv.email, role: inv.role });
            }}
            onRevoke={() => {
              resend.reset();
              revoke.mutate(inv.id);
            }}
          />
        ))}
      </ul>
    </div>
  );
}

function PendingRow({ invitation, busy, onResend, onRevoke }: { invitation: PendingInvitation; busy: boolean; onResend: () => void; onRevoke: () => void }) {
  return (
    <li className="flex flex-wrap items-center gap-x-3 gap-y-2 py-3">
      {/* At least 12rem for the address, so on a phone the buttons wrap below it. */}
      <div className="min-w-48 flex-1">
        <p className="break-all font-semibold text-ink">{invitation.email}</p>
        <p className="text-sm text-ink-soft">
          {roleLabels[invitation.role]}
          {invitation.invitedBy && <> · invited by {invitation.invitedBy}</>} ·{' '}
          {invitation.expired ? <strong className="text-alert-700">expired {formatDay(invitation.expiresAt)}</strong> : <>link valid until {formatDay(invitation.expiresAt)}</>}
        </p>
      </div>
      <div className="flex gap-2">
        <Button variant="secondary" disabled={busy} onClick={onResend} aria-label={`Send the invitation to ${invitation.email} again`}>
          Send again
        </Button>
        <Button variant="quiet" disabled={busy} onClick={onRevoke} aria-label={`Withdraw the invitation to ${invitation.email}`}>
          Withdraw
        </Button>
      </div>
    </li>
  );
}
