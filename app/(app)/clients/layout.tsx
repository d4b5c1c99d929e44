import type { ReactNode } from 'react';
import { AppProviders } from '@/components/ui/AppProviders';

/** This page's panels read and write through the query cache and report with toasts. */
export default function WithAppProviders({ children }: { children: ReactNode }) {
  return <AppProviders>{children}</AppProviders>;
}
