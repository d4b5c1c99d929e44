/**
 * Leading-and-trailing throttle for the live checks: the first change after a quiet spell goes
 * out at once (so a drop shows its findings quickly), changes during the window are folded into
 * one trailing call. Keeps us under the server's rate limit (≈10 a second). Pure timing; no React.
 */
export interface Throttle<T> {
  push(value: T): void;
  cancel(): void;
}

export interface ThrottleTimers {
  set: (fn: () => void, ms: number) => unknown;
  clear: (handle: unknown) => void;
  now: () => number;
}

/** Real timers, called as plain functions (a browser refuses setTimeout called as a method of another object). */
const realTimers: ThrottleTimers = {
  set: (fn, ms) => setTimeout(fn, ms),
  clear: (handle) => clearTimeout(handle as ReturnType<typeof setTimeout>),
  now: () => Date.now(),
};

export function createThrottle<T>(windowMs: number, emit: (value: T) => void, timers: ThrottleTimers = realTimers): Throttle<T> {
  let last = -Infinity;
  let pending: { value: T } | null = null;
  let timer: unknown = null;
  const fire = () => {
    timer = null;
    if (!pending) return;
    const v = pending.value;
    pending = null;
    last = timers.now();
    emit(v);
  };
  return {
    push(value) {
      const since = timers.now() - last;
      pending = { value };
      if (since >= windowMs && !timer) return fire();
      if (!timer) timer = timers.set(fire, Math.max(0, windowMs - since));
    },
    cancel() {
      if (timer) timers.clear(timer);
      timer = null;
      pending = null;
    },
  };
}
