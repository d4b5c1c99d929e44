'use client';
/**
 * Listens for keys anywhere in the editor and runs the command they mean (commands/keyboard.ts).
 * Keys typed into fields, or meant for tabs, menus and dialogs, are left alone. A screen that edits
 * only part of the document (the build plan) passes the ids of the commands it offers.
 */
import { useEffect } from 'react';
import { toast } from '@/components/ui/toast';
import type { EditorStore } from '../store/editorStore';
import { dispatchKey, isTypingTarget } from './keyboard';
import { COMMANDS } from './commands';
import { isMacPlatform } from './shortcuts';
import { runWaitingCommits } from '@/components/ui/afterNextPaint';

export function useEditorKeyboard(api: EditorStore, only?: readonly string[]) {
  const key = only?.join(',');
  useEffect(() => {
    const mac = isMacPlatform();
    const commands = key === undefined ? COMMANDS : COMMANDS.filter((c) => key.split(',').includes(c.id));
    const onKey = (e: KeyboardEvent) => {
      const t = e.target as HTMLElement | null;
      if (isTypingTarget(t)) return;
      if (t?.closest?.('[role="menu"], [role="tablist"], [role="radiogroup"]') && e.key.startsWith('Arrow')) return;
      const inDialog = t?.closest?.('dialog');
      if (inDialog && e.key !== '?' && e.key !== 'Escape') return;
      runWaitingCommits(); // a field's commit still waiting for its paint comes before the command
      const { command, result } = dispatchKey(e, api.getState(), mac, commands);
      if (!command) return;
      e.preventDefault();
      if (result && !result.ok && result.error) toast.error(result.error);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [api, key]);
}
