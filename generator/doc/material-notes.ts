/**
 * What a grower should know about a filament before printing a valve in it:
 * PLA softens in warm water, nylon takes up water, a flexible filament cannot
 * make a float. Each note says where its figures come from (`basis`); the
 * workbench shows the notes beside the filament menu and the build sheet
 * prints them with the print settings.
 *
 * A note applies to a table filament by name and to a grower's own by the
 * words in its name ("PLA+", "PA6-CF", "nylon 12", "TPE 85A").
 */
export interface MaterialNote {
  /** stable id, for tests and the page */
  id: 'pla-warm-water' | 'nylon-takes-up-water' | 'flexible-no-float';
  /** one short sentence: the fact */
  title: string;
  /** what it means for the valve, and what to do */
  text: string;
  /** where the figures come from */
  basis: string;
}

const NOTES: readonly (MaterialNote & { matches: RegExp })[] = [
  {
    id: 'pla-warm-water',
    matches: /\bPLA(?![a-z])/i,
    title: 'PLA softens in warm water',
    text:
      'PLA starts to soften at about 55 to 60 °C (its glass transition). Water in a dark tank or container standing in the sun can come close to that, ' +
      'and a float or housing that softens creeps out of shape and stops sealing. In a warm spot print PETG or ASA instead.',
    basis:
      'Glass transition of PLA 45 to 65 °C, 63 °C in their own DSC run (NETZSCH polymer database, "PLA: Polylactide"); 60.6 °C by DSC on a filament datasheet ' +
      '(Polymaker PolyTerra PLA, TDS V5.3, which gives a heat deflection temperature of 52 °C at 1.8 MPa). The round 55 to 60 °C is recalled from memory and lies ' +
      'within both. Sun-warmed water: common practice.',
  },
  {
    id: 'nylon-takes-up-water',
    matches: /\b(PA(?![a-z])|nylon|polyamide)/i,
    title: 'Nylon takes up water',
    text:
      'Nylon (PA) soaks up water until it is saturated: it swells a little, softens and gets heavier, so a nylon float sits lower than sized, and it can fail the ' +
      'day-long soak test on the build sheet without leaking. PA12 takes up the least of the nylons. For parts that stay wet, PETG or ASA is steadier.',
    basis:
      'Water taken up at saturation: PA6 about 9 %, PA66 about 7 %, a cast PA12 1.4 % of its weight (Intech, "Effects of moisture absorption", nylon ' +
      'material information); about 1.5 % for printed PA12 is recalled from memory. Water absorption is measured as in ISO 62 and ASTM D570.',
  },
  {
    id: 'flexible-no-float',
    matches: /\b(TPU|TPE|TPC|flex|rubber)/i,
    title: 'A flexible filament cannot make a float',
    text:
      'TPU and other flexible filaments give under a light touch: a float printed in one squashes and bends instead of holding its shape, so it cannot press ' +
      'the seal pad squarely onto the nozzle lip, and its thin shell does not stay watertight. Print the float, housing, nozzle and pin in a rigid filament.',
    basis:
      'TPU is an elastomer: the usual printing grade is Shore A 95, and its glass transition lies at -45 to -25 °C, so it is rubbery at any water temperature ' +
      '(the TPU page of the Additive Tools materials site, figures for printed parts). That a float must be rigid to pass its push to the pad is common practice.',
  },
];

/** The notes for a filament name, table or the grower's own (none for PETG, ABS, ASA, PP). */
export function materialNotes(materialName: string): MaterialNote[] {
  return NOTES.filter((n) => n.matches.test(materialName)).map(({ matches: _matches, ...note }) => note);
}
