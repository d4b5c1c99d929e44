'use client';
/**
 * Loads the Konva editor in the browser only (next/dynamic with ssr: false is allowed only in a
 * client file), keeping Konva out of the first load of every other route. Must never import
 * Konva or the editor statically.
 */
import dynamic from 'next/dynamic';
import type { EditorProps } from './types';

const loadEditor = () => import('./Editor');
// Fetch the editor's chunks as soon as this file runs in the browser, while the page is still
// hydrating, rather than when hydration reaches the editor: the bay is drawn a few hundred
// milliseconds sooner. The bundler hands both calls the same module.
if (typeof window !== 'undefined') void loadEditor();

const Editor = dynamic(loadEditor, {
  ssr: false,
  loading: () => (
    <div className="flex h-full items-center justify-center bg-paper text-ink-soft" role="status" aria-live="polite">
      <span className="font-mono text-sm">Unrolling the drawing…</span>
    </div>
  ),
});

export function EditorLoader(props: EditorProps) {
  return <Editor {...props} />;
}

export default EditorLoader;
