import { MessageSquarePlus } from 'lucide-react';
import { useState } from 'react';
import type { BrewComment, CommentTargetInput } from '@shared/schemas/comments';
import { Button } from '@/components/ui/button';
import { CommentForm } from './comment-form';
import { CommentThread } from './comment-thread';

/**
 * The comments under one reading or decision, and a "Comment" button that opens a box for it.
 * `what` names the target for the button's accessible name, e.g. "the late-boil decision".
 */
export function TargetComments({
  brewId,
  target,
  comments,
  canComment,
  what,
}: {
  brewId: number;
  target: CommentTargetInput & { id: number };
  comments: readonly BrewComment[];
  canComment: boolean;
  what: string;
}) {
  const [open, setOpen] = useState(false);
  const mine = comments.filter((c) => c.target.kind === target.kind && c.target.id === target.id);
  if (mine.length === 0 && !canComment) return null;
  return (
    <div className="no-print mt-2 space-y-2">
      <CommentThread brewId={brewId} comments={mine} />
      {canComment &&
        (open ? (
          <CommentForm brewId={brewId} target={target} label={`Your comment on ${what}`} autoFocus onPosted={() => setOpen(false)} onCancel={() => setOpen(false)} />
        ) : (
          <Button variant="quiet" className="-ml-4" icon={<MessageSquarePlus aria-hidden className="size-5" />} onClick={() => setOpen(true)} aria-label={`Comment on ${what}`}>
            Comment
          </Button>
        ))}
    </div>
  );
}
