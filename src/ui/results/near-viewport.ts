/**
 * Off-screen charts are drawn only when scrolled near: `NearViewport` watches its host with
 * an IntersectionObserver (600 px beyond the viewport, so a chart is ready before it shows)
 * and asks the host to update when it comes near or goes away. A view keeps a chart's
 * drawing out of date while `near` is false and draws it when it turns true. `chartSlot`
 * holds the place of a chart not drawn yet with the chart's own aspect ratio (its SVG is
 * drawn at 100 % width and auto height), so drawing it later moves nothing.
 */
import { html, type ReactiveController, type ReactiveControllerHost } from 'lit';
import { styleMap } from 'lit/directives/style-map.js';
import { unsafeSVG } from 'lit/directives/unsafe-svg.js';

export class NearViewport implements ReactiveController {
  /** True while the host is within the margin of the viewport (true where there is no IntersectionObserver). */
  near = false;
  private observer: IntersectionObserver | null = null;

  constructor(
    private readonly host: ReactiveControllerHost & Element,
    private readonly margin = '600px',
  ) {
    host.addController(this);
  }

  hostConnected(): void {
    if (typeof IntersectionObserver === 'undefined') {
      this.near = true;
      return;
    }
    this.observer = new IntersectionObserver(
      (entries) => {
        const near = entries[entries.length - 1].isIntersecting;
        if (near !== this.near) {
          this.near = near;
          this.host.requestUpdate();
        }
      },
      { rootMargin: `${this.margin} 0px ${this.margin} 0px` },
    );
    this.observer.observe(this.host);
  }

  hostDisconnected(): void {
    this.observer?.disconnect();
    this.observer = null;
  }
}

/**
 * A chart's place: the drawn SVG, or (`waiting`) an empty box of the chart's aspect ratio
 * (`width`/`height` of its viewBox) marked `data-pending`.
 */
export function chartSlot(svg: string, role: string, width: number, height: number, waiting: boolean) {
  if (svg) return html`<div class="chart" data-role=${role}>${unsafeSVG(svg)}</div>`;
  if (!waiting) return null;
  return html`<div class="chart" data-role=${role} data-pending="" aria-busy="true" style=${styleMap({ aspectRatio: `${width} / ${height}` })}></div>`;
}
