import type { ReactNode } from 'react';
import { QueryProvider } from '@/components/ui/QueryProvider';

/** The layouts table, the new-layout form and every layout page read through the query cache. */
export default function LayoutsSection({ children }: { children: ReactNode }) {
  return <QueryProvider>{children}</QueryProvider>;
}
