/**
 * Turns a message's parts (greeting, paragraphs, one action link, a quoted passage) into a plain
 * text body and a matching simple HTML body. Every piece of user text is HTML-escaped; links are
 * only ever http(s). Pure: no network, no database. Must never put unescaped input into HTML.
 */
import { palette } from '../../lib/look';

export interface MessageParts {
  greeting: string;
  paragraphs: string[];
  /** A passage the reader wrote or should read closely (a comment, a note). */
  quote?: string;
  action?: { label: string; url: string };
  footer?: string;
}

export interface ComposedMail {
  subject: string;
  text: string;
  html: string;
}

export function escapeHtml(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}

function safeUrl(url: string): string {
  const u = new URL(url);
  if (u.protocol !== 'http:' && u.protocol !== 'https:') throw new Error(`refusing a ${u.protocol} link in a mail`);
  return u.toString();
}

/** One line, no line breaks (a header must not be able to grow a second header). */
export function oneLine(s: string, max = 160): string {
  const flat = s.replace(/[\r\n\t]+/g, ' ').replace(/\s{2,}/g, ' ').trim();
  return flat.length > max ? `${flat.slice(0, max - 1)}…` : flat;
}

export function compose(subject: string, parts: MessageParts): ComposedMail {
  const url = parts.action ? safeUrl(parts.action.url) : undefined;
  const footer = parts.footer ?? 'Sent by Baywright on behalf of your workshop.';
  const text = [
    parts.greeting,
    '',
    ...parts.paragraphs.flatMap((p) => [p, '']),
    ...(parts.quote ? [...parts.quote.split('\n').map((l) => `> ${l}`), ''] : []),
    ...(parts.action && url ? [`${parts.action.label}: ${url}`, ''] : []),
    '--',
    footer,
  ].join('\n');
  const html = [
    `<!doctype html><html><body style="font-family:system-ui,sans-serif;color:${palette.ink};background:${palette.paper};padding:24px">`,
    `<p>${escapeHtml(parts.greeting)}</p>`,
    ...parts.paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`),
    parts.quote ? `<blockquote style="border-left:3px solid ${palette.copper};margin:0;padding:4px 12px;white-space:pre-wrap">${escapeHtml(parts.quote)}</blockquote>` : '',
    parts.action && url ? `<p><a href="${escapeHtml(url)}" style="color:${palette.copper}">${escapeHtml(parts.action.label)}</a></p>` : '',
    `<p style="color:${palette.inkSoft};font-size:12px">${escapeHtml(footer)}</p>`,
    '</body></html>',
  ].join('');
  return { subject: oneLine(subject, 200), text, html };
}
