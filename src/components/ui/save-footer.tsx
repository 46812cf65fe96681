import type { ReactNode } from 'react';
import { Button } from './button';
import { SaveNotice } from './save-notice';

interface SaveFooterProps {
  /** The last save's SaveFailure (the Formik status), if it failed; what was typed stays in the form. */
  status?: unknown;
  /** Tells the brewer nothing typed was lost. */
  keptNote?: string;
  submitLabel: ReactNode;
  busy: boolean;
  disabled?: boolean;
  onCancel: () => void;
}

/** A form's last lines: why the save failed (nothing typed is lost), then save and cancel. */
export function SaveFooter({ status, keptNote, submitLabel, busy, disabled, onCancel }: SaveFooterProps) {
  return (
    <>
      <SaveNotice failure={status} keptNote={keptNote} />
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
