/**
 * Waiting for the browser to paint: `afterNextPaint()` resolves in a task after the next frame
 * (after its paint), `whenSettledAfterPaint()` once the page is idle after that. Both resolve
 * anyway after a fallback delay, so a hidden tab (no frames) or a browser without idle
 * callbacks never waits forever; where there are no frames at all (node) they resolve at once.
 */
export function afterNextPaint(fallbackMs = 100): Promise<void> {
  if (typeof requestAnimationFrame === 'undefined') return Promise.resolve();
  return new Promise((resolve) => {
    let done = false;
    const finish = () => {
      if (done) return;
      done = true;
      clearTimeout(timer);
      resolve();
    };
    const timer = setTimeout(finish, fallbackMs);
    requestAnimationFrame(() => setTimeout(finish, 0));
  });
}

/** After the next paint and the tasks queued behind it (an idle period, at most `idleMs` later). */
export async function whenSettledAfterPaint(idleMs = 200): Promise<void> {
  await afterNextPaint();
  if (typeof requestIdleCallback === 'undefined') return new Promise((resolve) => setTimeout(resolve, 0));
  return new Promise((resolve) => requestIdleCallback(() => resolve(), { timeout: idleMs }));
}
