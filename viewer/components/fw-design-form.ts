import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import { materialNames } from '../../generator/sizing/materials.ts';
import { getAt, type Doc } from '../lib/doc-path.ts';
import { FIELD_GROUPS } from '../lib/form-fields.ts';
import { displayText, documentValue, unitFor, type FieldDef, type UnitSystem } from '../lib/units-system.ts';
import { shared } from './shared-styles.ts';
import './fw-bench-points.ts';

export interface FieldInputDetail {
  path: string;
  value: unknown;
}

/** The design inputs. State down (doc, units, errors); every edit goes up as a `field-input` event. */
@customElement('fw-design-form')
export class FwDesignForm extends LitElement {
  static override styles = [
    shared,
    css`
      fieldset { border: 1px solid var(--line); border-radius: 8px; margin: 0 0 0.8rem; padding: 0.5rem 0.8rem 0.7rem; background: var(--panel); }
      legend { font-weight: 600; padding: 0 0.3rem; }
      .intro { color: var(--muted); font-size: 0.85rem; margin: 0 0 0.4rem; }
      .field { margin: 0.45rem 0; }
      label { display: block; font-size: 0.9rem; }
      .box { display: flex; align-items: center; gap: 0.35rem; }
      input, select { font: inherit; padding: 0.25rem 0.4rem; border: 1px solid #b9b3a0; border-radius: 5px; width: 8.5rem; background: #fff; }
      .unit { color: var(--muted); min-width: 2.2rem; }
      .hint { color: var(--muted); font-size: 0.8rem; }
      .field.bad input { border-color: var(--bad); background: var(--bad-soft); }
      .msg { color: var(--bad); font-size: 0.82rem; margin-top: 0.15rem; }
    `,
  ];

  @property({ attribute: false }) doc: Doc = {};
  @property() units: UnitSystem = 'metric';
  @property({ attribute: false }) errors: Record<string, string> = {};

  private emit(path: string, value: unknown): void {
    this.dispatchEvent(new CustomEvent<FieldInputDetail>('field-input', { detail: { path, value }, bubbles: true, composed: true }));
  }

  private fieldId(def: FieldDef): string {
    return `f-${def.path.replace(/\./g, '-')}`;
  }

  private renderField(def: FieldDef) {
    const id = this.fieldId(def);
    const unit = unitFor(def, this.units);
    const error = this.errors[def.path];
    const raw = getAt(this.doc, def.path);
    return html`<div class="field ${error ? 'bad' : ''}">
      <label for=${id}>${def.label}</label>
      <div class="box">
        <input
          id=${id}
          name=${def.path}
          inputmode="decimal"
          autocomplete="off"
          .value=${displayText(raw, def, this.units)}
          aria-invalid=${error ? 'true' : 'false'}
          aria-describedby="${id}-unit ${id}-msg"
          @input=${(e: InputEvent) => this.emit(def.path, documentValue((e.target as HTMLInputElement).value, def, this.units))}
        />
        <span class="unit" id="${id}-unit">${unit}</span>
        ${def.hint ? html`<span class="hint">${def.hint}</span>` : nothing}
      </div>
      <div class="msg" id="${id}-msg" role=${error ? 'alert' : nothing}>${error ?? ''}</div>
    </div>`;
  }

  private renderMaterial() {
    const raw = getAt(this.doc, 'print.material');
    const custom = raw && typeof raw === 'object' ? (raw as { name?: string }).name ?? 'your own' : null;
    const current = typeof raw === 'string' ? raw : custom ? '__custom' : 'PETG';
    const error = this.errors['print.material'] ?? this.errors['print.material.density'];
    return html`<div class="field ${error ? 'bad' : ''}">
      <label for="f-print-material">Filament</label>
      <div class="box">
        <select id="f-print-material" aria-describedby="f-print-material-msg" @change=${(e: Event) => this.emit('print.material', (e.target as HTMLSelectElement).value)}>
          ${materialNames().map((n) => html`<option value=${n} ?selected=${n.toLowerCase() === String(current).toLowerCase()}>${n}</option>`)}
          ${custom ? html`<option value="__custom" selected disabled>${custom} (from your file)</option>` : nothing}
        </select>
      </div>
      <div class="msg" id="f-print-material-msg">${error ?? ''}</div>
    </div>`;
  }

  override render() {
    const name = getAt(this.doc, 'name');
    const nameError = this.errors['name'];
    return html`<fieldset>
        <legend>This valve</legend>
        <div class="field ${nameError ? 'bad' : ''}">
          <label for="f-name">Name (used for the file names)</label>
          <input id="f-name" name="name" style="width: 100%; box-sizing: border-box" maxlength="80" autocomplete="off" .value=${typeof name === 'string' ? name : ''}
            aria-describedby="f-name-msg" @input=${(e: InputEvent) => this.emit('name', (e.target as HTMLInputElement).value || undefined)} />
          <div class="msg" id="f-name-msg">${nameError ?? ''}</div>
        </div>
      </fieldset>
      ${FIELD_GROUPS.map(
      (g) => html`<fieldset>
        <legend>${g.title}</legend>
        ${g.intro ? html`<p class="intro">${g.intro}</p>` : nothing}
        ${g.id === 'print' ? this.renderMaterial() : nothing}
        ${g.fields.map((f) => this.renderField(f))}
      </fieldset>`,
    )}
      <fw-bench-points
        .points=${(getAt(this.doc, 'seal.calibration') as unknown[]) ?? []}
        .units=${this.units}
        .errors=${this.errors}
        @points-change=${(e: CustomEvent<unknown[]>) => this.emit('seal.calibration', e.detail.length ? e.detail : undefined)}
      ></fw-bench-points>`;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'fw-design-form': FwDesignForm;
  }
}
