import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import { GLOSSARY, termName, type Term, type TermKey } from '../../generator/doc/glossary.ts';
import { shared } from './shared-styles.ts';

/**
 * A word of the glossary in running text, with its explanation shown on hover and on keyboard focus
 * (role="tooltip", tied to the word by aria-describedby; Escape hides it: WCAG 2.2 SC 1.4.13).
 *
 * Options: `term` (glossary key, required); `marker` (default false): show a small "?" after a label
 * instead of the word itself. The word shown is the slotted text, or the glossary name when none is given.
 */
@customElement('fw-term')
export class FwTerm extends LitElement {
  static override styles = [
    shared,
    css`
      /* a word in running text keeps the text's colour and weight (the shared styles set the workbench's own) */
      :host { display: inline; position: relative; color: inherit; font: inherit; }
      .word { border-bottom: 1px dotted currentColor; cursor: help; }
      .word:focus-visible { outline: 3px solid #e0a030; outline-offset: 1px; border-radius: 2px; }
      .marker { display: inline-block; width: 1.05rem; height: 1.05rem; margin-left: 0.25rem; border-radius: 50%; border: 1px solid var(--muted); color: var(--muted);
        font-size: 0.72rem; line-height: 1rem; text-align: center; cursor: help; vertical-align: 0.05rem; border-bottom-style: solid; }
      [role='tooltip'] { display: none; position: fixed; z-index: 20; max-width: min(19rem, calc(100vw - 1rem)); width: max-content; box-sizing: border-box;
        padding: 0.35rem 0.55rem; border-radius: 6px; background: #2d3128; color: #fff; font-size: 0.82rem; font-weight: normal; line-height: 1.35;
        text-align: left; white-space: normal; box-shadow: 0 2px 8px rgb(0 0 0 / 25%); }
      [role='tooltip'][data-open] { display: block; }
      [role='tooltip'] b { font-weight: 600; }
    `,
  ];

  @property() term: TermKey = 'head';
  @property({ type: Boolean }) marker = false;
  @state() private open = false;

  private show(): void {
    this.open = true;
    // placed beside the word in the viewport, so a scrolling column cannot clip it and it never widens the page
    void this.updateComplete.then(() => {
      const word = this.renderRoot.querySelector<HTMLElement>('.word, .marker');
      const tip = this.renderRoot.querySelector<HTMLElement>('[role="tooltip"]');
      if (!word || !tip) return;
      const at = word.getBoundingClientRect();
      const width = tip.offsetWidth;
      const left = Math.max(8, Math.min(at.left, globalThis.innerWidth - width - 8));
      const below = at.bottom + 4 + tip.offsetHeight <= globalThis.innerHeight;
      tip.style.left = `${left}px`;
      tip.style.top = `${below ? at.bottom + 4 : Math.max(4, at.top - 4 - tip.offsetHeight)}px`;
    });
  }

  private hide(): void {
    this.open = false;
  }

  private key(e: KeyboardEvent): void {
    if (e.key === 'Escape' && this.open) {
      e.stopPropagation();
      this.hide();
    }
  }

  override render() {
    const entry: Term | undefined = GLOSSARY[this.term];
    if (!entry) return html`<slot></slot>`;
    const name = termName(this.term);
    const handlers = { enter: () => this.show(), leave: () => this.hide() };
    return html`<span
        class=${this.marker ? 'marker' : 'word'}
        tabindex="0"
        data-term=${this.term}
        aria-describedby="tip"
        aria-label=${this.marker ? 'What is this?' : nothing}
        @focus=${handlers.enter}
        @blur=${handlers.leave}
        @mouseenter=${handlers.enter}
        @mouseleave=${handlers.leave}
        @keydown=${this.key}
        >${this.marker ? '?' : html`<slot>${name}</slot>`}</span
      ><span role="tooltip" id="tip" ?data-open=${this.open}><b>${termName(this.term, true)}${entry.trade ? ` (${entry.trade})` : ''}:</b> ${entry.explain}</span>`;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'fw-term': FwTerm;
  }
}
