import { describe, expect, it } from 'vitest';
import { COMMANDS, command } from '@/components/editor/commands/commands';
import { commandForKey, dispatchKey, isTypingTarget } from '@/components/editor/commands/keyboard';
import { formatShortcut, matchesShortcut } from '@/components/editor/commands/shortcuts';
import { harness, mod } from './harness';

const key = (k: string, m: Partial<{ ctrlKey: boolean; metaKey: boolean; shiftKey: boolean; altKey: boolean }> = {}) => ({ key: k, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...m });

describe('commands', () => {
  it('every command has a unique id, a label and at least one shortcut', () => {
    const ids = COMMANDS.map((c) => c.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const c of COMMANDS) {
      expect(c.label.length).toBeGreaterThan(2);
      expect(c.shortcut.length).toBeGreaterThan(0);
    }
  });

  it('no two commands claim the same shortcut', () => {
    const seen = new Map<string, string>();
    for (const c of COMMANDS) for (const s of c.shortcut) {
      expect(seen.get(s), `${s} used by ${seen.get(s)} and ${c.id}`).toBeUndefined();
      seen.set(s, c.id);
    }
  });

  it('matches Mod to Ctrl off a Mac and ⌘ on one, and Shift exactly', () => {
    expect(matchesShortcut('Mod+Z', key('z', { ctrlKey: true }), false)).toBe(true);
    expect(matchesShortcut('Mod+Z', key('z', { metaKey: true }), false)).toBe(false);
    expect(matchesShortcut('Mod+Z', key('z', { metaKey: true }), true)).toBe(true);
    expect(matchesShortcut('Mod+Z', key('Z', { ctrlKey: true, shiftKey: true }), false)).toBe(false);
    expect(commandForKey(key('Z', { ctrlKey: true, shiftKey: true }), false)?.id).toBe('edit.redo');
    expect(commandForKey(key('?', { shiftKey: true }), false)?.id).toBe('help.shortcuts');
    expect(commandForKey(key('ArrowLeft', { shiftKey: true }), false)?.id).toBe('edit.nudge-left-10');
    expect(formatShortcut('Mod+Shift+Z', true)).toBe('⌘ Shift Z');
    expect(formatShortcut('ArrowLeft', false)).toBe('←');
  });

  it('keys typed into a text field are never commands', () => {
    expect(isTypingTarget({ tagName: 'INPUT', type: 'text' })).toBe(true);
    expect(isTypingTarget({ tagName: 'TEXTAREA' })).toBe(true);
    expect(isTypingTarget({ tagName: 'INPUT', type: 'checkbox' })).toBe(false);
    expect(isTypingTarget({ tagName: 'DIV' })).toBe(false);
  });

  it('disabled commands do nothing: no selection, nothing to rotate', () => {
    const h = harness([mod('a')]);
    expect(command('edit.rotate').enabled(h.get())).toBe(false);
    const r = dispatchKey(key('r'), h.get(), false);
    expect(r.command).toBeUndefined();
  });

  it('a module can be selected and moved with the keyboard alone, and undone as one step', () => {
    const h = harness([mod('a', { x: 1000, y: 800 }), mod('b', { x: 2000, y: 800 })]);
    dispatchKey(key(']'), h.get(), false);
    expect(h.get().selection).toEqual(['a']);
    dispatchKey(key(']'), h.get(), false);
    expect(h.get().selection).toEqual(['b']);
    dispatchKey(key('ArrowRight', { shiftKey: true }), h.get(), false);
    dispatchKey(key('ArrowRight', { shiftKey: true }), h.get(), false);
    dispatchKey(key('ArrowDown'), h.get(), false);
    expect(h.byId('b')).toMatchObject({ x: 2020, y: 801 });
    dispatchKey(key('z', { ctrlKey: true }), h.get(), false);
    expect(h.byId('b')).toMatchObject({ x: 2000, y: 800 });
  });

  it('Escape cancels a gesture first, then clears the selection', () => {
    const h = harness([mod('a')]);
    h.get().select(['a']);
    h.get().beginMove(['a']);
    h.get().dragTo(100, 0);
    dispatchKey(key('Escape'), h.get(), false);
    expect(h.get().gesture).toBeNull();
    expect(h.get().selection).toEqual(['a']);
    dispatchKey(key('Escape'), h.get(), false);
    expect(h.get().selection).toEqual([]);
  });

  it('arrangement, phantom and snap-step commands', () => {
    const h = harness();
    dispatchKey(key('s'), h.get(), false);
    expect(h.get().arrangement).toBe('sleep');
    dispatchKey(key('o'), h.get(), false);
    expect(h.get().phantom).toBe('lounge');
    dispatchKey(key('g'), h.get(), false);
    expect(h.get().steps.step).toBe(50);
    dispatchKey(key('g'), h.get(), false);
    dispatchKey(key('g'), h.get(), false);
    expect(h.get().steps.step).toBe(10);
    const before = h.get().viewport.scale;
    dispatchKey(key('='), h.get(), false);
    expect(h.get().viewport.scale).toBeCloseTo(before * 1.25);
    dispatchKey(key('0'), h.get(), false);
    expect(h.get().viewport.scale).toBeCloseTo(before);
  });

  it('read-only: no edit command is enabled, viewing ones are', async () => {
    const { createEditorStore } = await import('@/components/editor/store/editorStore');
    const { testDoc } = await import('./harness');
    const store = createEditorStore({ doc: testDoc([mod('a')]), version: 1, readOnly: true });
    store.getState().select(['a']);
    const enabled = COMMANDS.filter((c) => c.enabled(store.getState())).map((c) => c.group);
    expect(enabled).not.toContain('edit');
    expect(command('view.fit').enabled(store.getState())).toBe(true);
  });
});
