'use client';
/**
 * A toolbar or panel button for one editor command: the same object the keyboard and context
 * menu use, so label, shortcut and enabled state always agree. Never runs anything else.
 */
import { memo, type ComponentType } from 'react';
import { RotateCw, Copy, Trash2, Undo2, Redo2, ZoomIn, ZoomOut, Maximize, Ruler, Keyboard, SquareDashed, Save, type LucideProps } from 'lucide-react';
import { toast } from '@/components/ui/toast';
import { command } from '../commands/commands';
import { formatShortcut, isMacPlatform } from '../commands/shortcuts';
import { useEditor, useEditorApi } from '../store/EditorStoreContext';
import { runWaitingCommits } from '@/components/ui/afterNextPaint';

const ICONS: Record<string, ComponentType<LucideProps>> = {
  'edit.rotate': RotateCw, 'edit.duplicate': Copy, 'edit.delete': Trash2, 'edit.undo': Undo2, 'edit.redo': Redo2,
  'view.zoom-in': ZoomIn, 'view.zoom-out': ZoomOut, 'view.fit': Maximize, 'view.actual': Ruler, 'help.shortcuts': Keyboard,
  'view.phantom': SquareDashed, 'edit.save': Save,
};

/** Memoised: a toolbar re-rendered for its save status does not rebuild every button and icon. */
export const CommandButton = memo(function CommandButton({ id, withLabel = false, pressed }: { id: string; withLabel?: boolean; pressed?: boolean }) {
  const api = useEditorApi();
  const c = command(id);
  const enabled = useEditor((s) => c.enabled(s));
  // Undo and redo name the step they would take ("Undo Move 1 module").
  const step = useEditor((s) => (id === 'edit.undo' ? s.history.past[s.history.past.length - 1]?.label : id === 'edit.redo' ? s.history.future[0]?.label : undefined));
  const Icon = ICONS[id];
  const keys = formatShortcut(c.shortcut[0], isMacPlatform());
  return (
    <button
      type="button"
      disabled={!enabled}
      aria-pressed={pressed}
      aria-keyshortcuts={c.shortcut[0].replace('Mod', isMacPlatform() ? 'Meta' : 'Control')}
      title={`${c.label}${step ? `: ${step}` : ''} (${keys})`}
      aria-label={withLabel ? undefined : c.label}
      onClick={() => {
        runWaitingCommits();
        const r = c.run(api.getState());
        if (r && !r.ok && r.error) toast.error(r.error);
      }}
      className={`inline-flex items-center gap-1.5 rounded border px-2 py-1 text-sm disabled:cursor-not-allowed disabled:opacity-40 ${pressed ? 'border-copper bg-copper-light text-copper-dark' : 'border-paper-edge bg-paper text-ink hover:border-ink-faint'}`}
    >
      {Icon && <Icon size={15} aria-hidden />}
      {withLabel && <span>{c.label}</span>}
    </button>
  );
});
