import { LitElement, css, html } from 'lit';
import { customElement, state } from 'lit/decorators.js';
import { CAUTIONS } from '../../generator/doc/cautions.ts';
import { shared } from './shared-styles.ts';

/** Remembers that the grower has read and folded the cautions once (they open on a first visit). */
export const CAUTIONS_FOLDED_KEY = 'floatwright.cautions-folded';

function wasFolded(): boolean {
  try {
    return globalThis.localStorage?.getItem(CAUTIONS_FOLDED_KEY) === '1';
  } catch {
    return false;
  }
}

/**
 * The shared safety cautions: open on a first visit, foldable to one line, and that line always on screen
 * (the page keeps it at the bottom edge), so the cautions are one click away wherever the grower is.
 */
@customElement('fw-cautions')
export class FwCautions extends LitElement {
  static override styles = [
    shared,
    css`
      :host { display: block; background: #fff8e8; border-top: 3px solid var(--warn); }
      summary { cursor: pointer; padding: 0.3rem 0.8rem; font-weight: 600; color: #6b4200; font-size: 0.85rem; }
      summary:focus-visible { outline: 3px solid #e0a030; }
      ul { list-style: none; margin: 0; padding: 0 0.8rem 0.4rem; display: flex; flex-wrap: wrap; gap: 0.2rem 1.2rem; font-size: 0.8rem; max-height: 40vh; overflow: auto; }
      li { flex: 1 1 16rem; min-width: 0; }
      b { color: #6b4200; }
      @media (max-width: 900px) { ul { max-height: 26vh; } }
    `,
  ];

  @state() private open = !wasFolded();

  private toggled(e: Event): void {
    this.open = (e.target as HTMLDetailsElement).open;
    try {
      globalThis.localStorage?.setItem(CAUTIONS_FOLDED_KEY, this.open ? '0' : '1');
    } catch {
      // storage blocked: the cautions simply open again next time
    }
  }

  override render() {
    return html`<details ?open=${this.open} @toggle=${this.toggled}>
      <summary>Safety cautions${this.open ? '' : ': read them before you build (click to open)'}</summary>
      <ul aria-label="Safety cautions">${CAUTIONS.map((c) => html`<li><b>${c.title}.</b> ${c.text}</li>`)}</ul>
    </details>`;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'fw-cautions': FwCautions;
  }
}
