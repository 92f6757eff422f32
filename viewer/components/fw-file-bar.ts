import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { ExportKind } from '../worker/protocol.ts';
import { PART_NAMES, PART_WORDS, type PartName } from '../worker/parts-contract.ts';
import { shared } from './shared-styles.ts';

export interface ExportRequest {
  kind: ExportKind | 'json';
  part?: PartName;
}


/**
 * Downloads, opening a saved design, and the share link. Emits `export-request`, `import-file`, `share-link`.
 * While `disabled`, every file button (the design file too) is off and `reason` says why.
 */
@customElement('fw-file-bar')
export class FwFileBar extends LitElement {
  static override styles = [
    shared,
    css`
      :host { display: block; background: var(--panel); border: 1px solid var(--line); border-radius: 8px; padding: 0.5rem 0.8rem; }
      .row { display: flex; flex-wrap: wrap; gap: 0.35rem; margin: 0.3rem 0; align-items: center; }
      .row > span { color: var(--muted); font-size: 0.85rem; min-width: 5.5rem; }
      .primary { background: var(--leaf); color: #fff; }
      .primary:hover { background: #335a2b; }
      /* hidden from sight but not from Tab: the label is the button, the input takes the focus (Enter or Space opens the chooser) */
      input[type='file'] { position: absolute; inset: 0; width: 1px; height: 1px; opacity: 0; overflow: hidden; }
      label.file { position: relative; border: 1px solid var(--leaf); color: var(--leaf); border-radius: 6px; padding: 0.3rem 0.7rem; cursor: pointer; }
      label.file:focus-within { outline: 3px solid #e0a030; }
      .busy { color: var(--muted); font-size: 0.85rem; }
      .why { margin: 0.2rem 0; font-size: 0.85rem; color: var(--bad, #a33); }
    `,
  ];

  @property({ type: Boolean }) disabled = false;
  @property() busy = '';
  /** why the files cannot be made now (shown while disabled) */
  @property() reason = '';
  /** the parts of the valve on screen, one button each (a direct valve's until a sizing says otherwise) */
  @property({ attribute: false }) parts: readonly PartName[] = PART_NAMES;

  private ask(kind: ExportRequest['kind'], part?: PartName) {
    this.dispatchEvent(new CustomEvent<ExportRequest>('export-request', { detail: { kind, part }, bubbles: true, composed: true }));
  }

  override render() {
    const d = this.disabled || this.busy !== '';
    return html`<h2>Files for your printer</h2>
      ${this.disabled && this.reason ? html`<p class="why" role="status" data-export-blocked>${this.reason}</p>` : nothing}
      <div class="row">
        <span>Everything</span>
        <button class="primary" ?disabled=${d} @click=${() => this.ask('zip')}>All parts (.zip)</button>
        <button ?disabled=${d} @click=${() => this.ask('3mf')}>Print plate (.3mf)</button>
        <button ?disabled=${d} @click=${() => this.ask('sheet')}>Build sheet</button>
      </div>
      <div class="row">
        <span>One part (.stl)</span>
        ${this.parts.map((p) => html`<button ?disabled=${d} data-part=${p} @click=${() => this.ask('stl', p)}>${PART_WORDS[p]}</button>`)}
      </div>
      <div class="row">
        <span>Design</span>
        <button ?disabled=${d} @click=${() => this.ask('json')}>Save design file</button>
        <label class="file">Open design file…<input type="file" accept=".json,application/json" @change=${(e: Event) => {
          const input = e.target as HTMLInputElement;
          const file = input.files?.[0];
          if (file) this.dispatchEvent(new CustomEvent<File>('import-file', { detail: file, bubbles: true, composed: true }));
          input.value = '';
        }} /></label>
        <button @click=${() => this.dispatchEvent(new CustomEvent('share-link', { bubbles: true, composed: true }))}>Copy share link</button>
      </div>
      <div class="busy" role="status">${this.busy}</div>`;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'fw-file-bar': FwFileBar;
  }
}
