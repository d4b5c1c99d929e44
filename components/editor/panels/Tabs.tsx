'use client';
/**
 * Small accessible tabs (WAI-ARIA tabs pattern: arrow keys move between tabs). Used by the side
 * and bottom panels. Never holds editor state.
 */
import { useId, useRef, type ReactNode } from 'react';

export interface TabDef {
  id: string;
  label: ReactNode;
  /** Plain-text name for assistive technology when the label has icons or counts. */
  title: string;
}

export function Tabs({ tabs, active, onChange, children, className = '' }: { tabs: TabDef[]; active: string; onChange: (id: string) => void; children: ReactNode; className?: string }) {
  const base = useId();
  const refs = useRef<(HTMLButtonElement | null)[]>([]);
  const onKey = (e: React.KeyboardEvent, i: number) => {
    if (e.key !== 'ArrowRight' && e.key !== 'ArrowLeft') return;
    e.preventDefault();
    const next = (i + (e.key === 'ArrowRight' ? 1 : tabs.length - 1)) % tabs.length;
    onChange(tabs[next].id);
    refs.current[next]?.focus();
  };
  return (
    <div className={`flex min-h-0 flex-col ${className}`}>
      <div role="tablist" className="flex shrink-0 gap-1 border-b border-paper-edge bg-paper-deep px-2">
        {tabs.map((t, i) => (
          <button
            key={t.id}
            ref={(el) => {
              refs.current[i] = el;
            }}
            role="tab"
            type="button"
            id={`${base}-tab-${t.id}`}
            aria-selected={active === t.id}
            aria-controls={`${base}-panel`}
            aria-label={t.title}
            tabIndex={active === t.id ? 0 : -1}
            onClick={() => onChange(t.id)}
            onKeyDown={(e) => onKey(e, i)}
            className={`-mb-px flex items-center gap-1.5 border-b-2 px-3 py-2 text-sm ${active === t.id ? 'border-copper font-medium text-ink' : 'border-transparent text-ink-soft hover:text-ink'}`}
          >
            {t.label}
          </button>
        ))}
      </div>
      <div role="tabpanel" id={`${base}-panel`} aria-labelledby={`${base}-tab-${active}`} className="min-h-0 flex-1 overflow-auto">
        {children}
      </div>
    </div>
  );
}
