'use client';
/**
 * A panel that stands beside the plan on a desktop and slides over it as a drawer on a tablet or
 * phone: one drawer open at a time (components/ui/drawers.ts), a heading with a 44 px close button,
 * Escape closes it. The panel inside is rendered once in both cases and keeps its state while
 * closed (hidden, not unmounted). Must never know what the panel inside does.
 */
import { useEffect, useRef, type ReactNode } from 'react';
import { X } from 'lucide-react';
import { setDrawer, useOpenDrawer, type DrawerId } from './drawers';

const SIDE: Record<'left' | 'right' | 'bottom', string> = {
  left: 'inset-y-0 left-0 w-[min(22rem,88vw)] border-r',
  right: 'inset-y-0 right-0 w-[min(24rem,92vw)] border-l',
  bottom: 'inset-x-0 bottom-0 h-[min(60%,28rem)] border-t',
};

export interface DrawerProps {
  id: DrawerId;
  title: string;
  side: 'left' | 'right' | 'bottom';
  /** True: a drawer over the plan. False: docked beside it (desktop), shown when `dockedOpen`. */
  floating: boolean;
  /** Classes of the docked panel (width, borders). */
  dockedClassName?: string;
  /** Docked panels that can be closed (Mark-ups) pass whether they are open; others are always shown. */
  dockedOpen?: boolean;
  children: ReactNode;
}

export function Drawer({ id, title, side, floating, dockedClassName = '', dockedOpen = true, children }: DrawerProps) {
  const open = useOpenDrawer() === id;
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (!floating || !open) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape' && !e.defaultPrevented) setDrawer(null);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [floating, open]);

  if (!floating) {
    return <div className={`${dockedClassName} ${dockedOpen ? '' : 'hidden'}`} data-drawer={id} data-docked="">{children}</div>;
  }
  return (
    <div
      ref={ref}
      role="dialog"
      aria-modal="false"
      aria-label={title}
      hidden={!open}
      data-drawer={id}
      data-open={open ? 'yes' : 'no'}
      className={`absolute z-30 flex flex-col border-paper-edge bg-paper shadow-xl ${SIDE[side]} ${open ? '' : 'hidden'}`}
    >
      <div className="flex shrink-0 items-center gap-2 border-b border-paper-edge pl-3">
        <h2 className="text-sm font-semibold">{title}</h2>
        <button type="button" className="ml-auto inline-flex size-11 items-center justify-center text-ink-soft hover:text-ink" aria-label={`Close ${title}`} onClick={() => setDrawer(null)}>
          <X size={18} aria-hidden />
        </button>
      </div>
      <div className="flex min-h-0 flex-1 flex-col overflow-auto">{children}</div>
    </div>
  );
}
