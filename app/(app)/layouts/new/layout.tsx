import type { ReactNode } from 'react';
import { Toasts } from '@/components/ui/Toasts';

/** Pages below here confirm and report with toasts; the query cache comes from the layouts section. */
export default function WithToasts({ children }: { children: ReactNode }) {
  return (
    <>
      {children}
      <Toasts />
    </>
  );
}
