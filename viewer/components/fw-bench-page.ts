import { superscriptUnits } from '../../generator/doc/superscript-units.ts';
import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import { BenchClient, type BenchWorkerFactory } from '../lib/bench-client.ts';
import { GROUP_FIELDS, TANK_FIELDS, benchDisplay, benchInLabels, benchLabelFor, benchValue, convertPlan, setPlanAt, unitOf, type BenchField } from '../lib/bench-fields.ts';
import { isPlanDocument, loadBench, loadPreviousBench, saveBench, savePreviousBench } from '../lib/bench-storage.ts';
import { fileStem } from '../../generator/doc/file-stem.ts';
import { textInUnits } from '../../generator/doc/text-in-units.ts';
import { getAt, type Doc } from '../lib/doc-path.ts';
import { flowLph, headM, lengthMm, minutes } from '../lib/format.ts';
import type { UnitSystem } from '../lib/units-system.ts';
import type { BenchGroup, BenchReply, BenchSolved } from '../worker/bench-protocol.ts';
import { shared } from './shared-styles.ts';
import './fw-bench-drawing.ts';
import './fw-term.ts';

/** Wait after the last keystroke before solving the bench: a burst (a paste, a held key) is one input, as on the valve page (TYPING_PAUSE_MS). */
export const BENCH_TYPING_PAUSE_MS = 10;

export interface OpenValveDetail {
  /** the group's valve as a design document, heads filled in */
  doc: Record<string, unknown>;
  name: string;
}

type Notice = { kind: 'bad' | 'good'; text: string; undo?: Doc } | null;

function download(file: { name: string; mime: string; bytes: Uint8Array }): void {
  const url = URL.createObjectURL(new Blob([file.bytes as BlobPart], { type: file.mime }));
  const a = document.createElement('a');
  a.href = url;
  a.download = file.name;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}

const rowsOf = (plan: Doc): Doc[] => (Array.isArray(plan.containers) ? (plan.containers as Doc[]) : []);

/** A name not yet used by a group: "new group 5", "new group 6", ... */
function freeName(plan: Doc): string {
  const used = new Set(rowsOf(plan).map((r) => String(r?.name ?? '').trim().toLowerCase()));
  for (let n = rowsOf(plan).length + 1; ; n++) if (!used.has(`new group ${n}`)) return `new group ${n}`;
}

/**
 * The bench page: one tank, one main, the container groups, and what the
 * whole bench does (a side drawing, each group's flows, which starve), with
 * each group's valve one click from the valve page and every file in one zip.
 * The plan is a plan document (as `floatwright plan` reads), solved in the
 * bench worker with generator/plan; kept in the browser as typed.
 * Emits `open-valve` (OpenValveDetail).
 */
@customElement('fw-bench-page')
export class FwBenchPage extends LitElement {
  static override styles = [
    shared,
    css`
      :host { display: grid; grid-template-columns: minmax(20rem, 30rem) minmax(0, 1fr); gap: 0.8rem; padding: 0.8rem; min-height: 0; overflow: hidden; }
      :host([hidden]) { display: none; }
      :host > * { overflow: auto; min-height: 0; min-width: 0; }
      section { display: flex; flex-direction: column; gap: 0.6rem; }
      .card { background: var(--panel); border: 1px solid var(--line); border-radius: 8px; padding: 0.5rem 0.8rem; }
      .intro { margin: 0; color: var(--muted); font-size: 0.85rem; }
      .fields { display: grid; grid-template-columns: repeat(auto-fill, minmax(11rem, 1fr)); gap: 0.4rem 0.7rem; }
      label.box { display: flex; flex-direction: column; font-size: 0.85rem; gap: 0.1rem; min-width: 0; }
      label.box span.unit { color: var(--muted); }
      label.box small { color: var(--muted); font-size: 0.75rem; }
      .entry { display: flex; align-items: center; gap: 0.3rem; }
      textarea { font: inherit; padding: 0.2rem 0.35rem; border: 1px solid var(--line); border-radius: 5px; width: 100%; box-sizing: border-box; resize: vertical; }
      input { font: inherit; padding: 0.2rem 0.35rem; border: 1px solid var(--line); border-radius: 5px; min-width: 0; width: 100%; box-sizing: border-box; }
      input[aria-invalid='true'] { border-color: var(--bad); background: var(--bad-soft); }
      .err { color: var(--bad); font-size: 0.78rem; }
      details.group { border: 1px solid var(--line); border-radius: 8px; background: var(--panel); }
      details.group > summary { cursor: pointer; padding: 0.4rem 0.7rem; display: flex; flex-wrap: wrap; gap: 0.1rem 0.6rem; align-items: baseline; }
      details.group > summary b { font-weight: 600; }
      details.group > summary span { color: var(--muted); font-size: 0.85rem; }
      details.group > summary .flag { color: var(--bad); font-weight: 700; font-size: 0.85rem; }
      details.group > summary:focus-visible { outline: 3px solid #e0a030; }
      details.group fieldset { border: 0; margin: 0; padding: 0 0.7rem 0.6rem; min-width: 0; }
      details.group.starving { border-color: var(--bad); }
      details.group.wrong { border-color: var(--bad); background: var(--bad-soft); }
      .rowbar { display: flex; flex-wrap: wrap; gap: 0.4rem; margin-top: 0.4rem; }
      .primary { background: var(--leaf); color: #fff; }
      .primary:hover { background: #335a2b; }
      .problems { background: var(--bad-soft); border: 1px solid var(--bad); border-radius: 8px; padding: 0.4rem 0.8rem; }
      .problems p { margin: 0.15rem 0; }
      .notice { padding: 0.4rem 0.7rem; border-radius: 6px; display: flex; flex-wrap: wrap; gap: 0.6rem; align-items: baseline; }
      .notice.bad { background: var(--bad-soft); border: 1px solid var(--bad); }
      .notice.good { background: var(--leaf-soft); border: 1px solid var(--leaf); }
      .summary p { margin: 0.15rem 0; }
      .status-starves { color: var(--bad); font-weight: 700; }
      .status-nofit { color: var(--warn); font-weight: 700; }
      .status-ok { color: var(--leaf); font-weight: 600; }
      .results { display: grid; grid-template-columns: repeat(auto-fill, minmax(17rem, 1fr)); gap: 0.6rem; }
      .result { background: var(--panel); border: 1px solid var(--line); border-radius: 8px; padding: 0.45rem 0.7rem; }
      .result.starving { border: 2px solid var(--bad); background: #fff7f5; }
      .result h3 { margin: 0 0 0.2rem; font-size: 0.95rem; }
      .result dl { display: grid; grid-template-columns: auto 1fr; gap: 0.05rem 0.6rem; margin: 0.3rem 0; font-size: 0.85rem; }
      .result dt { color: var(--muted); }
      .result dd { margin: 0; }
      .result ul { margin: 0.2rem 0; padding-left: 1.1rem; font-size: 0.82rem; }
      table { border-collapse: collapse; font-size: 0.85rem; }
      td { border-top: 1px solid var(--line); padding: 0.15rem 0.5rem 0.15rem 0; vertical-align: top; }
      .stale { opacity: 0.6; }
      label.file { position: relative; border: 1px solid var(--leaf); color: var(--leaf); border-radius: 6px; padding: 0.3rem 0.7rem; cursor: pointer; }
      label.file:focus-within { outline: 3px solid #e0a030; }
      input[type='file'] { position: absolute; inset: 0; width: 1px; height: 1px; opacity: 0; overflow: hidden; }
      .busy { color: var(--muted); font-size: 0.85rem; }
      @media (max-width: 900px) {
        :host { grid-template-columns: minmax(0, 1fr); overflow: visible; }
        :host > * { overflow: visible; }
      }
    `,
  ];

  @property() units: UnitSystem = 'metric';
  /** the plan to start from when nothing is kept in the browser (the plan preset) */
  @property({ attribute: false }) starter: Record<string, unknown> | null = null;

  @state() private plan: Doc = {};
  @state() private solved: BenchSolved | null = null;
  /** problems by plan path */
  @state() private errors: { field: string; message: string }[] = [];
  @state() private notice: Notice = null;
  @state() private busy = '';
  @state() private pending = false;

  /** set before connecting to run the solve somewhere else (tests) */
  workerFactory: BenchWorkerFactory | undefined;

  private client: BenchClient | null = null;
  private timer: ReturnType<typeof setTimeout> | null = null;
  private lastEditAt = 0;
  private firstAfterEdit = Infinity;
  private solvedPlanText = '';
  private planTexts = new Map<number, string>();
  private shownUnits: UnitSystem | null = null;
  private beforeSwitch: { units: UnitSystem; plan: Doc; converted: Doc } | null = null;
  /** groups unfolded by the grower (by position); a group with a problem always shows its boxes */
  private unfolded = new Set<number>();

  override connectedCallback(): void {
    super.connectedCallback();
    this.client = new BenchClient(
      (reply, newer) => this.planned(reply, newer),
      (message) => {
        this.pending = false;
        this.notice = { kind: 'bad', text: `The bench could not be worked out: ${message}` };
      },
      this.workerFactory,
    );
    const kept = loadBench(globalThis.localStorage);
    this.plan = kept ?? (this.starter ? structuredClone(this.starter) : { tank: {}, main: {}, containers: [] });
    this.solve();
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    this.client?.dispose();
    this.client = null;
  }

  protected override willUpdate(changed: Map<string, unknown>): void {
    // a switch of units rewrites the boxes in the new units (the plan keeps its unit with every value)
    if (changed.has('units') && this.shownUnits !== null && this.shownUnits !== this.units) {
      // switching back with no edit in between restores the exact values (no drift from the rounding)
      const back = this.beforeSwitch;
      if (back && back.units === this.units && back.converted === this.plan) {
        this.plan = back.plan;
        this.beforeSwitch = null;
      } else {
        const converted = convertPlan(this.plan, this.units);
        this.beforeSwitch = { units: this.shownUnits, plan: this.plan, converted };
        this.plan = converted;
      }
      this.edited(0);
    }
    this.shownUnits = this.units;
  }

  protected override updated(): void {
    // for tests and timing: whether a change is still being worked out
    this.toggleAttribute('data-pending', this.pending || this.timer !== null);
  }

  /**
   * Put a whole plan on the page (the plan preset, a plan file). The bench it
   * replaces is kept (the browser keeps one earlier bench) and can be put back.
   */
  openPlan(doc: Record<string, unknown>, from: string): void {
    const before = this.plan;
    const changed = JSON.stringify(before) !== JSON.stringify(doc);
    if (changed && rowsOf(before).length) savePreviousBench(globalThis.localStorage, before);
    this.plan = convertPlan(structuredClone(doc), this.units);
    this.notice = { kind: 'good', text: changed && rowsOf(before).length ? `Opened ${from}. Your previous bench is kept: "Put back my previous bench" brings it back.` : `Opened ${from}.`, ...(changed && rowsOf(before).length ? { undo: before } : {}) };
    this.edited(0);
  }

  private edited(pause = BENCH_TYPING_PAUSE_MS): void {
    saveBench(globalThis.localStorage, this.plan);
    this.lastEditAt = performance.now();
    this.firstAfterEdit = Infinity;
    this.pending = true;
    if (this.timer) clearTimeout(this.timer);
    this.timer = setTimeout(() => this.solve(), pause);
  }

  private solve(): void {
    this.timer = null;
    if (!this.client) return;
    this.pending = true;
    const text = JSON.stringify(this.plan);
    const id = this.client.plan(JSON.parse(text));
    this.planTexts.set(id, text);
    if (this.firstAfterEdit === Infinity) this.firstAfterEdit = id;
  }

  private async planned(reply: Extract<BenchReply, { type: 'planned' }>, newer: boolean): Promise<void> {
    const text = this.planTexts.get(reply.id) ?? '';
    for (const k of this.planTexts.keys()) if (k <= reply.id) this.planTexts.delete(k);
    if (reply.ok) {
      this.solved = reply.solved;
      this.errors = [];
      this.solvedPlanText = text;
    } else {
      this.errors = reply.errors;
    }
    this.pending = newer || this.timer !== null;
    this.setAttribute('data-solve-ms', reply.solveMs.toFixed(1));
    await this.updateComplete;
    const editAt = this.lastEditAt;
    if (reply.id >= this.firstAfterEdit && editAt > 0) {
      // input-to-redraw: last keystroke to the drawing and figures updated from a solve that includes it
      const at = await new Promise<number>((r) => requestAnimationFrame(() => r(performance.now())));
      if (this.lastEditAt === editAt) this.setAttribute('data-input-to-redraw-ms', (at - editAt).toFixed(1));
    }
    this.setAttribute('data-solved-id', String(reply.id));
    this.setAttribute('data-bench', reply.ok ? 'solved' : 'problems');
    if (!this.pending) this.dispatchEvent(new CustomEvent('bench-settled', { bubbles: true, composed: true }));
  }

  private setField(path: string, f: BenchField, text: string): void {
    this.plan = setPlanAt(this.plan, path, benchValue(text, f, this.units));
    this.edited();
  }

  private setText(path: 'name' | 'notes', text: string): void {
    this.plan = setPlanAt(this.plan, path, text === '' ? undefined : text);
    this.edited();
  }

  private addGroup(): void {
    const rows = rowsOf(this.plan);
    const last = rows[rows.length - 1] ?? {};
    const row: Doc = { ...structuredClone(last), name: freeName(this.plan), count: 1 };
    this.plan = { ...this.plan, containers: [...rows, row] };
    this.unfolded.add(rows.length);
    this.notice = { kind: 'good', text: `Added "${row.name}", a copy of the last group: set its floor height and distance along the main.` };
    this.edited(0);
    // the new group's first box to change gets the focus (on a phone the notice is a screen away)
    void this.updateComplete.then(() => (this.renderRoot.querySelector(`input[data-field="containers.${rows.length}.floorElevation"]`) as HTMLInputElement | null)?.focus());
  }

  private removeGroup(i: number): void {
    const rows = rowsOf(this.plan);
    const before = this.plan;
    this.plan = { ...this.plan, containers: rows.filter((_, k) => k !== i) };
    this.unfolded = new Set([...this.unfolded].filter((k) => k !== i).map((k) => (k > i ? k - 1 : k)));
    this.notice = { kind: 'good', text: `Removed "${String(rows[i]?.name ?? `group ${i + 1}`)}".`, undo: before };
    this.edited(0);
  }

  private putBack(doc: Doc): void {
    this.plan = doc;
    this.notice = { kind: 'good', text: 'Your previous bench is back.' };
    this.edited(0);
  }

  private openPrevious(): void {
    const prev = loadPreviousBench(globalThis.localStorage);
    if (prev) this.openPlan(prev, 'your previous bench');
  }

  private async openFile(e: Event): Promise<void> {
    const input = e.target as HTMLInputElement;
    const file = input.files?.[0];
    input.value = '';
    if (!file) return;
    let doc: unknown;
    try {
      doc = JSON.parse(await file.text());
    } catch {
      this.notice = { kind: 'bad', text: `${file.name} is not a bench file (it is not readable JSON). Your bench is unchanged.` };
      return;
    }
    if (!isPlanDocument(doc)) {
      this.notice = { kind: 'bad', text: `${file.name} holds a single valve design, not a bench: open it on the valve page. Your bench is unchanged.` };
      return;
    }
    this.openPlan(doc as Doc, file.name);
  }

  private saveFile(): void {
    const slug = fileStem(this.plan.name, { fallback: 'bench' });
    download({ name: `floatwright-plan-${slug}.json`, mime: 'application/json', bytes: new TextEncoder().encode(`${JSON.stringify(this.plan, null, 2)}\n`) });
  }

  /** Why the zip cannot be made from what is on screen now, or null. */
  private exportBlock(): string | null {
    if (this.errors.length) return 'Correct the problems listed first: the files must match the bench on screen.';
    if (this.pending) return 'Working out your latest change: the files will be ready in a moment.';
    if (!this.solved) return 'Working out the bench…';
    if (this.solvedPlanText !== JSON.stringify(this.plan)) return 'The bench is being worked out again.';
    const nofit = this.solved.groups.filter((g) => g.noFit.length);
    if (nofit.length) return `No valve size fits ${nofit.map((g) => `"${g.name}"`).join(', ')}: change those groups first.`;
    return null;
  }

  private async exportZip(): Promise<void> {
    const blocked = this.exportBlock();
    if (blocked) {
      this.notice = { kind: 'bad', text: `No files were made. ${blocked}` };
      return;
    }
    this.busy = `Making the files for ${this.solved!.designs} valve design${this.solved!.designs === 1 ? '' : 's'} at print quality…`;
    try {
      const file = await this.client!.exportZip(JSON.parse(this.solvedPlanText));
      download(file);
      this.busy = '';
      this.setAttribute('data-exported', file.name);
    } catch (error) {
      this.busy = '';
      this.notice = { kind: 'bad', text: `The files could not be made: ${error instanceof Error ? error.message : String(error)}` };
    }
  }

  private openValve(g: BenchGroup): void {
    this.dispatchEvent(new CustomEvent<OpenValveDetail>('open-valve', { detail: { doc: g.valveDoc, name: g.name }, bubbles: true, composed: true }));
  }

  private errorFor(path: string): string | undefined {
    return this.errors.find((e) => e.field === path)?.message;
  }

  private renderBox(path: string, f: BenchField, id: string) {
    const err = this.errorFor(path);
    const unit = unitOf(f, this.units);
    const shownUnit = superscriptUnits(unit);
    return html`<label class="box">
      <span>${f.label}${f.optional ? html` <small>(optional)</small>` : nothing}${f.term ? html`<fw-term marker term=${f.term}></fw-term>` : nothing}</span>
      <span class="entry">
        <input
          data-field=${path}
          id=${id}
          inputmode=${f.kind === 'text' ? 'text' : 'decimal'}
          aria-invalid=${err ? 'true' : 'false'}
          .value=${benchDisplay(getAt(this.plan, path), f, this.units)}
          @input=${(e: Event) => this.setField(path, f, (e.target as HTMLInputElement).value)}
        />${unit ? html`<span class="unit">${shownUnit}</span>` : nothing}
      </span>
      ${f.hint ? html`<small>${textInUnits(f.hint, this.units)}</small>` : nothing}
      ${err ? html`<span class="err" role="alert">${benchInLabels(err, this.plan)}</span>` : nothing}
    </label>`;
  }

  /** One line for a folded group: how many, the floor height, the distance along the main, as typed. */
  private groupLine(row: Doc): string {
    const shown = (path: string) => {
      const f = GROUP_FIELDS.find((g) => g.path === path)!;
      const text = benchDisplay(getAt(row, path), f, this.units);
      const unit = unitOf(f, this.units);
      return text === '' ? '?' : /[a-z]/i.test(text) ? text : `${text} ${unit}`;
    };
    const count = Number(row?.count ?? 1);
    return `${Number.isFinite(count) ? count : '?'} × floor ${shown('floorElevation')}, ${shown('mainLength')} along the main`;
  }

  private renderInputs() {
    const rows = rowsOf(this.plan);
    const flagged = new Set((this.solved?.groups ?? []).filter((g) => g.starving).map((g) => g.index));
    const wrong = new Set(this.errors.map((e) => /^containers\.(\d+)/.exec(e.field)?.[1]).filter((k) => k !== undefined).map(Number));
    const few = rows.length <= 2;
    return html`<section aria-label="Bench inputs">
      <div class="card">
        <div class="fields">
          <label class="box"><span>Bench name</span>
            <input data-field="name" .value=${typeof this.plan.name === 'string' ? this.plan.name : ''} @input=${(e: Event) => this.setText('name', (e.target as HTMLInputElement).value)} />
            <small>names the zip and the report</small>
            ${this.errorFor('name') ? html`<span class="err" role="alert">${this.errorFor('name')}</span>` : nothing}
          </label>
        </div>
        <label class="box"><span>Notes <small>(optional)</small></span>
          <textarea data-field="notes" rows="2" .value=${typeof this.plan.notes === 'string' ? this.plan.notes : ''} @input=${(e: Event) => this.setText('notes', (e.target as HTMLTextAreaElement).value)}></textarea>
          ${this.errorFor('notes') ? html`<span class="err" role="alert">${this.errorFor('notes')}</span>` : nothing}
        </label>
      </div>
      <div class="card">
        <h2>Tank and main</h2>
        <p class="intro">Every height is measured from one reference level of your choice, such as the ground or the deck.</p>
        <div class="fields">${TANK_FIELDS.map((f) => this.renderBox(f.path, f, `tank-${f.path}`))}</div>
      </div>
      <h2>Container groups</h2>
      <p class="intro">A group is one or more identical containers on one tee of the main. Click a group to see or change its boxes.</p>
      ${rows.map(
        (row, i) => html`<details
          class="group ${flagged.has(i) ? 'starving' : ''} ${wrong.has(i) ? 'wrong' : ''}"
          data-group=${i}
          ?open=${few || wrong.has(i) || this.unfolded.has(i)}
          @toggle=${(e: Event) => {
            if ((e.target as HTMLDetailsElement).open) this.unfolded.add(i);
            else this.unfolded.delete(i);
          }}
        >
          <summary>
            <b>Group ${i + 1}${typeof row?.name === 'string' && row.name.trim() ? `: ${row.name}` : ''}</b>
            <span>${this.groupLine(row)}</span>
            ${flagged.has(i) ? html`<span class="flag">starves</span>` : nothing}
            ${wrong.has(i) ? html`<span class="flag">to correct</span>` : nothing}
          </summary>
          <fieldset aria-label="Group ${i + 1}">
            <div class="fields">${GROUP_FIELDS.map((f) => this.renderBox(`containers.${i}.${f.path}`, f, `g${i}-${f.path}`))}</div>
            <div class="rowbar"><button data-remove-group=${i} @click=${() => this.removeGroup(i)}>Remove this group</button></div>
          </fieldset>
        </details>`,
      )}
      <div class="rowbar">
        <button class="primary" data-add-group @click=${this.addGroup}>Add a group</button>
        <label class="file">Open a bench file…<input type="file" accept=".json,application/json" aria-label="Open a bench file" @change=${this.openFile} /></label>
        <button data-save-plan @click=${this.saveFile}>Save bench file</button>
        ${loadPreviousBench(globalThis.localStorage) ? html`<button data-previous-bench @click=${this.openPrevious}>Open my previous bench</button>` : nothing}
      </div>
    </section>`;
  }

  private renderGroup(g: BenchGroup) {
    const u = this.units;
    const status = g.starving
      ? html`<p class="status-starves" data-starving>Starves: ${textInUnits(g.starvingReason ?? '', u)}.</p>`
      : g.noFit.length
        ? html`<p class="status-nofit">No valve size fits: ${g.noFit.map((m) => benchInLabels(m, this.plan)).join(' ')}</p>`
        : html`<p class="status-ok">Gets enough water with every valve open.</p>`;
    return html`<article class="result ${g.starving ? 'starving' : ''}" data-result-group=${g.index}>
      <h3>${g.name} ×${g.count}${g.design ? html` <small>(valve ${g.design})</small>` : nothing}</h3>
      ${status}
      <dl>
        <dt>Tank above the nozzle</dt><dd>${headM(g.headMaxM, u)} full, ${headM(g.headMinM, u)} low</dd>
        <dt>Water held</dt><dd>${g.levelFullMm === null ? '–' : `${lengthMm(g.levelFullMm, u)} full tank, ${lengthMm(g.levelLowMm ?? NaN, u)} low`} (asked ${lengthMm(g.targetMm, u, 0)})</dd>
        <dt>Flow, this valve alone</dt><dd>${flowLph(g.aloneFullLph, u)} (${flowLph(g.aloneLowLph, u)} low tank)</dd>
        <dt>Flow, every valve open</dt><dd>${flowLph(g.sharedFullLph, u)} (${flowLph(g.sharedLowLph, u)} low tank)</dd>
        ${g.fillSharedMin !== null ? html`<dt>Refill, every valve open</dt><dd>${minutes(g.fillSharedMin)}</dd>` : nothing}
      </dl>
      ${g.warnings.length ? html`<ul>${g.warnings.map((w) => html`<li>${textInUnits(w, this.units)}</li>`)}</ul>` : nothing}
      ${g.waysOut.length ? html`<ul>${g.waysOut.map((w) => html`<li>Would fit with ${benchLabelFor(w.field, this.plan).toLowerCase()} ${w.value}: ${benchInLabels(w.message, this.plan)}</li>`)}</ul>` : nothing}
      <button data-open-valve=${g.index} ?disabled=${g.noFit.length > 0} @click=${() => this.openValve(g)}>Open this valve on the valve page</button>
    </article>`;
  }

  private renderOutcome() {
    const s = this.solved;
    const stale = this.errors.length > 0 || (s !== null && this.solvedPlanText !== JSON.stringify(this.plan));
    const blocked = this.exportBlock();
    const starving = s?.groups.filter((g) => g.starving) ?? [];
    return html`<section aria-label="What the bench does">
      ${this.notice
        ? html`<div class="notice ${this.notice.kind}" role=${this.notice.kind === 'bad' ? 'alert' : 'status'}>
            <span>${this.notice.text}</span>
            ${this.notice.undo ? html`<button data-undo @click=${() => this.putBack(this.notice!.undo!)}>Put back my previous bench</button>` : nothing}
            <button @click=${() => (this.notice = null)}>Dismiss</button>
          </div>`
        : nothing}
      ${this.errors.length
        ? html`<div class="problems" role="alert" data-problems>
            <h2>To correct before the bench can be worked out</h2>
            ${this.errors.map((e) => html`<p>${benchLabelFor(e.field, this.plan)}: ${benchInLabels(e.message, this.plan)}</p>`)}
            ${s ? html`<p><em>The drawing and figures below show the last bench that worked.</em></p>` : nothing}
          </div>`
        : nothing}
      ${s
        ? html`<div class="card summary ${stale ? 'stale' : ''}" data-summary>
              <h2>The whole bench</h2>
              ${starving.length
                ? html`<p class="status-starves" data-starving-summary>${starving.length} of ${s.groups.length} groups would <fw-term term="starves">starve</fw-term> with every valve open: ${starving.map((g) => `"${g.name}"`).join(', ')}. A wider <fw-term term="main">main</fw-term>, shorter runs or a higher tank help.</p>`
                : html`<p class="status-ok">No group starves: each gets at least ${Math.round(s.starvingShare * 100)} % of its own flow with every valve open.</p>`}
              <p>${s.groups.reduce((n, g) => n + g.count, 0)} valves from ${s.designs} design${s.designs === 1 ? '' : 's'} (groups whose valves come out the same share one).</p>
              <p>Tank outflow with every valve open: ${this.totalFlow(s)}.</p>
            </div>
            <fw-bench-drawing class=${stale ? 'stale' : ''} .solved=${s} .units=${this.units}></fw-bench-drawing>
            <div class="results ${stale ? 'stale' : ''}">${s.groups.map((g) => this.renderGroup(g))}</div>
            <div class="card ${stale ? 'stale' : ''}">
              <h2>To buy and print</h2>
              <table><tbody>${s.report.totals.rows.filter((r) => !r[0]!.startsWith('tank outflow')).map((r) => html`<tr><td>${r[0]}</td><td>${textInUnits(r[1]!, this.units)}</td></tr>`)}</tbody></table>
            </div>`
        : html`<p>${this.errors.length ? '' : 'Working out the bench…'}</p>`}
      <div class="card">
        <h2>Files</h2>
        <p class="intro">One zip: each valve design's parts (STL), its print plate (3MF) and build sheet, every part of the bench packed on print plates, and the bench report.</p>
        <div class="rowbar">
          <button class="primary" data-export-zip ?disabled=${blocked !== null || this.busy !== ''} @click=${this.exportZip}>Download every file (zip)</button>
          ${this.busy ? html`<span class="busy" role="status">${this.busy}</span>` : nothing}
        </div>
        ${blocked && !this.busy ? html`<p class="intro" data-export-why>${blocked}</p>` : nothing}
      </div>
    </section>`;
  }

  private totalFlow(s: BenchSolved): string {
    const full = s.groups.reduce((n, g) => n + g.count * g.sharedFullLph, 0);
    const low = s.groups.reduce((n, g) => n + g.count * g.sharedLowLph, 0);
    return `${flowLph(full, this.units)} full, ${flowLph(low, this.units)} low`;
  }

  override render() {
    return html`${this.renderInputs()}${this.renderOutcome()}`;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'fw-bench-page': FwBenchPage;
  }
}
