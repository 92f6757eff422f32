/**
 * A design-document path as the box on screen is labelled ("supply.headMax" ->
 * "Tank full: water height above the valve"), for messages: the grower sees
 * labels, never document paths.
 */
import { ALL_FIELDS } from './form-fields.ts';

const OTHER_LABELS: [RegExp, (m: RegExpExecArray) => string][] = [
  [/^seal\.calibration\.(\d+)\.head$/, (m) => `Tank height, point ${Number(m[1]) + 1}`],
  [/^seal\.calibration\.(\d+)\.mass$/, (m) => `Weight, point ${Number(m[1]) + 1}`],
  [/^seal\.calibration(\.\d+)?$/, () => 'Bench points'],
  [/^print\.material\.name$/, () => 'Filament name'],
  [/^print\.material\.density$/, () => 'Filament density'],
  [/^print\.material$/, () => 'Filament'],
  [/^name$/, () => 'Design name'],
  [/^notes$/, () => 'Notes'],
];

export function labelFor(path: string): string {
  const field = ALL_FIELDS.find((f) => f.path === path);
  if (field) return field.label;
  for (const [pattern, label] of OTHER_LABELS) {
    const m = pattern.exec(path);
    if (m) return label(m);
  }
  return path === 'design' || path === '' ? 'The design' : 'A setting of the design';
}

/** A message with every document path in it replaced by its box's label in quotes. */
export function inLabels(message: string): string {
  return message.replace(/\b(supply|level|limits|reservoir|print|nozzle|seal|liquid)\.[A-Za-z]+(\.[A-Za-z0-9]+)*\b/g, (path) => `"${labelFor(path)}"`);
}

/** Problems of a document as "Label: message" sentences. */
export function problemsInLabels(errors: readonly { field: string; message: string }[]): string {
  return errors.map((e) => `${labelFor(e.field)}: ${inLabels(e.message)}`).join(' ');
}
