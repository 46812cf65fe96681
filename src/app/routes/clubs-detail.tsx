import type { QueryClient } from '@tanstack/react-query';
import { ArrowLeft, Pencil } from 'lucide-react';
import { useState } from 'react';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { clubQueryOptions, useClub } from '@/features/clubs/api/get-club';
import { ClubDetailsForm } from '@/features/clubs/components/club-details-form';
import { ClubMembers } from '@/features/clubs/components/club-members';
import { InviteForm } from '@/features/clubs/components/invite-form';
import { LeaveClub } from '@/features/clubs/components/leave-club';
import { PendingInvitations } from '@/features/clubs/components/pending-invitations';
import { roleWithArticle } from '@/features/clubs/components/role-words';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Card, Loading, PageHeader } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { useMe } from '@/lib/auth';
import { Component as NotFound } from './not-found';

const clubId = (params: Record<string, string | undefined>) => Number(params.id);

export const loader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    Number.isInteger(clubId(params)) ? queryClient.prefetchQuery(clubQueryOptions(clubId(params))) : null;

export function Component() {
  const id = clubId(useParams());
  const { data: me } = useMe();
  const { data: club, error, isPending, refetch, isRefetching } = useClub(id);
  const navigate = useNavigate();
  const [editing, setEditing] = useState(false);

  if (!Number.isInteger(id) || (error instanceof ApiError && (error.status === 404 || error.status === 400))) return <NotFound />;
  if (isPending || !me) return <Loading label="Loading the club…" />;
  if (error) {
    return (
      <Notice tone="error" title="Could not load the club">
        {error.message}{' '}
        <Button variant="quiet" busy={isRefetching} onClick={() => refetch()}>
          Try again
        </Button>
      </Notice>
    );
  }

  return (
    <>
      <Link to="/clubs" className="mb-2 inline-flex min-h-touch items-center gap-1 font-semibold text-cellar-700">
        <ArrowLeft aria-hidden className="size-4" /> All clubs
      </Link>
      {editing ? (
        <Card className="mb-6">
          <ClubDetailsForm club={club} onDone={() => setEditing(false)} />
        </Card>
      ) : (
        <PageHeader
          title={club.name}
          subtitle={
            <>
              {club.description && <span className="block whitespace-pre-line">{club.description}</span>}
              <span className="block text-sm text-ink-faint">{club.myRole ? `You are ${roleWithArticle[club.myRole]} here.` : 'You are viewing as site admin.'}</span>
            </>
          }
          actions={
            club.canManage && (
              <Button variant="secondary" icon={<Pencil aria-hidden className="size-4" />} onClick={() => setEditing(true)}>
                Edit details
              </Button>
            )
          }
        />
      )}

      <div className="grid grid-cols-1 gap-4 lg:grid-cols-2">
        <Card>
          <h2 className="mb-2 text-lg font-semibold text-cellar-900">
            Members <span className="font-normal text-ink-faint">({club.members.length})</span>
          </h2>
          <ClubMembers club={club} myUserId={me.id} />
        </Card>
        {club.canManage && (
          <div className="space-y-4">
            <Card>
              <h2 className="mb-3 text-lg font-semibold text-cellar-900">Invite someone</h2>
              <InviteForm clubId={club.id} />
            </Card>
            <Card>
              <h2 className="mb-2 text-lg font-semibold text-cellar-900">Waiting for an answer</h2>
              <PendingInvitations clubId={club.id} />
            </Card>
          </div>
        )}
      </div>

      {club.myRole && (
        <Card className="mt-4">
          <h2 className="mb-3 text-lg font-semibold text-cellar-900">Leave the club</h2>
          <LeaveClub clubId={club.id} clubName={club.name} onLeft={() => navigate('/clubs', { replace: true })} />
        </Card>
      )}
    </>
  );
}
