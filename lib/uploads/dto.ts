/**
 * What the upload routes answer with: a reference file of a layout, as the browser sees it.
 * Shared by the data layer and the client components; types only, never the stored name.
 */
import type { TracingPlacement } from '../tracing/calibration';

export interface UploadDto {
  id: string;
  layoutId: string;
  fileName: string;
  contentType: string;
  kind: 'photo' | 'drawing';
  sizeBytes: number;
  uploadedBy: string | null;
  createdAt: string;
  /** Where to fetch the bytes (rights checked there too). */
  url: string;
  /** Where the image sits under the plan, or null when it is not placed. */
  tracing: TracingPlacement | null;
}

/** What the file picker offers, and the limit said before any byte is sent. */
export const ACCEPTED_UPLOADS = 'image/jpeg,image/png,image/webp,application/pdf,.jpg,.jpeg,.png,.webp,.pdf';
export const UPLOAD_LIMIT_BYTES = 15 * 1024 * 1024;
