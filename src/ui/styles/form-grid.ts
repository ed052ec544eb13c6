/**
 * The look of a worksheet input section made of fieldsets (1 Opening and loads, 6 Support): a
 * grid of fieldsets that wraps to one column on a narrow screen, a rule above each, one field a
 * line, select labels of a common width.
 */
import { css } from 'lit';

export const formGrid = css`
  :host {
    display: block;
  }
  .grid {
    display: grid;
    grid-template-columns: repeat(auto-fit, minmax(min(22rem, 100%), 1fr));
    gap: 0 1.5rem;
  }
  fieldset {
    min-width: 0;
    border: none;
    border-top: 1px solid var(--lam-rule);
    margin: 0.4rem 0;
    padding: 0.3rem 0;
  }
  legend {
    font-weight: 600;
    padding: 0 0.3em 0 0;
  }
  .line {
    display: block;
    margin: 0.25rem 0;
  }
  .field-label {
    display: inline-block;
    min-width: 11em;
  }
  select {
    max-width: 100%;
  }
  .choice-note {
    display: block;
  }
`;
