'use client';
/** The shortcut sheet (`?`): every command with its keys, from the one command list. */
import { memo } from 'react';
import { useShallow } from 'zustand/react/shallow';
import { COMMANDS, type CommandGroup } from '../commands/commands';
import { formatShortcut, isMacPlatform } from '../commands/shortcuts';
import { useEditor, useEditorApi } from '../store/EditorStoreContext';
import { Dialog } from './Dialog';

const GROUPS: { id: CommandGroup; title: string }[] = [
  { id: 'edit', title: 'Edit' }, { id: 'select', title: 'Select' }, { id: 'view', title: 'View' }, { id: 'arrangement', title: 'Arrangements' }, { id: 'help', title: 'Help' },
];

/** Memoised (no props): an edit that re-renders the editor does not rebuild the closed sheet. */
export const ShortcutSheet = memo(function ShortcutSheet() {
  const api = useEditorApi();
  const { open, readOnly } = useEditor(useShallow((s) => ({ open: s.shortcutSheetOpen, readOnly: s.readOnly })));
  const mac = isMacPlatform();
  return (
    <Dialog open={open} title="Keyboard shortcuts" onClose={() => api.getState().setShortcutSheet(false)} testId="shortcut-sheet">
      <div className="grid max-h-[60vh] grid-cols-1 gap-4 overflow-auto text-sm sm:grid-cols-2">
        {GROUPS.map((g) => {
          const list = COMMANDS.filter((c) => c.group === g.id && !(readOnly && c.group === 'edit'));
          if (list.length === 0) return null;
          return (
            <section key={g.id}>
              <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-ink-soft">{g.title}</h3>
              <dl className="space-y-0.5">
                {list.map((c) => (
                  <div key={c.id} className="flex justify-between gap-3">
                    <dt>{c.label}</dt>
                    <dd className="shrink-0 font-mono text-xs text-ink-soft">{c.shortcut.map((s) => formatShortcut(s, mac)).join(' / ')}</dd>
                  </div>
                ))}
              </dl>
            </section>
          );
        })}
        <section>
          <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-ink-soft">Pointer</h3>
          <dl className="space-y-0.5">
            <div className="flex justify-between gap-3"><dt>Pan</dt><dd className="font-mono text-xs text-ink-soft">Space + drag / middle button</dd></div>
            <div className="flex justify-between gap-3"><dt>Zoom</dt><dd className="font-mono text-xs text-ink-soft">Wheel / pinch</dd></div>
            <div className="flex justify-between gap-3"><dt>Add to selection</dt><dd className="font-mono text-xs text-ink-soft">Shift + click</dd></div>
          </dl>
        </section>
      </div>
      <div className="mt-4 text-right">
        <button type="button" onClick={() => api.getState().setShortcutSheet(false)} className="rounded bg-ink px-3 py-1 text-sm text-paper">Close</button>
      </div>
    </Dialog>
  );
});
