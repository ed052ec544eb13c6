/**
 * A displayed result number that opens its calculation trace: a button with class `traced`
 * and `data-path` (the report field path) dispatching `show-trace`.
 *
 * @fires show-trace - { path }
 */
import { html, nothing } from 'lit';
import { fire } from './events';

export function tracedValue(path: string, text: string, siValue: number | null | undefined) {
  return html`<button
    type="button"
    class="traced"
    data-path=${path}
    data-si-value=${siValue !== null && siValue !== undefined && Number.isFinite(siValue) ? String(siValue) : nothing}
    title="Show how this number was calculated"
    @click=${(e: Event) => fire(e.currentTarget as EventTarget, 'show-trace', { path })}
  >
    ${text}
  </button>`;
}
