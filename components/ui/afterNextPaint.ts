/**
 * Runs `fn` once the browser has painted the frame the current event asked for: the focus
 * moving off a field, a ticked box. Heavy work a field's commit sets off (the store update that
 * redraws the plan and asks for findings) then lands in the next task, so the person sees their
 * key or click answered first, which is what Interaction to Next Paint measures
 * (web.dev, "Optimize Interaction to Next Paint": yield before work the next paint does not need).
 *
 * Whatever reads the document's state before that task (is there an unsaved edit? run a command)
 * calls `runWaitingNow()` first, so a commit still waiting for its paint is never missed or
 * reordered. Without a window (server rendering, node tests) `fn` runs at once.
 */
const waiting = new Set<() => void>();

export function afterNextPaint(fn: () => void): void {
  if (typeof window === 'undefined' || typeof window.requestAnimationFrame !== 'function') {
    fn();
    return;
  }
  const run = () => {
    if (waiting.delete(run)) fn();
  };
  waiting.add(run);
  // The animation frame runs just before the paint; a task queued from it runs after that paint.
  window.requestAnimationFrame(() => setTimeout(run, 0));
}

/** Runs every commit still waiting for its paint, in the order they were made. */
export function runWaitingNow(): void {
  for (const run of [...waiting]) run();
}
