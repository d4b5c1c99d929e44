'use client';
/**
 * Hands the editor's store to its components. Components read slices with `useEditor(selector)`
 * (use `useShallow` for object slices) and call actions through `useEditorApi().getState()`.
 * Must never create a second store per render.
 */
import { createContext, useContext, type ReactNode } from 'react';
import { useStore } from 'zustand';
import type { EditorState, EditorStore } from './editorStore';

const EditorStoreContext = createContext<EditorStore | null>(null);

export function EditorStoreProvider({ store, children }: { store: EditorStore; children: ReactNode }) {
  return <EditorStoreContext.Provider value={store}>{children}</EditorStoreContext.Provider>;
}

export function useEditorApi(): EditorStore {
  const store = useContext(EditorStoreContext);
  if (!store) throw new Error('useEditorApi must be used inside <EditorStoreProvider>');
  return store;
}

export function useEditor<T>(selector: (s: EditorState) => T): T {
  return useStore(useEditorApi(), selector);
}
