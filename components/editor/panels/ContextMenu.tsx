'use client';
/**
 * The plan's context menu: the same command objects as toolbar and keyboard. Opens at the
 * pointer, closes on choice, Escape or a click elsewhere; arrow keys move between items.
 */
import { useEffect, useRef } from 'react';
import { toast } from '@/components/ui/toast';
import { command } from '../commands/commands';
import { formatShortcut, isMacPlatform } from '../commands/shortcuts';
import { useEditorApi, useEditor } from '../store/EditorStoreContext';
import { runWaitingCommits } from '@/components/ui/afterNextPaint';

const ITEMS = ['edit.rotate', 'edit.duplicate', 'edit.delete', 'select.all', 'view.fit', 'view.phantom', 'help.shortcuts'];

export function ContextMenu({ at, onClose }: { at: { x: number; y: number }; onClose: () => void }) {
  const api = useEditorApi();
  useEditor((s) => s.selection); // re-render when the selection changes
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    ref.current?.querySelector<HTMLButtonElement>('button:not([disabled])')?.focus();
    const away = (e: PointerEvent) => {
      if (!ref.current?.contains(e.target as Node)) onClose();
    };
    // Escape closes it wherever the focus is (a long press leaves it on the plan).
    const escape = (e: KeyboardEvent) => {
      if (e.key === 'Escape') onClose();
    };
    window.addEventListener('pointerdown', away, true);
    window.addEventListener('keydown', escape);
    return () => {
      window.removeEventListener('pointerdown', away, true);
      window.removeEventListener('keydown', escape);
    };
  }, [onClose]);
  const mac = isMacPlatform();
  return (
    <div
      ref={ref}
      role="menu"
      aria-label="Module actions"
      style={{ left: at.x, top: at.y }}
      className="absolute z-20 min-w-52 rounded border border-paper-edge bg-paper py-1 text-sm shadow-lg"
      onKeyDown={(e) => {
        if (e.key === 'Escape') {
          e.stopPropagation();
          onClose();
        }
        if (e.key === 'ArrowDown' || e.key === 'ArrowUp') {
          e.preventDefault();
          e.stopPropagation();
          const items = [...(ref.current?.querySelectorAll<HTMLButtonElement>('button:not([disabled])') ?? [])];
          const i = items.indexOf(document.activeElement as HTMLButtonElement);
          items[(i + (e.key === 'ArrowDown' ? 1 : items.length - 1)) % items.length]?.focus();
        }
      }}
    >
      {ITEMS.map((id) => {
        const c = command(id);
        const enabled = c.enabled(api.getState());
        return (
          <button
            key={id}
            type="button"
            role="menuitem"
            disabled={!enabled}
            onClick={() => {
              runWaitingCommits();
              const r = c.run(api.getState());
              if (r && !r.ok && r.error) toast.error(r.error);
              onClose();
            }}
            className="flex w-full justify-between gap-6 px-3 py-1 text-left hover:bg-paper-deep focus:bg-paper-deep focus:outline-none disabled:opacity-40"
          >
            <span>{c.label}</span>
            <span className="font-mono text-xs text-ink-soft">{formatShortcut(c.shortcut[0], mac)}</span>
          </button>
        );
      })}
    </div>
  );
}
