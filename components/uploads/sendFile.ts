/**
 * Sends one file to a layout with XMLHttpRequest, because only XHR reports upload progress. The
 * body is the file itself (not a form): its type goes as Content-Type, its name as `?name=`. The
 * server's error message (413 too large, 415 wrong type…) comes back as the rejection's message.
 * Must never read the file into memory.
 */
import type { UploadDto } from '@/lib/uploads/dto';

export class UploadError extends Error {
  constructor(readonly status: number, message: string) {
    super(message);
  }
}

export interface SendHandle {
  done: Promise<UploadDto>;
  abort: () => void;
}

export function sendFile(layoutId: string, file: File, onProgress: (fraction: number) => void): SendHandle {
  const xhr = new XMLHttpRequest();
  const done = new Promise<UploadDto>((resolve, reject) => {
    xhr.open('POST', `/api/layouts/${encodeURIComponent(layoutId)}/uploads?name=${encodeURIComponent(file.name)}`);
    xhr.setRequestHeader('Content-Type', file.type || 'application/octet-stream');
    xhr.responseType = 'json';
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress(e.loaded / e.total);
    };
    xhr.onload = () => {
      const body = xhr.response as (UploadDto & { error?: string }) | null;
      if (xhr.status === 201 && body) {
        onProgress(1);
        resolve(body);
      } else reject(new UploadError(xhr.status, body?.error ?? `The upload failed (${xhr.status}).`));
    };
    xhr.onerror = () => reject(new UploadError(0, 'The connection dropped while sending the file; try again.'));
    xhr.onabort = () => reject(new UploadError(0, 'Upload cancelled.'));
    xhr.send(file);
  });
  return { done, abort: () => xhr.abort() };
}
