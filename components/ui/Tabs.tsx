'use client';
/**
 * The one tabs component (WAI-ARIA tabs pattern): arrow keys move between tabs and wrap, Home and
 * End go to the first and last, only the active tab is in the tab order, and the panel is labelled
 * by its tab. Used by the editor's side and bottom panels and the build plan. Holds no state: the
 * caller says which tab is active.
 */
import { useId, useRef, type ReactNode } from 'react';

export interface TabDef {
  id: string;
  label: ReactNode;
  /** Plain-text name for assistive technology when the label carries icons or counts. */
  title: string;
}

export interface TabsProps {
  tabs: TabDef[];
  active: string;
  onChange: (id: string) => void;
  children: ReactNode;
  /** What the tabs choose between, for assistive technology ("Build plan"). */
  label?: string;
  /** Classes of the outer box (its size and frame). */
  className?: string;
  /** Classes of the panel under the tabs. */
  panelClassName?: string;
}

export function Tabs({ tabs, active, onChange, children, label, className = '', panelClassName = '' }: TabsProps) {
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
    <div className={className}>
      <div role="tablist" aria-label={label} className="flex shrink-0 flex-wrap gap-1 border-b border-paper-edge bg-paper-deep px-2">
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
            className={`-mb-px flex items-center gap-1.5 border-b-2 px-3 py-2 text-sm ${active === t.id ? 'border-copper font-medium text-ink' : 'border-transparent text-ink-soft hover:text-ink'}`}
          >
            {t.label}
          </button>
        ))}
      </div>
      <div role="tabpanel" id={`${base}-panel`} aria-labelledby={`${base}-tab-${active}`} className={panelClassName}>
        {children}
      </div>
    </div>
  );
}
