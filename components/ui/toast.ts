/**
 * Toasts: the one way client code shows them (`toast('…')`, `toast.success`, `toast.error`,
 * `toast.warning`, with the toast library's options). The library (sonner) is not in any page's
 * first load: it is fetched when the page's toast outlet mounts it once the browser is idle
 * (Toasts.tsx), or by the first toast asked for before that, whichever comes first. Evaluating it
 * inserts its stylesheet, work a page's first draw can do without.
 *
 * A toast asked for while the library is on its way is shown when it has arrived: the outlet
 * replays the toasts made before it subscribed. Nothing else imports the library (eslint.config.mjs).
 */
import type { ExternalToast } from 'sonner';

type Library = typeof import('sonner');
type Show = (message: string, options?: ExternalToast) => void;

let library: Promise<Library> | null = null;
const askedFor = new Set<() => void>();

/** The toast library, fetched once; a failed fetch is tried again by the next toast. */
export function loadToastLibrary(): Promise<Library> {
  if (!library) {
    library = import('sonner');
    library.catch(() => {
      library = null;
    });
  }
  return library;
}

/** Called at the first toast asked for (the outlet mounts at once rather than at idle time). */
export function onFirstToast(listener: () => void): () => void {
  askedFor.add(listener);
  return () => askedFor.delete(listener);
}

const via = (pick: (l: Library) => Show): Show => (message, options) => {
  askedFor.forEach((listener) => listener());
  loadToastLibrary().then(
    (l) => pick(l)(message, options),
    // The page could not fetch a script of its own: say so where a developer looks.
    (err: unknown) => console.error('A toast could not be shown:', message, err),
  );
};

export const toast = Object.assign(
  via((l) => l.toast),
  {
    success: via((l) => l.toast.success),
    error: via((l) => l.toast.error),
    warning: via((l) => l.toast.warning),
  },
);
