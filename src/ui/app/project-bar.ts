/**
 * `<project-bar>`: new project, demo presets, open, save, share link, undo, redo and the SI/US
 * switch. It wraps onto several lines on a narrow screen and never overflows it.
 * Opening a file reads it with the model's `readProjectText`; a refused file reports its field
 * errors and leaves the current project untouched.
 *
 * @fires project-replace - a new project, a preset or an opened file (already validated)
 * @fires project-file-errors - { source, errors } a file could not be opened
 * @fires units-change - { units }
 * @fires history-undo
 * @fires history-redo
 * @fires app-notice - { notice } (link copied, file saved)
 */
import { LitElement, html, css, type PropertyValues } from 'lit';
import type { Project } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import { readProjectText, writeProjectText } from '../../model/project-file';
import { MIGRATED_CODE } from '../../model/validate';
import { ProjectError } from '../../model/validate';
import { PRESETS, presetData } from '../state/presets';
import { newProject } from '../../model/new-project';
import { encodeShareHash } from '../state/share-link';
import { fire, fireReplace, fireUnits } from '../inputs/events';
import { tokens } from '../styles/tokens';
import { sheet } from '../styles/sheet';
import { downloadText, safeFileName } from './download';

export class ProjectBar extends LitElement {
  static override properties = {
    project: { attribute: false },
    units: { type: String },
    canUndo: { type: Boolean },
    canRedo: { type: Boolean },
    shareLink: { state: true },
  };

  project!: Project;
  units: UnitSystem = 'SI';
  canUndo = false;
  canRedo = false;
  shareLink = '';

  static override styles = [
    tokens,
    sheet,
    css`
      :host {
        display: block;
      }
      .bar {
        display: flex;
        flex-wrap: wrap;
        gap: 0.4rem 0.9rem;
        align-items: center;
      }
      .group {
        display: inline-flex;
        flex-wrap: wrap;
        gap: 0.3rem;
        align-items: center;
        max-width: 100%;
        min-width: 0;
      }
      .group.demo {
        flex: 0 1 auto;
      }
      .group.demo select {
        flex: 1 1 12rem;
        min-width: 0;
        max-width: 100%;
      }
      .file-label {
        border: 1px solid var(--lam-ink);
        border-radius: 2px;
        padding: 0.15em 0.6em;
        cursor: pointer;
        min-height: 1.9em;
        display: inline-flex;
        align-items: center;
      }
      .file-label:focus-within {
        outline: 3px solid var(--lam-focus);
        outline-offset: 1px;
      }
      input[type='file'] {
        position: absolute;
        width: 1px;
        height: 1px;
        opacity: 0;
      }
      fieldset {
        border: none;
        padding: 0;
        margin: 0;
        min-width: 0;
        flex-wrap: wrap;
        display: inline-flex;
        gap: 0.4rem;
        align-items: center;
      }
      legend {
        float: left;
        margin-right: 0.3rem;
      }
      .share {
        width: 100%;
        display: flex;
        gap: 0.4rem;
        align-items: center;
      }
      .share {
        flex-wrap: wrap;
      }
      .share input {
        flex: 1 1 12rem;
        min-width: 0;
        font-family: var(--lam-mono);
        font-size: 0.85em;
      }
      @media print {
        :host {
          display: none;
        }
      }
    `,
  ];

  protected override willUpdate(changed: PropertyValues<this>): void {
    // A link copied earlier carries the old project: drop it once the project changes.
    if (changed.has('project') && changed.get('project') !== undefined) this.shareLink = '';
  }

  private startNew(): void {
    fireReplace(this, newProject(), 'New project (one layer; its placeholders and defaults are listed below the project bar)');
  }

  private loadPreset(e: Event): void {
    const select = e.target as HTMLSelectElement;
    const preset = PRESETS.find((p) => p.id === select.value);
    select.value = '';
    if (preset) fireReplace(this, presetData(preset), `Demo “${preset.label}”`);
  }

  private async openFile(e: Event): Promise<void> {
    const input = e.target as HTMLInputElement;
    const file = input.files?.[0];
    input.value = '';
    if (!file) return;
    let text: string;
    try {
      text = await file.text();
    } catch (err) {
      fire(this, 'project-file-errors', { source: file.name, errors: [{ path: '', message: `the file could not be read: ${String(err)}` }] });
      return;
    }
    try {
      const { project, warnings } = readProjectText(text);
      fireReplace(this, project, `File ${file.name}`);
      // A lamina/1 file was migrated on reading: say once what that means.
      const migrated = warnings.find((w) => w.code === MIGRATED_CODE);
      if (migrated) fire(this, 'app-notice', { notice: migrated.message });
    } catch (err) {
      const errors = err instanceof ProjectError ? err.issues.map((i) => ({ path: i.path, message: i.message })) : [{ path: '', message: String(err) }];
      fire(this, 'project-file-errors', { source: file.name, errors });
    }
  }

  private save(): void {
    const name = `${safeFileName(this.project.title)}.lamina.json`;
    downloadText(name, writeProjectText(this.project));
    fire(this, 'app-notice', { notice: `Saved as ${name} (your browser’s download folder).` });
  }

  private async share(): Promise<void> {
    const url = `${location.origin}${location.pathname}${location.search}${encodeShareHash(this.project)}`;
    this.shareLink = url;
    try {
      await navigator.clipboard.writeText(url);
      fire(this, 'app-notice', { notice: 'Link copied: it carries the whole project; anyone opening it gets this project.' });
    } catch {
      fire(this, 'app-notice', { notice: 'Copy the link from the box below the project bar.' });
    }
  }

  override render() {
    return html`<div class="bar">
      <span class="group">
        <button type="button" id="new-project" @click=${this.startNew} title="A blank project with one layer; every starting value is listed for you to replace or check">New project</button>
      </span>
      <span class="group demo">
        <label for="preset">Demo projects</label>
        <select id="preset" @change=${this.loadPreset}>
          <option value="">Load a demo…</option>
          ${PRESETS.map((p) => html`<option value=${p.id}>${p.label}</option>`)}
        </select>
      </span>
      <span class="group">
        <label class="file-label">Open…<input id="open-file" type="file" accept=".json,.lamina.json,application/json" @change=${this.openFile} /></label>
        <button type="button" id="save" @click=${this.save}>Save</button>
        <button type="button" id="share" @click=${this.share}>Copy link</button>
      </span>
      <span class="group">
        <button type="button" id="undo" ?disabled=${!this.canUndo} @click=${() => fire(this, 'history-undo', {})} title="Undo (Ctrl+Z)">↶ Undo</button>
        <button type="button" id="redo" ?disabled=${!this.canRedo} @click=${() => fire(this, 'history-redo', {})} title="Redo (Ctrl+Shift+Z or Ctrl+Y)">↷ Redo</button>
      </span>
      <fieldset>
        <legend>Units</legend>
        ${(['SI', 'US'] as const).map(
          (u) => html`<label
            ><input type="radio" name="units" value=${u} .checked=${this.units === u} @change=${() => fireUnits(this, u)} />${u === 'SI' ? 'SI (m, MPa)' : 'US (ft, psi)'}</label
          >`,
        )}
      </fieldset>
      ${this.shareLink
        ? html`<span class="share"
            ><label for="share-link">Link to this project</label><input id="share-link" readonly .value=${this.shareLink} @focus=${(e: Event) => (e.target as HTMLInputElement).select()}
          /></span>`
        : ''}
    </div>`;
  }
}

if (!customElements.get('project-bar')) customElements.define('project-bar', ProjectBar);

declare global {
  interface HTMLElementTagNameMap {
    'project-bar': ProjectBar;
  }
}
