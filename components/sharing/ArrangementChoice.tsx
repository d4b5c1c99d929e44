'use client';
/**
 * Which arrangement two drawings side by side show: travel, lounge or sleep, as one radio group.
 * Shared by the revision and the variant comparisons.
 */
import type { Arrangement } from '@/lib/layout/schema';
import { ARRANGEMENTS } from '@/lib/layout/vocabulary';

export const ARRANGEMENT_WORD: Record<Arrangement, string> = { travel: 'Travel', lounge: 'Lounge', sleep: 'Sleep' };

export function ArrangementChoice({ value, onChange }: { value: Arrangement; onChange: (a: Arrangement) => void }) {
  return (
    <div role="radiogroup" aria-label="Arrangement" className="flex overflow-hidden rounded border border-ink-faint">
      {ARRANGEMENTS.map((a) => (
        <button key={a} type="button" role="radio" aria-checked={value === a} onClick={() => onChange(a)}
          className={`px-3 py-1 text-sm ${value === a ? 'bg-ink text-paper' : 'bg-paper text-ink hover:bg-paper-deep'}`}>
          {ARRANGEMENT_WORD[a]}
        </button>
      ))}
    </div>
  );
}
