/**
 * Off-screen parts of the sheet update after the next paint, not before it. When an edit's
 * results land, every section gets new values; the ones on screen render in the same task
 * (so the results a user is looking at are painted in the next frame) and the ones out of view
 * render once that frame has been painted and the page is idle (at most `OFFSCREEN_IDLE_MS`
 * later), so they are never in the way of the next key either. Nothing is skipped: an
 * off-screen part is up to date a frame or two later, long before anyone can scroll to it.
 *
 * `DeferOffscreen(LitElement)` gives a component this behaviour. Whether it is on screen comes
 * from an IntersectionObserver on the host (no margin); until the first observation, and where
 * there is no IntersectionObserver (tests in node), it counts as on screen.
 */
import type { LitElement } from 'lit';
import { whenSettledAfterPaint } from '../after-paint';

/** The longest an off-screen update waits for an idle moment after the paint (ms). */
export const OFFSCREEN_IDLE_MS = 250;

type LitConstructor = abstract new (...args: any[]) => LitElement; // eslint-disable-line @typescript-eslint/no-explicit-any

export function DeferOffscreen<T extends LitConstructor>(Base: T) {
  abstract class Deferring extends Base {
    /** False while the host is out of the viewport (as last observed). */
    protected onScreen = true;
    private screenObserver: IntersectionObserver | null = null;

    /**
     * A user reaching into the view (a press, a focus, a key) may come before the observer has
     * said it is on screen: it then counts as on screen, and an update held back is done at
     * once, so the view never acts on values a frame old.
     */
    private readonly onUse = (): void => {
      this.onScreen = true;
      this.wakeUp?.();
      if (this.isUpdatePending) this.performUpdate();
    };
    /** Ends the wait of an update held back for the next paint (lit runs updates one after another). */
    private wakeUp: (() => void) | null = null;

    override connectedCallback(): void {
      super.connectedCallback();
      for (const type of ['pointerdown', 'focusin', 'keydown']) this.addEventListener(type, this.onUse, true);
      if (typeof IntersectionObserver === 'undefined' || typeof requestAnimationFrame === 'undefined') return;
      this.screenObserver = new IntersectionObserver((entries) => {
        this.onScreen = entries[entries.length - 1].isIntersecting;
      });
      this.screenObserver.observe(this);
    }

    override disconnectedCallback(): void {
      super.disconnectedCallback();
      for (const type of ['pointerdown', 'focusin', 'keydown']) this.removeEventListener(type, this.onUse, true);
      this.screenObserver?.disconnect();
      this.screenObserver = null;
      this.onScreen = true;
    }

    protected override async scheduleUpdate(): Promise<unknown> {
      if (!this.onScreen) {
        await new Promise<void>((resolve) => {
          this.wakeUp = resolve;
          void whenSettledAfterPaint(OFFSCREEN_IDLE_MS).then(resolve);
        });
        this.wakeUp = null;
      }
      return super.scheduleUpdate();
    }
  }
  return Deferring;
}
