/**
 * `<caution-banner>`: the engineering caution (DESIGN.md "Caution", text from
 * `src/model/caution.ts` — never retyped), visible on every view and in print.
 */
import { LitElement, html, css } from 'lit';
import { CAUTION, CAUTION_TITLE } from '../../model/caution';
import { tokens } from '../styles/tokens';

export class CautionBanner extends LitElement {
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
      @media print {
        aside {
          break-inside: avoid;
        }
      }
    `,
  ];

  override render() {
    return html`<aside role="note" aria-label=${CAUTION_TITLE}><strong>${CAUTION_TITLE}.</strong><span class="text">${CAUTION}</span></aside>`;
  }
}

if (!customElements.get('caution-banner')) customElements.define('caution-banner', CautionBanner);

declare global {
  interface HTMLElementTagNameMap {
    'caution-banner': CautionBanner;
  }
}
