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
 * The report is built only when it is wanted: when the reader opens it ("Show the report"),
 * prints (the Print button, or the browser's print through `beforeprint`) or downloads it.
 * While open it is rebuilt in idle time after each analysis, so it never slows an edit. The
 * report model (`report-document.ts`, which brings mathjs for the trace formulas and the
 * chart code) is not in the page's first load: it is loaded on first use, or in idle time a
 * few seconds after the first results so that the browser's own print finds it ready.
 */
import { LitElement, css, html, unsafeCSS, type PropertyValues } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import { unsafeHTML } from 'lit/directives/unsafe-html.js';
import type { Project } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import type { Analysis, SpanCurve } from '../../analysis/types';
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

type ReportModule = typeof import('../../report/report-document');
let reportModule: Promise<ReportModule> | null = null;
let reportModuleLoaded: ReportModule | null = null;

/** The report model, loaded once (a chunk of its own, with mathjs). */
export function loadReportModule(): Promise<ReportModule> {
  reportModule ??= import('../../report/report-document').then((m) => (reportModuleLoaded = m));
  return reportModule;
}

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
  /** The reader opened the report (it is built and shown only then). */
  @state() open = false;

  private doc: ReportDocument | null = null;
  private dirty = true;
  private pending: IdleHandle | null = null;
  private printContainer: HTMLElement | null = null;
  private preload: ReturnType<typeof setTimeout> | null = null;

  override connectedCallback(): void {
    super.connectedCallback();
    window.addEventListener('beforeprint', this.onBeforePrint);
    this.ensurePrintContainer();
    // Ready for the browser's own print (Ctrl+P) without weighing on the first load.
    this.preload = setTimeout(() => whenIdle(() => void loadReportModule()), 3000);
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    window.removeEventListener('beforeprint', this.onBeforePrint);
    this.pending?.cancel();
    this.pending = null;
    if (this.preload !== null) clearTimeout(this.preload);
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
      this.pending = null;
    }
    if (this.open && this.dirty && !this.pending) {
      this.pending = whenIdle(() => {
        this.pending = null;
        void this.buildWhenLoaded();
      });
    }
  }

  /** Load the report model if need be, then build. */
  async buildWhenLoaded(): Promise<ReportDocument | null> {
    try {
      await loadReportModule();
    } catch (err) {
      this.error = `the report code could not be loaded (${err instanceof Error ? err.message : String(err)})`;
      return null;
    }
    return this.build();
  }

  /**
   * Build the report now if the inputs changed since the last build; null (and a load started)
   * while the report model is not loaded yet.
   */
  build(): ReportDocument | null {
    const m = reportModuleLoaded;
    if (!m) {
      void this.buildWhenLoaded();
      return null;
    }
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
        this.doc = m.buildReportDocument({
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
    if (!this.build() && this.printContainer && !this.printContainer.innerHTML) {
      this.printContainer.textContent = 'The report was still loading: close this print preview and use "Print / Save as PDF" in the Report section of the worksheet.';
    }
  };

  /** Build (loading the report model if need be), then open the browser's print. */
  async print(): Promise<void> {
    await this.buildWhenLoaded();
    window.print();
  }

  private toggle(): void {
    this.open = !this.open;
  }

  private async download(): Promise<void> {
    const doc = await this.buildWhenLoaded();
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
        <button type="button" class="action" data-role="toggle" aria-expanded=${this.open ? 'true' : 'false'} ?disabled=${!ready} @click=${this.toggle}>
          ${this.open ? 'Hide the report' : 'Show the report'}
        </button>
        <button type="button" class="action" data-role="print" ?disabled=${!ready} @click=${this.print}>Print / Save as PDF</button>
        <button type="button" class="action" data-role="download" ?disabled=${!ready} @click=${this.download}>Download HTML report</button>
        <label class="trace-switch"
          ><input type="checkbox" data-role="with-trace" .checked=${this.withTrace} @change=${(e: Event) => (this.withTrace = (e.target as HTMLInputElement).checked)} />
          With the calculation trace (appendix)</label
        >
        <span class="note" role="status">${this.open && this.dirty && this.body ? 'Updating the report to the current values…' : 'The printout is this report only, with the caution at the start and the end: a summary of a few pages, then, when chosen, the appendix with every step of the calculation.'}</span>
      </div>
      ${!this.open
        ? html`<p class="note" data-role="closed">The calculation report (inputs, strength chain, checks, the full calculation trace and the charts) is built when you show it, print it or download it.</p>`
        : this.error
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
