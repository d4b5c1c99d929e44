/**
 * WOFF 1.0 → plain sfnt (TrueType/OpenType) bytes: each table inflated and laid out again behind
 * an sfnt table directory (W3C WOFF File Format 1.0, §4–5). The PDF's font reader mishandles an
 * empty last glyph inside a WOFF file, so the sheet's faces are unwrapped first. Node only (zlib).
 */
import { inflateSync } from 'node:zlib';

export function woffToSfnt(woff: Uint8Array): Uint8Array {
  const buf = Buffer.from(woff.buffer, woff.byteOffset, woff.byteLength);
  if (buf.length < 44 || buf.toString('latin1', 0, 4) !== 'wOFF') throw new Error('not a WOFF 1.0 file');
  const flavor = buf.readUInt32BE(4);
  const count = buf.readUInt16BE(12);
  const tables: { tag: string; data: Buffer; checksum: number }[] = [];
  for (let i = 0; i < count; i++) {
    const at = 44 + i * 20;
    const offset = buf.readUInt32BE(at + 4);
    const compLength = buf.readUInt32BE(at + 8);
    const origLength = buf.readUInt32BE(at + 12);
    if (offset + compLength > buf.length) throw new Error('WOFF table runs past the end of the file');
    const raw = buf.subarray(offset, offset + compLength);
    const data = compLength < origLength ? inflateSync(raw) : raw;
    if (data.length !== origLength) throw new Error('WOFF table has the wrong length after inflating');
    tables.push({ tag: buf.toString('latin1', at, at + 4), data, checksum: buf.readUInt32BE(at + 16) });
  }
  let log2 = 0;
  while (2 << log2 <= count) log2++;
  const searchRange = (1 << log2) * 16;
  const head = Buffer.alloc(12 + 16 * count);
  head.writeUInt32BE(flavor, 0);
  head.writeUInt16BE(count, 4);
  head.writeUInt16BE(searchRange, 6);
  head.writeUInt16BE(log2, 8);
  head.writeUInt16BE(count * 16 - searchRange, 10);
  const parts: Buffer[] = [head];
  let offset = head.length;
  tables.forEach((t, i) => {
    const at = 12 + 16 * i;
    head.write(t.tag, at, 'latin1');
    head.writeUInt32BE(t.checksum, at + 4);
    head.writeUInt32BE(offset, at + 8);
    head.writeUInt32BE(t.data.length, at + 12);
    const pad = (4 - (t.data.length % 4)) % 4;
    parts.push(t.data, Buffer.alloc(pad));
    offset += t.data.length + pad;
  });
  return new Uint8Array(Buffer.concat(parts));
}
