import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import { MAX_NOTES_LENGTH } from '../../generator/doc/schema.ts';
import { materialNames } from '../../generator/sizing/materials.ts';
import { AUTO_PAD, findPad, padNames } from '../../generator/sizing/seal/pads.ts';
import { getAt, type Doc } from '../lib/doc-path.ts';
import { FIELD_GROUPS, VALVE_MENUS, type MenuDef } from '../lib/form-fields.ts';
import { MATERIAL_DENSITY_FIELD, OTHER_FILAMENT, materialChoice, otherFilamentValue } from '../lib/material-choice.ts';
import { fileStem } from '../../generator/doc/file-stem.ts';
import { fieldDefault } from '../lib/field-default.ts';
import { materialNotes } from '../../generator/doc/material-notes.ts';
import { superscriptUnits } from '../../generator/doc/superscript-units.ts';
import { labelFor } from '../lib/field-label.ts';
import { markTerms } from '../lib/mark-terms.ts';
import { REFILL_BOXES, loneRefillBox } from '../lib/lone-refill-box.ts';
import { displayText, documentValue, unitFor, type FieldDef, type UnitSystem } from '../lib/units-system.ts';
import { shared } from './shared-styles.ts';
import './fw-bench-points.ts';

const otherRefillBox = (path: string) => REFILL_BOXES.find((p) => p !== path)!;

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
      .label-row { display: flex; align-items: baseline; }
      .label-row label { display: inline; }
      .box { display: flex; align-items: center; gap: 0.35rem; }
      textarea { font: inherit; width: 100%; box-sizing: border-box; padding: 0.25rem 0.4rem; border: 1px solid #b9b3a0; border-radius: 5px; resize: vertical; }
      input, select { font: inherit; padding: 0.25rem 0.4rem; border: 1px solid #b9b3a0; border-radius: 5px; width: 8.5rem; background: #fff; }
      /* a menu as wide as its longest choice, never wider than the column */
      select { width: auto; min-width: 8.5rem; max-width: 100%; }
      .unit { color: var(--muted); min-width: 2.2rem; flex: none; white-space: nowrap; }
      .note { color: var(--muted); font-size: 0.8rem; }
      .note:empty { display: none; }
      .reset { padding: 0.1rem 0.45rem; font-size: 0.8rem; flex: none; }
      input::placeholder { color: #8d8a80; font-style: italic; }
      .field.bad input { border-color: var(--bad); background: var(--bad-soft); }
      .msg { color: var(--bad); font-size: 0.82rem; margin-top: 0.15rem; }
      .material-note { margin: 0.4rem 0; padding: 0.3rem 0.5rem; border-left: 4px solid var(--warn); border-radius: 4px; background: var(--warn-soft); color: #4d3400; font-size: 0.82rem; }
      .material-note .basis { margin-top: 0.2rem; color: var(--muted); font-size: 0.76rem; }
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

  /** `emptyValue`: what an emptied box sends (undefined removes the key; '' keeps it, for the density inside a custom material) */
  private renderField(def: FieldDef, emptyValue?: '') {
    const id = this.fieldId(def);
    const unit = unitFor(def, this.units);
    const error = this.errors[def.path];
    const raw = getAt(this.doc, def.path);
    const fallback = fieldDefault(def, this.doc, this.units);
    const typed = raw !== undefined && raw !== '';
    const waiting = loneRefillBox(this.doc) === def.path;
    return html`<div class="field ${error ? 'bad' : ''}">
      <div class="label-row"><label for=${id} id="${id}-label">${def.label}</label>${def.term ? html`<fw-term marker term=${def.term}></fw-term>` : nothing}</div>
      <div class="box">
        <input
          id=${id}
          name=${def.path}
          inputmode="decimal"
          autocomplete="off"
          placeholder=${fallback?.placeholder ?? nothing}
          .value=${displayText(raw, def, this.units)}
          aria-invalid=${error ? 'true' : 'false'}
          aria-describedby="${id}-unit ${id}-note ${id}-msg"
          @input=${(e: InputEvent) => this.emit(def.path, documentValue((e.target as HTMLInputElement).value, def, this.units) ?? emptyValue)}
        />
        <span class="unit" id="${id}-unit">${superscriptUnits(unit)}</span>
        ${fallback && typed
          ? html`<button class="reset" data-reset=${def.path} aria-label="Back to the default" aria-describedby="${id}-label ${id}-note" title=${superscriptUnits(fallback.note)}
              @click=${() => this.resetField(def, id)}>↺ default</button>`
          : nothing}
      </div>
      <div class="note" id="${id}-note">${superscriptUnits([def.hint && def.hint[0].toUpperCase() + def.hint.slice(1), waiting ? `Not used until "${labelFor(otherRefillBox(def.path))}" is given too.` : fallback?.note].filter(Boolean).join('. '))}</div>
      <div class="msg" id="${id}-msg" role=${error ? 'alert' : nothing}>${error ?? ''}</div>
    </div>`;
  }

  /** A blank box takes its default; the focus stays in the box, to type another value straight away. */
  private resetField(def: FieldDef, id: string): void {
    this.emit(def.path, undefined);
    void this.updateComplete.then(() => this.renderRoot.querySelector<HTMLInputElement>(`#${id}`)?.focus());
  }

  /** the grower's own filament, kept while a table one is picked, so picking "other" again brings it back */
  private rememberedOther: { name: string; density: unknown } | null = null;

  override willUpdate(): void {
    const choice = materialChoice(getAt(this.doc, 'print.material'));
    if (choice.kind === 'other') this.rememberedOther = { name: choice.name, density: choice.density };
  }

  /** The menu shows the document's choice (set after the options exist; an attribute would not move a menu the grower has used). */
  override updated(): void {
    const select = this.renderRoot.querySelector<HTMLSelectElement>('#f-print-material');
    const choice = materialChoice(getAt(this.doc, 'print.material'));
    const value = choice.kind === 'table' ? choice.name : choice.kind === 'other' ? OTHER_FILAMENT : '';
    if (select && select.value !== value) select.value = value;
    const padSelect = this.renderRoot.querySelector<HTMLSelectElement>('#f-seal-pad');
    const padValue = this.padValue();
    if (padSelect && padSelect.value !== padValue) padSelect.value = padValue;
    for (const def of VALVE_MENUS) {
      const menu = this.renderRoot.querySelector<HTMLSelectElement>(`select[name="${def.path}"]`);
      const v = this.menuValue(def);
      if (menu && menu.value !== v) menu.value = v;
    }
  }

  /** A valve menu's value for the document: its choice, 'auto' when the document has none. */
  private menuValue(def: MenuDef): string {
    const raw = getAt(this.doc, def.path);
    return raw === undefined ? 'auto' : String(raw);
  }

  /** One of the valve's menus (VALVE_MENUS): "auto" leaves the document without the key. */
  private renderMenu(def: MenuDef) {
    const id = `f-${def.path.replace(/\./g, '-')}`;
    const error = this.errors[def.path];
    const value = this.menuValue(def);
    return html`<div class="field ${error ? 'bad' : ''}">
      <div class="label-row"><label for=${id}>${def.label}</label>${def.term ? html`<fw-term marker term=${def.term}></fw-term>` : nothing}</div>
      <div class="box">
        <select id=${id} name=${def.path} data-menu aria-invalid=${error ? 'true' : 'false'} aria-describedby="${id}-msg"
          @change=${(e: Event) => {
            const v = (e.target as HTMLSelectElement).value;
            this.emit(def.path, v === 'auto' ? undefined : v);
          }}>
          ${def.choices.map((c) => html`<option value=${c.value}>${c.words}</option>`)}
          ${def.choices.some((c) => c.value === value) ? nothing : html`<option value=${value} disabled>${value} (not in the list)</option>`}
        </select>
      </div>
      <div class="msg" id="${id}-msg" role=${error ? 'alert' : nothing}>${error ?? ''}</div>
    </div>`;
  }

  /** The pad menu's value for the document: a table name, AUTO_PAD, or '' for text that is not a pad. */
  private padValue(): string {
    const raw = getAt(this.doc, 'seal.pad');
    if (raw === undefined || (typeof raw === 'string' && raw.trim().toLowerCase() === AUTO_PAD)) return AUTO_PAD;
    return typeof raw === 'string' ? (findPad(raw)?.name ?? '') : '';
  }

  private renderPad() {
    const error = this.errors['seal.pad'];
    const raw = getAt(this.doc, 'seal.pad');
    return html`<div class="field ${error ? 'bad' : ''}">
      <div class="label-row"><label for="f-seal-pad">Seal pad</label><fw-term marker term="seal-pad"></fw-term></div>
      <div class="box">
        <select id="f-seal-pad" name="seal.pad" aria-invalid=${error ? 'true' : 'false'} aria-describedby="f-seal-pad-msg"
          @change=${(e: Event) => {
            const v = (e.target as HTMLSelectElement).value;
            this.emit('seal.pad', v === AUTO_PAD ? undefined : v);
          }}>
          <option value=${AUTO_PAD}>softest sponge that fits</option>
          ${padNames().map((n) => html`<option value=${n}>${n}</option>`)}
          ${this.padValue() === '' ? html`<option value="" disabled>${String(raw)} (not in the list)</option>` : nothing}
        </select>
      </div>
      <div class="msg" id="f-seal-pad-msg" role=${error ? 'alert' : nothing}>${error ?? ''}</div>
    </div>`;
  }

  private pickMaterial(value: string): void {
    const raw = getAt(this.doc, 'print.material');
    this.emit('print.material', value === OTHER_FILAMENT ? otherFilamentValue(raw, this.rememberedOther) : value);
  }

  private renderMaterial() {
    const choice = materialChoice(getAt(this.doc, 'print.material'));
    const error = this.errors['print.material'];
    return html`<div class="field ${error ? 'bad' : ''}">
        <label for="f-print-material">Filament</label>
        <div class="box">
          <select id="f-print-material" name="print.material" aria-invalid=${error ? 'true' : 'false'} aria-describedby="f-print-material-msg f-print-material-notes"
            @change=${(e: Event) => this.pickMaterial((e.target as HTMLSelectElement).value)}>
            ${materialNames().map((n) => html`<option value=${n}>${n}</option>`)}
            <option value=${OTHER_FILAMENT}>other filament…</option>
            ${choice.kind === 'unknown' ? html`<option value="" disabled>${choice.text} (not in the list)</option>` : nothing}
          </select>
        </div>
        <div class="msg" id="f-print-material-msg" role=${error ? 'alert' : nothing}>${error ?? ''}</div>
      </div>
      ${choice.kind === 'other' ? this.renderOtherFilament() : nothing}
      ${this.renderMaterialNotes(choice.kind === 'unknown' ? choice.text : choice.name)}`;
  }

  /** What to know about the filament (PLA and warm water, nylon and water, flexible filament), each with its basis. */
  private renderMaterialNotes(name: string) {
    const notes = materialNotes(name);
    return html`<div id="f-print-material-notes">
      ${notes.map(
        (n) => html`<div class="material-note" role="note" data-material-note=${n.id}>
          <b>${n.title}.</b> ${n.text}
          <div class="basis">Basis: ${n.basis}</div>
        </div>`,
      )}
    </div>`;
  }

  /** Name and density of the grower's own filament (shown only for "other filament"). */
  private renderOtherFilament() {
    const nameError = this.errors['print.material.name'];
    const name = getAt(this.doc, 'print.material.name');
    return html`<div class="field ${nameError ? 'bad' : ''}">
        <label for="f-print-material-name">Filament name</label>
        <input id="f-print-material-name" name="print.material.name" autocomplete="off" maxlength="40" .value=${typeof name === 'string' ? name : ''}
          aria-invalid=${nameError ? 'true' : 'false'} aria-describedby="f-print-material-name-msg"
          @input=${(e: InputEvent) => this.emit('print.material.name', (e.target as HTMLInputElement).value)} />
        <div class="msg" id="f-print-material-name-msg" role=${nameError ? 'alert' : nothing}>${nameError ?? ''}</div>
      </div>
      ${this.renderField(MATERIAL_DENSITY_FIELD, '')}`;
  }

  override render() {
    const name = getAt(this.doc, 'name');
    const nameError = this.errors['name'];
    const notes = getAt(this.doc, 'notes');
    const notesError = this.errors['notes'];
    return html`<fieldset>
        <legend>This valve</legend>
        <div class="field ${nameError ? 'bad' : ''}">
          <label for="f-name">Name (used for the file names)</label>
          <input id="f-name" name="name" style="width: 100%; box-sizing: border-box" maxlength="80" autocomplete="off" .value=${typeof name === 'string' ? name : ''}
            aria-describedby="f-name-note f-name-msg" @input=${(e: InputEvent) => this.emit('name', (e.target as HTMLInputElement).value || undefined)} />
          <div class="note" id="f-name-note" data-file-stem>${`Files are named ${fileStem(name)}-…`}</div>
          <div class="msg" id="f-name-msg">${nameError ?? ''}</div>
        </div>
        <div class="field ${notesError ? 'bad' : ''}">
          <label for="f-notes">Notes (printed on the build sheet)</label>
          <textarea id="f-notes" name="notes" rows="3" maxlength=${MAX_NOTES_LENGTH} .value=${typeof notes === 'string' ? notes : ''}
            aria-describedby="f-notes-msg" @input=${(e: InputEvent) => this.emit('notes', (e.target as HTMLTextAreaElement).value || undefined)}></textarea>
          <div class="msg" id="f-notes-msg" role=${notesError ? 'alert' : nothing}>${notesError ?? ''}</div>
        </div>
      </fieldset>
      ${FIELD_GROUPS.map(
      (g) => html`<fieldset>
        <legend>${g.title}</legend>
        ${g.intro ? html`<p class="intro">${markTerms(g.intro, g.introTerms ?? [])}</p>` : nothing}
        ${g.id === 'print' ? this.renderMaterial() : nothing}
        ${g.id === 'nozzle' ? this.renderPad() : nothing}
        ${g.id === 'valve' ? VALVE_MENUS.map((m) => this.renderMenu(m)) : nothing}
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
