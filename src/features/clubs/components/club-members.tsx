import { UserMinus } from 'lucide-react';
import { useState } from 'react';
import type { ClubDetail, ClubMember } from '@shared/schemas/clubs';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useRemoveMember } from '../api/remove-member';
import { useSetMemberRole } from '../api/set-member-role';
import { RoleSelect } from './role-select';
import { roleLabels } from './role-words';

/** Who is in the club; organisers change roles and remove members here. */
export function ClubMembers({ club, myUserId }: { club: ClubDetail; myUserId: number }) {
  const setRole = useSetMemberRole(club.id);
  const remove = useRemoveMember(club.id);
  const [confirming, setConfirming] = useState<number | null>(null);
  const error = setRole.error ?? remove.error;
  return (
    <div>
      {error && (
        <Notice tone="error" className="mb-3">
          {error.message}
        </Notice>
      )}
      <ul className="divide-y divide-cellar-100">
        {club.members.map((m) => (
          <li key={m.userId} className="py-3">
            <div className="flex flex-wrap items-center gap-x-3 gap-y-2">
              <MemberName member={m} isMe={m.userId === myUserId} />
              {club.canManage ? (
                <div className="flex w-full items-center gap-2 sm:w-auto">
                  <div className="min-w-0 flex-1 sm:w-40 sm:flex-none">
                    <RoleSelect
                      label={`Role of ${m.displayName}`}
                      value={m.role}
                      disabled={setRole.isPending}
                      onChange={(role) => {
                        remove.reset();
                        setRole.mutate({ userId: m.userId, role });
                      }}
                    />
                  </div>
                  {m.userId !== myUserId && (
                    <Button
                      variant="quiet"
                      icon={<UserMinus aria-hidden className="size-5" />}
                      aria-label={`Remove ${m.displayName}`}
                      onClick={() => setConfirming(m.userId)}
                    />
                  )}
                </div>
              ) : (
                <span className="text-sm font-semibold text-ink-soft">{roleLabels[m.role]}</span>
              )}
            </div>
            {confirming === m.userId && (
              <div className="mt-2 flex flex-wrap items-center gap-2 rounded-lg bg-alert-50 p-2">
                <p className="flex-1 text-sm text-alert-700">
                  Remove {m.displayName} from {club.name}? What they shared with the club stops being visible to it.
                </p>
                <Button
                  variant="danger"
                  busy={remove.isPending}
                  onClick={() => {
                    setRole.reset();
                    remove.mutate(m.userId, { onSuccess: () => setConfirming(null) });
                  }}
                >
                  Remove
                </Button>
                <Button variant="secondary" onClick={() => setConfirming(null)}>
                  Keep
                </Button>
              </div>
            )}
          </li>
        ))}
      </ul>
    </div>
  );
}

function MemberName({ member, isMe }: { member: ClubMember; isMe: boolean }) {
  return (
    <div className="min-w-0 flex-1">
      <p className="truncate font-semibold text-ink">
        {member.displayName}
        {isMe && <span className="font-normal text-ink-faint"> (you)</span>}
      </p>
      {member.email && <p className="break-all text-sm text-ink-soft">{member.email}</p>}
    </div>
  );
}
