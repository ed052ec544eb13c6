/**
 * Small template helpers for the non-numeric fields of the forms: a labelled <select>, a
 * checkbox and a text field, each dispatching `project-edit` from `host` with its path.
 * Every control has a real <label>; `compact` hides it visually (table cells).
 */
import { html, nothing } from 'lit';
import { fireEdit } from './events';

let counter = 0;
const nextId = (): string => `f${++counter}`;

export interface Choice<T extends string> {
  value: T;
  label: string;
  /** A sentence shown under the select while this choice is chosen (keeps the label short enough to read in the select). */
  note?: string;
}

export function selectField<T extends string>(
  host: EventTarget,
  opts: { label: string; path: string; value: T; choices: ReadonlyArray<Choice<T>>; compact?: boolean; disabled?: boolean; error?: string },
) {
  const id = nextId();
  return html`<span class="field select-field">
    <label for=${id} class=${opts.compact ? 'sr-only' : 'field-label'}>${opts.label}</label>
    <select
      id=${id}
      data-path=${opts.path}
      ?disabled=${opts.disabled ?? false}
      aria-invalid=${opts.error ? 'true' : 'false'}
      @change=${(e: Event) => fireEdit(host, opts.path, (e.target as HTMLSelectElement).value)}
    >
      ${opts.choices.map((c) => html`<option value=${c.value} ?selected=${c.value === opts.value}>${c.label}</option>`)}
    </select>
    ${choiceNote(opts.choices, opts.value)}
    ${opts.error ? html`<span class="error" role="alert">${opts.label}: ${opts.error}</span>` : nothing}
  </span>`;
}

/** The chosen choice's note, as a hint line under its select (nothing when it has none). */
export function choiceNote<T extends string>(choices: ReadonlyArray<Choice<T>>, value: T) {
  const note = choices.find((c) => c.value === value)?.note;
  return note ? html`<span class="hint choice-note">${note}</span>` : nothing;
}

export function checkboxField(host: EventTarget, opts: { label: string; path: string; value: boolean; compact?: boolean; hint?: string }) {
  const id = nextId();
  return html`<span class="field check-field">
    <input
      id=${id}
      type="checkbox"
      data-path=${opts.path}
      .checked=${opts.value}
      @change=${(e: Event) => fireEdit(host, opts.path, (e.target as HTMLInputElement).checked)}
    />
    <label for=${id} class=${opts.compact ? 'sr-only' : ''}>${opts.label}</label>
    ${opts.hint ? html`<span class="hint">${opts.hint}</span>` : nothing}
  </span>`;
}

export function textField(host: EventTarget, opts: { label: string; path: string; value: string; compact?: boolean; size?: number; error?: string }) {
  const id = nextId();
  return html`<span class="field text-field">
    <label for=${id} class=${opts.compact ? 'sr-only' : 'field-label'}>${opts.label}</label>
    <input
      id=${id}
      type="text"
      data-path=${opts.path}
      size=${opts.size ?? 18}
      .value=${opts.value}
      aria-invalid=${opts.error ? 'true' : 'false'}
      @change=${(e: Event) => fireEdit(host, opts.path, (e.target as HTMLInputElement).value)}
    />
    ${opts.error ? html`<span class="error" role="alert">${opts.label}: ${opts.error}</span>` : nothing}
  </span>`;
}

/** The validation message for `path` among the store's field errors (exact path match). */
export function errorFor(errors: ReadonlyArray<{ path: string; message: string }> | undefined, path: string): string {
  const e = errors?.find((x) => x.path === path);
  return e ? e.message : '';
}

/**
 * A `<quantity-input>` on its own line for a form: the value in the file unit of `quantity`
 * (or a plain number with `unitText`), shown in `units`, with the model's error for `path`.
 */
export function quantityField(opts: {
  label: string; path: string; value: number | null; quantity: string; units: string;
  errors: ReadonlyArray<{ path: string; message: string }>; unitText?: string; nullable?: boolean; hint?: string;
}) {
  return html`<quantity-input
    class="line"
    label=${opts.label}
    path=${opts.path}
    .value=${opts.value}
    quantity=${opts.quantity}
    units=${opts.units}
    unit-text=${opts.unitText ?? ''}
    ?nullable=${opts.nullable ?? false}
    hint=${opts.hint ?? ''}
    error=${errorFor(opts.errors, opts.path)}
  ></quantity-input>`;
}
