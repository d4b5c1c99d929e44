/**
 * From a key press to the editor command it means. Keys typed into a form field belong to the
 * field, never to the canvas. Pure: the React hook that listens lives in useEditorKeyboard.ts.
 */
import { COMMANDS, type Command } from './commands';
import { matchesShortcut, type KeyLike } from './shortcuts';
import type { EditorState } from '../store/editorStore';

export interface KeyTarget {
  tagName?: string;
  isContentEditable?: boolean;
  type?: string;
}

/** Inputs whose keys are their own (text, numbers, sliders…): all but the push-button kinds. */
const NON_TYPING_INPUTS = new Set(['checkbox', 'radio', 'button', 'submit', 'reset', 'file', 'color']);

export function isTypingTarget(t: KeyTarget | null | undefined): boolean {
  if (!t || !t.tagName) return false;
  const tag = t.tagName.toUpperCase();
  if (tag === 'TEXTAREA' || tag === 'SELECT' || t.isContentEditable) return true;
  return tag === 'INPUT' && !NON_TYPING_INPUTS.has((t.type ?? 'text').toLowerCase());
}

export function commandForKey(e: KeyLike, isMac: boolean, commands: Command[] = COMMANDS): Command | undefined {
  return commands.find((c) => c.shortcut.some((s) => matchesShortcut(s, e, isMac)));
}

/** Run the command a key means, if it is enabled now. Returns the command run, if any. */
export function dispatchKey(e: KeyLike, state: EditorState, isMac: boolean, commands: Command[] = COMMANDS): { command?: Command; result?: { ok: boolean; error?: string } } {
  const c = commandForKey(e, isMac, commands);
  if (!c || !c.enabled(state)) return {};
  const result = c.run(state);
  return { command: c, result: result ?? undefined };
}
