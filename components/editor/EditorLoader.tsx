'use client';
/**
 * Loads the Konva editor in the browser only (next/dynamic with ssr: false is allowed only in a
 * client file), keeping Konva out of the first load of every other route. Must never import
 * Konva or the editor statically.
 */
import dynamic from 'next/dynamic';
import type { EditorProps } from './types';

const Editor = dynamic(() => import('./Editor'), {
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
