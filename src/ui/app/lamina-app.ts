/**
 * `<lamina-app>`: the worksheet shell. Holds the store (the one place the analysis runs),
 * forwards the components' events to it, and lays out the sheet top to bottom:
 * caution · verdict · 1 Opening and loads · 2 Strata · 3 Lab tests · 4 Strength chain ·
 * 5 Checks · 6 Support · 7 Span and thickness · 8 Uncertainty (a study run in a worker) · 9 Report.
 * A finished run that is current for the inputs (`uncertainty/current-run.ts`) adds its P_f row
 * (with an acceptable P_f) to the checks and the verdict, and its section to the report; a run
 * made before the latest edit reaches neither. Results elements (sections 4–9, the trace dialog)
 * are rendered by tag; if one is not registered the page still works (it stays empty).
 *
 * Under the project bar it warns of demo text left in a changed project (with a one-click
 * clear) and lists the placeholders and defaults a new project still holds. While any field
 * holds a refused value the verdict and every results section say "stale". A refused file's
 * errors are listed in a dialog of their own. On a narrow or short screen the top block
 * scrolls away and a pinned bar keeps a one-line caution and the verdict on screen.
 *
 * Performance marks: `lamina:edit` at each edit (set by the store), `lamina:results` once the
 * results have rendered (next animation frame after the update), the measure
 * `lamina:edit-to-results`, and `lamina:first-results` once the first results are painted.
 */
import { LitElement, html, css, nothing } from 'lit';
import { formatQuantity, type UnitSystem } from '../../model/units';
import type { Project } from '../../model/types';
import { clearDemoText, demoLeftover, demoLeftoverText } from '../../model/demo-leftover';
import { isNewProject, pendingDefaults, type StartingValue } from '../../model/new-project';
import { numberText, PRECISION } from '../../model/number-format';
import type { AppState, ProjectStore } from '../state/project-store';
import { tokens } from '../styles/tokens';
import { sheet } from '../styles/sheet';
import { textField } from '../inputs/field-templates';
import { downloadText } from './download';
import '../inputs/opening-loads-form';
import './caution-banner';
import './verdict-line';
import './project-bar';
import './verdict-chip';
import type { UncertaintyRunner } from '../compute/types';
import { analysisWithRun, type UncertaintyRun } from '../uncertainty/current-run';
import { afterNextPaint, whenSettledAfterPaint } from '../after-paint';

const SECTIONS = [
  { id: 'opening', title: 'Opening and loads' },
  { id: 'strata', title: 'Strata' },
  { id: 'lab', title: 'Lab tests' },
  { id: 'strength', title: 'Strength chain' },
  { id: 'checks', title: 'Checks' },
  { id: 'support', title: 'Support' },
  { id: 'span', title: 'Span and thickness' },
  { id: 'uncertainty', title: 'Uncertainty' },
  { id: 'report', title: 'Report' },
] as const;

/** Sections showing analysis results (their heading says "updating…" while the next analysis runs). */
const RESULT_SECTIONS = ['strength', 'checks', 'support', 'span'] as const;

const nextFrame = (): Promise<void> => new Promise((resolve) => requestAnimationFrame(() => resolve()));
const nextTask = (): Promise<void> =>
  new Promise((resolve) => {
    const ch = new MessageChannel();
    ch.port1.onmessage = () => resolve();
    ch.port2.postMessage(null);
  });

/**
 * The longest an accepted edit's render waits for its results (ms). The worker answers an
 * edit in a few ms; rendering the edit on its own first (marking every section "updating")
 * costs a frame that delays the results behind it.
 */
const HOLD_MS = 100;
/** Events that release a held edit before they reach their target (`onUse`). */
const USE_EVENTS = ['pointerdown', 'click', 'keydown', 'focusin'] as const;

export class LaminaApp extends LitElement {
  static override properties = {
    store: { attribute: false },
    state: { state: true },
    tracePath: { state: true },
    uncertaintyRun: { state: true },
    sheetComplete: { state: true },
    sheetStarted: { state: true },
  };

  store!: ProjectStore;
  state!: AppState;
  tracePath: string | null = null;
  /** Runs the uncertainty study off the main thread: main.ts passes the compute client's runner (its run worker). */
  runner: UncertaintyRunner | null = null;
  /** The last finished uncertainty run; it reaches the checks and the report only while current (`current-run.ts`). */
  uncertaintyRun: UncertaintyRun | null = null;
  private resultsWithRun = analysisWithRun();
  private reportWithRun = analysisWithRun();
  private unsubscribe: (() => void) | null = null;
  private lastAnalysis: unknown = null;
  private firstResultsMarked = false;
  /**
   * The sheet is shown in three steps, so the first results wait for as little as possible.
   * The first frame holds only its top: the title, the project bar, the caution, the verdict
   * and the section list. Once the first results are painted (`completeSheet`), section 1 is
   * rendered (`sheetStarted`) and the elements of sections 2–9 load; those sections are
   * rendered when they have loaded (`sheetComplete`). Each step only adds below what is laid
   * out, so nothing on screen moves (a section's heading is never shown before its contents).
   */
  sheetComplete = false;
  sheetStarted = false;
  private sheetLoading = false;
  /** Resolves once the sheet's lower sections have loaded (or failed to) and are set to render. */
  private sheetLoaded: Promise<void> = Promise.resolve();
  /** An accepted edit's state, held back until its results land (or HOLD_MS passes). */
  private held: AppState | null = null;
  private holdTimer: ReturnType<typeof setTimeout> | null = null;
  private traceOpener: HTMLElement | null = null;

  static override styles = [
    tokens,
    sheet,
    css`
      :host {
        display: block;
        max-width: 78rem;
        margin: 0 auto;
        padding: 0 1rem 3rem;
        background: var(--lam-paper);
      }
      header {
        display: flex;
        flex-wrap: wrap;
        align-items: baseline;
        gap: 0.3rem 1rem;
        padding: 0.6rem 0 0.4rem;
        border-bottom: 2px solid var(--lam-ink);
      }
      h1 {
        font-size: 1.35rem;
        margin: 0;
        letter-spacing: 0.02em;
      }
      h1 small {
        font-weight: 400;
        font-size: 0.7em;
        color: var(--lam-muted);
      }
      .title {
        flex: 1 1 24rem;
      }
      .title input {
        width: 100%;
        font-size: 1.05rem;
        font-weight: 600;
      }
      project-bar {
        padding: 0.4rem 0;
        border-bottom: 1px solid var(--lam-rule);
      }
      .top {
        position: sticky;
        top: 0;
        z-index: 2;
        background: var(--lam-paper);
        padding-top: 0.3rem;
        border-bottom: 1px solid var(--lam-rule);
      }
      .pin {
        display: none;
      }
      @media (max-width: 900px), (max-height: 640px) {
        /* On small screens the full block would hide too much of the sheet: it scrolls away,
           and a pinned one-line caution and verdict stay on screen instead. */
        .top {
          position: static;
        }
        .pin {
          display: block;
          position: sticky;
          top: 0;
          z-index: 3;
          background: var(--lam-paper);
          padding: 0.2rem 0 0.25rem;
          border-bottom: 1px solid var(--lam-ink);
        }
        .pin verdict-chip {
          margin-top: 0.15rem;
        }
        section > h2 {
          scroll-margin-top: 5.5rem;
        }
      }
      .verdict-wrap.stale verdict-line {
        color: var(--lam-muted);
      }
      .stale-note {
        margin: 0.2rem 0;
        font-weight: 600;
      }
      .stale-word {
        border: 1px dashed var(--lam-ink);
        padding: 0 0.3em;
        margin-right: 0.3em;
        font-weight: 700;
      }
      .provenance {
        margin: 0.4rem 0;
      }
      .demo-leftover {
        border: 2px solid var(--lam-warn);
        border-left-width: 8px;
        padding: 0.3rem 0.6rem;
        margin: 0.3rem 0;
      }
      .demo-leftover button {
        margin-top: 0.25rem;
      }
      details.new-project {
        border: 1px solid var(--lam-ink);
        padding: 0.3rem 0.6rem;
        margin: 0.3rem 0;
      }
      details.new-project summary {
        font-weight: 600;
        cursor: pointer;
      }
      details.new-project h3 {
        font-size: 1em;
        margin: 0.5rem 0 0.2rem;
      }
      details.new-project ul {
        margin: 0.2rem 0;
        padding-left: 1.2rem;
      }
      details.new-project .why {
        color: var(--lam-muted);
      }
      dialog.file-dialog {
        max-width: min(40rem, calc(100vw - 2rem));
        border: 2px solid var(--lam-bad);
        padding: 0.5rem 1rem;
      }
      dialog.file-dialog::backdrop {
        background: rgb(0 0 0 / 0.35);
      }
      .file-errors ul {
        padding-left: 1.2rem;
        overflow-wrap: anywhere;
      }
      nav ol {
        list-style: none;
        display: flex;
        flex-wrap: wrap;
        gap: 0.2rem 0.9rem;
        padding: 0.25rem 0;
        margin: 0;
        font-size: 0.92em;
      }
      nav a {
        color: var(--lam-ink);
      }
      .messages {
        margin: 0.3rem 0;
      }
      .status-line {
        min-height: 1.35em;
        margin: 0.1rem 0;
        color: var(--lam-muted);
        font-size: 0.92em;
        white-space: nowrap;
        overflow: hidden;
        text-overflow: ellipsis;
      }
      .file-errors {
        border: 2px solid var(--lam-bad);
        padding: 0.3rem 0.8rem;
        margin: 0.4rem 0;
      }
      .autosave-alert {
        border: 2px solid var(--lam-bad);
        border-left-width: 8px;
        padding: 0.3rem 0.8rem;
        margin: 0.4rem 0;
      }
      .autosave-alert p {
        margin: 0.3rem 0;
      }
      .autosave-alert button {
        margin: 0 0.5rem 0.3rem 0;
      }
      .file-errors h2 {
        font-size: 1em;
        border: none;
        margin: 0.2rem 0;
      }
      .file-errors li {
        font-family: var(--lam-mono);
        font-size: 0.9em;
      }
      section {
        margin-top: 1.2rem;
      }
      /* Off-screen sections skip layout and paint until scrolled near (results re-render on
         every edit; only what is on screen needs to be laid out at once). */
      section.inputs,
      section.results,
      section.print {
        content-visibility: auto;
        contain-intrinsic-size: auto 900px;
      }
      /* The uncertainty section updates while off screen (a run's progress and result); chromium
         left its updated parts without layout boxes under content-visibility: auto. */
      section.study {
        content-visibility: visible;
      }
      section > h2 {
        scroll-margin-top: 9rem;
      }
      /* A results view wider than the screen (a wide table on a phone) scrolls sideways in its
         own box: never past the page, never cut off. */
      section.results > :not(h2):not(p),
      section.print > :not(h2):not(p),
      section.inputs > lab-tests-panel {
        display: block;
        max-width: 100%;
        overflow-x: auto;
      }
      /* "updating…" after a results heading while its results are for the previous values:
         always laid out (so nothing moves), shown only when busy and after a short delay (no
         flicker for a quick update); a pseudo-element, so it is not part of the heading's text. */
      h2.results-h::after {
        content: ' updating…';
        font-size: 0.75em;
        font-weight: 400;
        color: var(--lam-muted);
        visibility: hidden;
      }
      h2.results-h[aria-busy='true']::after {
        visibility: visible;
        animation: lam-show-late 0.25s step-end;
      }
      @keyframes lam-show-late {
        from {
          visibility: hidden;
        }
      }
      .num-badge {
        display: inline-block;
        min-width: 1.4em;
        margin-right: 0.3em;
      }
      details.input-notes {
        font-size: 0.9em;
        color: var(--lam-muted);
      }
      details.input-notes li {
        font-family: var(--lam-mono);
        font-size: 0.95em;
      }
      footer {
        margin-top: 2rem;
      }
      @media print {
        :host {
          max-width: none;
          padding: 0;
        }
        .top {
          position: static;
          border: none;
        }
        header .title input {
          border: none;
          padding: 0;
        }
        nav,
        .status-line,
        project-bar,
        .pin,
        .provenance,
        .messages,
        details.input-notes,
        section.inputs,
        section.results,
        footer {
          display: none !important;
        }
        section.print {
          margin-top: 0.5rem;
          content-visibility: visible;
        }
      }
    `,
  ];

  override connectedCallback(): void {
    super.connectedCallback();
    this.state = this.store.getState();
    this.unsubscribe = this.store.subscribe((s) => this.onState(s));
    this.addEventListener('project-edit', this.onEdit as EventListener);
    this.addEventListener('project-replace', this.onReplace as EventListener);
    this.addEventListener('units-change', this.onUnits as EventListener);
    this.addEventListener('chart-layer-change', this.onChartLayer as EventListener);
    this.addEventListener('show-trace', this.onShowTrace as EventListener);
    this.addEventListener('trace-close', this.onTraceClose);
    this.addEventListener('history-undo', this.onUndo);
    this.addEventListener('history-redo', this.onRedo);
    this.addEventListener('project-file-errors', this.onFileErrors as EventListener);
    this.addEventListener('app-notice', this.onNotice as EventListener);
    this.addEventListener('field-refused', this.onFieldRefused as EventListener);
    this.addEventListener('uncertainty-result', this.onUncertaintyResult as EventListener);
    window.addEventListener('keydown', this.onKey);
    for (const type of USE_EVENTS) this.addEventListener(type, this.onUse, true);
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    this.unsubscribe?.();
    if (this.holdTimer !== null) clearTimeout(this.holdTimer);
    this.holdTimer = null;
    window.removeEventListener('keydown', this.onKey);
    for (const type of USE_EVENTS) this.removeEventListener(type, this.onUse, true);
  }

  private onState(s: AppState): void {
    if (this.holdsForResults(s)) {
      // The typed text is already in its field; the rest of the sheet changes once, with the
      // results (a worker answers in a few ms), not twice. A slow answer shows "updating…".
      this.held = s;
      this.holdTimer ??= setTimeout(() => this.releaseHeld(), HOLD_MS);
      return;
    }
    if (this.holdTimer !== null) clearTimeout(this.holdTimer);
    this.holdTimer = null;
    this.held = null;
    this.state = s;
    if (s.analysis !== this.lastAnalysis && !s.pending) {
      this.lastAnalysis = s.analysis;
      void this.markResults();
    }
  }

  /**
   * Whether to hold `s` back: an accepted edit whose analysis is on its way, while the sheet
   * shows valid results and nothing else about the page changed (no refusal, notice, units,
   * file errors, undo state or autosave state to show).
   */
  private holdsForResults(s: AppState): boolean {
    const shown = this.held ?? this.state;
    if (!shown || !s.pending || shown.analysis === null || s.analysis !== shown.analysis) return false;
    return (
      s.fieldErrors.length === 0 &&
      shown.fieldErrors.length === 0 &&
      s.fileErrors === shown.fileErrors &&
      s.units === shown.units &&
      s.notice === shown.notice &&
      s.autosave === shown.autosave &&
      s.canUndo === shown.canUndo &&
      s.canRedo === shown.canRedo
    );
  }

  private releaseHeld(): void {
    if (this.holdTimer !== null) clearTimeout(this.holdTimer);
    this.holdTimer = null;
    if (this.held) {
      this.state = this.held;
      this.held = null;
    }
  }

  /**
   * A press, click, key or focus anywhere in the sheet while an edit is held: show it at once
   * (a synchronous render, before the event reaches its target), so no control acts on values
   * older than the project (e.g. Run pressed right after another field was committed).
   */
  private readonly onUse = (): void => {
    if (!this.held) return;
    this.releaseHeld();
    this.performUpdate();
  };

  /**
   * Fill in the sections below the top of the sheet (once), when their elements have loaded
   * (`sheet-below.ts`, not in the first load); marks `lamina:sheet-complete` after their paint.
   * Should the module fail to load, the sections are rendered all the same (their elements stay
   * empty) and the failure is said on the status line.
   */
  private completeSheet(): void {
    if (this.sheetLoading) return;
    this.sheetLoading = true;
    this.sheetStarted = true;
    this.sheetLoaded = import('./sheet-below')
      .catch((err: unknown) => {
        this.store.setNotice(`Part of the worksheet could not be loaded (${err instanceof Error ? err.message : String(err)}); reload the page.`);
      })
      .then(() => {
        this.sheetComplete = true;
      });
    void this.sheetLoaded
      .then(() => this.updateComplete)
      .then(() => afterNextPaint())
      .then(() => {
        try {
          performance.mark('lamina:sheet-complete');
        } catch {
          /* the timeline is optional */
        }
      });
  }

  protected override firstUpdated(): void {
    // Without first results to wait for (the analysis failed), the sheet is completed once the
    // page has painted and settled.
    void whenSettledAfterPaint(500).then(() => this.completeSheet());
  }

  /** After the analysis has been rendered: mark and measure edit → results. */
  private async markResults(): Promise<void> {
    await this.updateComplete;
    await nextFrame();
    // The first results painted (a task after the frame runs after its paint): the benchmark's
    // "first results after navigation" (performance marks count from the navigation).
    if (!this.firstResultsMarked) {
      this.firstResultsMarked = true;
      setTimeout(() => {
        try {
          performance.mark('lamina:first-results');
        } catch {
          /* the timeline is optional */
        }
        this.completeSheet();
      }, 0);
    }
    try {
      if (performance.getEntriesByName('lamina:edit', 'mark').length === 0) return;
      performance.mark('lamina:results');
      performance.measure('lamina:edit-to-results', 'lamina:edit', 'lamina:results');
      performance.clearMarks('lamina:edit');
      performance.clearMarks('lamina:results');
      if (performance.getEntriesByName('lamina:edit-to-results', 'measure').length > 500) performance.clearMeasures('lamina:edit-to-results');
    } catch {
      /* the timeline is optional */
    }
  }

  /**
   * Test hook: apply an edit, wait for its analysis and chart (from the compute worker) and
   * until every element has updated. Returns ms to that point (`rendered`) and to the next
   * animation frame (`frame`).
   */
  async editNow(path: string, value: unknown): Promise<{ accepted: boolean; rendered_ms: number; frame_ms: number }> {
    const t0 = performance.now();
    const accepted = this.store.edit(path, value);
    await this.store.settled();
    await this.updateComplete;
    await nextTask();
    const t1 = performance.now();
    await nextFrame();
    const t2 = performance.now();
    return { accepted, rendered_ms: t1 - t0, frame_ms: t2 - t0 };
  }

  private onEdit = (e: CustomEvent<{ path: string; value: unknown }>): void => {
    e.stopPropagation();
    this.store.edit(e.detail.path, e.detail.value);
  };

  private onReplace = (e: CustomEvent<{ project: unknown; source: string }>): void => {
    e.stopPropagation();
    this.store.replace(e.detail.project, e.detail.source);
  };

  private onUnits = (e: CustomEvent<{ units: UnitSystem }>): void => {
    e.stopPropagation();
    this.store.setUnits(e.detail.units);
  };

  private onChartLayer = (e: CustomEvent<{ layer: number }>): void => {
    e.stopPropagation();
    this.store.setChartLayer(Number(e.detail.layer));
  };

  private onShowTrace = (e: CustomEvent<{ path: string }>): void => {
    e.stopPropagation();
    const origin = e.composedPath()[0];
    this.traceOpener = origin instanceof HTMLElement ? origin : null;
    this.tracePath = e.detail.path;
  };

  private onTraceClose = (): void => {
    this.tracePath = null;
    const opener = this.traceOpener;
    this.traceOpener = null;
    if (opener && opener.isConnected) opener.focus();
  };

  private onUndo = (): void => void this.store.undo();
  private onRedo = (): void => void this.store.redo();

  private onFileErrors = (e: CustomEvent<{ source: string; errors: { path: string; message: string }[] }>): void => {
    this.store.setFileErrors(e.detail.source, e.detail.errors, `${e.detail.source}: not opened — the current project is unchanged.`);
  };

  private onUncertaintyResult = (e: CustomEvent<UncertaintyRun>): void => {
    e.stopPropagation();
    this.uncertaintyRun = e.detail;
  };

  private onFieldRefused = (e: CustomEvent<{ path: string; message: string | null }>): void => {
    e.stopPropagation();
    this.store.markRefused(e.detail.path, e.detail.message);
  };

  /** Open or close the refused-file dialog to match the state. */
  protected override updated(): void {
    const dialog = this.renderRoot.querySelector<HTMLDialogElement>('dialog.file-dialog');
    if (!dialog) return;
    const want = Boolean(this.state?.fileErrors);
    if (want && !dialog.open) {
      dialog.showModal();
      dialog.querySelector<HTMLElement>('button')?.focus();
    } else if (!want && dialog.open) dialog.close();
  }

  private clearDemo(project: Project): void {
    const leftover = demoLeftover(project);
    if (leftover) this.store.replace(clearDemoText(project, leftover), 'Demo title and description cleared');
  }

  private endNewProject(project: Project): void {
    const next = structuredClone(project);
    delete next.description;
    this.store.replace(next, 'New-project list closed');
  }

  private startingValue(v: StartingValue, units: UnitSystem) {
    const value =
      typeof v.value === 'number'
        ? v.quantity
          ? formatQuantity(v.value, v.quantity, units, units === 'SI' ? PRECISION.storedInput : PRECISION.convertedInput)
          : `${numberText(v.value, PRECISION.storedInput)}${v.unit}`
        : String(v.value);
    return html`<li data-path=${v.path}><strong>${v.label}</strong> ${value} <span class="why">— ${v.why}</span></li>`;
  }

  /** Demo text left in a changed project; the placeholders and defaults a new project still holds. */
  private provenance(p: Project, units: UnitSystem) {
    const leftover = demoLeftover(p);
    const fresh = isNewProject(p) ? pendingDefaults(p) : null;
    if (!leftover && !fresh) return nothing;
    const placeholders = fresh?.filter((v) => v.kind === 'placeholder') ?? [];
    const defaults = fresh?.filter((v) => v.kind === 'default') ?? [];
    return html`<div class="provenance">
      ${leftover
        ? html`<div class="demo-leftover" role="alert">
            <strong class="warning">Demo text in a changed project.</strong> ${demoLeftoverText(leftover)}
            <br /><button type="button" id="clear-demo-text" @click=${() => this.clearDemo(p)}>Clear the demo ${leftover.fields.join(' and ')}</button>
          </div>`
        : nothing}
      ${fresh
        ? html`<details class="new-project" open>
            <summary>New project: ${placeholders.length} placeholder${placeholders.length === 1 ? '' : 's'} to replace, ${defaults.length} default${defaults.length === 1 ? '' : 's'} to check</summary>
            <p>It starts with one layer and the values below. Each leaves this list once you change it.</p>
            ${placeholders.length
              ? html`<h3>Placeholders: replace each with your own data</h3>
                  <ul class="placeholders">${placeholders.map((v) => this.startingValue(v, units))}</ul>`
              : html`<p><strong>Every placeholder has been replaced.</strong></p>`}
            ${defaults.length
              ? html`<h3>Defaults: check that each fits your site</h3>
                  <ul class="defaults">${defaults.map((v) => this.startingValue(v, units))}</ul>`
              : nothing}
            <button type="button" id="end-new-project" @click=${() => this.endNewProject(p)}>Close this list (removes the new-project description)</button>
          </details>`
        : nothing}
    </div>`;
  }

  private onNotice = (e: CustomEvent<{ notice: string }>): void => this.store.setNotice(e.detail.notice);

  private onKey = (e: KeyboardEvent): void => {
    if (!(e.ctrlKey || e.metaKey) || e.altKey) return;
    const key = e.key.toLowerCase();
    if (key === 'z' && !e.shiftKey) {
      e.preventDefault();
      this.store.undo();
    } else if ((key === 'z' && e.shiftKey) || key === 'y') {
      e.preventDefault();
      this.store.redo();
    }
  };

  private async goTo(e: Event, id: string): Promise<void> {
    e.preventDefault();
    // the sections below the first are rendered once their elements have loaded
    if (!this.sheetComplete) {
      this.completeSheet();
      await this.sheetLoaded;
      await this.updateComplete;
    }
    const heading = this.renderRoot.querySelector<HTMLElement>(`#${id}-h`);
    heading?.scrollIntoView({ block: 'start' });
    heading?.focus({ preventScroll: true });
  }

  /** A failed or paused autosave, said plainly, with a way to keep the saved text as a file. */
  private renderAutosave(s: AppState) {
    const a = s.autosave;
    if (a.status === 'saved') return nothing;
    return html`<div class="autosave-alert" role="alert">
      <p>${a.message}</p>
      ${a.held !== null
        ? html`<button type="button" id="autosave-download" @click=${() => downloadText('lamina-autosave-kept.json', a.held ?? '')}>
              Download the autosaved text (${a.held.length.toLocaleString('en-US')} characters)
            </button>
            <button type="button" id="autosave-resume" @click=${() => this.store.resumeAutosave()}>I have kept it — resume autosave (it will be overwritten)</button>`
        : nothing}
    </div>`;
  }

  private printed: { analysis: AppState['analysis']; needed: AppState['supportNeeded']; out: AppState['analysis'] } | null = null;

  /**
   * The analysis the printed report renders: with the support needed the store found for this
   * project (kept identical between renders, so the report is rebuilt only when either changes).
   */
  private reportAnalysis(s: AppState): AppState['analysis'] {
    const a = s.analysis;
    const n = s.supportNeeded;
    if (this.printed && this.printed.analysis === a && this.printed.needed === n) return this.printed.out;
    let out = a;
    if (a && a.report.support && n && n.project === (s.resultsProject ?? s.project)) {
      out = { ...a, report: { ...a.report, support: { ...a.report.support, needed: n.needed, neededReason: n.reason } } };
    }
    this.printed = { analysis: a, needed: n, out };
    return out;
  }

  /**
   * A section's heading. `busy`: the results shown are for the previous values while the
   * analysis of the current ones is on its way; the heading says "updating…" (a mark that is
   * always laid out and only shown, after a short delay, so nothing moves).
   */
  private heading(n: number, busy = false) {
    const s = SECTIONS[n - 1];
    const stale =
      n >= 4 && this.state?.stale
        ? html`<p class="stale-note" role="status"><span class="stale-word">Stale</span>results are for the last accepted values; a field above holds a refused value.</p>`
        : nothing;
    const results = (RESULT_SECTIONS as readonly string[]).includes(s.id);
    // An overhang is not a span: the span section says so for a cantilever.
    const title = s.id === 'span' && this.state?.project.opening.type === 'cantilever' ? 'Overhang and thickness' : s.title;
    return html`<h2 id="${s.id}-h" class=${results ? 'results-h' : ''} tabindex="-1" aria-busy=${busy ? 'true' : 'false'}><span class="num-badge">${n}</span> ${title}</h2>${stale}`;
  }

  override render() {
    const s = this.state;
    if (!s) return nothing;
    const p = s.project;
    // Results render against the project they were computed for (the previous one while the
    // analysis of an edit is on its way; the sections say "updating…" meanwhile).
    const rp = s.resultsProject ?? p;
    // With a run of the uncertainty study for these inputs: its P_f row in the check table and the verdict.
    const ra = this.resultsWithRun(s.analysis, rp, this.uncertaintyRun);
    // A refused file, link or paste gets its own dialog; a refused field is shown beside the
    // field and on the fixed-height status line (so the sheet does not jump while typing).
    const fileErrors = s.fileErrors;
    const editErrors = s.fieldErrors;
    return html`
      <header>
        <h1>Lamina <small>roof beam worksheet</small></h1>
        <div class="title">${textField(this, { label: 'Project title', path: 'title', value: p.title, compact: true, size: 60 })}</div>
      </header>
      <project-bar .project=${p} units=${s.units} ?canUndo=${s.canUndo} ?canRedo=${s.canRedo}></project-bar>
      ${this.provenance(p, s.units)}
      <div class="top">
        <caution-banner></caution-banner>
        <div class="verdict-wrap ${s.stale ? 'stale' : ''}">
          ${s.stale
            ? html`<p class="stale-note" role="status"><span class="stale-word">Stale</span>the verdict and results are for the last accepted values; a field holds a refused value.</p>`
            : nothing}
          <verdict-line .project=${rp} .analysis=${ra} units=${s.units} ?pending=${s.pending} .error=${s.error}></verdict-line>
        </div>
        <p class="status-line" role="status" aria-live="polite">
          ${editErrors.length
            ? html`<span class="error">Not applied — ${editErrors[0].message}${editErrors.length > 1 ? ` (and ${editErrors.length - 1} more)` : ''}</span>`
            : s.notice ?? ''}
        </p>
        <nav aria-label="Worksheet sections">
          <ol>
            ${SECTIONS.map((sec, i) => html`<li><a href="#${sec.id}" @click=${(e: Event) => void this.goTo(e, sec.id)}>${i + 1} ${sec.title}</a></li>`)}
          </ol>
        </nav>
      </div>
      <div class="pin" aria-label="Caution and verdict">
        <caution-banner compact></caution-banner>
        <verdict-chip .project=${rp} .analysis=${ra} ?stale=${s.stale} ?pending=${s.pending}></verdict-chip>
      </div>
      <div class="messages">
        ${this.renderAutosave(s)}
        <dialog class="file-dialog" aria-labelledby="file-dialog-h" @close=${() => this.store.dismissFileErrors()}>
          ${fileErrors
            ? html`<div class="file-errors" role="alert">
                <h2 id="file-dialog-h">Not opened: ${fileErrors.source}</h2>
                <p>${fileErrors.errors.length} error${fileErrors.errors.length === 1 ? '' : 's'} in it; the current project is unchanged.</p>
                <ul>
                  ${fileErrors.errors.map((e) => html`<li data-path=${e.path}>${e.message}</li>`)}
                </ul>
                <form method="dialog"><button type="submit" id="file-dialog-close">Close</button></form>
              </div>`
            : nothing}
        </dialog>
      </div>
      ${s.inputWarnings.length
        ? html`<details class="input-notes">
            <summary>Input notes (${s.inputWarnings.length}): values assumed or unusual</summary>
            <ul>
              ${s.inputWarnings.map((w) => html`<li>${w.message}</li>`)}
            </ul>
          </details>`
        : nothing}

      ${this.sheetStarted ? this.renderSheet(s) : nothing}
    `;
  }

  /**
   * The sheet below its top: section 1 from the frame after the first results; sections 2–9,
   * the trace dialog and the closing caution once their elements have loaded. Each step only
   * adds below what is already laid out, so nothing on screen moves.
   */
  private renderSheet(s: AppState) {
    const p = s.project;
    const rp = s.resultsProject ?? p;
    const report = s.analysis?.report ?? null;
    const ra = this.resultsWithRun(s.analysis, rp, this.uncertaintyRun);
    const opening = html`<section class="inputs" aria-labelledby="opening-h">
      ${this.heading(1)}
      <opening-loads-form .project=${p} units=${s.units} .fieldErrors=${s.fieldErrors}></opening-loads-form>
    </section>`;
    if (!this.sheetComplete) return opening;
    return html`
      ${opening}
      <section class="inputs" aria-labelledby="strata-h">
        ${this.heading(2)}
        <strata-editor .project=${p} .analysis=${s.analysis} units=${s.units} .fieldErrors=${s.fieldErrors}></strata-editor>
      </section>
      <section class="inputs" aria-labelledby="lab-h">
        ${this.heading(3)}
        <lab-tests-panel .project=${p} .analysis=${s.analysis} units=${s.units} .fieldErrors=${s.fieldErrors}></lab-tests-panel>
      </section>
      <section class="results" aria-labelledby="strength-h">
        ${this.heading(4, s.pending)}
        <strength-chain-view .project=${rp} .analysis=${s.analysis} .units=${s.units}></strength-chain-view>
      </section>
      <section class="results" aria-labelledby="checks-h">
        ${this.heading(5, s.pending)}
        <checks-table .project=${rp} .analysis=${ra} .units=${s.units}></checks-table>
      </section>
      <section class="results support" aria-labelledby="support-h">
        ${this.heading(6, s.pending || s.supportPending)}
        <support-form .project=${p} units=${s.units} .fieldErrors=${s.fieldErrors}></support-form>
              <support-view .project=${rp} .analysis=${s.analysis} .units=${s.units} .needed=${s.supportNeeded} ?pending=${s.supportPending}></support-view>
      </section>
      <section class="results" aria-labelledby="span-h">
        ${this.heading(7, s.pending || s.chartPending)}
        <span-finder-view
                .project=${rp}
                .analysis=${s.analysis}
                .units=${s.units}
                .curve=${s.curve}
                .chart=${s.chart}
                .chartLayer=${s.chartLayer}
                .minThickness=${s.minThickness_m}
                ?pending=${s.chartPending}
                .chartError=${s.chartError}
              ></span-finder-view>
              <beam-charts-view .project=${rp} .analysis=${s.analysis} .units=${s.units} .chart=${s.chart} .chartLayer=${s.chartLayer}></beam-charts-view>
      </section>
      <section class="results study" aria-labelledby="uncertainty-h">
        ${this.heading(SECTIONS.findIndex((x) => x.id === 'uncertainty') + 1)}
        <uncertainty-section .project=${p} .runner=${this.runner} .units=${s.units} .fieldErrors=${s.fieldErrors}></uncertainty-section>
      </section>
      <section class="print" aria-labelledby="report-h">
        ${this.heading(SECTIONS.findIndex((x) => x.id === 'report') + 1)}
        <report-view .project=${rp} .analysis=${this.reportWithRun(this.reportAnalysis(s), rp, this.uncertaintyRun)} .curve=${s.chartPending ? null : s.curve} .units=${s.units}></report-view>
      </section>
      <trace-dialog .report=${report} .path=${this.tracePath ?? ''} .units=${s.units} ?open=${this.tracePath !== null}></trace-dialog>
      <footer><caution-banner></caution-banner></footer>
    `;
  }
}


if (!customElements.get('lamina-app')) customElements.define('lamina-app', LaminaApp);

declare global {
  interface HTMLElementTagNameMap {
    'lamina-app': LaminaApp;
  }
}
