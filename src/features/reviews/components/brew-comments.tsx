import { MessageSquareReply } from 'lucide-react';
import { useEffect, useState } from 'react';
import type { BrewComment, CommentTargetInput } from '@shared/schemas/comments';
import { Button } from '@/components/ui/button';
import { Loading } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import { useComments } from '../api/list-comments';
import { CommentForm } from './comment-form';
import { CommentThread, commentTime } from './comment-thread';

interface Group {
  key: string;
  target: CommentTargetInput | null;
  label: string;
  at: string | null;
  missing: boolean;
  comments: BrewComment[];
}

function groupsOf(comments: readonly BrewComment[]): Group[] {
  const groups = new Map<string, Group>();
  for (const c of comments) {
    const key = `${c.target.kind}-${c.target.id ?? 'all'}`;
    let g = groups.get(key);
    if (!g) {
      const target: CommentTargetInput | null = c.target.kind === 'brew' || c.target.id === null ? null : { kind: c.target.kind, id: c.target.id };
      g = { key, target, label: c.target.label, at: c.target.at, missing: c.target.missing, comments: [] };
      groups.set(key, g);
    }
    g.comments.push(c);
  }
  return [...groups.values()];
}

function ReplyBox({ brewId, group }: { brewId: number; group: Group }) {
  const [open, setOpen] = useState(false);
  if (group.missing) return null;
  return open ? (
    <CommentForm brewId={brewId} target={group.target} label="Your reply" submitLabel="Post reply" autoFocus onPosted={() => setOpen(false)} onCancel={() => setOpen(false)} />
  ) : (
    <Button variant="secondary" icon={<MessageSquareReply aria-hidden className="size-5" />} onClick={() => setOpen(true)} aria-label={`Reply about ${group.label.toLowerCase()}`}>
      Reply
    </Button>
  );
}

/**
 * A club mentor's comments on the brewer's own log, grouped by what they are about, with a reply
 * box under each. `canComment` is the brew day's own permission (the brewer, or a mentor).
 */
export function BrewComments({ brewId, canComment }: { brewId: number; canComment: boolean }) {
  const { data: comments, isPending, error } = useComments(brewId);
  // The brewer's e-mail links to #comments; the section only exists once the comments are loaded.
  useEffect(() => {
    if (comments && window.location.hash === '#comments') document.getElementById('comments')?.scrollIntoView();
  }, [comments]);
  if (isPending) return <Loading label="Loading comments…" />;
  if (error) return <Notice tone="error">{error.message}</Notice>;
  const groups = groupsOf(comments);
  return (
    <section id="comments" aria-labelledby="comments-heading" className="space-y-3">
      <h2 id="comments-heading" className="text-xl font-bold text-cellar-900">
        Mentor comments
      </h2>
      {groups.length === 0 ? (
        <p className="text-ink-soft">No comments yet. Share the brew day with your club and its mentors can comment here.</p>
      ) : (
        <ul className="space-y-4">
          {groups.map((g) => (
            <li key={g.key} className="space-y-2 rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100">
              <p className="font-bold text-cellar-900">
                {g.label}
                {g.at && <span className="font-normal text-ink-faint"> · {commentTime(g.at)}</span>}
              </p>
              <CommentThread brewId={brewId} comments={g.comments} />
              {canComment && (
                <div className="no-print">
                  <ReplyBox brewId={brewId} group={g} />
                </div>
              )}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
