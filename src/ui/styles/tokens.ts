/**
 * Design tokens of the worksheet: system fonts only, black on white, thin rules, the
 * Okabe–Ito colour-blind-safe palette (Okabe & Ito 2008, "Color Universal Design"). Colour is
 * always a secondary cue: statuses carry a word and a symbol.
 */
import { css, unsafeCSS } from 'lit';

export const OKABE_ITO = {
  black: '#000000',
  orange: '#E69F00',
  skyBlue: '#56B4E9',
  bluishGreen: '#009E73',
  yellow: '#F0E442',
  blue: '#0072B2',
  vermillion: '#D55E00',
  reddishPurple: '#CC79A7',
} as const;

export const tokens = css`
  :host {
    --lam-font: system-ui, -apple-system, 'Segoe UI', Roboto, 'Helvetica Neue', Arial, sans-serif;
    --lam-mono: ui-monospace, 'SFMono-Regular', Menlo, Consolas, 'Liberation Mono', monospace;
    --lam-ink: #000;
    --lam-muted: #444;
    --lam-faint: #767676;
    --lam-rule: #bdbdbd;
    --lam-rule-strong: #000;
    --lam-paper: #fff;
    --lam-shade: #f4f4f4;
    --lam-ok: ${unsafeCSS(OKABE_ITO.bluishGreen)};
    --lam-bad: ${unsafeCSS(OKABE_ITO.vermillion)};
    --lam-accent: ${unsafeCSS(OKABE_ITO.blue)};
    --lam-warn: ${unsafeCSS(OKABE_ITO.orange)};
    --lam-focus: ${unsafeCSS(OKABE_ITO.blue)};
    --lam-size: 14px;
    --lam-gap: 0.5rem;
  }
`;
