/**
 * A result number that opens its calculation trace: a button with class `traced` and
 * `data-path` set to the report field path. Clicking it dispatches `show-trace`
 * (bubbles, composed) so the app shell can open the `<trace-dialog>`.
 *
 * @fires show-trace - detail `{ path: string }`
 */
import { html, nothing, type TemplateResult } from 'lit';

export interface ShowTraceDetail {
  path: string;
}

function onTracedClick(event: Event): void {
  const button = event.currentTarget as HTMLElement;
  const path = button.dataset.path ?? '';
  button.dispatchEvent(
    new CustomEvent<ShowTraceDetail>('show-trace', { detail: { path }, bubbles: true, composed: true }),
  );
}

/**
 * @param path   report field path, e.g. `layers[0].elastic.fsTension`
 * @param text   the formatted number
 * @param unit   unit label shown after the number (may be empty)
 * @param siValue the value in file units, exposed as `data-si-value` for tests and tools
 */
export function tracedNumber(path: string, text: string, unit = '', siValue?: number | null): TemplateResult {
  const value = siValue !== undefined && siValue !== null && Number.isFinite(siValue) ? String(siValue) : nothing;
  return html`<button
    type="button"
    class="traced"
    data-path=${path}
    data-si-value=${value}
    title="Show how this number was calculated"
    @click=${onTracedClick}
  >${text}${unit ? html`<span class="unit">&nbsp;${unit}</span>` : nothing}</button>`;
}
