/**
 * Limits on what a studio may store: decoded image size (every viewer's browser must decode an
 * image in full, so a small file declaring 30 000 × 30 000 px is refused) and the studio's total
 * storage. Reads image dimensions from the file's header with `image-size` (pure JS, no decoding).
 */
import 'server-only';
import fs from 'node:fs';
import { imageSize } from 'image-size';
import { formatWhole } from '../format';

/** Longest side and pixel count an uploaded image may decode to (common practice, no source: a 40 MP camera photo fits). */
export const MAX_IMAGE_SIDE_PX = 12_000;
export const MAX_IMAGE_PIXELS = 40_000_000;

export class ImageTooLargeError extends Error {
  readonly status = 415;
}

export class StorageQuotaError extends Error {
  readonly status = 413;
}

export function checkImageDimensions(file: string): void {
  let size: { width?: number; height?: number };
  try {
    size = imageSize(fs.readFileSync(file));
  } catch {
    throw new ImageTooLargeError('The image’s size could not be read; save it again as PNG or JPEG.');
  }
  const width = size.width ?? 0;
  const height = size.height ?? 0;
  if (!width || !height) throw new ImageTooLargeError('The image’s size could not be read; save it again as PNG or JPEG.');
  if (width > MAX_IMAGE_SIDE_PX || height > MAX_IMAGE_SIDE_PX || width * height > MAX_IMAGE_PIXELS) {
    throw new ImageTooLargeError(
      `The image is ${width} × ${height} px; images may be at most ${formatWhole(MAX_IMAGE_SIDE_PX)} px on a side and ${MAX_IMAGE_PIXELS / 1_000_000} megapixels. Make it smaller and upload it again.`,
    );
  }
}

/** BAYWRIGHT_STUDIO_STORAGE_MB (MiB), default 2048 (2 GB). */
export function studioQuotaBytes(env: Record<string, string | undefined> = process.env): number {
  const raw = env.BAYWRIGHT_STUDIO_STORAGE_MB;
  const mb = raw === undefined || raw === '' ? 2048 : Number(raw);
  if (!Number.isFinite(mb) || mb <= 0) throw new Error(`BAYWRIGHT_STUDIO_STORAGE_MB must be a positive number of megabytes, got "${raw}"`);
  return Math.floor(mb * 1024 * 1024);
}

export function quotaMessage(quota: number): string {
  return `This studio’s files would pass its storage allowance of ${formatBytes(quota)}. Delete reference files the studio no longer needs, or ask the administrator to raise the allowance.`;
}

function formatBytes(n: number): string {
  return n >= 1024 ** 3 ? `${(n / 1024 ** 3).toFixed(n % 1024 ** 3 ? 1 : 0)} GB` : `${Math.round(n / 1024 ** 2)} MB`;
}
