// The mail words: user text is escaped in HTML, subjects stay on one line, only http(s) links.
import { describe, expect, it } from 'vitest';
import { compose, escapeHtml, oneLine } from '@/server/mail/compose';
import { markupMail, decisionMail, invitationMail, revisionIssuedMail, SIGN_OFF_CAUTION } from '@/server/mail/messages';
import { publicUrl, PublicUrlMissing } from '@/server/mail/public-url';
import { outboxEnabled } from '@/server/mail/outbox-mode';

describe('compose', () => {
  it('escapes every piece of user text in the HTML body', () => {
    const m = markupMail({ recipientName: 'Ivo', authorName: '<b>Priya</b>', layoutName: 'Van & co', body: '<script>alert(1)</script>', reply: false, url: 'https://app.test/layouts/1' });
    expect(m.html).not.toContain('<script>');
    expect(m.html).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(m.html).toContain('Van &amp; co');
    expect(m.text).toContain('> <script>alert(1)</script>');
  });

  it('keeps the subject on one line whatever the names contain', () => {
    const m = revisionIssuedMail({ clientName: 'Priya', studioName: 'S', layoutName: 'Van\r\nBcc: victim@example.com', letter: 'A', note: '', url: 'https://app.test/x' });
    expect(m.subject).not.toMatch(/[\r\n]/);
    expect(oneLine('a\n\n b\tc')).toBe('a b c');
  });

  it('refuses links that are not http(s)', () => {
    expect(() => compose('x', { greeting: 'Hi', paragraphs: [], action: { label: 'Go', url: 'javascript:alert(1)' } })).toThrow(/javascript:/);
  });

  it('says what each message is about', () => {
    const inv = invitationMail({ clientName: 'Sam', studioName: 'Saltmarsh Van Works', inviterName: 'Ivo Brandt', url: 'http://127.0.0.1:3000/invite/abc', expiresAt: new Date('2030-01-08T00:00:00Z'), layoutName: 'Stock van' });
    expect(inv.subject).toBe('Saltmarsh Van Works invites you to follow your van\'s design');
    expect(inv.text).toContain('Join the studio: http://127.0.0.1:3000/invite/abc');
    expect(inv.text).toContain('until 8 Jan 2030'); // midnight UTC is midnight GMT: the studio's zone (Europe/London) in winter
    const d = decisionMail({ recipientName: 'Ivo', clientName: 'Sam', layoutName: 'Stock van', letter: 'A', decision: 'approved', message: '', url: 'https://a.test/r' });
    expect(d.subject).toBe('Sam approved revision A of Stock van');
    expect(d.text).toMatch(/cannot be changed/);
    // Approvals and new revisions carry the sign-off caution (gas, 230 V, heating, belts, weight).
    expect(d.text).toContain(SIGN_OFF_CAUTION);
    expect(revisionIssuedMail({ clientName: 'P', studioName: 'S', layoutName: 'L', letter: 'B', note: '', url: 'https://a.test/r' }).html).toContain('qualified fitters');
    const note = markupMail({ recipientName: 'Ivo', authorName: 'Sam', layoutName: 'Stock van', body: 'Bed 50 mm longer?', reply: false, url: 'https://a.test/l' });
    expect(note.subject).toBe('Sam left a mark-up on Stock van');
    expect(note.text).toContain('Sam left a mark-up on Stock van:');
    expect(markupMail({ recipientName: 'Sam', authorName: 'Ivo', layoutName: 'Stock van', body: 'Yes', reply: true, url: 'https://a.test/l' }).subject).toBe('Ivo replied to a mark-up on Stock van');
    expect(escapeHtml(`"'`)).toBe('&quot;&#39;');
  });
});

describe('publicUrl', () => {
  const req = new Request('http://127.0.0.1:3210/api/invitations', { headers: { host: 'evil.test' } });
  it('prefers the configured address', () => {
    expect(publicUrl(req, '/invite/t', { BAYWRIGHT_PUBLIC_URL: 'https://studio.example/', NODE_ENV: 'production' })).toBe('https://studio.example/invite/t');
  });
  it('uses the request address outside production and in the demo, never in plain production', () => {
    expect(publicUrl(req, '/v/t', { NODE_ENV: 'development' })).toBe('http://127.0.0.1:3210/v/t');
    expect(publicUrl(req, '/v/t', { NODE_ENV: 'production', BAYWRIGHT_DEMO: '1' })).toBe('http://127.0.0.1:3210/v/t');
    expect(() => publicUrl(req, '/v/t', { NODE_ENV: 'production' })).toThrow(PublicUrlMissing);
  });
  it('only builds links to paths on this site', () => {
    expect(() => publicUrl(req, '//evil.test/x', { NODE_ENV: 'development' })).toThrow();
    expect(() => publicUrl(req, 'https://evil.test', { NODE_ENV: 'development' })).toThrow();
  });
});

describe('outboxEnabled', () => {
  it('is on outside production, off in production unless the demo or the outbox is switched on', () => {
    expect(outboxEnabled({ NODE_ENV: 'development' })).toBe(true);
    expect(outboxEnabled({ NODE_ENV: 'test' })).toBe(true);
    expect(outboxEnabled({ NODE_ENV: 'production' })).toBe(false);
    expect(outboxEnabled({ NODE_ENV: 'production', BAYWRIGHT_DEMO: '1' })).toBe(true);
    expect(outboxEnabled({ NODE_ENV: 'production', BAYWRIGHT_OUTBOX: '1' })).toBe(true);
    expect(outboxEnabled({ NODE_ENV: 'production', BAYWRIGHT_OUTBOX: 'yes' })).toBe(false);
  });
});
