import type { QueryClient } from '@tanstack/react-query';
import { queueQueryOptions, useQueue } from '@/features/reviews/api/get-queue';
import { reviewedQueryOptions, useReviewed } from '@/features/reviews/api/get-reviewed';
import { ReviewQueue } from '@/features/reviews/components/review-queue';
import { useMe } from '@/lib/auth';
import { Loading, PageHeader } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';

export function loader(queryClient: QueryClient) {
  return async () => {
    void queryClient.prefetchInfiniteQuery(queueQueryOptions());
    void queryClient.prefetchInfiniteQuery(reviewedQueryOptions());
    return null;
  };
}

/** Brew days a mentor of your clubs has commented on: they left the queue and are found again here. */
function ReviewedSection() {
  const reviewed = useReviewed();
  if (reviewed.isPending) return <Loading label="Loading the brew days already reviewed…" />;
  if (reviewed.error) return <Notice tone="error">{reviewed.error.message}</Notice>;
  return (
    <section aria-labelledby="reviewed-heading" className="mt-8">
      <h2 id="reviewed-heading" className="mb-1 text-lg font-bold text-cellar-900">
        Reviewed
      </h2>
      <p className="mb-3 text-sm text-ink-soft">Brew days a mentor of your club has already commented on, latest comment first.</p>
      {reviewed.data.pages[0].items.length > 0 ? (
        <ReviewQueue pages={reviewed} label="Reviewed" />
      ) : (
        <p className="text-ink-soft">None yet: a brew day moves here once a mentor comments on it.</p>
      )}
    </section>
  );
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
      ) : queue.data.pages[0].items.length > 0 ? (
        <ReviewQueue pages={queue} />
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
      {mentorOf.length > 0 && <ReviewedSection />}
    </>
  );
}
