import type { ReactNode } from 'react';
import { Button } from './button';
import { Notice } from './notice';

interface SaveFooterProps {
  /** The error from the last save, if it failed; what was typed stays in the form. */
  status?: string | null;
  /** Tells the brewer nothing typed was lost. */
  keptNote?: string;
  submitLabel: ReactNode;
  busy: boolean;
  disabled?: boolean;
  onCancel: () => void;
}

/** A form's last lines: why the save failed (nothing typed is lost), then save and cancel. */
export function SaveFooter({ status, keptNote = 'What you entered is still here: try again.', submitLabel, busy, disabled, onCancel }: SaveFooterProps) {
  return (
    <>
      {status && (
        <Notice tone="error" title="Not saved">
          {status} {keptNote}
        </Notice>
      )}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={busy} disabled={disabled}>
          {submitLabel}
        </Button>
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </>
  );
}
