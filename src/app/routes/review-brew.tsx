import type { QueryClient } from '@tanstack/react-query';
import { ArrowLeft, Eye } from 'lucide-react';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { brewStatusLabels, readingKindInSentence } from '@shared/schemas/brews';
import type { BrewReview, CommentTargetInput } from '@shared/schemas/comments';
import { timelineEntries } from '@/features/brews/components/brew-log';
import { reviewQueryOptions, useReview } from '@/features/reviews/api/get-review';
import { CommentForm } from '@/features/reviews/components/comment-form';
import { CommentThread } from '@/features/reviews/components/comment-thread';
import { fermentationEntries, type ReviewEntry } from '@/features/reviews/components/fermentation-entries';
import { ReviewDeviations } from '@/features/reviews/components/review-deviations';
import { TargetComments } from '@/features/reviews/components/target-comments';
import { ButtonLink } from '@/components/ui/button-link';
import { Card, Loading, PageHeader } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useUnits, type Units } from '@/lib/units';

export function loader(queryClient: QueryClient) {
  return async ({ params }: LoaderFunctionArgs) => {
    const id = Number(params.brewId);
    if (Number.isInteger(id) && id > 0) void queryClient.prefetchQuery(reviewQueryOptions(id));
    return null;
  };
}

const verdictWords = {
  'no-reading': 'No reading yet',
  'too-early': 'Too early to tell',
  moving: 'Still moving',
  stuck: 'Steady, but well above the recipe FG',
  stable: 'Stable',
} as const;

const clock = (iso: string) => new Date(iso).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' });

/** What a timeline entry may be commented on as, from the keys the brew-day log and the fermentation entries give it. */
function targetOf(key: string, review: BrewReview): { target: CommentTargetInput & { id: number }; what: string } | null {
  const [prefix, raw] = [key.slice(0, 2), Number(key.slice(2))];
  if (prefix === 'r-') {
    const r = review.brew.readings.find((x) => x.id === raw);
    return r ? { target: { kind: 'reading', id: r.id }, what: `the ${readingKindInSentence(r.kind)} reading at ${clock(r.takenAt)}` } : null;
  }
  if (prefix === 'd-') {
    const d = review.brew.decisions.find((x) => x.id === raw);
    return d ? { target: { kind: 'decision', id: d.id }, what: `the late-boil decision at ${clock(d.decidedAt)}` } : null;
  }
  if (prefix === 'f-') {
    const f = review.fermentation.readings.find((x) => x.id === raw);
    return f ? { target: { kind: 'fermentation_reading', id: f.id }, what: `the fermentation ${f.kind} reading of day ${Math.max(0, f.day).toFixed(1)}` } : null;
  }
  return null;
}

function Timeline({ review, units }: { review: BrewReview; units: Units }) {
  const entries: ReviewEntry[] = [...timelineEntries(review.brew, units), ...fermentationEntries(review, units)].sort(
    (a, b) => Date.parse(a.at) - Date.parse(b.at) || a.rank - b.rank || a.key.localeCompare(b.key),
  );
  if (entries.length === 0) return <p className="text-ink-soft">Nothing logged yet.</p>;
  return (
    <ol className="space-y-4" aria-label="Timeline">
      {entries.map((e) => {
        const commentable = targetOf(e.key, review);
        const d = new Date(e.at);
        return (
          <li key={e.key} id={`entry-${e.key}`} className="grid scroll-mt-4 grid-cols-[4rem_minmax(0,1fr)] gap-2 sm:grid-cols-[5rem_minmax(0,1fr)] sm:gap-3">
            <time dateTime={e.at} className="pt-1 text-sm leading-tight tabular-nums text-ink-faint">
              {d.toLocaleDateString([], { day: 'numeric', month: 'short' })}
              <br />
              {clock(e.at)}
            </time>
            <div className="min-w-0 border-l-2 border-cellar-100 pl-3">
              {e.node}
              {commentable && (
                <TargetComments brewId={review.brew.id} target={commentable.target} what={commentable.what} comments={review.comments} canComment={review.permissions.comment} />
              )}
            </div>
          </li>
        );
      })}
    </ol>
  );
}

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <div className="min-w-0">
      <p className="text-sm text-ink-faint">{label}</p>
      <p className="font-bold tabular-nums">{value}</p>
    </div>
  );
}

export function Component() {
  const brewId = Number(useParams().brewId);
  const units = useUnits();
  const { data: review, isPending, error } = useReview(brewId);
  if (isPending) return <Loading label="Loading the brew day…" />;
  if (error || !review) {
    const gone = error instanceof ApiError && error.status === 404;
    return (
      <div className="space-y-4">
        <PageHeader title={gone ? 'Not shared with you' : 'Could not load the review'} />
        <Notice tone={gone ? 'info' : 'error'}>
          {gone ? 'This brew day is not shared with a club of yours, or is no longer: its brewer may have stopped sharing it.' : error?.message}
        </Notice>
        <ButtonLink to="/reviews" variant="secondary">
          <ArrowLeft aria-hidden className="size-5" /> Back to reviews
        </ButtonLink>
      </div>
    );
  }
  const { brew } = review;
  const t = brew.targets;
  const fermenterVolume = brew.readings.filter((r) => r.kind === 'og' && r.volumeL !== null).at(-1)?.volumeL ?? null;
  const onDay = review.comments.filter((c) => c.target.kind === 'brew' || c.target.missing);
  return (
    <>
      <PageHeader
        title={brew.name}
        subtitle={
          <>
            {brew.isOwner ? 'Your brew day' : `Brewed by ${brew.ownerName}`} on {brew.brewedOn} · {brew.recipeName}
          </>
        }
        actions={
          <ButtonLink to="/reviews" variant="secondary">
            <ArrowLeft aria-hidden className="size-5" /> Reviews
          </ButtonLink>
        }
      />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <aside className="space-y-6 lg:sticky lg:top-4 lg:col-start-2 lg:row-start-1 lg:self-start" aria-label="Summary">
          <section aria-labelledby="review-deviations-heading" className="space-y-2">
            <h2 id="review-deviations-heading" className="text-xl font-bold text-cellar-900">
              Where it left its targets
            </h2>
            <ReviewDeviations deviations={review.deviations} units={units} pitchedAt={brew.pitchedAt} />
          </section>
          <section aria-label="Targets and results" className="grid grid-cols-2 gap-3 rounded-xl bg-white p-4 ring-1 ring-cellar-100">
            <Fact label="Target OG" value={units.format('gravity', t.targetOg)} />
            <Fact label="OG" value={units.format('gravity', brew.og)} />
            <Fact label="Target volume" value={units.format('volume', t.batchVolumeL)} />
            <Fact label="Into the fermenter" value={fermenterVolume === null ? 'not measured' : units.format('volume', fermenterVolume)} />
            <Fact label="Fermentation range" value={`${units.format('temperature', t.fermentationTempMinC)}–${units.format('temperature', t.fermentationTempMaxC)}`} />
            <Fact label="Status" value={brewStatusLabels[brew.status]} />
            <Fact label="Final gravity" value={review.fermentation.verdict ? verdictWords[review.fermentation.verdict.state] : 'Not pitched yet'} />
          </section>
        </aside>

        <div className="min-w-0 space-y-6 lg:col-start-1 lg:row-start-1">
          {review.permissions.comment && !brew.isOwner ? (
            <Notice title="You are reviewing as a mentor">
              Comment on a reading or decision with its Comment button, or on the whole brew day at the bottom. {brew.ownerName} gets an e-mail; only they can change
              the brew day itself.
            </Notice>
          ) : (
            !brew.isOwner && (
              <Notice>
                <Eye aria-hidden className="mr-1 inline size-4" /> You can read this brew day; the club’s mentors comment on it.
              </Notice>
            )
          )}
          <section aria-labelledby="review-timeline-heading" className="space-y-3">
            <h2 id="review-timeline-heading" className="text-xl font-bold text-cellar-900">
              Timeline
            </h2>
            <Timeline review={review} units={units} />
          </section>
          {brew.notes && (
            <section aria-labelledby="review-notes-heading" className="space-y-1">
              <h2 id="review-notes-heading" className="text-xl font-bold text-cellar-900">
                The brewer’s notes
              </h2>
              <p className="whitespace-pre-line">{brew.notes}</p>
            </section>
          )}
          <Card>
            <h2 id="day-comments" className="mb-3 text-xl font-bold text-cellar-900">
              On the brew day as a whole
            </h2>
            <div className="space-y-3">
              {onDay.length === 0 && !review.permissions.comment && <p className="text-ink-soft">No comments yet.</p>}
              <CommentThread brewId={brew.id} comments={onDay} />
              {review.permissions.comment && <CommentForm brewId={brew.id} target={null} label="Your comment on the brew day" />}
            </div>
          </Card>
        </div>
      </div>
    </>
  );
}
