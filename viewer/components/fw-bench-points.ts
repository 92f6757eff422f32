import { LitElement, css, html } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import { CALIBRATION_HEAD, CALIBRATION_MASS, displayText, documentValue, unitFor, type UnitSystem } from '../lib/units-system.ts';
import { labelFor } from '../lib/field-label.ts';
import { oneHeadNote } from '../lib/one-head-note.ts';
import { shared } from './shared-styles.ts';
import './fw-term.ts';

type Point = { head?: unknown; mass?: unknown };

/**
 * Bench calibration: the grower hangs weights on a pad under the nozzle and
 * notes, for a few heads, the smallest weight that stopped the flow.
 * Emits `points-change` with the whole new list.
 */
@customElement('fw-bench-points')
export class FwBenchPoints extends LitElement {
  static override styles = [
    shared,
    css`
      fieldset { border: 1px solid var(--line); border-radius: 8px; padding: 0.5rem 0.8rem 0.7rem; background: var(--panel); margin: 0; }
      legend { font-weight: 600; padding: 0 0.3rem; }
      p { color: var(--muted); font-size: 0.85rem; margin: 0 0 0.4rem; }
      table { border-collapse: collapse; }
      th { font-weight: normal; text-align: left; font-size: 0.85rem; padding-right: 0.4rem; }
      input { font: inherit; width: 5.5rem; padding: 0.2rem 0.35rem; border: 1px solid #b9b3a0; border-radius: 5px; }
      input[aria-invalid='true'] { border-color: var(--bad); background: var(--bad-soft); }
      .msg { color: var(--bad); font-size: 0.82rem; }
      .one-head { color: var(--ink); background: var(--warn-soft); border-left: 3px solid var(--warn); padding: 0.2rem 0.5rem; border-radius: 4px; }
      .remove { border-color: #999; color: #555; padding: 0.1rem 0.45rem; }
    `,
  ];

  @property({ attribute: false }) points: Point[] = [];
  @property() units: UnitSystem = 'metric';
  @property({ attribute: false }) errors: Record<string, string> = {};

  private change(points: Point[]): void {
    this.dispatchEvent(new CustomEvent('points-change', { detail: points, bubbles: true, composed: true }));
  }

  private edit(i: number, key: 'head' | 'mass', text: string): void {
    const def = key === 'head' ? CALIBRATION_HEAD : CALIBRATION_MASS;
    const next = this.points.map((p, j) => (j === i ? { ...p, [key]: documentValue(text, def, this.units) ?? '' } : p));
    this.change(next);
  }

  private renderOneHead() {
    const note = oneHeadNote(this.points);
    return note ? html`<p class="one-head" role="status" data-one-head>${note}</p>` : '';
  }

  override render() {
    const hu = unitFor(CALIBRATION_HEAD, this.units);
    const mu = unitFor(CALIBRATION_MASS, this.units);
    const messages = Object.entries(this.errors).filter(([k]) => k.startsWith('seal.calibration'));
    return html`<fieldset>
      <legend>Bench test of your pad (optional)<fw-term marker term="bench-points"></fw-term></legend>
      <p>Hold the pad under the nozzle, hang weights on it, and note the smallest weight that stops the flow at two or more heads. The sizing then uses your pad instead of the book values.</p>
      ${this.points.length
        ? html`<table>
            <thead><tr><th id="bp-h"><fw-term term="head">Head</fw-term> (${hu})</th><th id="bp-m">Weight (${mu})</th><th></th></tr></thead>
            <tbody>
              ${this.points.map(
                (p, i) => html`<tr>
                  <td><input aria-label="Head, point ${i + 1}" name="cal-head-${i}" .value=${displayText(p.head, { ...CALIBRATION_HEAD, path: `seal.calibration.${i}.head` }, this.units)}
                    aria-invalid=${this.errors[`seal.calibration.${i}.head`] ? 'true' : 'false'}
                    @input=${(e: InputEvent) => this.edit(i, 'head', (e.target as HTMLInputElement).value)} /></td>
                  <td><input aria-label="Weight, point ${i + 1}" name="cal-mass-${i}" .value=${displayText(p.mass, { ...CALIBRATION_MASS, path: `seal.calibration.${i}.mass` }, this.units)}
                    aria-invalid=${this.errors[`seal.calibration.${i}.mass`] ? 'true' : 'false'}
                    @input=${(e: InputEvent) => this.edit(i, 'mass', (e.target as HTMLInputElement).value)} /></td>
                  <td><button class="remove" aria-label="Remove point ${i + 1}" @click=${() => this.change(this.points.filter((_, j) => j !== i))}>×</button></td>
                </tr>`,
              )}
            </tbody>
          </table>`
        : ''}
      ${messages.map(([k, m]) => html`<div class="msg" role="alert">${labelFor(k)}: ${m}</div>`)}
      ${this.renderOneHead()}
      ${this.points.some((p) => !p.head || !p.mass) ? html`<p>A row with an empty box is not used until both are filled in.</p>` : ''}
      <button @click=${() => this.change([...this.points, { head: '', mass: '' }])}>Add a bench point</button>
    </fieldset>`;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'fw-bench-points': FwBenchPoints;
  }
}
