import type { QueryClient } from '@tanstack/react-query';
import { Plus } from 'lucide-react';
import { useState } from 'react';
import { useNavigate } from 'react-router';
import { clubsQueryOptions, useClubs } from '@/features/clubs/api/list-clubs';
import { ClubList } from '@/features/clubs/components/club-list';
import { CreateClubForm } from '@/features/clubs/components/create-club-form';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Card, Loading, PageHeader } from '@/components/ui/page';

export const loader = (queryClient: QueryClient) => () => queryClient.prefetchQuery(clubsQueryOptions());

export function Component() {
  const { data: clubs, error, isPending, refetch, isRefetching } = useClubs();
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  return (
    <>
      <PageHeader
        title="Clubs"
        subtitle="Share a brew day or a recipe with your club, and a mentor can look it over and comment."
        actions={
          !creating && (
            <Button icon={<Plus aria-hidden className="size-5" />} onClick={() => setCreating(true)}>
              Start a club
            </Button>
          )
        }
      />
      {creating && (
        <Card className="mb-6">
          <h2 className="mb-3 text-lg font-semibold text-cellar-900">Start a club</h2>
          <p className="mb-4 text-ink-soft">You will be its organiser: you invite members by e-mail and name mentors.</p>
          <CreateClubForm onCreated={(club) => navigate(`/clubs/${club.id}`)} />
          <Button variant="quiet" className="mt-2" onClick={() => setCreating(false)}>
            Cancel
          </Button>
        </Card>
      )}
      {isPending ? (
        <Loading label="Loading your clubs…" />
      ) : error ? (
        <Notice tone="error" title="Could not load your clubs">
          {error.message}{' '}
          <Button variant="quiet" busy={isRefetching} onClick={() => refetch()}>
            Try again
          </Button>
        </Notice>
      ) : clubs.length === 0 ? (
        <Card>
          <p className="text-ink-soft">You are not in a club yet. An organiser can invite you by e-mail, or start a club of your own.</p>
        </Card>
      ) : (
        <ClubList clubs={clubs} />
      )}
    </>
  );
}
