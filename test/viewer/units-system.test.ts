/**
 * Unit display for the workbench. Conversion factors checked against NIST SP 811
 * (Guide for the Use of the SI, appendix B: 1 in = 25.4 mm exactly, 1 ft = 0.3048 m exactly,
 * 1 ozf = 0.2780139 N).
 */
import { describe, expect, it } from 'vitest';
import { convertDocument, convertValue, displayText, documentValue, type FieldDef } from '../../viewer/lib/units-system.ts';
import { ALL_FIELDS } from '../../viewer/lib/form-fields.ts';

const level = ALL_FIELDS.find((f) => f.path === 'level.target')!;
const head = ALL_FIELDS.find((f) => f.path === 'supply.headMax')!;
// a force field as the form would define one (the form has none since the pad table replaced the preload)
const preload: FieldDef = { path: 'seal.preload', label: 'a force', kind: 'force', metric: 'N', imperial: 'ozf' };

describe('field text and document values', () => {
  it('a bare number gets the unit the field shows', () => {
    expect(documentValue('45', level, 'metric')).toBe('45 mm');
    expect(documentValue('1.5', level, 'imperial')).toBe('1.5 in');
    expect(documentValue(' 7 ', head, 'imperial')).toBe('7 ft');
  });
  it('text with its own unit is kept as written, and empty clears', () => {
    expect(documentValue('3 psi', head, 'metric')).toBe('3 psi');
    expect(documentValue('', level, 'metric')).toBeUndefined();
  });
  it('shows the number alone when the value is in the shown unit', () => {
    expect(displayText('45 mm', level, 'metric')).toBe('45');
    expect(displayText(45, level, 'metric')).toBe('45'); // bare number: the field's document unit (mm)
    expect(displayText('3 psi', head, 'metric')).toBe('3 psi');
  });
  it('a plain-number field has no unit', () => {
    const reserve = ALL_FIELDS.find((f) => f.path === 'reserve')!;
    expect(documentValue('1.8', reserve, 'imperial')).toBe(1.8);
    expect(displayText(1.8, reserve, 'imperial')).toBe('1.8');
  });
});

describe('switching systems', () => {
  it('converts lengths with the exact inch and foot (NIST SP 811)', () => {
    expect(convertValue('50.8 mm', level, 'in')).toBe('2 in');
    expect(convertValue('3.048 m', head, 'ft')).toBe('10 ft');
    expect(convertValue('10 ft', head, 'm')).toBe('3.048 m');
  });
  it('converts a force to ounce-force (NIST SP 811: 1 ozf = 0.2780139 N)', () => {
    expect(convertValue('0.2780139 N', preload, 'ozf')).toBe('1 ozf');
  });
  it('leaves a head given as pressure, and unreadable text, as written', () => {
    expect(convertValue('3 psi', head, 'ft')).toBe('3 psi');
    expect(convertValue('lots', head, 'ft')).toBe('lots');
  });
  it('converts a whole document, bench points included, and keeps print settings in mm', () => {
    const doc = { supply: { headMax: '2.4384 m' }, level: { target: '50.8 mm' }, print: { wall: '2.4 mm' }, seal: { calibration: [{ head: '0.6096 m', mass: '28.349523125 g' }] } };
    const out = convertDocument(doc, ALL_FIELDS, 'imperial') as typeof doc;
    expect(out.supply.headMax).toBe('8 ft');
    expect(out.level.target).toBe('2 in');
    expect(out.print.wall).toBe('2.4 mm');
    expect(out.seal.calibration[0]).toEqual({ head: '2 ft', mass: '1 oz' });
    expect(doc.level.target).toBe('50.8 mm'); // the original is not touched
  });
  it('every field def names a path the schema knows', () => {
    const known = (d: FieldDef) => displayText(undefined, d, 'metric') === '';
    expect(ALL_FIELDS.every(known)).toBe(true);
  });
});

describe('imperial as growers write it (NIST SP 811: 1 in = 25.4 mm, 1 ft = 0.3048 m)', () => {
  const tube = ALL_FIELDS.find((f) => f.path === 'supply.tubeInnerDiameter')!;
  it('a fraction typed in an inch box is inches, and shows as typed', () => {
    expect(documentValue('5/32', tube, 'imperial')).toBe('5/32 in');
    expect(displayText('5/32 in', tube, 'imperial')).toBe('5/32');
    expect(documentValue('1 1/2', level, 'imperial')).toBe('1 1/2 in');
  });
  it("feet and inches in a feet box stay as typed; switching to metric gives 2.184 m for 7' 2\"", () => {
    expect(documentValue(`7' 2"`, head, 'imperial')).toBe(`7' 2"`);
    expect(displayText(`7' 2"`, head, 'imperial')).toBe(`7' 2"`);
    expect(convertValue(`7' 2"`, head, 'm')).toBe('2.184 m'); // 86 in = 2.1844 m, to the millimetre
  });
  it('rounds sensibly: 2.2 m is 7.22 ft, not 7.2178; 45 mm is 1.77 in', () => {
    expect(convertValue('2.2 m', head, 'ft')).toBe('7.22 ft');
    expect(displayText('2.2 m', head, 'imperial')).toBe('2.2 m'); // typed in another unit: kept as written
    expect(displayText(2.2, head, 'imperial')).toBe('7.22');
    expect(convertValue('45 mm', level, 'in')).toBe('1.77 in');
  });
});
