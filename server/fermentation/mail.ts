/**
 * The reminder e-mails, in the one mail layout (server/mail/templates.ts): a link to the brew's
 * fermentation page and the short bottle caution.
 */
import { renderMail, type MailContent } from '../mail/templates';
import { DAY_MS } from '@shared/dates';

export const BOTTLE_CAUTION =
  'Bottles filled before fermentation has ended can burst. Package only when two hydrometer readings at least two days apart agree, use bottles made for carbonated drinks, and store them where a burst can hurt no one.';

const day = (date: Date) => date.toLocaleDateString('en-GB', { weekday: 'long', day: 'numeric', month: 'long', timeZone: 'UTC' });

export function reminderMail(input: {
  kind: 'first-fg-check' | 'recheck';
  brewerName: string;
  brewName: string;
  pitchedAt: Date;
  dueAt: Date;
  url: string;
}): MailContent {
  const dayNumber = Math.round((input.dueAt.getTime() - input.pitchedAt.getTime()) / DAY_MS);
  const subject =
    input.kind === 'first-fg-check' ? `Day ${dayNumber}: time to check the gravity of ${input.brewName}` : `Read the gravity of ${input.brewName} again`;
  const paragraphs =
    input.kind === 'first-fg-check'
      ? [
          `Hello ${input.brewerName},`,
          `${input.brewName} was pitched ${dayNumber} days ago. Today (${day(input.dueAt)}) is a good day for the first final-gravity check: take a hydrometer reading and log it.`,
          'Time alone proves nothing: the beer is finished when a second reading, two or more days later, gives the same gravity.',
        ]
      : [
          `Hello ${input.brewerName},`,
          `Two days ago the gravity of ${input.brewName} was still moving. Take another hydrometer reading today (${day(input.dueAt)}) and log it, to see whether it has settled.`,
        ];
  return renderMail(subject, {
    paragraphs,
    action: { label: 'Open the fermentation log', url: input.url },
    after: [BOTTLE_CAUTION, 'You get these reminders because they are on for your account. Switch them off on the fermentation page.'],
  });
}
