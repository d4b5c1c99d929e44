/**
 * Small real files for upload tests: a valid PNG drawn from scratch (zlib + CRC-32 from Node),
 * the first bytes of JPEG, WebP and PDF files, and a Request maker for binary bodies with a real
 * session cookie.
 */
import zlib from 'node:zlib';
import { call, sessionCookie, type CallOptions, type SessionUser } from '../helpers/http';

function chunk(type: string, data: Buffer): Buffer {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(zlib.crc32(body));
  return Buffer.concat([len, body, crc]);
}

/** A w × h truecolour PNG filled with one colour (PNG spec, ISO/IEC 15948). */
export function pngBytes(w = 8, h = 6, rgb: [number, number, number] = [164, 82, 42]): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(w, 0);
  ihdr.writeUInt32BE(h, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 2; // truecolour
  const row = Buffer.concat([Buffer.from([0]), Buffer.from(Array.from({ length: w }, () => rgb).flat())]);
  const raw = Buffer.concat(Array.from({ length: h }, () => row));
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', zlib.deflateSync(raw)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/**
 * The head of a 640 × 480 baseline JPEG: start of image, a JFIF APP0 segment, a start-of-frame
 * segment that carries the size (what the upload's size check reads), some scan bytes, end of image.
 */
export const jpegBytes = () =>
  Buffer.concat([
    Buffer.from([0xff, 0xd8]),
    Buffer.from([0xff, 0xe0, 0x00, 0x10]), Buffer.from('JFIF\0'), Buffer.from([1, 1, 0, 0, 1, 0, 1, 0, 0]),
    Buffer.from([0xff, 0xc0, 0x00, 0x11, 8, 0x01, 0xe0, 0x02, 0x80, 3, 1, 0x22, 0, 2, 0x11, 1, 3, 0x11, 1]),
    Buffer.alloc(200, 7),
    Buffer.from([0xff, 0xd9]),
  ]);
export const webpBytes = () => Buffer.concat([Buffer.from('RIFF'), Buffer.from([0x24, 0, 0, 0]), Buffer.from('WEBPVP8 '), Buffer.alloc(40, 1)]);
export const pdfBytes = () => Buffer.from('%PDF-1.7\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n');

export interface UploadRequest {
  as?: SessionUser | null;
  name?: string;
  type?: string;
  bytes: Buffer | ReadableStream<Uint8Array>;
  declaredLength?: number;
  headers?: Record<string, string>;
}

export async function uploadRequest(layoutId: string, r: UploadRequest): Promise<Request> {
  const headers: Record<string, string> = { host: 'localhost:3000', ...r.headers };
  if (r.type !== undefined) headers['content-type'] = r.type;
  if (r.declaredLength !== undefined) headers['content-length'] = String(r.declaredLength);
  if (r.as) headers.cookie = await sessionCookie(r.as);
  const q = r.name !== undefined ? `?name=${encodeURIComponent(r.name)}` : '';
  return new Request(`http://localhost:3000/api/layouts/${layoutId}/uploads${q}`, {
    method: 'POST',
    headers,
    body: r.bytes instanceof ReadableStream ? r.bytes : new Uint8Array(r.bytes),
    duplex: 'half',
  } as RequestInit);
}

/** A body that streams `total` bytes in 1 MB pieces without ever holding them all. */
export function streamOf(total: number, first: Buffer): ReadableStream<Uint8Array> {
  let sent = 0;
  return new ReadableStream({
    pull(controller) {
      if (sent >= total) return controller.close();
      const piece = sent === 0 ? first : new Uint8Array(Math.min(1024 * 1024, total - sent));
      sent += piece.byteLength;
      controller.enqueue(piece);
    },
  });
}

/** `call` for our route handlers, whose context names its own params (the helper types a generic record). */
export const callRoute = call as unknown as (handler: (req: Request, ctx: never) => Promise<Response>, options?: CallOptions) => ReturnType<typeof call>;
