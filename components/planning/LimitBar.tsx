'use client';
/**
 * One measured value against its limit as a labelled bar: the number in the mono face, the
 * limit, and a word and icon for within/over (never colour alone). For "at least" limits
 * (payload wanted) pass `atLeast`. Draws what it is given; judges nothing beyond the comparison.
 */
import { CircleCheck, CircleX, CircleHelp } from 'lucide-react';
import { formatNumber } from '@/lib/format';

export function LimitBar({ label, value, limit, unit, atLeast = false, testId }: {
  label: string;
  value: number | null;
  limit: number | null;
  unit: string;
  atLeast?: boolean;
  testId?: string;
}) {
  const known = value !== null && limit !== null && limit > 0;
  const ok = known && (atLeast ? value >= limit : value <= limit);
  const share = known ? Math.max(0, Math.min(1.25, value / limit)) : 0;
  const fmt = (n: number) => formatNumber(n);
  return (
    <div data-testid={testId} data-ok={known ? String(ok) : 'unknown'}>
      <div className="flex items-baseline justify-between gap-2 text-sm">
        <span>{label}</span>
        <span className="font-mono">
          {value === null ? '—' : `${fmt(value)} ${unit}`}
          <span className="text-ink-soft"> {atLeast ? 'wanted ≥' : 'of'} {limit === null ? '—' : `${fmt(limit)} ${unit}`}</span>
        </span>
      </div>
      <div className="relative mt-1 h-2 rounded-sm bg-paper-deep" aria-hidden="true">
        {known && <div className={`absolute inset-y-0 left-0 rounded-sm ${ok ? 'bg-moss' : 'bg-brick'}`} style={{ width: `${(share / 1.25) * 100}%` }} />}
        <div className="absolute inset-y-[-2px] w-px bg-ink" style={{ left: `${(1 / 1.25) * 100}%` }} />
      </div>
      <p className={`mt-0.5 flex items-center gap-1 text-xs ${!known ? 'text-ink-soft' : ok ? 'text-moss' : 'text-brick'}`}>
        {!known ? <CircleHelp size={12} aria-hidden="true" /> : ok ? <CircleCheck size={12} aria-hidden="true" /> : <CircleX size={12} aria-hidden="true" />}
        {!known
          ? 'Not known yet: enter the values on the left'
          : atLeast
            ? ok ? `${fmt(value - limit)} ${unit} more than wanted` : `${fmt(limit - value)} ${unit} short`
            : ok ? `${fmt(limit - value)} ${unit} to spare` : `${fmt(value - limit)} ${unit} over`}
      </p>
    </div>
  );
}
