import type { QueryClient } from '@tanstack/react-query';
import { queueQueryOptions, useQueue } from '@/features/reviews/api/get-queue';
import { ReviewQueue } from '@/features/reviews/components/review-queue';
import { useMe } from '@/lib/auth';
import { Loading, PageHeader } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';

export function loader(queryClient: QueryClient) {
  return async () => {
    void queryClient.prefetchQuery(queueQueryOptions());
    return null;
  };
}

export function Component() {
  const { data: me } = useMe();
  const queue = useQueue();
  const mentorOf = (me?.clubs ?? []).filter((c) => c.role === 'mentor');
  return (
    <>
      <PageHeader
        title="Reviews"
        subtitle="Brew days shared with clubs where you are a mentor, waiting for a mentor’s first comment. Newest share first."
      />
      {queue.isPending ? (
        <Loading label="Loading the brew days waiting for you…" />
      ) : queue.error ? (
        <Notice tone="error">{queue.error.message}</Notice>
      ) : queue.data.length > 0 ? (
        <ReviewQueue items={queue.data} />
      ) : mentorOf.length === 0 ? (
        <Notice title="You are not a mentor in any club">
          A club’s organiser names its mentors. Mentors read the brew days members share with the club, see where each left its targets, and
          comment. Your own shared brew days show their mentors’ comments on their log.
        </Notice>
      ) : (
        <Notice tone="success" title="Nothing waiting">
          Every brew day shared with {mentorOf.map((c) => c.name).join(', ')} has a mentor’s comment. New ones appear here as members share them.
        </Notice>
      )}
    </>
  );
}
