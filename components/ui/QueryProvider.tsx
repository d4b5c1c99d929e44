'use client';
/**
 * The query cache, for the pages whose client parts read or write through TanStack Query. Kept
 * out of the root layout so pages without such parts (sign-in, the start page, the outbox) do
 * not ship it; a page wraps only the subtree that needs it.
 */
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';

export function QueryProvider({ children }: { children: ReactNode }) {
  const [client] = useState(
    () => new QueryClient({ defaultOptions: { queries: { staleTime: 10_000, retry: 1, refetchOnWindowFocus: false } } }),
  );
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
