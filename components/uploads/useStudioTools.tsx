'use client';
/**
 * What the signed-in layout page adds to the editor from this feature: the tracing photos under
 * the plan (a Konva layer fetched in the browser only, like the other plan layers), the Tracing
 * control and the File menu (plan sheet, PNG/JSON export, JSON import) for the toolbar. A viewer
 * link page must not use this: tracing photos never leave the studio.
 */
import { useEffect, useState, type ComponentType, type ReactNode } from 'react';
import type { Viewport } from '@/components/editor/geometry/viewport';
import type { LengthUnit } from '@/lib/layout';
import { LayoutFileMenu } from '@/components/sheet/LayoutFileMenu';
import type { TracingLayerProps } from './TracingLayer';
import { TracingPanel } from './TracingPanel';
import { useUploads } from './useUploads';

export function useStudioTools(layoutId: string, canEdit: boolean, units: LengthUnit): { planUnderlay: (view: { viewport: Viewport }) => ReactNode; toolbar: ReactNode } {
  const uploads = useUploads(layoutId);
  const [Layer, setLayer] = useState<ComponentType<TracingLayerProps> | null>(null);
  useEffect(() => {
    let live = true;
    import('./TracingLayer').then((m) => { if (live) setLayer(() => m.TracingLayer); });
    return () => { live = false; };
  }, []);
  const list = uploads.data ?? [];
  return {
    planUnderlay: ({ viewport }) => (Layer && list.some((u) => u.tracing) ? <Layer viewport={viewport} uploads={list} /> : null),
    toolbar: (
      <div className="flex items-center gap-1" role="group" aria-label="Files and tracing">
        <TracingPanel layoutId={layoutId} canEdit={canEdit} units={units} />
        <LayoutFileMenu layoutId={layoutId} canEdit={canEdit} />
      </div>
    ),
  };
}
