/**
 * Work that waits for the browser to paint the frame the current event asked for (the focus
 * moving off a field, a module dropped) and then runs in the next task. Heavy work an edit sets
 * off (the store update that redraws the plan, the live checks' request) then no longer delays
 * the frame that answers the person's key or click, which is what Interaction to Next Paint
 * measures (web.dev, "Optimize Interaction to Next Paint": yield before work the next paint does
 * not need).
 */

/** Runs `fn` in the task after the next paint (in the next task where nothing paints); returns how to call it off. */
export function afterNextPaint(fn: () => void): () => void {
  if (typeof requestAnimationFrame !== 'function') {
    const t = setTimeout(fn, 0);
    return () => clearTimeout(t);
  }
  // A frame callback runs just before the paint; a task queued from it runs after that paint.
  let t: ReturnType<typeof setTimeout> | undefined;
  const frame = requestAnimationFrame(() => (t = setTimeout(fn, 0)));
  return () => {
    cancelAnimationFrame(frame);
    if (t !== undefined) clearTimeout(t);
  };
}

const waiting = new Set<() => void>();

/**
 * A field's edit, applied to the document after the next paint. Whatever reads the document
 * before then (is there an unsaved edit? an undo, a command) calls `runWaitingCommits()` first,
 * so an edit still waiting for its paint is never missed or reordered.
 */
export function commitAfterNextPaint(fn: () => void): void {
  const run = () => {
    if (waiting.delete(run)) fn();
  };
  waiting.add(run);
  afterNextPaint(run);
}

/** Applies every edit still waiting for its paint, in the order they were made. */
export function runWaitingCommits(): void {
  for (const run of [...waiting]) run();
}
