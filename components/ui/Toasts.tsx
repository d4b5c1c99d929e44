'use client';
/**
 * The toast outlet, for the pages whose client parts call `toast()` (sonner). A page that calls
 * `toast()` without this mounted shows nothing, so every such page renders it (see AppProviders).
 */
import { Toaster } from 'sonner';

export function Toasts() {
  return <Toaster position="bottom-right" toastOptions={{ className: 'font-sans' }} />;
}
