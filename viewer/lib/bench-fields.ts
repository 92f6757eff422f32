/**
 * The bench page's boxes: where each sits in the plan document (the plan
 * file's own fields, generator/plan/schema.ts), its label, and its unit in
 * each system. Also the plan paths in messages turned into those labels, so
 * the grower never reads "containers.2.floorElevation".
 */
import { fromSi, parseQuantity, type QuantityKind } from '../../generator/doc/units.ts';
import { shownNumber } from '../../generator/doc/shown-number.ts';
import type { UnitSystem } from './units-system.ts';
import type { TermKey } from '../../generator/doc/glossary.ts';

export interface BenchField {
  /** path in the plan document; for a group, relative to its row */
  path: string;
  label: string;
  kind: QuantityKind | 'text';
  metric: string;
  imperial: string;
  hint?: string;
  optional?: boolean;
  /** the glossary word the box is about, explained beside its label (default none) */
  term?: TermKey;
}

export const TANK_FIELDS: readonly BenchField[] = [
  { path: 'tank.fullSurfaceElevation', label: 'Tank water surface, full', kind: 'length', metric: 'm', imperial: 'ft', hint: 'height above your reference level (the ground, a deck)' },
  { path: 'tank.lowSurfaceElevation', label: 'Tank water surface, low', kind: 'length', metric: 'm', imperial: 'ft', optional: true, hint: 'the lowest you let it run; blank: same as full' },
  { path: 'main.innerDiameter', label: 'Main pipe, inside width', kind: 'length', metric: 'mm', imperial: 'in', term: 'main' },
];

export const GROUP_FIELDS: readonly BenchField[] = [
  { path: 'name', label: 'Name', kind: 'text', metric: '', imperial: '' },
  { path: 'count', label: 'How many', kind: 'number', metric: '', imperial: '', hint: 'identical containers on one tee' },
  { path: 'floorElevation', label: 'Floor height', kind: 'length', metric: 'm', imperial: 'ft', hint: 'container floor above the reference level' },
  { path: 'level', label: 'Water depth to hold', kind: 'length', metric: 'mm', imperial: 'in', term: 'water-depth' },
  { path: 'mainLength', label: 'Distance along the main', kind: 'length', metric: 'm', imperial: 'ft', hint: 'from the tank to this group\u2019s tee' },
  { path: 'branch.length', label: 'Branch tube, length', kind: 'length', metric: 'm', imperial: 'ft', term: 'branch' },
  { path: 'branch.innerDiameter', label: 'Branch tube, inside width', kind: 'length', metric: 'mm', imperial: 'in' },
  { path: 'reservoirArea', label: 'Water surface area', kind: 'area', metric: 'm2', imperial: 'ft2', optional: true, hint: 'for the refill time' },
  { path: 'design.container.demand', label: 'Plants\u2019 use per container', kind: 'flow', metric: 'L/day', imperial: 'gal/day', optional: true, hint: 'blank: 3 L/day' },
  { path: 'design.container.rimHeight', label: 'Rim height', kind: 'length', metric: 'mm', imperial: 'in', optional: true, hint: 'top of the container wall above its floor; lets the valve hang from the rim', term: 'rim-height' },
];

export const unitOf = (f: BenchField, system: UnitSystem) => (system === 'metric' ? f.metric : f.imperial);

/** What a box shows for a document value: the bare number when written in the shown unit, else the text as written. */
export function benchDisplay(raw: unknown, f: BenchField, system: UnitSystem): string {
  if (raw === undefined || raw === null) return '';
  const text = String(raw);
  if (f.kind === 'text' || f.kind === 'number') return text;
  const unit = unitOf(f, system);
  const parsed = parseQuantity(text, f.kind, unit);
  if (parsed.ok && parsed.quantity.unit === unit) return text.match(/^\s*([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?)/i)?.[1] ?? text;
  return text;
}

/** What a box's text goes into the document as: a bare number takes the shown unit; empty is removed. */
export function benchValue(text: string, f: BenchField, system: UnitSystem): unknown {
  const t = text.trim();
  if (t === '') return undefined;
  if (f.kind === 'text') return text;
  if (f.kind === 'number') return /^[+-]?\d+(\.\d+)?$/.test(t) ? Number(t) : t;
  const unit = unitOf(f, system);
  return /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)$/.test(t) ? `${t} ${unit}` : t;
}

function groupName(plan: unknown, i: number): string {
  const rows = (plan as { containers?: unknown } | null)?.containers;
  const name = Array.isArray(rows) ? (rows[i] as { name?: unknown } | undefined)?.name : undefined;
  return typeof name === 'string' && name.trim() ? `"${name.trim()}"` : `group ${i + 1}`;
}

const DESIGN_WORDS: Record<string, string> = {
  'level.target': 'Water depth to hold',
  'supply.tubeLength': 'Branch tube, length',
  'supply.tubeInnerDiameter': 'Branch tube, inside width',
  'reservoir.area': 'Water surface area',
  'reservoir.rise': 'Refill depth',
  'container.demand': 'Plants\u2019 use per container',
};

/** A plan path as the grower sees its box: "containers.2.floorElevation" -> 'Floor height of "bottom tier"'. */
export function benchLabelFor(path: string, plan: unknown): string {
  const top = TANK_FIELDS.find((f) => f.path === path);
  if (top) return top.label;
  const m = /^containers\.(\d+)(?:\.(.+))?$/.exec(path);
  if (m) {
    const who = groupName(plan, Number(m[1]));
    if (!m[2]) return `The group ${who}`;
    const f = GROUP_FIELDS.find((g) => g.path === m[2]);
    const inner = m[2].replace(/^design\./, '');
    const label = f?.label ?? DESIGN_WORDS[inner] ?? 'A setting';
    return `${label} of ${who}`;
  }
  if (path === 'containers') return 'Container groups';
  if (path === 'name') return 'Bench name';
  if (path === 'notes') return 'Notes';
  if (path.startsWith('design')) return 'A setting shared by every group';
  if (path === 'starvingShare') return 'Starving share';
  return 'The bench';
}

/** A message with every plan path in it replaced by its box's label in quotes. */
export function benchInLabels(message: string, plan: unknown): string {
  return message
    .replace(/\b(?:containers\.\d+(?:\.[A-Za-z]+)*|tank\.[A-Za-z]+|main\.[A-Za-z]+|tankFullSurfaceElevation)\b/g, (p) =>
      p === 'tankFullSurfaceElevation' ? '"Tank water surface, full"' : `"${benchLabelFor(p, plan)}"`,
    )
    .replace(/\b(?:supply|level|reservoir|container|limits|print|nozzle|seal)\.[A-Za-z]+(?:\.[A-Za-z0-9]+)*\b/g, (p) => `"${DESIGN_WORDS[p] ?? 'a valve setting'}"`);
}

/**
 * The plan with every box's value rewritten in the system's unit, rounded as the
 * valve page rounds (shownNumber: 2.7 m shows as 8.86 ft), so the boxes read in
 * the units chosen; values that do not parse are left as typed.
 */
export function convertPlan(plan: Record<string, unknown>, system: UnitSystem): Record<string, unknown> {
  const out = structuredClone(plan);
  const convert = (holder: unknown, path: string, f: BenchField) => {
    if (f.kind === 'text' || f.kind === 'number' || !holder || typeof holder !== 'object') return;
    const keys = path.split('.');
    let node = holder as Record<string, unknown>;
    for (const k of keys.slice(0, -1)) {
      const next = node[k];
      if (!next || typeof next !== 'object') return;
      node = next as Record<string, unknown>;
    }
    const last = keys[keys.length - 1]!;
    const raw = node[last];
    if (typeof raw !== 'string') return;
    const unit = unitOf(f, system);
    const parsed = parseQuantity(raw, f.kind, unit);
    if (!parsed.ok || parsed.quantity.unit === unit || /^\s*[+-]?[\d.]+\s*$/.test(raw)) return;
    node[last] = `${shownNumber(fromSi(parsed.quantity.si, unit), unit)} ${unit}`;
  };
  for (const f of TANK_FIELDS) convert(out, f.path, f);
  const rows = (out as { containers?: unknown }).containers;
  if (Array.isArray(rows)) for (const row of rows) for (const f of GROUP_FIELDS) convert(row, f.path, f);
  return out;
}

const UNSAFE = new Set(['__proto__', 'constructor', 'prototype']);

/**
 * A copy of the plan with `value` at `path` ("containers.2.branch.length"): list
 * positions stay lists; `undefined` removes the key (and sections left empty, never a group).
 */
export function setPlanAt(plan: Record<string, unknown>, path: string, value: unknown): Record<string, unknown> {
  const keys = path.split('.');
  if (keys.some((k) => UNSAFE.has(k) || k === '')) return plan;
  const copy = structuredClone(plan);
  let node: Record<string, unknown> | unknown[] = copy;
  const trail: [Record<string, unknown> | unknown[], string][] = [];
  for (const key of keys.slice(0, -1)) {
    const holder = node as Record<string, unknown>;
    const next = holder[key];
    if (next === null || typeof next !== 'object') holder[key] = {};
    trail.push([node, key]);
    node = holder[key] as Record<string, unknown> | unknown[];
  }
  const last = keys[keys.length - 1]!;
  if (value === undefined) {
    delete (node as Record<string, unknown>)[last];
    for (let i = trail.length - 1; i >= 0; i--) {
      const [parent, key] = trail[i]!;
      const child = (parent as Record<string, unknown>)[key];
      if (Array.isArray(parent) || Array.isArray(child) || Object.keys(child as object).length > 0) break;
      delete (parent as Record<string, unknown>)[key];
    }
  } else (node as Record<string, unknown>)[last] = value;
  return copy;
}
