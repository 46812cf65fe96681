import type { ScheduledReminder } from '@shared/schemas/fermentation';
import { Notice } from '@/components/ui/notice';
import { useUpdateReminderSetting } from '../api/reminder-setting';
import { shortDate } from './words';

const kindWords = { 'first-fg-check': 'First final-gravity check', recheck: 'Read again after a moving reading' } as const;

/** E-mail reminders: on by default; one switch for all of the brewer's brews. */
export function RemindersToggle({ enabled, reminders }: { enabled: boolean; reminders: ScheduledReminder[] }) {
  const update = useUpdateReminderSetting();
  const upcoming = reminders.filter((r) => r.sentAt === null);
  return (
    <div className="space-y-2">
      <label className="flex min-h-touch cursor-pointer items-center gap-3 text-base">
        <input
          type="checkbox"
          className="size-6 accent-cellar-700"
          checked={update.isPending ? Boolean(update.variables?.remindersEnabled) : enabled}
          onChange={(e) => update.mutate({ remindersEnabled: e.target.checked })}
        />
        E-mail me when a gravity reading is due
      </label>
      <p className="text-sm text-ink-soft">On day 12 for the first final-gravity check, and two days after a reading that was still moving. The switch applies to all your brews.</p>
      {enabled && upcoming.length > 0 && (
        <ul className="text-sm">
          {upcoming.map((r) => (
            <li key={`${r.kind}-${r.dueAt}`}>
              {kindWords[r.kind]}: {shortDate(r.dueAt)}
            </li>
          ))}
        </ul>
      )}
      {update.error && <Notice tone="error">{update.error.message}</Notice>}
    </div>
  );
}
