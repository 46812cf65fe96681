/**
 * Every e-mail Wortwise sends: a plain-text body (what most mail clients show in previews and
 * what the tests read) and a small HTML body with the same words. Anything a user typed is
 * escaped before it reaches the HTML.
 */
import { utcDayInWords } from '@shared/dates';
import type { OutgoingMail } from './mailer';

export type MailContent = Omit<OutgoingMail, 'to'>;

const roleWords = { member: 'a member', mentor: 'a mentor', organiser: 'an organiser' } as const;

export function escapeHtml(value: string) {
  return value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

/** A short, whole-word excerpt on one line, for quoting a comment in a notice. */
export function excerpt(text: string, maxChars = 280) {
  const flat = text.replace(/\s+/g, ' ').trim();
  if (flat.length <= maxChars) return flat;
  const cut = flat.slice(0, maxChars);
  const lastSpace = cut.lastIndexOf(' ');
  return `${(lastSpace > maxChars * 0.6 ? cut.slice(0, lastSpace) : cut).trimEnd()}…`;
}

export interface MailBlock {
  paragraphs: string[];
  action: { label: string; url: string };
  quote?: string;
  after?: string[];
}

/** The one layout for all mail: paragraphs, an optional quote, one button (and its link spelled out). */
export function renderMail(subject: string, block: MailBlock): MailContent {
  const text = [
    ...block.paragraphs,
    ...(block.quote ? [block.quote.split('\n').map((l) => `> ${l}`).join('\n')] : []),
    `${block.action.label}:\n${block.action.url}`,
    ...(block.after ?? []),
    '— Wortwise',
  ].join('\n\n');
  const p = (s: string) => `<p style="margin:0 0 16px">${escapeHtml(s)}</p>`;
  const html = [
    '<!doctype html><html><body style="margin:0;padding:24px;background:#fbf8f3;color:#1d2624;font-family:system-ui,sans-serif;font-size:16px;line-height:1.5">',
    '<div style="max-width:560px;margin:0 auto;background:#ffffff;border-radius:12px;padding:24px">',
    `<p style="margin:0 0 16px;font-weight:700;color:#1f3b36">Wortwise</p>`,
    ...block.paragraphs.map(p),
    ...(block.quote
      ? [`<blockquote style="margin:0 0 16px;padding:8px 16px;border-left:4px solid #d6962a;background:#fdf6e7">${escapeHtml(block.quote)}</blockquote>`]
      : []),
    `<p style="margin:0 0 16px"><a href="${escapeHtml(block.action.url)}" style="display:inline-block;padding:12px 20px;background:#1f3b36;color:#ffffff;border-radius:8px;text-decoration:none;font-weight:600">${escapeHtml(block.action.label)}</a></p>`,
    `<p style="margin:0 0 16px;font-size:14px;color:#4a5753">Or open this link: ${escapeHtml(block.action.url)}</p>`,
    ...(block.after ?? []).map((s) => `<p style="margin:0 0 16px;font-size:14px;color:#4a5753">${escapeHtml(s)}</p>`),
    '</div></body></html>',
  ].join('');
  return { subject, text, html };
}

export function invitationMail(input: {
  clubName: string;
  inviterName: string | null;
  role: keyof typeof roleWords;
  url: string;
  expiresAt: Date;
}): MailContent {
  const who = input.inviterName ?? 'An organiser';
  return renderMail(`${who} invites you to ${input.clubName} on Wortwise`, {
    paragraphs: [
      `${who} invites you to join ${input.clubName} on Wortwise as ${roleWords[input.role]}.`,
      'Wortwise keeps your recipes and brew-day readings, and lets you share a brew with your club so a mentor can look over it and comment.',
      'If you have no Wortwise account yet, the link lets you create one on the way in.',
    ],
    action: { label: 'Accept the invitation', url: input.url },
    after: [`The link works once and expires on ${utcDayInWords(input.expiresAt)}. If you were not expecting this, ignore it: nothing happens until the link is opened and accepted.`],
  });
}

export function passwordResetMail(input: { displayName: string; url: string; validMinutes: number }): MailContent {
  return renderMail('Choose a new Wortwise password', {
    paragraphs: [`Hello ${input.displayName},`, 'Someone (we hope you) asked to choose a new password for your Wortwise account.'],
    action: { label: 'Choose a new password', url: input.url },
    after: [
      `The link works once, for ${input.validMinutes} minutes. Choosing a new password signs you out everywhere else.`,
      'If you did not ask for this, ignore this e-mail: your password stays as it is.',
    ],
  });
}

/** Sent to a brewer when a club mentor comments on something they shared. */
export function mentorCommentNotice(input: {
  brewerName: string;
  mentorName: string;
  brewName: string;
  commentExcerpt: string;
  url: string;
}): MailContent {
  return renderMail(`${input.mentorName} commented on ${input.brewName}`, {
    paragraphs: [`Hello ${input.brewerName},`, `${input.mentorName} left a comment on ${input.brewName}:`],
    quote: excerpt(input.commentExcerpt),
    action: { label: 'Read it in Wortwise', url: input.url },
    after: ['You get this because you shared this brew with your club. Stop sharing it at any time to end the comments.'],
  });
}
