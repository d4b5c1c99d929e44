'use client';
/**
 * Query cache and toast outlet together, for the pages whose client parts use both (the editor,
 * the build planner, settings, clients, revisions, the sheet, the viewer link…). Pages that need
 * neither (sign-in, the start page, the outbox) render without them and stay small.
 */
import type { ReactNode } from 'react';
import { QueryProvider } from './QueryProvider';
import { Toasts } from './Toasts';

export function AppProviders({ children }: { children: ReactNode }) {
  return (
    <QueryProvider>
      {children}
      <Toasts />
    </QueryProvider>
  );
}
