// The toast adapter (components/ui/toast.ts): the toast library is loaded on demand, and a toast
// asked for before it has arrived is still shown, with its options, once it has. The library is
// replaced by a recorder here; which library it is, and its outlet, the browser tests see.
import { beforeEach, describe, expect, it, vi } from 'vitest';

const shown: [string, string, unknown][] = [];
const record = (kind: string) => (message: string, options?: unknown) => void shown.push([kind, message, options]);
const imported = vi.fn();
vi.mock('sonner', () => {
  imported();
  return { toast: Object.assign(record('message'), { success: record('success'), error: record('error'), warning: record('warning') }), Toaster: () => null };
});

beforeEach(() => {
  shown.length = 0;
});

describe('toast adapter', () => {
  it('loads nothing until a toast is asked for or the outlet asks for it', async () => {
    vi.resetModules();
    imported.mockClear();
    await import('@/components/ui/toast');
    expect(imported).not.toHaveBeenCalled();
  });

  it('delivers each kind of toast, with its options, once the library is in', async () => {
    vi.resetModules();
    const { toast, loadToastLibrary } = await import('@/components/ui/toast');
    toast('Proposals cancelled.');
    toast.success('Bench placed.', { duration: 2500 });
    toast.error('Not saved: the server is unreachable.');
    toast.warning('Not applied: length below 100 mm.');
    expect(shown).toEqual([]); // asked for, the library still on its way
    await loadToastLibrary();
    await Promise.resolve();
    expect(shown).toEqual([
      ['message', 'Proposals cancelled.', undefined],
      ['success', 'Bench placed.', { duration: 2500 }],
      ['error', 'Not saved: the server is unreachable.', undefined],
      ['warning', 'Not applied: length below 100 mm.', undefined],
    ]);
  });

  it('tells the outlet at the first toast, so it mounts at once rather than at idle time', async () => {
    vi.resetModules();
    const { toast, onFirstToast } = await import('@/components/ui/toast');
    const mount = vi.fn();
    const stop = onFirstToast(mount);
    toast.error('Unknown module kind "boat".');
    expect(mount).toHaveBeenCalledTimes(1);
    stop();
    toast.error('again');
    expect(mount).toHaveBeenCalledTimes(1);
  });
});
