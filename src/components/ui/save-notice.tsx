import { RotateCcw } from 'lucide-react';
import type { ReactNode } from 'react';
import { saveFailureOf } from '@/lib/save-failure';
import { Button } from './button';
import { Notice } from './notice';

interface SaveNoticeProps {
  /** A SaveFailure (usually the Formik `status`); nothing is shown without one. */
  failure: unknown;
  /** Offered when the server could not be reached: what was typed is sent again. */
  onRetry?: () => void;
  busy?: boolean;
  /** Said after a refusal's message; the default tells the brewer nothing typed is lost. */
  keptNote?: string;
  conflictTitle?: string;
  /** What the brewer can do about a conflict (load the latest, save as new). */
  conflictActions?: ReactNode;
  className?: string;
}

/** The one way a form says its save failed: offline, conflict or refused, and what was typed is kept. */
export function SaveNotice({ failure, onRetry, busy, keptNote = 'What you entered is still here: try again.', conflictTitle = 'Not saved: this changed elsewhere', conflictActions, className = '' }: SaveNoticeProps) {
  const f = saveFailureOf(failure);
  if (!f) return null;
  if (f.kind === 'offline') {
    return (
      <Notice tone="error" title="Not saved — no connection" className={className}>
        <p>{f.message}</p>
        {onRetry && (
          <Button variant="secondary" className="mt-2" busy={busy} icon={<RotateCcw aria-hidden className="size-5" />} onClick={onRetry}>
            Retry
          </Button>
        )}
      </Notice>
    );
  }
  if (f.kind === 'conflict') {
    return (
      <Notice tone="caution" title={conflictTitle} className={className}>
        <p>{f.message}</p>
        {conflictActions && <div className="mt-2 flex flex-wrap gap-2">{conflictActions}</div>}
      </Notice>
    );
  }
  return (
    <Notice tone="error" title="Not saved" className={className}>
      <p>{f.message}</p>
      {keptNote && <p>{keptNote}</p>}
    </Notice>
  );
}
