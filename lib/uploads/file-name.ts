/**
 * The uploader's file name, made safe to show and to send back in a download header. It is
 * never used to build a path on disk (stored names are random), but it is cleaned all the same:
 * no folders (`../`, `C:\`), no control or bidirectional-override characters, no leading dots,
 * a bounded length. Pure; must never touch the file system.
 */

const MAX_NAME = 120;

/** Characters that reorder or hide text and can disguise an extension (e.g. U+202E). */
const INVISIBLE = /[\u0000-\u001F\u007F-\u009F\u200B-\u200F\u202A-\u202E\u2060-\u2069\uFEFF]/g;

export function cleanFileName(raw: string | null | undefined, fallback = 'upload'): string {
  let name = String(raw ?? '');
  try {
    name = name.normalize('NFC');
  } catch {
    /* keep as is */
  }
  // The last segment after any kind of slash: browsers and tools disagree on which they send.
  name = name.split(/[/\\]/).pop() ?? '';
  name = name.replace(INVISIBLE, '').replace(/[<>:"|?*]/g, '_').trim();
  name = name.replace(/^[.\s]+/, '').replace(/[.\s]+$/, '');
  if (name.length > MAX_NAME) {
    const ext = /\.[A-Za-z0-9]{1,8}$/.exec(name)?.[0] ?? '';
    name = name.slice(0, MAX_NAME - ext.length) + ext;
  }
  return name || fallback;
}

/** Adds `.ext` when the name has none, so a downloaded file opens in the right program. */
export function withExtension(name: string, ext: string): string {
  return /\.[A-Za-z0-9]{1,8}$/.test(name) ? name : `${name}.${ext}`;
}

/**
 * `Content-Disposition` for a stored file: an ASCII fallback in `filename` and the exact name in
 * `filename*` (RFC 6266 §4.3 with RFC 8187 encoding).
 */
export function contentDisposition(name: string, disposition: 'inline' | 'attachment'): string {
  const fallback = name.replace(/[^\x20-\x7E]/g, '_').replace(/["\\]/g, '_');
  const encoded = encodeURIComponent(name).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
  return `${disposition}; filename="${fallback}"; filename*=UTF-8''${encoded}`;
}
