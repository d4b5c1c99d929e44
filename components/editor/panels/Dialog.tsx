'use client';
/**
 * A modal dialog on the native <dialog> element (focus trapping and Escape come with it).
 * Never holds editor state.
 */
import { useEffect, useRef, type ReactNode } from 'react';

export function Dialog({ open, title, onClose, children, testId }: { open: boolean; title: string; onClose: () => void; children: ReactNode; testId?: string }) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) d.showModal();
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      aria-label={title}
      data-testid={testId}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      className="m-auto max-w-lg rounded border border-paper-edge bg-paper p-0 text-ink shadow-xl backdrop:bg-ink/30"
    >
      {open && (
        <div className="p-5">
          <h2 className="mb-3 text-base font-semibold">{title}</h2>
          {children}
        </div>
      )}
    </dialog>
  );
}
