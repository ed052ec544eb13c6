/**
 * The base calculation-sheet look shared by every worksheet element: dense tables with thin
 * rules, tabular numbers, plain inputs with a visible focus ring, small buttons, headings
 * numbered like the sections of a calculation. Import as `static styles = [tokens, sheet]`.
 */
import { css } from 'lit';

export const sheet = css`
  :host {
    font-family: var(--lam-font);
    font-size: var(--lam-size);
    line-height: 1.35;
    color: var(--lam-ink);
    font-variant-numeric: tabular-nums;
  }
  *,
  *::before,
  *::after {
    box-sizing: border-box;
  }
  h2,
  h3,
  h4 {
    font-weight: 600;
    margin: 0.9em 0 0.35em;
    line-height: 1.2;
  }
  h2 {
    font-size: 1.2em;
    border-bottom: 1px solid var(--lam-rule-strong);
    padding-bottom: 0.15em;
  }
  h3 {
    font-size: 1.05em;
  }
  h4 {
    font-size: 1em;
  }
  p {
    margin: 0.3em 0;
  }
  .hint {
    color: var(--lam-muted);
    font-size: 0.92em;
  }
  table {
    border-collapse: collapse;
    font-variant-numeric: tabular-nums;
  }
  th,
  td {
    border-bottom: 1px solid var(--lam-rule);
    padding: 0.2em 0.45em;
    text-align: left;
    vertical-align: top;
  }
  thead th {
    border-bottom: 1px solid var(--lam-rule-strong);
    font-weight: 600;
  }
  th[scope='row'] {
    font-weight: 500;
    white-space: nowrap;
  }
  td.num,
  th.num {
    text-align: right;
  }
  input,
  select,
  textarea,
  button {
    font: inherit;
    color: inherit;
  }
  input[type='text'],
  input:not([type]),
  select,
  textarea {
    border: 1px solid var(--lam-faint);
    border-radius: 2px;
    background: var(--lam-paper);
    padding: 0.15em 0.3em;
    min-height: 1.9em;
  }
  input[aria-invalid='true'] {
    border-color: var(--lam-bad);
    border-width: 2px;
  }
  button {
    border: 1px solid var(--lam-ink);
    border-radius: 2px;
    background: var(--lam-paper);
    padding: 0.15em 0.6em;
    min-height: 1.9em;
    cursor: pointer;
  }
  button:hover:not(:disabled) {
    background: var(--lam-shade);
  }
  button:disabled {
    color: var(--lam-faint);
    border-color: var(--lam-rule);
    cursor: default;
  }
  :focus-visible {
    outline: 3px solid var(--lam-focus);
    outline-offset: 1px;
  }
  .error {
    color: #8a2a00;
    font-size: 0.92em;
  }
  .error::before {
    content: '✗ ';
  }
  .warning::before {
    content: '! ';
    font-weight: 700;
  }
  .sr-only {
    position: absolute;
    width: 1px;
    height: 1px;
    padding: 0;
    margin: -1px;
    overflow: hidden;
    clip: rect(0, 0, 0, 0);
    white-space: nowrap;
    border: 0;
  }
  .chart svg {
    width: 100%;
    height: auto;
    display: block;
  }
  @media print {
    button,
    input[type='file'] {
      display: none !important;
    }
  }
`;
