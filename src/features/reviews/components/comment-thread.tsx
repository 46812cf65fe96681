import { Trash2 } from 'lucide-react';
import type { BrewComment } from '@shared/schemas/comments';
import { Notice } from '@/components/ui/notice';
import { useDeleteComment } from '../api/delete-comment';

export function commentTime(iso: string): string {
  return new Date(iso).toLocaleString([], { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });
}

/** Comments in the order they were written. Only a comment's author sees its delete button; nobody edits. */
export function CommentThread({ brewId, comments }: { brewId: number; comments: readonly BrewComment[] }) {
  const remove = useDeleteComment(brewId);
  if (comments.length === 0) return null;
  return (
    <div className="space-y-2">
      <ul className="space-y-2" aria-label="Comments">
        {comments.map((c) => (
          <li key={c.id} id={`comment-${c.id}`} data-testid="comment" className={`rounded-lg px-3 py-2 ring-1 ${c.author.role === 'mentor' ? 'bg-cellar-50 ring-cellar-100' : 'bg-white ring-malt-100'}`}>
            <div className="flex items-start justify-between gap-2">
              <p className="min-w-0 text-sm">
                <strong className="text-cellar-900">{c.author.name}</strong>{' '}
                <span className="text-ink-faint">
                  · {c.author.role === 'mentor' ? 'mentor' : 'brewer'} · <time dateTime={c.createdAt}>{commentTime(c.createdAt)}</time>
                </span>
              </p>
              {c.canDelete && (
                <button
                  type="button"
                  aria-label="Delete my comment"
                  disabled={remove.isPending}
                  className="no-print -my-2 -mr-2 flex min-h-touch min-w-touch shrink-0 items-center justify-center rounded-lg text-alert-700 hover:bg-alert-50"
                  onClick={() => {
                    if (window.confirm('Delete this comment? It cannot be brought back.')) remove.mutate(c.id);
                  }}
                >
                  <Trash2 aria-hidden className="size-5" />
                </button>
              )}
            </div>
            {c.target.missing && <p className="text-sm text-ink-faint">About {c.target.label.toLowerCase()}</p>}
            <p className="mt-1 whitespace-pre-line break-words">{c.body}</p>
          </li>
        ))}
      </ul>
      {remove.error && <Notice tone="error">{remove.error.message}</Notice>}
    </div>
  );
}
