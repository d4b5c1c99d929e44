'use client';
/**
 * Loads the Konva editor in the browser only (next/dynamic with ssr: false is allowed only in a
 * client file), keeping Konva out of the first load of every other route. Must never import
 * Konva or the editor statically.
 *
 * Until the editor is running, the page shows its frame as served (`EditorAsServed`): the plan
 * as the server drew it (`preview`, the thumbnail's SVG of the layout as opened) where the plan
 * goes, and on a desktop the findings the server checked in time where the Checks panel goes, at
 * the same width. So the bay and the findings are on screen with the page's HTML rather than after
 * the editor's scripts, and nothing moves when the editor takes over. It is inert: it
 * only shows.
 */
import dynamic from 'next/dynamic';
import { createContext, useContext } from 'react';
import type { EditorProps } from './types';
import type { CheckReport } from '@/lib/checks/types';
import { Tabs } from '@/components/ui/Tabs';
import { ChecksReportView } from './panels/ChecksReportView';
import { DRAWING_TABS } from './panels/bottomTabs';

const loadEditor = () => import('./Editor');
// Fetch the editor's chunks as soon as this file runs in the browser, while the page is still
// hydrating, rather than when hydration reaches the editor: the bay is drawn a few hundred
// milliseconds sooner. The bundler hands both calls the same module.
if (typeof window !== 'undefined') void loadEditor();

interface AsServed {
  preview: string | null;
  canEdit: boolean;
  layoutId: string;
  units: EditorProps['units'];
  /** The report when the server had it in time (a promise still on its way is not waited for here). */
  report: CheckReport | null;
}

/** What the frame as served shows (next/dynamic gives its placeholder no props). */
const AsServedContext = createContext<AsServed | null>(null);

const BOTTOM_TABS = [{ id: 'checks', title: 'Checks', label: 'Checks' }, ...DRAWING_TABS];
const ignore = () => {};

/**
 * The editor's frame as Editor.tsx lays it out on a desktop (toolbar, shelf w-60, plan over a
 * Checks panel h-64, Details w-80), its panels shown only where the editor docks them (the
 * `desktop:` variant, the same media queries as components/ui/screenClass.ts). Keep the widths in
 * step with Editor.tsx.
 */
function EditorAsServed() {
  const served = useContext(AsServedContext);
  const preview = served?.preview ?? null;
  const report = served?.report ?? null;
  return (
    <div className="flex h-full min-h-0 flex-col bg-paper text-ink" data-testid="editor-as-served" aria-busy="true">
      <div className="hidden h-[45px] shrink-0 border-b border-paper-edge desktop:block" />
      <div className="relative flex min-h-0 flex-1">
        {served?.canEdit && <div className="hidden w-60 shrink-0 border-r border-paper-edge desktop:block" />}
        <div className="flex min-w-0 flex-1 flex-col">
          <div className="flex min-h-0 flex-1 flex-col items-center justify-center gap-3 bg-paper p-6 text-ink-soft" role="status" aria-live="polite" data-testid="plan-preview">
            {preview && (
              // eslint-disable-next-line @next/next/no-img-element -- an SVG the server drew from the document, inline; nothing to optimise
              <img src={`data:image/svg+xml;charset=utf-8,${encodeURIComponent(preview)}`} alt="" aria-hidden="true" className="h-auto max-h-[70%] w-auto max-w-full object-contain" />
            )}
            <span className="font-mono text-sm">Unrolling the drawing…</span>
          </div>
          <div className="hidden desktop:contents" inert>
            <Tabs className="flex h-64 min-h-0 shrink-0 flex-col border-t border-paper-edge" panelClassName="min-h-0 flex-1 overflow-auto" label="Checks and section" active="checks" onChange={ignore} tabs={BOTTOM_TABS}>
              <ChecksReportView checks={{ report: report ?? undefined, status: report ? 'ready' : 'checking', stale: false }} units={served?.units ?? 'mm'} layoutId={served?.canEdit ? served.layoutId : undefined} />
            </Tabs>
          </div>
        </div>
        <div className="hidden w-80 shrink-0 border-l border-paper-edge desktop:block" />
      </div>
    </div>
  );
}

const Editor = dynamic(loadEditor, { ssr: false, loading: () => <EditorAsServed /> });

export interface EditorLoaderProps extends EditorProps {
  /** The plan as an SVG document (lib/sheet/thumbnail.ts), drawn on the server; shown until the editor runs. */
  preview?: string | null;
}

function inline(checks: EditorProps['initialChecks']): CheckReport | null {
  return checks && !('then' in checks) ? checks : null;
}

export function EditorLoader({ preview = null, ...props }: EditorLoaderProps) {
  return (
    <AsServedContext.Provider value={{ preview, canEdit: props.canEdit, layoutId: props.layoutId, units: props.units, report: inline(props.initialChecks) }}>
      <Editor {...props} />
    </AsServedContext.Provider>
  );
}

export default EditorLoader;
