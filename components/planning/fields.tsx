'use client';
/**
 * Form fields of the build-planning panels, wired to react-hook-form: a quantity box with its
 * unit shown beside it (the text may carry its own unit, e.g. `2.1 t`), a yes/no/not-answered
 * select, a checkbox, and a group heading. Every value is shown in the mono face. They hold no
 * state of their own and never convert anything: the panel's schema does.
 */
import { useId, type ReactNode } from 'react';
import type { FieldError, UseFormRegisterReturn } from 'react-hook-form';

export function QuantityField({ label, unit, reg, error, placeholder, hint, disabled, testId }: {
  label: string;
  unit: string;
  reg: UseFormRegisterReturn;
  error?: FieldError | { message?: string };
  placeholder?: string;
  hint?: string;
  disabled?: boolean;
  testId?: string;
}) {
  const id = useId();
  return (
    <div>
      <label htmlFor={id} className="label">{label}</label>
      <span className={`flex items-center rounded-sm border bg-white/70 focus-within:border-copper ${error ? 'border-brick' : 'border-ink-faint'}`}>
        <input
          id={id}
          {...reg}
          disabled={disabled}
          placeholder={placeholder}
          inputMode="decimal"
          autoComplete="off"
          aria-invalid={!!error}
          aria-describedby={error || hint ? `${id}-note` : undefined}
          data-testid={testId}
          className="w-full min-w-0 bg-transparent px-2 py-1.5 font-mono text-sm outline-none disabled:text-ink-soft"
        />
        <span className="shrink-0 pr-2 font-mono text-xs text-ink-faint">{unit}</span>
      </span>
      {error?.message ? <p id={`${id}-note`} className="field-error" role="alert">{error.message}</p> : hint ? <p id={`${id}-note`} className="mt-1 text-xs text-ink-soft">{hint}</p> : null}
    </div>
  );
}

export function YesNoField({ label, reg, disabled, hint }: { label: string; reg: UseFormRegisterReturn; disabled?: boolean; hint?: string }) {
  const id = useId();
  return (
    <div>
      <label htmlFor={id} className="label">{label}</label>
      <select id={id} {...reg} disabled={disabled} className="field">
        <option value="">Not answered yet</option>
        <option value="yes">Yes</option>
        <option value="no">No</option>
      </select>
      {hint && <p className="mt-1 text-xs text-ink-soft">{hint}</p>}
    </div>
  );
}

export function CheckField({ label, reg, disabled, hint }: { label: ReactNode; reg: UseFormRegisterReturn; disabled?: boolean; hint?: string }) {
  return (
    <label className="flex items-start gap-2 text-sm">
      <input type="checkbox" {...reg} disabled={disabled} className="mt-0.5 accent-copper" />
      <span>
        {label}
        {hint && <span className="block text-xs text-ink-soft">{hint}</span>}
      </span>
    </label>
  );
}

export function FieldGroup({ title, children, note }: { title: string; children: ReactNode; note?: ReactNode }) {
  return (
    <fieldset className="rounded-sm border border-paper-edge p-3">
      <legend className="px-1 text-sm font-semibold">{title}</legend>
      {note && <div className="mb-2 text-xs text-ink-soft">{note}</div>}
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">{children}</div>
    </fieldset>
  );
}

/** A caution box: safety notes that always defer to local codes and licensed practice. */
export function Caution({ children }: { children: ReactNode }) {
  return (
    <div role="note" className="rounded-sm border border-ochre bg-ochre-light p-3 text-sm">
      <p className="font-semibold">Safety</p>
      <div className="mt-1 space-y-1">{children}</div>
    </div>
  );
}
