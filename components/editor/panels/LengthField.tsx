'use client';
/**
 * A length input in the person's units that commits whole millimetres when left or on Enter.
 * Text that is not a length is shown as an error and never committed. Never edits the store
 * itself: the caller's onCommit does, after the next paint, and its refusal is shown beside the field.
 */
import { useId, useRef, useState } from 'react';
import { parseLength, toUnit, type LengthUnit } from '@/lib/layout/units';
import { commitAfterNextPaint } from '@/components/ui/afterNextPaint';

export function LengthField({ label, hint, valueMm, unit, onCommit, disabled, min = 0, max, testId, compact = false }: {
  label: string;
  /** A few words after the label saying where it is measured from (read as the field's description). */
  hint?: string;
  valueMm: number;
  unit: LengthUnit;
  onCommit: (mm: number) => { ok: boolean; error?: string };
  disabled?: boolean;
  min?: number;
  /** Upper limit in mm (from the schema's limits); none when absent. */
  max?: number;
  testId?: string;
  compact?: boolean;
}) {
  const id = useId();
  const shown = String(toUnit(valueMm, unit));
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const pending = useRef<number | null>(null);
  const commit = () => {
    if (draft === null) return;
    const v = parseLength(draft, unit);
    if (v === null) return setError('Type a length, e.g. 1200, 120 cm or 47 in');
    if (v < min) return setError(`At least ${min} mm`);
    if (max !== undefined && v > max) return setError(`At most ${max} mm`);
    if (v === valueMm) {
      setDraft(null);
      setError(null);
      return;
    }
    // Committed after the paint that answers the key (the focus moving on), as the Details form does;
    // Enter and then leaving the field within that frame commit once.
    if (pending.current === v) return;
    pending.current = v;
    commitAfterNextPaint(() => {
      pending.current = null;
      const r = onCommit(v);
      if (!r.ok) return setError(r.error ?? 'Refused');
      setDraft(null);
      setError(null);
    });
  };
  return (
    <div className={compact ? '' : 'block'}>
      <label htmlFor={id} className={compact ? 'sr-only' : 'text-xs text-ink-soft'}>{label}</label>
      {hint && <span id={`${id}-hint`} className={compact ? 'sr-only' : 'text-xs text-ink-soft'}> · {hint}</span>}
      <span className="mt-0.5 flex items-center rounded border border-paper-edge bg-paper focus-within:ring-2 focus-within:ring-copper">
        <input
          id={id}
          value={draft ?? shown}
          disabled={disabled}
          inputMode="decimal"
          aria-invalid={!!error}
          aria-describedby={hint ? `${id}-hint` : undefined}
          data-testid={testId}
          onChange={(e) => setDraft(e.target.value)}
          onBlur={commit}
          onKeyDown={(e) => {
            if (e.key === 'Enter') commit();
            if (e.key === 'Escape') {
              setDraft(null);
              setError(null);
            }
          }}
          className="w-full min-w-0 bg-transparent px-2 py-1 font-mono text-sm outline-none disabled:text-ink-soft"
        />
        <span className="pr-2 font-mono text-xs text-ink-soft">{unit}</span>
      </span>
      {error && <span className="mt-0.5 block text-xs text-brick" role="alert">{error}</span>}
    </div>
  );
}
