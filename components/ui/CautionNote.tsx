/**
 * A caution in the look of the product: an ochre rule, a warning triangle and a word, never
 * colour alone. Its words always come from lib/layout/cautions. Presentation only.
 */
import { TriangleAlert } from 'lucide-react';
import type { ReactNode } from 'react';

export function CautionNote({ title, children, compact = false, testId }: { title?: string; children: ReactNode; compact?: boolean; testId?: string }) {
  return (
    <div role="note" className={`flex gap-2 rounded-sm border border-ochre bg-ochre-light text-ink ${compact ? 'p-2 text-xs' : 'p-3 text-sm'}`} data-testid={testId}>
      <TriangleAlert size={compact ? 13 : 15} className="mt-0.5 shrink-0 text-ochre" aria-hidden="true" />
      <p>{title && <strong className="font-semibold">{title}: </strong>}{children}</p>
    </div>
  );
}
