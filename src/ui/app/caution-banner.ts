/**
 * `<caution-banner>`: the engineering caution (DESIGN.md "Caution", text from
 * `src/model/caution.ts` — never retyped), visible on every view and in print. With `compact`
 * it shows the one-line `CAUTION_SHORT` (the bar pinned at the top of narrow screens).
 */
import { LitElement, html, css } from 'lit';
import { CAUTION, CAUTION_SHORT, CAUTION_TITLE } from '../../model/caution';
import { tokens } from '../styles/tokens';

export class CautionBanner extends LitElement {
  static override properties = { compact: { type: Boolean, reflect: true } };

  compact = false;

  static override styles = [
    tokens,
    css`
      :host {
        display: block;
        font-family: var(--lam-font);
        font-size: 0.84rem;
        line-height: 1.3;
      }
      aside {
        border: 2px solid var(--lam-ink);
        border-left-width: 8px;
        padding: 0.2rem 0.6rem;
        background: var(--lam-paper);
        color: var(--lam-ink);
      }
      strong {
        margin-right: 0.4em;
      }
      strong::before {
        content: '⚠ ';
      }
      :host([compact]) aside {
        border-width: 1px;
        border-left-width: 6px;
        padding: 0.1rem 0.4rem;
        font-size: 0.95em;
      }
      @media print {
        aside {
          break-inside: avoid;
        }
      }
    `,
  ];

  override render() {
    return html`<aside role="note" aria-label=${CAUTION_TITLE}><strong>${CAUTION_TITLE}.</strong><span class="text">${this.compact ? CAUTION_SHORT : CAUTION}</span></aside>`;
  }
}

if (!customElements.get('caution-banner')) customElements.define('caution-banner', CautionBanner);

declare global {
  interface HTMLElementTagNameMap {
    'caution-banner': CautionBanner;
  }
}
