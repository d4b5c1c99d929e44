'use client';
/**
 * The tracing layer under the plan: each placed photo drawn in bay millimetres through the
 * editor's one viewport transform, at its calibrated scale, rotation and opacity. Never listens
 * for events (the plan's pointer input stays the editor's) and never changes the document.
 * Loaded only in the browser, with Konva.
 */
import { useEffect, useState } from 'react';
import { Image as KonvaImage, Layer } from '../editor/canvas/konva';
import type { Viewport } from '@/components/editor/geometry/viewport';
import { worldLayerProps } from '@/components/editor/canvas/worldTransform';
import type { UploadDto } from '@/lib/uploads/dto';

function usePhoto(url: string): HTMLImageElement | null {
  const [img, setImg] = useState<HTMLImageElement | null>(null);
  useEffect(() => {
    let live = true;
    const el = new window.Image();
    el.decoding = 'async';
    el.onload = () => live && setImg(el);
    el.onerror = () => live && setImg(null);
    el.src = url;
    return () => {
      live = false;
    };
  }, [url]);
  return img;
}

function PlacedPhoto({ upload }: { upload: UploadDto }) {
  const img = usePhoto(upload.url);
  const t = upload.tracing;
  if (!img || !t) return null;
  return <KonvaImage image={img} x={t.x} y={t.y} scaleX={t.mmPerPx} scaleY={t.mmPerPx} rotation={t.rotation} opacity={t.opacity} listening={false} />;
}

export interface TracingLayerProps {
  viewport: Viewport;
  uploads: UploadDto[];
}

export function TracingLayer({ viewport, uploads }: TracingLayerProps) {
  const placed = uploads.filter((u) => u.kind === 'photo' && u.tracing);
  if (placed.length === 0) return null;
  return (
    <Layer {...worldLayerProps(viewport)} listening={false} name="tracing">
      {placed.map((u) => <PlacedPhoto key={u.id} upload={u} />)}
    </Layer>
  );
}
