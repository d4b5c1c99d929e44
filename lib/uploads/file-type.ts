/**
 * What an uploaded file really is, from its first bytes ("magic numbers"), never from its name
 * or the type the browser claimed. Only the four kinds Baywright keeps are recognised: JPEG, PNG
 * and WebP photos, PDF drawings. Pure: bytes in, a type out; must never read files or trust a
 * name.
 *
 * Signatures: JPEG starts FF D8 FF (ITU-T T.81 / JFIF, SOI marker followed by a marker);
 * PNG 89 50 4E 47 0D 0A 1A 0A (PNG specification, ISO/IEC 15948 §5.2); WebP "RIFF" <size>
 * "WEBP" (RFC 9649 §2); PDF "%PDF-" (ISO 32000-1 §7.5.2, file header).
 */

export const UPLOAD_TYPES = ['image/jpeg', 'image/png', 'image/webp', 'application/pdf'] as const;
export type UploadType = (typeof UPLOAD_TYPES)[number];

/** How many leading bytes `sniffType` needs to decide. */
export const SNIFF_BYTES = 12;

const ascii = (bytes: Uint8Array, at: number, text: string) => [...text].every((ch, i) => bytes[at + i] === ch.charCodeAt(0));

export function sniffType(head: Uint8Array): UploadType | null {
  if (head.length >= 3 && head[0] === 0xff && head[1] === 0xd8 && head[2] === 0xff) return 'image/jpeg';
  if (head.length >= 8 && [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a].every((b, i) => head[i] === b)) return 'image/png';
  if (head.length >= 12 && ascii(head, 0, 'RIFF') && ascii(head, 8, 'WEBP')) return 'image/webp';
  if (head.length >= 5 && ascii(head, 0, '%PDF-')) return 'application/pdf';
  return null;
}

export function isImage(type: string): boolean {
  return type === 'image/jpeg' || type === 'image/png' || type === 'image/webp';
}

/** The word the Details of a file use: photos and drawings. */
export function uploadKind(type: string): 'photo' | 'drawing' {
  return isImage(type) ? 'photo' : 'drawing';
}

const EXTENSIONS: Record<string, UploadType> = {
  jpg: 'image/jpeg',
  jpeg: 'image/jpeg',
  jpe: 'image/jpeg',
  png: 'image/png',
  webp: 'image/webp',
  pdf: 'application/pdf',
};

export function typeOfExtension(fileName: string): UploadType | null {
  const m = /\.([A-Za-z0-9]{1,8})$/.exec(fileName);
  return m ? (EXTENSIONS[m[1].toLowerCase()] ?? null) : null;
}

export function extensionOf(type: UploadType): string {
  return type === 'image/jpeg' ? 'jpg' : type === 'image/png' ? 'png' : type === 'image/webp' ? 'webp' : 'pdf';
}

/** What a browser may put in Content-Type for a file it could not name: no claim at all. */
const NO_CLAIM = new Set(['', 'application/octet-stream', 'binary/octet-stream']);

/**
 * Compares the content with what the request claimed (Content-Type, file name). Returns null
 * when they agree, or a sentence saying what does not match.
 */
export function typeMismatch(found: UploadType | null, claimedType: string, fileName: string): string | null {
  const accepted = 'Send a JPEG, PNG or WebP photo, or a PDF drawing.';
  if (!found) return `This file is not a JPEG, PNG, WebP or PDF by its content. ${accepted}`;
  const claim = claimedType.split(';')[0].trim().toLowerCase();
  if (!NO_CLAIM.has(claim) && claim !== found && !(claim === 'image/jpg' && found === 'image/jpeg')) {
    return `The file was sent as ${claim || 'an unknown type'} but its content is ${found}. ${accepted}`;
  }
  const byName = typeOfExtension(fileName);
  const extension = /\.([A-Za-z0-9]{1,8})$/.exec(fileName)?.[1]?.toLowerCase();
  if (extension && byName !== found && (byName !== null || ['html', 'htm', 'svg', 'js', 'exe', 'xml', 'gif', 'tif', 'tiff', 'heic'].includes(extension))) {
    return `The file is named .${extension} but its content is ${found}. ${accepted}`;
  }
  return null;
}
