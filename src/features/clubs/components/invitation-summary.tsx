import type { InvitationPreview } from '@shared/schemas/clubs';
import { formatDay, roleHints, roleLabels } from './role-words';

export function InvitationSummary({ invitation }: { invitation: InvitationPreview }) {
  return (
    <div className="space-y-1">
      <p className="text-ink">
        {invitation.inviterName ?? 'An organiser'} invites <strong>{invitation.email}</strong> to join as{' '}
        <strong>{roleLabels[invitation.role].toLowerCase()}</strong>: {roleHints[invitation.role]}.
      </p>
      <p className="text-sm text-ink-faint">The link works once, until {formatDay(invitation.expiresAt)}.</p>
    </div>
  );
}
