/**
 * Every editor command as one object `{ id, label, shortcut, enabled(state), run(state) }`, shared
 * by the toolbar, the context menu, the keyboard and the shortcut sheet. Commands act only
 * through store actions; they never touch the DOM or Konva.
 */
import type { Arrangement } from '@/lib/layout';
import { canRedo, canUndo, type EditorState } from '../store/editorStore';
import { GRID_STEPS } from '../geometry/snapping';
import { modulesIn } from '@/lib/layout/bay';

export type CommandGroup = 'edit' | 'select' | 'view' | 'arrangement' | 'help';

export interface Command {
  id: string;
  label: string;
  group: CommandGroup;
  /** One or more shortcuts; the first is the one shown. */
  shortcut: string[];
  enabled(state: EditorState): boolean;
  run(state: EditorState): void | { ok: boolean; error?: string };
}

const editable = (s: EditorState) => !s.readOnly;
const hasSelection = (s: EditorState) => !s.readOnly && s.selection.length > 0;
/** Modules or an opening selected: what arrow keys move and Delete removes. */
const hasAnySelection = (s: EditorState) => hasSelection(s) || (!s.readOnly && s.openingSelection !== null);

function nudge(id: string, label: string, keys: string[], dx: number, dy: number): Command {
  return { id, label, group: 'edit', shortcut: keys, enabled: hasAnySelection, run: (s) => s.nudgeSelection(dx, dy) };
}

function showArrangement(a: Arrangement, key: string): Command {
  return { id: `arrangement.${a}`, label: `Show ${a}`, group: 'arrangement', shortcut: [key], enabled: (s) => s.arrangement !== a, run: (s) => s.setArrangement(a) };
}

/** Which arrangement the phantom lines show: the one that differs most from the one on show. */
export function phantomPartner(a: Arrangement): Arrangement {
  return a === 'sleep' ? 'lounge' : a === 'lounge' ? 'sleep' : 'lounge';
}

function stepSelection(s: EditorState, dir: 1 | -1) {
  const inView = modulesIn(s.doc, s.arrangement);
  if (inView.length === 0) return;
  const cur = inView.findIndex((m) => m.id === s.selection[s.selection.length - 1]);
  const next = cur === -1 ? (dir === 1 ? 0 : inView.length - 1) : (cur + dir + inView.length) % inView.length;
  s.select([inView[next].id]);
}

export const COMMANDS: Command[] = [
  { id: 'edit.undo', label: 'Undo', group: 'edit', shortcut: ['Mod+Z'], enabled: (s) => editable(s) && canUndo(s), run: (s) => s.undo() },
  { id: 'edit.redo', label: 'Redo', group: 'edit', shortcut: ['Mod+Shift+Z', 'Mod+Y'], enabled: (s) => editable(s) && canRedo(s), run: (s) => s.redo() },
  { id: 'edit.rotate', label: 'Rotate 90°', group: 'edit', shortcut: ['R'], enabled: hasSelection, run: (s) => s.rotateSelection() },
  { id: 'edit.duplicate', label: 'Duplicate', group: 'edit', shortcut: ['Mod+D'], enabled: hasSelection, run: (s) => s.duplicateSelection() },
  { id: 'edit.delete', label: 'Delete', group: 'edit', shortcut: ['Delete', 'Backspace'], enabled: hasAnySelection, run: (s) => s.deleteSelection() },
  nudge('edit.nudge-left', 'Nudge towards the cab 1 mm', ['ArrowLeft'], -1, 0),
  nudge('edit.nudge-right', 'Nudge rearwards 1 mm', ['ArrowRight'], 1, 0),
  nudge('edit.nudge-up', 'Nudge towards the left wall 1 mm', ['ArrowUp'], 0, -1),
  nudge('edit.nudge-down', 'Nudge towards the right wall 1 mm', ['ArrowDown'], 0, 1),
  nudge('edit.nudge-left-10', 'Nudge towards the cab 10 mm', ['Shift+ArrowLeft'], -10, 0),
  nudge('edit.nudge-right-10', 'Nudge rearwards 10 mm', ['Shift+ArrowRight'], 10, 0),
  nudge('edit.nudge-up-10', 'Nudge towards the left wall 10 mm', ['Shift+ArrowUp'], 0, -10),
  nudge('edit.nudge-down-10', 'Nudge towards the right wall 10 mm', ['Shift+ArrowDown'], 0, 10),
  { id: 'edit.save', label: 'Save now', group: 'edit', shortcut: ['Mod+S'], enabled: editable, run: (s) => s.requestSave() },

  { id: 'select.all', label: 'Select all in this arrangement', group: 'select', shortcut: ['Mod+A'], enabled: () => true, run: (s) => s.selectAll() },
  { id: 'select.next', label: 'Select next module', group: 'select', shortcut: [']'], enabled: (s) => s.doc.modules.length > 0, run: (s) => stepSelection(s, 1) },
  { id: 'select.previous', label: 'Select previous module', group: 'select', shortcut: ['['], enabled: (s) => s.doc.modules.length > 0, run: (s) => stepSelection(s, -1) },
  {
    id: 'select.escape', label: 'Cancel gesture / clear selection', group: 'select', shortcut: ['Escape'],
    enabled: (s) => s.gesture !== null || s.placing !== null || s.selection.length > 0 || s.openingSelection !== null || s.shortcutSheetOpen,
    run: (s) => (s.gesture ? s.cancelGesture() : s.placing ? s.setPlacing(null) : s.shortcutSheetOpen ? s.setShortcutSheet(false) : s.select([])),
  },

  { id: 'view.zoom-in', label: 'Zoom in', group: 'view', shortcut: ['=', 'Plus'], enabled: () => true, run: (s) => s.zoomBy(1.25) },
  { id: 'view.zoom-out', label: 'Zoom out', group: 'view', shortcut: ['-'], enabled: () => true, run: (s) => s.zoomBy(0.8) },
  { id: 'view.fit', label: 'Fit bay', group: 'view', shortcut: ['0'], enabled: () => true, run: (s) => s.fit() },
  { id: 'view.actual', label: 'Actual size (1:1)', group: 'view', shortcut: ['1'], enabled: () => true, run: (s) => s.actualSize() },
  { id: 'view.phantom', label: 'Show the other arrangement in phantom lines', group: 'view', shortcut: ['O'], enabled: () => true, run: (s) => s.setPhantom(s.phantom ? null : phantomPartner(s.arrangement)) },
  { id: 'view.steps', label: 'Move in steps or freely', group: 'view', shortcut: ['Shift+S'], enabled: editable, run: (s) => s.setSteps({ enabled: !s.steps.enabled }) },
  {
    id: 'view.grid-step', label: 'Next step size (10 / 50 / 100 mm)', group: 'view', shortcut: ['G'], enabled: editable,
    run: (s) => s.setSteps({ step: GRID_STEPS[(GRID_STEPS.indexOf(s.steps.step) + 1) % GRID_STEPS.length], enabled: true }),
  },

  showArrangement('travel', 'T'),
  showArrangement('lounge', 'L'),
  showArrangement('sleep', 'S'),

  { id: 'help.shortcuts', label: 'Keyboard shortcuts', group: 'help', shortcut: ['?'], enabled: () => true, run: (s) => s.setShortcutSheet(!s.shortcutSheetOpen) },
];

export const COMMAND_BY_ID: Record<string, Command> = Object.fromEntries(COMMANDS.map((c) => [c.id, c]));

export function command(id: string): Command {
  const c = COMMAND_BY_ID[id];
  if (!c) throw new Error(`no editor command "${id}"`);
  return c;
}
