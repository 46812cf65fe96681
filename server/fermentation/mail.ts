/**
 * The reminder e-mails: plain text first (what previews and tests read), a small HTML copy with
 * the same words, a link to the brew's fermentation page and the short bottle caution.
 */
import { escapeHtml, type MailContent } from '../mail/templates';

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
  const dayNumber = Math.round((input.dueAt.getTime() - input.pitchedAt.getTime()) / 86_400_000);
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
  const action = { label: 'Open the fermentation log', url: input.url };
  const after = [BOTTLE_CAUTION, 'You get these reminders because they are on for your account. Switch them off on the fermentation page.'];
  const text = [...paragraphs, `${action.label}:\n${action.url}`, ...after, '— Wortwise'].join('\n\n');
  const p = (s: string, small = false) => `<p style="margin:0 0 16px${small ? ';font-size:14px;color:#4a5753' : ''}">${escapeHtml(s)}</p>`;
  const html = [
    '<!doctype html><html><body style="margin:0;padding:24px;background:#fbf8f3;color:#1d2624;font-family:system-ui,sans-serif;font-size:16px;line-height:1.5">',
    '<div style="max-width:560px;margin:0 auto;background:#ffffff;border-radius:12px;padding:24px">',
    '<p style="margin:0 0 16px;font-weight:700;color:#1f3b36">Wortwise</p>',
    ...paragraphs.map((s) => p(s)),
    `<p style="margin:0 0 16px"><a href="${escapeHtml(action.url)}" style="display:inline-block;padding:12px 20px;background:#1f3b36;color:#ffffff;border-radius:8px;text-decoration:none;font-weight:600">${escapeHtml(action.label)}</a></p>`,
    p(`Or open this link: ${action.url}`, true),
    ...after.map((s) => p(s, true)),
    '</div></body></html>',
  ].join('');
  return { subject, text, html };
}
