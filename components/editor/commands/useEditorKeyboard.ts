'use client';
/**
 * Listens for keys anywhere in the editor and runs the command they mean (commands/keyboard.ts).
 * Keys typed into fields, or meant for tabs, menus and dialogs, are left alone.
 */
import { useEffect } from 'react';
import { toast } from 'sonner';
import type { EditorStore } from '../store/editorStore';
import { dispatchKey, isTypingTarget } from './keyboard';
import { isMacPlatform } from './shortcuts';

export function useEditorKeyboard(api: EditorStore) {
  useEffect(() => {
    const mac = isMacPlatform();
    const onKey = (e: KeyboardEvent) => {
      const t = e.target as HTMLElement | null;
      if (isTypingTarget(t)) return;
      if (t?.closest?.('[role="menu"], [role="tablist"], [role="radiogroup"]') && e.key.startsWith('Arrow')) return;
      const inDialog = t?.closest?.('dialog');
      if (inDialog && e.key !== '?' && e.key !== 'Escape') return;
      const { command, result } = dispatchKey(e, api.getState(), mac);
      if (!command) return;
      e.preventDefault();
      if (result && !result.ok && result.error) toast.error(result.error);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [api]);
}
