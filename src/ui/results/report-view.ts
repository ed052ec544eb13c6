/**
 * `<report-view>`: the calculation report shown in the page (the same report model and HTML
 * as the downloadable file: `buildReportDocument` → `renderHtmlBody` + `REPORT_CSS`), with
 * "Print / Save as PDF" (`window.print()`) and "Download HTML report" (a Blob of `renderHtml`,
 * named `<title>-report.html`).
 *
 * Printing: while connected, the element keeps a print-only copy of the report body in a
 * container at the top of `document.body` (`#lamina-print-report`, hidden on screen). A small
 * document style shows only that container in print, so the printout is the report — caution
 * first and last — with no buttons, inputs or navigation, whatever the app's layout.
 *
 * The report is built after the results render (in idle time), so it never slows an edit; a
 * print or download builds it at once if it is out of date.
 */
import { LitElement, css, html, unsafeCSS, type PropertyValues } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import { unsafeHTML } from 'lit/directives/unsafe-html.js';
import type { Project } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import type { Analysis, SpanCurve } from '../../analysis/types';
import { buildReportDocument } from '../../report/report-document';
import { renderHtml, renderHtmlBody, REPORT_CSS } from '../../report/render-html';
import type { ReportDocument } from '../../report/document-types';
import pkg from '../../../package.json';
import { resultsStyles } from './results-styles';
import { reportFileName } from './report-file-name';

export const PRINT_CONTAINER_ID = 'lamina-print-report';
const PRINT_STYLE_ID = 'lamina-print-report-style';

const PRINT_CSS = `
#${PRINT_CONTAINER_ID} { display: none; }
@media print {
  body > *:not(#${PRINT_CONTAINER_ID}) { display: none !important; }
  #${PRINT_CONTAINER_ID} { display: block !important; }
  body { margin: 0; background: #fff; }
}
@page { size: auto; margin: 15mm 14mm 16mm; }
${REPORT_CSS}`;

type IdleHandle = { cancel(): void };

function whenIdle(run: () => void): IdleHandle {
  const w = window as Window & {
    requestIdleCallback?: (cb: () => void, opts?: { timeout: number }) => number;
    cancelIdleCallback?: (id: number) => void;
  };
  if (w.requestIdleCallback && w.cancelIdleCallback) {
    const id = w.requestIdleCallback(run, { timeout: 800 });
    return { cancel: () => w.cancelIdleCallback!(id) };
  }
  const id = window.setTimeout(run, 60);
  return { cancel: () => window.clearTimeout(id) };
}

@customElement('report-view')
export class ReportView extends LitElement {
  static override styles = [
    resultsStyles,
    unsafeCSS(REPORT_CSS),
    css`
      .lamina-report {
        padding: 0;
        max-width: none;
      }
      .report-frame {
        border: 1px solid var(--rule);
        padding: 0.8em 1em;
        background: #fff;
      }
      @media print {
        :host {
          display: none !important;
        }
      }
    `,
  ];

  @property({ attribute: false }) project: Project | null = null;
  @property({ attribute: false }) analysis: Analysis | null = null;
  @property({ attribute: false }) curve: SpanCurve | null = null;
  @property() units: UnitSystem = 'SI';

  /** Include the appendix (layer results, strength chain, calculation trace, methods); off: the summary alone. */
  @state() private withTrace = true;
  @state() private body = '';
  @state() private error: string | null = null;

  private doc: ReportDocument | null = null;
  private dirty = true;
  private pending: IdleHandle | null = null;
  private printContainer: HTMLElement | null = null;

  override connectedCallback(): void {
    super.connectedCallback();
    window.addEventListener('beforeprint', this.onBeforePrint);
    this.ensurePrintContainer();
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    window.removeEventListener('beforeprint', this.onBeforePrint);
    this.pending?.cancel();
    this.pending = null;
    this.printContainer?.remove();
    this.printContainer = null;
    if (!document.getElementById(PRINT_CONTAINER_ID)) document.getElementById(PRINT_STYLE_ID)?.remove();
  }

  private ensurePrintContainer(): void {
    if (!document.getElementById(PRINT_STYLE_ID)) {
      const style = document.createElement('style');
      style.id = PRINT_STYLE_ID;
      style.textContent = PRINT_CSS;
      document.head.appendChild(style);
    }
    let container = document.getElementById(PRINT_CONTAINER_ID);
    if (!container) {
      container = document.createElement('div');
      container.id = PRINT_CONTAINER_ID;
      container.setAttribute('aria-hidden', 'true');
      document.body.prepend(container);
    }
    this.printContainer = container;
    if (this.body) container.innerHTML = this.body;
  }

  protected override willUpdate(changed: PropertyValues): void {
    if (changed.has('project') || changed.has('analysis') || changed.has('curve') || changed.has('units') || changed.has('withTrace')) {
      this.dirty = true;
      this.pending?.cancel();
      this.pending = whenIdle(() => {
        this.pending = null;
        this.build();
      });
    }
  }

  /** Build the report now if the inputs changed since the last build. */
  build(): ReportDocument | null {
    if (!this.dirty) return this.doc;
    this.dirty = false;
    this.pending?.cancel();
    this.pending = null;
    if (!this.project || !this.analysis) {
      this.doc = null;
      this.body = '';
      this.error = null;
    } else {
      try {
        this.doc = buildReportDocument({
          project: this.project,
          analysis: this.analysis,
          curve: this.curve,
          units: this.units,
          version: pkg.version,
          trace: this.withTrace,
        });
        this.body = renderHtmlBody(this.doc);
        this.error = null;
      } catch (err) {
        this.doc = null;
        this.body = '';
        this.error = err instanceof Error ? err.message : String(err);
      }
    }
    if (this.printContainer) this.printContainer.innerHTML = this.body;
    return this.doc;
  }

  private onBeforePrint = (): void => {
    this.build();
  };

  private print(): void {
    this.build();
    window.print();
  }

  private download(): void {
    const doc = this.build();
    if (!doc || !this.project) return;
    const blob = new Blob([renderHtml(doc)], { type: 'text/html;charset=utf-8' });
    const url = URL.createObjectURL(blob);
    const a = document.createElement('a');
    a.href = url;
    a.download = reportFileName(this.project.title);
    a.style.display = 'none';
    document.body.appendChild(a);
    a.click();
    a.remove();
    window.setTimeout(() => URL.revokeObjectURL(url), 10_000);
  }

  override render() {
    const ready = !!this.project && !!this.analysis;
    return html`
      <div class="controls">
        <button type="button" class="action" data-role="print" ?disabled=${!ready} @click=${this.print}>Print / Save as PDF</button>
        <button type="button" class="action" data-role="download" ?disabled=${!ready} @click=${this.download}>Download HTML report</button>
        <label class="trace-switch"
          ><input type="checkbox" data-role="with-trace" .checked=${this.withTrace} @change=${(e: Event) => (this.withTrace = (e.target as HTMLInputElement).checked)} />
          With the calculation trace (appendix)</label
        >
        <span class="note">The printout is this report only, with the caution at the start and the end: a summary of a few pages, then, when chosen, the appendix with every step of the calculation.</span>
      </div>
      ${this.error
        ? html`<p class="empty" role="alert">The report could not be built: ${this.error}</p>`
        : !ready
          ? html`<p class="empty">No report yet: the analysis has not run.</p>`
          : this.body
            ? html`<div class="report-frame" data-role="report">${unsafeHTML(this.body)}</div>`
            : html`<p class="empty">Preparing the report…</p>`}
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'report-view': ReportView;
  }
}
