/**
 * A design-document path as the box on screen is labelled ("supply.headMax" ->
 * "Tank full: water height above the valve"), for messages: the grower sees
 * labels, never document paths.
 */
import { superscriptUnits } from '../../generator/doc/superscript-units.ts';
import { ALL_FIELDS, VALVE_MENUS } from './form-fields.ts';

/** Paths that are not plain boxes of the form (bench rows, menus), or not on the valve page at all. */
const OTHER_LABELS: [RegExp, (m: RegExpExecArray) => string][] = [
  [/^seal\.calibration\.(\d+)\.head$/, (m) => `Head, point ${Number(m[1]) + 1}`],
  [/^seal\.calibration\.(\d+)\.mass$/, (m) => `Weight, point ${Number(m[1]) + 1}`],
  [/^seal\.calibration(\.\d+)?$/, () => 'Bench points'],
  [/^seal\.pad$/, () => 'Seal pad'],
  [/^seal\.padDensity$/, () => 'Pad density'],
  [/^seal\.preload$/, () => 'Pad preload (no longer used)'],
  [/^seal\.indentation$/, () => 'Pad squeeze (no longer used)'],
  [/^print\.material\.name$/, () => 'Filament name'],
  [/^print\.material\.density$/, () => 'Filament density'],
  [/^print\.material$/, () => 'Filament'],
  [/^print\.bed(\.\w+)?$/, () => 'Printer bed size'],
  [/^liquid\.density$/, () => 'Liquid density'],
  [/^liquid\.viscosity$/, () => 'Liquid viscosity'],
  [/^container\.demand$/, () => 'Plants\u2019 use per day'],
  // the two menus of the "Kind of valve" group (fw-design-form)
  [/^valve\.architecture$/, () => VALVE_MENUS[0].label],
  [/^valve\.mount$/, () => VALVE_MENUS[1].label],
  [/^name$/, () => 'Design name'],
  [/^notes$/, () => 'Notes'],
];

/** The sections of the design document; a dotted word starting with one of these in a message is a path. */
const DOCUMENT_PATH = /\b(?:supply|level|limits|reservoir|print|nozzle|seal|liquid|container|valve)\.[A-Za-z]+(?:\.[A-Za-z0-9]+)*\b/g;

/** "rimHeight" -> "Rim height": a key no box is labelled for yet, still said in words. */
function keyInWords(path: string): string {
  const key = path.split('.').filter((k) => !/^\d+$/.test(k)).pop() ?? '';
  const words = key.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
  return words ? words[0].toUpperCase() + words.slice(1) : 'A setting of the design';
}

export function labelFor(path: string): string {
  const field = ALL_FIELDS.find((f) => f.path === path);
  if (field) return field.label;
  for (const [pattern, label] of OTHER_LABELS) {
    const m = pattern.exec(path);
    if (m) return label(m);
  }
  return path === 'design' || path === '' ? 'The design' : keyInWords(path);
}

/** A message with every document path in it replaced by its box's label in quotes. */
export function inLabels(message: string): string {
  return message.replace(DOCUMENT_PATH, (path) => `"${labelFor(path)}"`);
}

/** A message as the screen shows it: boxes by their labels, units with their powers raised (m², kg/m³). */
export function shownMessage(message: string): string {
  return superscriptUnits(inLabels(message));
}

/** Problems of a document as "Label: message" sentences, as the screen shows them. */
export function problemsInLabels(errors: readonly { field: string; message: string }[]): string {
  return errors.map((e) => `${labelFor(e.field)}: ${shownMessage(e.message)}`).join(' ');
}
