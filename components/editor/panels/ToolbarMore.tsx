'use client';
/**
 * The tablet toolbar's overflow: a "More" button opening a panel with the tools that do not fit
 * in one row (view, steps, units, phantom lines, the page's own tools). Closes on Escape, on a
 * tap outside it, and after a link in it is followed. Never runs anything itself.
 */
import { useEffect, useId, useRef, useState, type ReactNode } from 'react';
import { Ellipsis } from 'lucide-react';

export function ToolbarMore({ children }: { children: ReactNode }) {
  const [open, setOpen] = useState(false);
  const box = useRef<HTMLDivElement>(null);
  const panelId = useId();
  useEffect(() => {
    if (!open) return;
    const away = (e: PointerEvent) => {
      if (!box.current?.contains(e.target as Node)) setOpen(false);
    };
    const key = (e: KeyboardEvent) => {
      if (e.key === 'Escape') {
        setOpen(false);
        box.current?.querySelector<HTMLButtonElement>('button[aria-controls]')?.focus();
      }
    };
    window.addEventListener('pointerdown', away, true);
    window.addEventListener('keydown', key);
    return () => {
      window.removeEventListener('pointerdown', away, true);
      window.removeEventListener('keydown', key);
    };
  }, [open]);
  return (
    <div ref={box} className="relative">
      <button
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        aria-label="More tools"
        data-testid="toolbar-more"
        onClick={() => setOpen((o) => !o)}
        className={`inline-flex items-center justify-center rounded border px-2 ${open ? 'border-ink bg-paper-deep' : 'border-paper-edge bg-paper'}`}
      >
        <Ellipsis size={18} aria-hidden />
      </button>
      <div
        id={panelId}
        role="group"
        aria-label="More tools"
        hidden={!open}
        data-testid="toolbar-more-panel"
        // Following a link or picking a command closes the panel; form controls keep it open.
        onClick={(e) => {
          if ((e.target as HTMLElement).closest('a')) setOpen(false);
        }}
        className="absolute right-0 top-full z-40 mt-1 w-[min(26rem,calc(100vw-1rem))] space-y-3 rounded border border-paper-edge bg-paper p-3 shadow-xl"
      >
        {children}
      </div>
    </div>
  );
}
