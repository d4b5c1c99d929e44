'use client';
/**
 * Loads the Konva editor in the browser only (next/dynamic with ssr: false is allowed only in a
 * client file), keeping Konva out of the first load of every other route. Must never import
 * Konva or the editor statically.
 *
 * Until the editor is running, the page shows the plan as the server drew it (`preview`, the
 * thumbnail's SVG of the layout as opened), so the bay is on screen with the page's HTML rather
 * than after the editor's scripts.
 */
import dynamic from 'next/dynamic';
import { createContext, useContext } from 'react';
import type { EditorProps } from './types';

const loadEditor = () => import('./Editor');
// Fetch the editor's chunks as soon as this file runs in the browser, while the page is still
// hydrating, rather than when hydration reaches the editor: the bay is drawn a few hundred
// milliseconds sooner. The bundler hands both calls the same module.
if (typeof window !== 'undefined') void loadEditor();

/** The server-drawn plan shown while the editor loads (next/dynamic gives its placeholder no props). */
const PreviewContext = createContext<string | null>(null);

function Unrolling() {
  const preview = useContext(PreviewContext);
  return (
    <div className="flex h-full flex-col items-center justify-center gap-3 bg-paper p-6 text-ink-soft" role="status" aria-live="polite" data-testid="plan-preview">
      {preview && (
        // eslint-disable-next-line @next/next/no-img-element -- an SVG the server drew from the document, inline; nothing to optimise
        <img src={`data:image/svg+xml;charset=utf-8,${encodeURIComponent(preview)}`} alt="" aria-hidden="true" className="h-auto max-h-[70%] w-auto max-w-full object-contain" />
      )}
      <span className="font-mono text-sm">Unrolling the drawing…</span>
    </div>
  );
}

const Editor = dynamic(loadEditor, { ssr: false, loading: () => <Unrolling /> });

export interface EditorLoaderProps extends EditorProps {
  /** The plan as an SVG document (lib/sheet/thumbnail.ts), drawn on the server; shown until the editor runs. */
  preview?: string | null;
}

export function EditorLoader({ preview = null, ...props }: EditorLoaderProps) {
  return (
    <PreviewContext.Provider value={preview}>
      <Editor {...props} />
    </PreviewContext.Provider>
  );
}

export default EditorLoader;
