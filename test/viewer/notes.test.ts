// @vitest-environment happy-dom
/**
 * Notes on the valve page (issue 12): visible and editable; a preset opens as
 * a copy without its own notes, so a renamed copy's build sheet never carries
 * the demo scenario's text. Checked against the preset files themselves
 * (presets/*.json) and the document the export is made from; the build sheet
 * is the shared generator/doc/build-sheet.ts, which prints a document's notes.
 */
import { strFromU8 } from 'fflate';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import type { SizingSuccess } from '../../generator/sizing/result.ts';
import { presets } from '../../viewer/lib/presets.ts';
import { presetCopy } from '../../viewer/lib/preset-copy.ts';
import { exportFiles } from '../../viewer/worker/export-files.ts';
import type { WorkerRequest } from '../../viewer/worker/protocol.ts';
import { edit, form, mountApp, root, sentRequests, settle } from './app-harness.ts';

const tubs = presets().find((p) => p.id === 'rooftop-tubs')!;
const tubsNotes = tubs.doc.notes as string;

beforeEach(() => {
  localStorage.clear();
  location.hash = '';
});
afterEach(() => {
  document.body.innerHTML = '';
});

describe('a preset opens as a copy', () => {
  it('without its notes, which become its description; the preset itself is untouched', () => {
    expect(tubsNotes.length).toBeGreaterThan(20); // the preset file has notes to hide
    const copy = presetCopy(tubs);
    expect(copy.doc.notes).toBeUndefined();
    expect(copy.description).toBe(tubsNotes);
    expect(tubs.doc.notes).toBe(tubsNotes);
    expect(copy.doc).not.toBe(tubs.doc);
  });
});

describe('notes in the workbench', () => {
  async function exportedDocument(app: Parameters<typeof settle>[0]): Promise<Record<string, unknown>> {
    root(app).querySelector('fw-file-bar')!.dispatchEvent(new CustomEvent('export-request', { detail: { kind: 'zip' }, bubbles: true, composed: true }));
    const req = sentRequests().find((r) => r.type === 'export') as Extract<WorkerRequest, { type: 'export' }>;
    return req.document as Record<string, unknown>;
  }

  it('a preset renamed carries no notes into its files; notes typed by the grower do, and show in the box', async () => {
    const app = await mountApp();
    await settle(app);
    const select = root(app).querySelector('header select') as HTMLSelectElement;
    select.value = 'rooftop-tubs';
    select.dispatchEvent(new Event('change'));
    await settle(app);
    const notesBox = () => form(app).shadowRoot!.querySelector('#f-notes') as HTMLTextAreaElement;
    expect(notesBox().value).toBe('');
    expect(root(app).querySelector('[data-notice]')!.textContent).toContain(tubsNotes.slice(0, 40));
    await edit(app, 'name', 'My balcony tubs');
    await settle(app);
    const renamed = await exportedDocument(app);
    expect(renamed.name).toBe('My balcony tubs');
    expect(renamed.notes).toBeUndefined();
    await settle(app);
    notesBox().value = 'Second tub from the left; pad cut from the blue sponge.';
    notesBox().dispatchEvent(new Event('input'));
    await settle(app);
    expect((await exportedDocument(app)).notes).toBe('Second tub from the left; pad cut from the blue sponge.');
    expect(form(app).shadowRoot!.querySelector('label[for="f-notes"]')!.textContent).toContain('Notes');
  });

  it('the build sheet prints the grower\'s notes and nothing of the preset\'s', () => {
    const copy = presetCopy(tubs).doc;
    const parsed = parseDesign(copy);
    if (!parsed.ok) throw new Error('preset does not parse');
    const s = sizeDesign(parsed.inputs) as SizingSuccess;
    const sheet = (doc: unknown) => strFromU8(exportFiles('sheet', s, doc, null)[0].bytes);
    expect(sheet({ ...copy, name: 'Mine' })).not.toContain(tubsNotes.slice(0, 40));
    expect(sheet({ ...copy, name: 'Mine', notes: 'blue sponge' })).toContain('blue sponge');
  });
});
