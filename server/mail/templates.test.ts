import { describe, expect, it } from 'vitest';
import { hashLinkToken, newLinkToken } from '../lib/tokens';
import { escapeHtml, excerpt, invitationMail, mentorCommentNotice, passwordResetMail } from './templates';

describe('link tokens', () => {
  it('hashes with SHA-256 (FIPS 180-2, appendix B.1 test vector "abc")', () => {
    expect(hashLinkToken('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });

  it('makes 32-byte base64url tokens (RFC 4648 §5 alphabet, 43 characters unpadded) that differ each time', () => {
    const a = newLinkToken();
    const b = newLinkToken();
    expect(a.token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(Buffer.from(a.token, 'base64url')).toHaveLength(32);
    expect(a.token).not.toBe(b.token);
    expect(a.hash).toBe(hashLinkToken(a.token));
  });
});

describe('mail templates', () => {
  it('escapes the five characters the OWASP XSS cheat sheet lists for HTML content', () => {
    expect(escapeHtml(`<b onclick="x">Tom & Jerry's</b>`)).toBe('&lt;b onclick=&quot;x&quot;&gt;Tom &amp; Jerry&#39;s&lt;/b&gt;');
  });

  it('puts user-typed names into the HTML escaped, and the link in both bodies', () => {
    const mail = invitationMail({
      clubName: '<script>alert(1)</script> Brewers',
      inviterName: 'Rook & Co',
      role: 'mentor',
      url: 'https://wortwise.example/invitations/abc',
      expiresAt: new Date('2026-05-09T12:00:00Z'),
    });
    expect(mail.subject).toBe('Rook & Co invites you to <script>alert(1)</script> Brewers on Wortwise');
    expect(mail.html).not.toContain('<script>');
    expect(mail.html).toContain('&lt;script&gt;alert(1)&lt;/script&gt; Brewers');
    expect(mail.html).toContain('Rook &amp; Co');
    expect(mail.text).toContain('as a mentor');
    expect(mail.text).toContain('expires on 9 May 2026');
    expect(mail.text).toContain('https://wortwise.example/invitations/abc');
    expect(mail.html).toContain('href="https://wortwise.example/invitations/abc"');
  });

  it('says how long a reset link lasts', () => {
    const mail = passwordResetMail({ displayName: 'Kit', url: 'https://wortwise.example/reset-password/xyz', validMinutes: 60 });
    expect(mail.text).toContain('The link works once, for 60 minutes.');
    expect(mail.text).toContain('https://wortwise.example/reset-password/xyz');
  });

  it('quotes a mentor’s comment in a notice, shortened at a word boundary', () => {
    const long = `${'Mash pH sat at 5.6, the top of the usual band. '.repeat(10)}End.`;
    const mail = mentorCommentNotice({ brewerName: 'Priya', mentorName: 'Ivo', brewName: 'Hollow Amber #3', commentExcerpt: long, url: 'https://wortwise.example/brews/3' });
    expect(mail.subject).toBe('Ivo commented on Hollow Amber #3');
    const quoted = mail.text.split('\n').find((l) => l.startsWith('> '))!;
    expect(quoted.length).toBeLessThanOrEqual(2 + 281);
    expect(quoted.endsWith('…')).toBe(true);
    expect(quoted).not.toMatch(/\s…$/);
    expect(excerpt('short and sweet')).toBe('short and sweet');
  });
});
