'use client';
/**
 * The toast outlet, for the pages whose client parts call `toast()` (components/ui/toast.ts). A
 * page that calls `toast()` without this mounted shows nothing, so every such page renders it
 * (see AppProviders).
 *
 * It mounts the toast library's outlet (a polite live region) once the browser is idle after the
 * page has loaded, before a person has done anything that toasts, or at once when a toast is asked
 * for sooner; the library is not in the page's first-load JavaScript.
 */
import { useEffect, useState, type ComponentType } from 'react';
import type { ToasterProps } from 'sonner';
import { loadToastLibrary, onFirstToast } from './toast';
import { whenIdle } from './whenIdle';

export function Toasts() {
  const [Outlet, setOutlet] = useState<ComponentType<ToasterProps> | null>(null);
  useEffect(() => {
    let live = true;
    let asked = false;
    const mount = () => {
      if (asked) return;
      asked = true;
      loadToastLibrary().then(
        (l) => live && setOutlet(() => l.Toaster),
        () => {
          asked = false; // the next toast tries again
        },
      );
    };
    const stop = onFirstToast(mount);
    const cancel = whenIdle(mount);
    return () => {
      live = false;
      stop();
      cancel();
    };
  }, []);
  return Outlet ? <Outlet position="bottom-right" toastOptions={{ className: 'font-sans' }} /> : null;
}
