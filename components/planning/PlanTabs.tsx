'use client';
/**
 * Tabs of the build-plan page (WAI-ARIA tabs pattern: arrow keys, Home and End move between
 * tabs; the active one is in the tab order). Holds no state: the page says which is active.
 */
import { useId, useRef, type ReactNode } from 'react';

export interface PlanTab {
  id: string;
  label: ReactNode;
  /** Plain-text name for assistive technology when the label carries icons or counts. */
  title: string;
}

export function PlanTabs({ tabs, active, onChange, children }: { tabs: PlanTab[]; active: string; onChange: (id: string) => void; children: ReactNode }) {
  const base = useId();
  const refs = useRef<(HTMLButtonElement | null)[]>([]);
  const move = (i: number) => {
    onChange(tabs[i].id);
    refs.current[i]?.focus();
  };
  const onKey = (e: React.KeyboardEvent, i: number) => {
    if (e.key === 'ArrowRight') move((i + 1) % tabs.length);
    else if (e.key === 'ArrowLeft') move((i + tabs.length - 1) % tabs.length);
    else if (e.key === 'Home') move(0);
    else if (e.key === 'End') move(tabs.length - 1);
    else return;
    e.preventDefault();
  };
  return (
    <div className="panel">
      <div role="tablist" aria-label="Build plan" className="flex flex-wrap gap-1 border-b border-paper-edge bg-paper-deep px-2">
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
            data-tab={t.id}
            className={`-mb-px border-b-2 px-3 py-2 text-sm ${active === t.id ? 'border-copper font-medium text-ink' : 'border-transparent text-ink-soft hover:text-ink'}`}
          >
            {t.label}
          </button>
        ))}
      </div>
      <div role="tabpanel" id={`${base}-panel`} aria-labelledby={`${base}-tab-${active}`}>
        {children}
      </div>
    </div>
  );
}
