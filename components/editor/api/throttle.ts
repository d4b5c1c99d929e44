/**
 * Leading-and-trailing throttle for the live checks: the first change after a quiet spell goes
 * out at once (so a drop shows its findings quickly), changes during the window are folded into
 * one trailing call. Keeps us under the server's rate limit (≈10 a second). Pure timing; no React.
 *
 * "At once" means straight after the browser has painted the change (`afterPaint`, in the browser
 * `afterNextPaint`), not inside the keystroke or drop that made it: building and sending the
 * request, and the re-render that marks the findings as being checked, would otherwise delay the
 * frame that shows the edit.
 */
import { afterNextPaint } from '@/components/ui/afterNextPaint';

export interface Throttle<T> {
  push(value: T): void;
  cancel(): void;
}

export interface ThrottleTimers {
  set: (fn: () => void, ms: number) => unknown;
  clear: (handle: unknown) => void;
  now: () => number;
  /** Runs `fn` soon, after the next paint where there is one; returns how to call it off. Absent: at once. */
  afterPaint?: (fn: () => void) => () => void;
}

/** Real timers, called as plain functions (a browser refuses setTimeout called as a method of another object). */
const realTimers: ThrottleTimers = {
  set: (fn, ms) => setTimeout(fn, ms),
  clear: (handle) => clearTimeout(handle as ReturnType<typeof setTimeout>),
  now: () => Date.now(),
  afterPaint: afterNextPaint,
};

export function createThrottle<T>(windowMs: number, emit: (value: T) => void, timers: ThrottleTimers = realTimers): Throttle<T> {
  let last = -Infinity;
  let pending: { value: T } | null = null;
  let timer: unknown = null;
  let callOff: (() => void) | null = null;
  const fire = () => {
    timer = null;
    callOff = null;
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
      if (timer || callOff) return; // already due: it takes the newest value
      if (since >= windowMs) {
        if (!timers.afterPaint) return fire();
        callOff = timers.afterPaint(fire);
        return;
      }
      timer = timers.set(fire, Math.max(0, windowMs - since));
    },
    cancel() {
      if (timer) timers.clear(timer);
      callOff?.();
      timer = null;
      callOff = null;
      pending = null;
    },
  };
}
