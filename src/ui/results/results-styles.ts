/**
 * Shared look of the results views: a plain calculation sheet (black on white, thin rules,
 * tabular numbers, system fonts). Colours are Okabe–Ito and only a secondary cue: every status
 * has a word and a symbol. Custom properties (`--lamina-*`) let the app shell theme them.
 */
import { css } from 'lit';

export const resultsStyles = css`
  :host {
    display: block;
    color: var(--lamina-ink, #000);
    font-family: var(--lamina-font, system-ui, -apple-system, 'Segoe UI', Roboto, sans-serif);
    font-size: var(--lamina-font-size, 0.95rem);
    line-height: 1.4;
    --ok: #009e73;
    --bad: #d55e00;
    --info: #56b4e9;
    --na: #999;
    --rule: var(--lamina-rule, #bbb);
    --muted: var(--lamina-muted, #444);
  }
  h3 {
    font-size: 1.05em;
    margin: 1.2em 0 0.4em;
    border-bottom: 1px solid var(--rule);
    padding-bottom: 0.15em;
  }
  h4 {
    font-size: 1em;
    margin: 1em 0 0.3em;
  }
  p {
    margin: 0.4em 0;
  }
  table {
    border-collapse: collapse;
    width: 100%;
    font-variant-numeric: tabular-nums;
    margin: 0.4em 0 0.8em;
  }
  caption {
    text-align: left;
    font-weight: 600;
    padding: 0.3em 0;
  }
  th,
  td {
    border-bottom: 1px solid var(--rule);
    padding: 0.25em 0.5em 0.25em 0;
    text-align: left;
    vertical-align: top;
  }
  th {
    font-weight: 600;
  }
  thead th,
  tbody th[scope='rowgroup'] {
    border-bottom: 1px solid var(--lamina-ink, #000);
  }
  tbody {
    border-bottom: 1px solid var(--lamina-ink, #000);
  }
  .pair {
    display: grid;
    grid-template-columns: minmax(0, 1fr);
    gap: 0 2rem;
    align-items: start;
  }
  /* A table wider than a phone scrolls sideways inside its own box, never past the page. */
  .pair > div {
    min-width: 0;
    overflow-x: auto;
  }
  @media (min-width: 72rem) {
    .pair {
      grid-template-columns: minmax(0, 1.15fr) minmax(0, 1fr);
    }
  }
  td.num,
  th.num {
    text-align: right;
    white-space: nowrap;
  }
  .note,
  .reason,
  .source {
    color: var(--muted);
    font-size: 0.9em;
  }
  .source {
    font-style: italic;
  }
  button.traced {
    font: inherit;
    font-variant-numeric: tabular-nums;
    color: inherit;
    background: none;
    border: none;
    border-bottom: 1px dotted currentColor;
    padding: 0;
    margin: 0;
    cursor: pointer;
    white-space: nowrap;
  }
  button.traced:hover {
    background: #eef6fb;
  }
  button:focus-visible,
  select:focus-visible,
  a:focus-visible {
    outline: 2px solid #0072b2;
    outline-offset: 2px;
  }
  .unit {
    color: var(--muted);
  }
  .status {
    white-space: nowrap;
    padding-left: 0.4em;
    border-left: 4px solid var(--na);
  }
  .status.meets {
    border-left-color: var(--ok);
  }
  .status.below {
    border-left-color: var(--bad);
    font-weight: 600;
  }
  .status.info {
    border-left-color: var(--info);
  }
  .verdict {
    border: 1px solid var(--lamina-ink, #000);
    padding: 0.5em 0.7em;
    margin: 0.5em 0 1em;
  }
  .chart {
    max-width: 46rem;
    margin: 0.5em 0 1em;
  }
  .chart svg {
    width: 100%;
    height: auto;
    display: block;
  }
  .controls {
    display: flex;
    flex-wrap: wrap;
    gap: 0.5em 1.2em;
    align-items: center;
    margin: 0.5em 0;
  }
  label {
    font-weight: 600;
  }
  select,
  button.action {
    font: inherit;
    padding: 0.2em 0.6em;
    border: 1px solid var(--lamina-ink, #000);
    background: #fff;
    color: inherit;
    border-radius: 2px;
  }
  button.action {
    cursor: pointer;
  }
  button.action:hover {
    background: #f0f0f0;
  }
  button.action[disabled] {
    opacity: 0.5;
    cursor: default;
  }
  .empty {
    color: var(--muted);
    font-style: italic;
  }
  ul.warnings {
    padding-left: 1.2em;
  }
  ul.warnings li {
    margin: 0.2em 0;
  }
  code {
    font-family: var(--lamina-mono, ui-monospace, 'SFMono-Regular', Menlo, Consolas, monospace);
    font-size: 0.9em;
  }
  @media print {
    button.action,
    select,
    .controls {
      display: none !important;
    }
    button.traced {
      border-bottom: none;
    }
  }
`;
