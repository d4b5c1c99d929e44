/**
 * Browser-side exports of what the editor shows: the plan as a PNG (the Konva stage drawn onto
 * paper at twice the screen resolution) and the layout as a JSON file. Konva is imported only
 * when a PNG is asked for (the editor has loaded it by then). Must never change the document.
 */
import { theme } from '@/components/editor/theme';

export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.rel = 'noopener';
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** The current canvas view as PNG: the stage under `planElement`, on the paper colour. */
export async function planToPng(planElement: HTMLElement, pixelRatio = 2): Promise<Blob> {
  const Konva = (await import('konva/lib/Core')).default;
  const stage = Konva.stages.find((s) => planElement.contains(s.container()));
  if (!stage) throw new Error('The plan is not drawn yet; wait a moment and try again.');
  const drawn = stage.toCanvas({ pixelRatio });
  const out = document.createElement('canvas');
  out.width = drawn.width;
  out.height = drawn.height;
  const ctx = out.getContext('2d');
  if (!ctx) throw new Error('This browser cannot make a PNG here.');
  ctx.fillStyle = theme.paper;
  ctx.fillRect(0, 0, out.width, out.height);
  ctx.drawImage(drawn, 0, 0);
  return new Promise((resolve, reject) => out.toBlob((b) => (b ? resolve(b) : reject(new Error('The PNG could not be made.'))), 'image/png'));
}
