import type { ReactNode } from 'react';
import { QueryProvider } from '@/components/ui/QueryProvider';
import { Toasts } from '@/components/ui/Toasts';

/**
 * The layouts table, the new-layout form and every layout page read through the query cache and
 * confirm and report with toasts (the table's row actions too). The toast library itself loads
 * after the page (components/ui/toast.ts).
 */
export default function LayoutsSection({ children }: { children: ReactNode }) {
  return (
    <QueryProvider>
      {children}
      <Toasts />
    </QueryProvider>
  );
}
