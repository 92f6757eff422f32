import { LitElement, css, html, nothing } from 'lit';
import { customElement, query, state } from 'lit/decorators.js';
import { parseDesign } from '../../generator/doc/schema.ts';
import type { SizingResult, SizingSuccess, WayOut } from '../../generator/sizing/result.ts';
import { PART_NAMES, valvePartNames } from '../../generator/solids/part-names.ts';
import { BuildClient, type WorkerFactory } from '../lib/build-client.ts';
import { setAt, type Doc } from '../lib/doc-path.ts';
import { docToSize } from '../lib/doc-to-size.ts';
import { fileStem } from '../../generator/doc/file-stem.ts';
import { placeErrors } from '../lib/place-errors.ts';
import { messageInUnits } from '../lib/message-in-units.ts';
import { wayOutInUnits } from '../lib/way-out-in-units.ts';
import { joinedWaysOut } from '../lib/joined-ways-out.ts';
import { ALL_FIELDS } from '../lib/form-fields.ts';
import { presets, type Preset } from '../lib/presets.ts';
import { presetCopy, type PresetCopy } from '../lib/preset-copy.ts';
import { decodeDesign, designFromHash, shareUrl, unitsFromHash } from '../lib/share-link.ts';
import { loadSaved, save } from '../lib/storage.ts';
import { labelFor, problemsInLabels, shownMessage } from '../lib/field-label.ts';
import { keepRecent, loadRecent, recentTitle, type RecentDesign } from '../lib/recent-designs.ts';
import { convertDocument, type UnitSystem } from '../lib/units-system.ts';
import { isPlanDocument, loadPage, savePage, type Page } from '../lib/bench-storage.ts';
import type { FwBenchPage, OpenValveDetail } from './fw-bench-page.ts';
import type { BuiltReply, ExportFile } from '../worker/protocol.ts';
import type { PartMeshes, PartTransforms } from '../worker/parts-contract.ts';
import type { FieldInputDetail } from './fw-design-form.ts';
import type { ExportRequest } from './fw-file-bar.ts';
import type { FwValveView, ViewOptions } from './fw-valve-view.ts';
import { shared } from './shared-styles.ts';
import './fw-design-form.ts';
import './fw-results.ts';
import './fw-push-plot.ts';
import './fw-flow-plot.ts';
// three.js (most of the page's code) loads beside the first build instead of before it
void import('./fw-valve-view.ts');
import './fw-file-bar.ts';
import './fw-cautions.ts';

/**
 * Wait after the last keystroke before sizing: only long enough to take a burst (a paste, a held key) as one
 * input. A person types a key every 150 ms or more, so every number typed is sized anyway; a half-typed one
 * that searches long ('5' on the way to '51') runs on one build worker while the next input takes the other
 * (BuildClient), and waiting longer here would only add to every redraw.
 */
export const TYPING_PAUSE_MS = 10;

type Notice = { kind: 'bad' | 'good'; text: string; link?: string; undo?: Doc; action?: { label: string; run: () => void } } | null;

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

const errorList = problemsInLabels;

/** Why a saved design cannot be used (a damaged browser store), or null when it parses. */
function savedProblem(doc: Doc): string | null {
  try {
    const parsed = parseDesign(docToSize(doc));
    return parsed.ok ? null : errorList(parsed.errors);
  } catch {
    return 'it is damaged.';
  }
}

/** The workbench: holds the design, talks to the build worker, hands state down to the panels. */
@customElement('fw-app')
export class FwApp extends LitElement {
  static override styles = [
    shared,
    css`
      :host { display: grid; grid-template-rows: auto auto 1fr auto; height: 100vh; background: var(--paper); }
      header { display: flex; flex-wrap: wrap; align-items: center; gap: 0.4rem 1.2rem; padding: 0.45rem 1rem; background: var(--leaf); color: #fff; }
      header h1 { font-size: 1.15rem; margin: 0; }
      header h1 small { font-weight: normal; opacity: 0.85; }
      header label, header legend { font-size: 0.9rem; }
      header select { font: inherit; padding: 0.15rem 0.3rem; border-radius: 5px; max-width: 14rem; }
      header fieldset { border: 0; margin: 0; padding: 0; display: flex; gap: 0.5rem; align-items: center; }
      header legend { float: left; margin-right: 0.3rem; }
      /* Wide: inputs | view and plots | summary above the details. Narrow: one column, in the order inputs,
         summary, view, details (grid areas place them; the wide page reads inputs, view, then the figures). */
      main {
        display: grid; gap: 0.8rem; padding: 0.8rem; overflow: hidden; min-height: 0;
        grid-template-columns: minmax(17rem, 21rem) minmax(22rem, 1fr) minmax(19rem, 25rem);
        grid-template-areas: 'inputs view side';
      }
      main > * { overflow: auto; min-height: 0; min-width: 0; }
      .left { grid-area: inputs; }
      /* wide: summary and details scroll together in the third column; narrow: the wrapper steps aside
         (display: contents) and each takes its own place in the single column */
      .side { grid-area: side; display: flex; flex-direction: column; gap: 0.6rem; }
      .summary { grid-area: summary; display: flex; flex-direction: column; gap: 0.6rem; }
      .middle { grid-area: view; display: flex; flex-direction: column; gap: 0.6rem; }
      .right { grid-area: details; display: flex; flex-direction: column; gap: 0.6rem; }
      fw-valve-view { flex: 1 1 auto; min-height: 320px; }
      .viewbar { display: flex; flex-wrap: wrap; gap: 0.3rem 1rem; align-items: center; font-size: 0.9rem; }
      .viewbar fieldset { border: 0; padding: 0; margin: 0; display: flex; flex-wrap: wrap; gap: 0.2rem 0.5rem; }
      .viewbar legend { float: left; margin-right: 0.3rem; color: var(--muted); }
      .notice { margin: 0 0.8rem; padding: 0.4rem 0.7rem; border-radius: 6px; display: flex; flex-wrap: wrap; gap: 0.6rem; align-items: baseline; overflow-wrap: anywhere; }
      .notice.bad { background: var(--bad-soft); border: 1px solid var(--bad); }
      .notice.good { background: var(--leaf-soft); border: 1px solid var(--leaf); }
      .notice input { flex: 1; font: inherit; min-width: 10rem; max-width: 100%; }
      .notice button { margin-left: auto; }
      main[hidden] { display: none; }
      nav.pages { display: flex; gap: 0.3rem; }
      nav.pages button { border-color: #fff; background: transparent; color: #fff; }
      nav.pages button[aria-pressed='true'] { background: #fff; color: var(--leaf); font-weight: 600; }
      .out-of-date { margin: 0; padding: 0.25rem 0.6rem; border-radius: 5px; background: var(--bad-soft); border: 1px solid var(--bad); font-size: 0.85rem; }
      fw-valve-view.stale, fw-flow-plot.stale { opacity: 0.6; }
      fw-cautions { z-index: 2; }
      /* 1024 px and the like: the view column narrows before anything overlaps */
      @media (max-width: 1180px) {
        main { grid-template-columns: minmax(16rem, 19rem) minmax(0, 1fr) minmax(16rem, 21rem); }
      }
      @media (max-width: 900px) {
        :host { display: block; height: auto; }
        header { padding: 0.4rem 0.7rem; gap: 0.3rem 0.8rem; }
        header h1 small { display: none; }
        main { grid-template-columns: minmax(0, 1fr); grid-template-rows: none; grid-template-areas: 'inputs' 'summary' 'view' 'details'; overflow: visible; padding: 0.6rem; }
        main > * { overflow: visible; }
        .side { display: contents; }
        /* a fixed height: a view sized by its content grew with every redraw */
        fw-valve-view { flex: none; height: 320px; min-height: 0; }
        fw-cautions { position: sticky; bottom: 0; }
        .notice { margin: 0 0.6rem; }
      }
    `,
  ];

  @state() private doc: Doc = {};
  @state() private units: UnitSystem = 'metric';
  @state() private errors: Record<string, string> = {};
  @state() private result: SizingResult | null = null;
  @state() private lastGood: SizingSuccess | null = null;
  @state() private meshes: PartMeshes | null = null;
  @state() private transforms: { rest: PartTransforms; seal: PartTransforms } | null = null;
  @state() private meshBuildId = 0;
  @state() private view: ViewOptions = { pose: 'seal', section: true, exploded: false, water: true };
  @state() private notice: Notice = null;
  @state() private busy = '';
  @state() private presetId = '';
  @state() private timing = '';
  /** designs set aside when a link, a preset or a file replaced them (newest first) */
  @state() private recent: RecentDesign[] = [];
  /** which page is open: one valve, or the whole bench */
  @state() private page: Page = 'valve';
  @state() private benchLoaded = false;

  @query('fw-valve-view') private viewer!: FwValveView;
  @query('fw-bench-page') private benchPage!: FwBenchPage | null;

  /** set before connecting to run the builds somewhere else (tests) */
  workerFactory: WorkerFactory | undefined;

  private client: BuildClient | null = null;
  private allPresets: Preset[] = presets();
  /** valve designs; the plan presets open on the bench page */
  private presetList: PresetCopy[] = this.allPresets.filter((p) => !isPlanDocument(p.doc)).map(presetCopy);
  private benchPresets: Preset[] = this.allPresets.filter((p) => isPlanDocument(p.doc));
  private typingTimer: ReturnType<typeof setTimeout> | null = null;
  private lastEditAt = 0;
  private checks = 0;
  private firstBuildAfterEdit = 0;
  /** the document each build request came from */
  private docsById = new Map<number, Doc>();
  private lastGoodDoc: Doc | null = null;
  /** when each box was last typed in (a count of edits), so an error between two boxes lands on the one changed */
  private editedAt = new Map<string, number>();
  private edits = 0;
  private beforeSwitch: { units: UnitSystem; doc: Doc; convertedDoc: Doc } | null = null;
  private readonly onHashChange = () => this.openFromHash();

  override connectedCallback(): void {
    super.connectedCallback();
    this.client = new BuildClient(
      (reply, newer) => this.built(reply, newer),
      (message) => (this.notice = { kind: 'bad', text: `Building the parts failed: ${message}` }),
      this.workerFactory,
    );
    const saved = loadSaved(globalThis.localStorage);
    this.recent = loadRecent(globalThis.localStorage);
    const problem = saved ? savedProblem(saved.doc) : null;
    if (saved && !problem) {
      this.units = saved.units;
      this.doc = saved.doc;
    } else {
      this.doc = this.presetList[0].doc;
      this.presetId = this.presetList[0].id;
    }
    if (saved && problem) {
      // a damaged store never leaves the screen waiting: say so, start from a preset, keep the damaged one to look at
      this.recent = keepRecent(globalThis.localStorage, saved.doc, 'it was found damaged');
      this.notice = {
        kind: 'bad',
        text: `Your saved design could not be opened: ${problem} The workbench starts from "${this.presetList[0].title}" instead; the saved one is kept under "Earlier designs".`,
      };
    }
    this.evaluate();
    this.openFromHash();
    if (loadPage(globalThis.localStorage) === 'bench') void this.showPage('bench');
    globalThis.addEventListener?.('hashchange', this.onHashChange);
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    globalThis.removeEventListener?.('hashchange', this.onHashChange);
    this.client?.dispose();
  }

  /** A design from a share link: used only when it is valid; otherwise say why and keep the current one. */
  private openFromHash(): void {
    const encoded = designFromHash(globalThis.location?.hash ?? '');
    if (encoded === null) return;
    const linkUnits = unitsFromHash(location.hash);
    history.replaceState(null, '', location.pathname + location.search);
    const decoded = decodeDesign(encoded);
    if (!decoded.ok) {
      this.notice = { kind: 'bad', text: `The shared link could not be used: ${decoded.message} Your current design is unchanged.` };
      return;
    }
    const parsed = parseDesign(docToSize(decoded.doc as Doc));
    if (!parsed.ok) {
      this.notice = { kind: 'bad', text: `The shared link holds a design with problems, so it was not opened. ${errorList(parsed.errors)} Your current design is unchanged.` };
      return;
    }
    // the link opens in the system it was made in; its values are shown as they were written
    if (linkUnits && linkUnits !== this.units) {
      this.units = linkUnits;
      this.beforeSwitch = null;
    }
    this.replaceDoc(decoded.doc as Doc, linkUnits === 'imperial' ? 'Opened the design from the link, in imperial units.' : 'Opened the design from the link.', 'a share link');
  }

  /**
   * Put a whole design on screen. With `replacedBy` (a link, a preset, a file), the design it replaces is
   * kept under "Earlier designs" and the notice offers to put it back.
   */
  private replaceDoc(doc: Doc, message?: string, replacedBy?: string): void {
    const before = this.doc;
    const kept = replacedBy !== undefined && JSON.stringify(before) !== JSON.stringify(doc);
    if (kept) this.recent = keepRecent(globalThis.localStorage, before, replacedBy);
    this.doc = doc;
    this.presetId = '';
    if (message) this.notice = { kind: 'good', text: kept ? `${message} Your previous design is kept under "Earlier designs".` : message, ...(kept ? { undo: before } : {}) };
    this.lastEditAt = performance.now();
    this.firstBuildAfterEdit = Infinity;
    this.evaluate();
  }

  private fieldInput(e: CustomEvent<FieldInputDetail>): void {
    this.doc = setAt(this.doc, e.detail.path, e.detail.value);
    this.editedAt.set(e.detail.path, ++this.edits);
    this.lastEditAt = performance.now();
    this.firstBuildAfterEdit = Infinity;
    if (this.typingTimer) clearTimeout(this.typingTimer);
    this.typingTimer = setTimeout(() => this.evaluate(), TYPING_PAUSE_MS);
  }

  /** Check the document; when it is good, ask the worker to size and build it. */
  private evaluate(): void {
    this.typingTimer = null;
    // for tests: each check counted, so a test knows its keystroke has been judged
    this.setAttribute('data-checked', String(++this.checks));
    const parsed = parseDesign(docToSize(this.doc));
    if (!parsed.ok) {
      // each box shows its own problem; other boxes it mentions are named by their labels
      // quantities in the page's units (an inch box's limits in inches), then as the screen shows them
      this.errors = placeErrors(Object.fromEntries(parsed.errors.map((e) => [e.field, shownMessage(messageInUnits(e.field, e.message, this.units))])), this.editedAt);
      return;
    }
    this.errors = {};
    const id = this.client!.build(parsed.inputs);
    this.setAttribute('data-asked-build-id', String(id));
    this.docsById.set(id, this.doc);
    if (this.firstBuildAfterEdit === Infinity) this.firstBuildAfterEdit = id;
  }

  private built(reply: BuiltReply, newerWaiting: boolean): void {
    const doc = this.docsById.get(reply.id);
    for (const k of this.docsById.keys()) if (k <= reply.id) this.docsById.delete(k);
    this.result = reply.sizing;
    this.timing = `Sized in ${reply.sizeMs.toFixed(0)} ms; parts drawn in ${reply.buildMs.toFixed(0)} ms.`;
    this.setAttribute('data-size-ms', reply.sizeMs.toFixed(1));
    this.setAttribute('data-parts-ms', reply.buildMs.toFixed(1));
    if (reply.sizing.ok) {
      this.lastGood = reply.sizing;
      if (reply.meshes && reply.transforms) {
        this.meshes = reply.meshes;
        this.transforms = reply.transforms;
        this.meshBuildId = reply.id;
      }
      if (reply.solidError) this.notice = { kind: 'bad', text: `The parts could not be drawn: ${reply.solidError}` };
      if (doc) {
        this.lastGoodDoc = doc;
        save(globalThis.localStorage, { doc, units: this.units });
      }
    }
    this.setAttribute('data-result', reply.sizing.ok ? 'sized' : 'no-fit');
    this.setAttribute('data-build-id', String(reply.id));
    if (!newerWaiting && !reply.sizing.ok) this.dispatchEvent(new CustomEvent('design-settled', { detail: { buildId: reply.id } }));
  }

  /** Input-to-preview time: from the last keystroke to the preview drawn from a build that includes it. */
  private previewRendered(e: CustomEvent<{ buildId: number; at: number }>): void {
    if (this.lastEditAt > 0 && e.detail.buildId >= this.firstBuildAfterEdit) {
      const ms = e.detail.at - this.lastEditAt;
      this.setAttribute('data-input-to-preview-ms', ms.toFixed(1));
    }
    this.setAttribute('data-preview-build-id', String(e.detail.buildId));
    this.dispatchEvent(new CustomEvent('design-settled', { detail: { buildId: e.detail.buildId } }));
  }

  private setUnits(units: UnitSystem): void {
    if (units === this.units) return;
    this.units = units;
    // Switching back with no edit in between restores the exact values (no rounding drift from the round trip).
    const back = this.beforeSwitch;
    if (back && back.units === units && back.convertedDoc === this.doc) {
      this.doc = back.doc;
      this.beforeSwitch = null;
    } else {
      const converted = convertDocument(this.doc, ALL_FIELDS, units);
      this.beforeSwitch = { units: units === 'metric' ? 'imperial' : 'metric', doc: this.doc, convertedDoc: converted };
      this.doc = converted;
    }
    if (this.lastGoodDoc) save(globalThis.localStorage, { doc: this.lastGoodDoc, units });
    this.evaluate();
  }

  /** Switch pages; the bench page loads on its first visit and then stays, so neither page loses its state. */
  private async showPage(page: Page): Promise<void> {
    if (page === 'bench' && !this.benchLoaded) {
      // the bench worker loads beside the page's code, not after it
      (await import('../lib/bench-client.ts')).startBenchWorker();
      await import('./fw-bench-page.ts');
      this.benchLoaded = true;
    }
    this.page = page;
    savePage(globalThis.localStorage, page);
    await this.updateComplete;
  }

  /** A plan (the plan preset, a plan file) opens on the bench page, never in the valve form. */
  private async openOnBench(doc: Record<string, unknown>, from: string): Promise<void> {
    await this.showPage('bench');
    this.benchPage?.openPlan(doc, from);
    this.notice = null;
  }

  /** A group's valve from the bench, as a new design: the one on screen is kept under "Earlier designs". */
  private openGroupValve(e: CustomEvent<OpenValveDetail>): void {
    const { doc, name } = e.detail;
    this.replaceDoc(convertDocument(doc, ALL_FIELDS, this.units), `Opened the valve of the bench group "${name}".`, `the bench group "${name}"`);
    void this.showPage('valve');
  }

  private choosePreset(id: string): void {
    const bench = this.benchPresets.find((p) => p.id === id);
    if (bench) {
      void this.openOnBench(bench.doc, `the bench "${bench.title}"`);
      this.presetId = '';
      this.requestUpdate();
      return;
    }
    const preset = this.presetList.find((p) => p.id === id);
    if (!preset) return;
    // a copy: the preset's notes are said here once, never kept in the design (nor in its build sheet)
    const about = preset.description ? ` ${preset.description}` : '';
    this.replaceDoc(convertDocument(preset.doc, ALL_FIELDS, this.units), `Started from a copy of "${preset.title}".${about}`, `the preset "${preset.title}"`);
    this.presetId = id;
    if (this.page !== 'valve') void this.showPage('valve');
  }

  private openRecent(index: number): void {
    const r = this.recent[index];
    if (r) this.replaceDoc(r.doc, 'Opened an earlier design.', 'an earlier design');
    if (r && this.page !== 'valve') void this.showPage('valve');
  }

  /**
   * Why the files cannot be made from what is on screen now, or null: never a file of a design the
   * screen does not show (a box in error, a change not sized yet, no valve fitting).
   */
  private exportBlock(): string | null {
    if (Object.keys(this.errors).length) return 'Correct the boxes marked in red first: the files must match what is on screen.';
    if (this.typingTimer !== null || this.docsById.size > 0) return 'Sizing your latest change: the files will be ready in a moment.';
    if (this.result && !this.result.ok) return 'No valve fits these numbers, so there are no files to make.';
    if (!this.lastGood || !this.lastGoodDoc) return 'Sizing…';
    if (this.lastGoodDoc !== this.doc) return 'The files are out of date: the valve is being sized again.';
    return null;
  }

  private applyWayOut(e: CustomEvent<WayOut>): void {
    // a way out may set more than one field (a lower highest head takes the lowest head with it)
    const changes = [e.detail, ...(e.detail.also ?? [])];
    this.replaceDoc(changes.reduce((doc, c) => setAt(doc, c.field, c.value), this.doc));
  }

  private async exportRequest(e: CustomEvent<ExportRequest>): Promise<void> {
    const good = this.lastGood;
    // the files hold the design as sized (a half-filled bench row or a lone refill box is left out, as the sizing did)
    const doc = this.lastGoodDoc && docToSize(this.lastGoodDoc);
    const blocked = this.exportBlock();
    if (blocked || !good || !doc) {
      this.notice = { kind: 'bad', text: `No files were made. ${blocked ?? 'Sizing…'}` };
      return;
    }
    if (e.detail.kind === 'json') {
      // named as the zip names it: <stem>-design.json
      download({ name: `${fileStem(doc.name)}-design.json`, mime: 'application/json', bytes: new TextEncoder().encode(JSON.stringify(doc, null, 2) + '\n') });
      return;
    }
    this.busy = e.detail.kind === 'sheet' ? 'Writing the build sheet…' : 'Making your files at print quality…';
    // The sheet opens in a new tab to read and print; the tab must open inside the click, before the worker answers.
    const sheetTab = e.detail.kind === 'sheet' ? globalThis.open?.('', '_blank') ?? null : null;
    try {
      const files: ExportFile[] = await this.client!.exportFiles(good.inputs, doc, e.detail.kind, e.detail.part, this.units);
      for (const f of files) {
        if (sheetTab && f.mime === 'text/html') {
          sheetTab.location.href = URL.createObjectURL(new Blob([f.bytes as BlobPart], { type: 'text/html' }));
        } else download(f);
      }
      this.busy = '';
    } catch (error) {
      sheetTab?.close();
      this.busy = '';
      this.notice = { kind: 'bad', text: `The files could not be made: ${error instanceof Error ? error.message : String(error)}` };
    }
  }

  private async importFile(e: CustomEvent<File>): Promise<void> {
    const file = e.detail;
    let doc: unknown;
    try {
      doc = JSON.parse(await file.text());
    } catch {
      this.notice = { kind: 'bad', text: `${file.name} is not a design file (it is not readable JSON). Your current design is unchanged.` };
      return;
    }
    if (isPlanDocument(doc)) {
      this.notice = {
        kind: 'good',
        text: `${file.name} is a whole-bench plan, not a single valve, so it was not put in the valve form. Your current design is unchanged.`,
        action: { label: 'Open it on the bench page', run: () => void this.openOnBench(doc as Record<string, unknown>, file.name) },
      };
      return;
    }
    const parsed = parseDesign(doc && typeof doc === 'object' && !Array.isArray(doc) ? docToSize(doc as Doc) : doc);
    if (!parsed.ok) {
      this.notice = { kind: 'bad', text: `${file.name} was not opened: ${errorList(parsed.errors)} Your current design is unchanged.` };
      return;
    }
    this.replaceDoc(doc as Doc, `Opened ${file.name}.`, `the file ${file.name}`);
  }

  private async shareLink(): Promise<void> {
    const doc = docToSize(this.lastGoodDoc ?? this.doc);
    const link = shareUrl(location.href, doc, this.units);
    let copied = false;
    try {
      await navigator.clipboard.writeText(link);
      copied = true;
    } catch {
      // clipboard blocked: the link is shown to copy by hand
    }
    this.notice = { kind: 'good', text: copied ? 'Link copied. Anyone who opens it gets this design:' : 'Copy this link to share the design:', link };
  }

  private convertedResult: { from: SizingResult | null; units: UnitSystem; doc: Doc; result: SizingResult | null } | null = null;

  /** The result with its ways out as buttons show them (pairs joined, in the boxes' units), kept while nothing changes. */
  private resultInUnits(): SizingResult | null {
    const c = this.convertedResult;
    if (c && c.from === this.result && c.units === this.units && c.doc === this.doc) return c.result;
    const r = this.result;
    // a pair offered together is one button (joined-ways-out.ts), in the boxes' units
    const result = r && !r.ok ? { ...r, waysOut: joinedWaysOut(r.waysOut).map((w) => wayOutInUnits(w, this.doc, this.units)) } : r;
    this.convertedResult = { from: r, units: this.units, doc: this.doc, result };
    return result;
  }

  private setView(patch: Partial<ViewOptions>): void {
    this.view = { ...this.view, ...patch };
  }

  private renderNotice() {
    const n = this.notice;
    if (!n) return nothing;
    return html`<div class="notice ${n.kind}" role=${n.kind === 'bad' ? 'alert' : 'status'} data-notice=${n.kind}>
      <span>${n.text}</span>
      ${n.link ? html`<input readonly aria-label="Share link" .value=${n.link} @focus=${(e: FocusEvent) => (e.target as HTMLInputElement).select()} />` : nothing}
      ${n.action ? html`<button data-notice-action @click=${n.action.run}>${n.action.label}</button>` : nothing}
      ${n.undo ? html`<button data-undo @click=${() => this.replaceDoc(n.undo!, 'Your previous design is back.', 'going back')}>Put back my previous design</button>` : nothing}
      <button @click=${() => (this.notice = null)}>Dismiss</button>
    </div>`;
  }

  override render() {
    // problems the form does not show beside a box of its own
    const formErrors = Object.entries(this.errors).filter(([k]) => !ALL_FIELDS.some((f) => f.path === k) && !k.startsWith('seal.calibration') && !k.startsWith('print.material') && k !== 'name' && k !== 'notes');
    const good = this.lastGood;
    const blocked = this.exportBlock();
    const outOfDate = blocked !== null && good !== null;
    return html`
      <header>
        <h1>floatwright <small>float valve workbench</small></h1>
        <nav class="pages" aria-label="Pages">
          <button data-page="valve" aria-pressed=${this.page === 'valve' ? 'true' : 'false'} @click=${() => this.showPage('valve')}>One valve</button>
          <button data-page="bench" aria-pressed=${this.page === 'bench' ? 'true' : 'false'} @click=${() => this.showPage('bench')}>Whole bench</button>
        </nav>
        <label>Start from
          <select @change=${(e: Event) => this.choosePreset((e.target as HTMLSelectElement).value)} aria-label="Start from a ready-made design">
            <option value="" ?selected=${this.presetId === ''}>(your design)</option>
            ${this.presetList.map((p) => html`<option value=${p.id} ?selected=${p.id === this.presetId}>${p.title}</option>`)}
            ${this.benchPresets.length
              ? html`<optgroup label="Whole benches (open on the bench page)">${this.benchPresets.map((p) => html`<option value=${p.id}>${p.title}</option>`)}</optgroup>`
              : nothing}
          </select>
        </label>
        ${this.recent.length
          ? html`<label>Earlier designs
              <select aria-label="Open an earlier design" data-recent @change=${(e: Event) => {
                const select = e.target as HTMLSelectElement;
                if (select.value !== '') this.openRecent(Number(select.value));
                select.value = '';
              }}>
                <option value="">(${this.recent.length} kept)</option>
                ${this.recent.map((r, i) => html`<option value=${i}>${recentTitle(r)}</option>`)}
              </select>
            </label>`
          : nothing}
        <fieldset>
          <legend>Units</legend>
          <label><input type="radio" name="units" value="metric" .checked=${this.units === 'metric'} @change=${() => this.setUnits('metric')} /> metric</label>
          <label><input type="radio" name="units" value="imperial" .checked=${this.units === 'imperial'} @change=${() => this.setUnits('imperial')} /> imperial</label>
        </fieldset>
      </header>
      <div>
        ${this.renderNotice()}
        ${formErrors.length ? html`<div class="notice bad" role="alert">${formErrors.map(([k, m]) => html`<div>${labelFor(k)}: ${m}</div>`)}</div>` : nothing}
      </div>
      <main ?hidden=${this.page !== 'valve'}>
        <div class="left">
          <fw-design-form .doc=${this.doc} .units=${this.units} .errors=${this.errors} @field-input=${this.fieldInput}></fw-design-form>
        </div>
        <div class="middle">
          <div class="viewbar">
            <fieldset>
              <legend>Float</legend>
              <label><input type="radio" name="pose" .checked=${this.view.pose === 'rest'} @change=${() => this.setView({ pose: 'rest' })} /> ${good?.architecture === 'lever' ? 'at rest, the arm down' : 'resting on its pin'}</label>
              <label><input type="radio" name="pose" .checked=${this.view.pose === 'seal'} @change=${() => this.setView({ pose: 'seal' })} /> shut against the nozzle</label>
            </fieldset>
            <label><input type="checkbox" name="section" .checked=${this.view.section} @change=${(e: Event) => this.setView({ section: (e.target as HTMLInputElement).checked })} /> cut open</label>
            <label><input type="checkbox" name="exploded" .checked=${this.view.exploded} @change=${(e: Event) => this.setView({ exploded: (e.target as HTMLInputElement).checked })} /> parts apart</label>
            <label><input type="checkbox" name="water" .checked=${this.view.water} @change=${(e: Event) => this.setView({ water: (e.target as HTMLInputElement).checked })} /> water line</label>
            <button @click=${() => this.viewer?.resetView()}>Reset view</button>
          </div>
          ${outOfDate ? html`<p class="out-of-date" role="status" data-out-of-date>Out of date: the picture and figures show the last design that worked, not the boxes as they are now.</p>` : nothing}
          <fw-valve-view class=${outOfDate ? 'stale' : ''} .meshes=${this.meshes} .transforms=${this.transforms} .sizing=${good} .options=${this.view} .buildId=${this.meshBuildId} @preview-rendered=${this.previewRendered}></fw-valve-view>
          <fw-push-plot .sizing=${good} .units=${this.units}></fw-push-plot>
          <fw-flow-plot class=${outOfDate ? 'stale' : ''} .band=${good} .units=${this.units}></fw-flow-plot>
        </div>
        <div class="side">
        <div class="summary">
          <fw-results show="summary" .result=${this.resultInUnits()} .lastGood=${good} .units=${this.units} .stale=${Object.keys(this.errors).length > 0 || outOfDate} @apply-way-out=${this.applyWayOut}></fw-results>
          <fw-file-bar .disabled=${blocked !== null} .reason=${blocked ?? ''} .busy=${this.busy} @export-request=${this.exportRequest} @import-file=${this.importFile} .parts=${good ? valvePartNames(good) : PART_NAMES} @share-link=${this.shareLink}></fw-file-bar>
        </div>
        <div class="right">
          <fw-results show="details" .result=${this.result} .lastGood=${good} .units=${this.units} .stale=${Object.keys(this.errors).length > 0 || outOfDate} .timing=${this.timing}></fw-results>
        </div>
        </div>
      </main>
      ${this.benchLoaded
        ? html`<fw-bench-page ?hidden=${this.page !== 'bench'} .units=${this.units} .starter=${this.benchPresets[0]?.doc ?? null} @open-valve=${this.openGroupValve}></fw-bench-page>`
        : nothing}
      <fw-cautions></fw-cautions>
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'fw-app': FwApp;
  }
}
