import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { NetworkError } from '@/lib/api-client';
import { NotSaved } from './not-saved';

interface DecisionExtrasProps {
  /** The check can run: there is something to attach a decision to. */
  ready: boolean;
  /** Saves the brewer's own action with the current check. */
  onOwnAction: (description: string) => Promise<unknown>;
}

/**
 * Above the late-boil options: why, saved with whichever option is chosen. It comes before the
 * "Choose this" buttons, so it can be written before the choice is saved.
 */
export function DecisionReason({ initial, onReasonChange }: { initial: string; onReasonChange: (text: string) => void }) {
  const reasonId = useId();
  const [reason, setReason] = useState(initial);
  return (
    <div className="rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100">
      <label htmlFor={reasonId} className="mb-1 block text-sm font-semibold text-ink-soft">
        Why (optional): saved with the option you choose
      </label>
      <textarea
        id={reasonId}
        rows={2}
        value={reason}
        onChange={(e) => {
          setReason(e.target.value);
          onReasonChange(e.target.value);
        }}
        className="block w-full rounded-lg border border-cellar-300 bg-white px-3 py-2 text-base"
      />
    </div>
  );
}

/** Below the late-boil options: an action of the brewer's own instead of any of them. */
export function DecisionExtras({ ready, onOwnAction }: DecisionExtrasProps) {
  const ownId = useId();
  const [own, setOwn] = useState('');
  const [state, setState] = useState<'idle' | 'saving' | 'saved' | 'offline'>('idle');
  const [problem, setProblem] = useState<string | null>(null);

  async function saveOwn() {
    setProblem(null);
    if (own.trim() === '') {
      setProblem('Say what you did instead.');
      return;
    }
    setState('saving');
    try {
      await onOwnAction(own.trim());
      setState('saved');
      setOwn('');
    } catch (error) {
      if (error instanceof NetworkError) setState('offline');
      else {
        setState('idle');
        setProblem((error as Error).message);
      }
    }
  }

  if (!ready) return null;
  return (
    <div className="space-y-3 rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100">
      <details>
        <summary className="flex min-h-touch cursor-pointer items-center font-semibold text-cellar-700">Did something else?</summary>
        <div className="mt-2 space-y-2">
          <label htmlFor={ownId} className="block text-sm font-semibold text-ink-soft">
            What you did instead
          </label>
          <textarea
            id={ownId}
            rows={2}
            value={own}
            onChange={(e) => setOwn(e.target.value)}
            aria-invalid={Boolean(problem) || undefined}
            className="block w-full rounded-lg border border-cellar-300 bg-white px-3 py-2 text-base"
          />
          {problem && (
            <p role="alert" className="text-sm font-semibold text-alert-700">
              {problem}
            </p>
          )}
          {state === 'offline' ? (
            <NotSaved onRetry={() => void saveOwn()} />
          ) : (
            <Button variant="secondary" className="w-full" busy={state === 'saving'} onClick={() => void saveOwn()}>
              Save my own action
            </Button>
          )}
          {state === 'saved' && <Notice tone="success">Saved to the brew-day log, with this check.</Notice>}
        </div>
      </details>
    </div>
  );
}
