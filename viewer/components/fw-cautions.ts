import { LitElement, css, html } from 'lit';
import { customElement } from 'lit/decorators.js';
import { CAUTIONS } from '../../generator/doc/cautions.ts';
import { shared } from './shared-styles.ts';

/** The shared safety cautions, always on screen. */
@customElement('fw-cautions')
export class FwCautions extends LitElement {
  static override styles = [
    shared,
    css`
      :host { display: block; background: #fff8e8; border-top: 3px solid var(--warn); }
      ul { list-style: none; margin: 0; padding: 0.35rem 0.8rem; display: flex; flex-wrap: wrap; gap: 0.2rem 1.2rem; font-size: 0.8rem; }
      li { flex: 1 1 16rem; }
      b { color: #6b4200; }
    `,
  ];

  override render() {
    return html`<ul aria-label="Safety cautions">${CAUTIONS.map((c) => html`<li><b>${c.title}.</b> ${c.text}</li>`)}</ul>`;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'fw-cautions': FwCautions;
  }
}
