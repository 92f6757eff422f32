/** The workbench's input fields, grouped the way a grower thinks about the job. */
import type { TermKey } from '../../generator/doc/glossary.ts';
import type { FieldDef } from './units-system.ts';
import { DEFAULT_CONTAINER_WALL_MM } from '../../generator/doc/schema.ts';

export interface FieldGroup {
  id: string;
  title: string;
  intro?: string;
  /** glossary words explained where the intro says them (default none) */
  introTerms?: TermKey[];
  fields: FieldDef[];
}

export const FIELD_GROUPS: readonly FieldGroup[] = [
  {
    id: 'tank',
    title: 'Tank and feed line',
    intro: "Each height is a head: how high the tank's water surface stands above the valve's nozzle.",
    introTerms: ['head'],
    fields: [
      { path: 'supply.headMax', label: 'Tank full: water height above the valve', term: 'tank-full', kind: 'head', metric: 'm', imperial: 'ft', hint: 'also takes kPa or psi' },
      { path: 'supply.headMin', label: 'Tank low: water height above the valve', term: 'tank-low', kind: 'head', metric: 'm', imperial: 'ft', optional: true, blankFrom: 'supply.headMax' },
      { path: 'supply.tubeInnerDiameter', label: 'Feed tube, inside width', term: 'feed-tube', kind: 'length', metric: 'mm', imperial: 'in', optional: true },
      { path: 'supply.tubeLength', label: 'Feed tube, length', kind: 'length', metric: 'm', imperial: 'ft', optional: true },
    ],
  },
  {
    id: 'container',
    title: 'Container',
    fields: [
      { path: 'level.target', label: 'Water depth to hold', term: 'water-depth', kind: 'length', metric: 'mm', imperial: 'in', hint: 'above the container floor' },
      { path: 'limits.maxOuterDiameter', label: 'Widest valve that fits', kind: 'length', metric: 'mm', imperial: 'in', optional: true },
      { path: 'reservoir.area', label: 'Water surface area', kind: 'area', metric: 'm2', imperial: 'ft2', optional: true, hint: 'for the refill time', blankMeans: 'no refill time' },
      { path: 'reservoir.rise', label: 'Refill depth', kind: 'length', metric: 'mm', imperial: 'in', optional: true, hint: 'for the refill time', blankMeans: 'no refill time' },
      { path: 'container.overflow', label: 'Overflow height', kind: 'length', metric: 'mm', imperial: 'in', optional: true, hint: 'above the floor; the valve shuts at least 10 mm lower', blankMeans: 'not checked' },
      { path: 'container.rimHeight', label: 'Rim height', term: 'rim-height', kind: 'length', metric: 'mm', imperial: 'in', optional: true, hint: 'top of the container wall, above the floor; lets the valve hang from the rim', blankMeans: 'the valve stands on the floor' },
      { path: 'container.wallThickness', label: 'Container wall at the rim', kind: 'length', metric: 'mm', imperial: 'mm', optional: true, hint: 'for the hanger over the rim; measure yours', blankUses: `${DEFAULT_CONTAINER_WALL_MM} mm` },
    ],
  },
  {
    id: 'valve',
    title: 'Kind of valve',
    intro: 'floatwright picks the kind and mounting with the least plastic that fits, unless you choose one here.',
    fields: [],
  },
  {
    id: 'print',
    title: 'Printing',
    intro: 'Print settings stay in millimetres, as your slicer uses them.',
    fields: [
      { path: 'print.wall', label: 'Housing wall', kind: 'length', metric: 'mm', imperial: 'mm', optional: true },
      { path: 'print.lineWidth', label: 'Line width', term: 'line-width', kind: 'length', metric: 'mm', imperial: 'mm', optional: true },
    ],
  },
  {
    id: 'nozzle',
    title: 'Nozzle and seal pad',
    fields: [
      { path: 'nozzle.orifice', label: 'Nozzle hole', term: 'nozzle-hole', kind: 'length', metric: 'mm', imperial: 'mm', optional: true },
      { path: 'nozzle.sealDiameter', label: 'Nozzle lip, outside width', term: 'nozzle-lip', kind: 'length', metric: 'mm', imperial: 'mm', optional: true },
      { path: 'seal.padThickness', label: 'Pad thickness', kind: 'length', metric: 'mm', imperial: 'mm', optional: true },
      { path: 'reserve', label: 'Spare lift (times the push needed)', term: 'spare-lift', kind: 'number', metric: '', imperial: '', optional: true },
    ],
  },
];

export const ALL_FIELDS: readonly FieldDef[] = FIELD_GROUPS.flatMap((g) => g.fields);

/** A menu of the form: its document path, label, and the words of each choice (the document's value first). */
export interface MenuDef {
  path: string;
  label: string;
  term?: TermKey;
  choices: readonly { value: string; words: string }[];
}

/**
 * The valve's kind and mounting (issue 13): "auto" (the sizing picks the least plastic that fits) unless the
 * grower picks one. The group they sit in is "valve" in FIELD_GROUPS.
 */
export const VALVE_MENUS: readonly [MenuDef, MenuDef] = [
  {
    path: 'valve.architecture',
    label: 'Valve kind',
    term: 'valve-kind',
    choices: [
      { value: 'auto', words: 'the lightest that fits' },
      { value: 'direct', words: 'direct: float under the nozzle' },
      { value: 'lever', words: 'on an arm: float on a pivoted arm' },
    ],
  },
  {
    path: 'valve.mount',
    label: 'Mounting',
    choices: [
      { value: 'auto', words: 'the lightest that fits' },
      { value: 'floor', words: 'stands on the container floor' },
      { value: 'rim', words: 'hangs from the rim (give the rim height)' },
    ],
  },
];
