/**
 * The build sheet a grower prints and keeps by the printer: the sizing
 * figures with units, the bill of materials (pad, tube, ballast or anchors),
 * print settings per part (orientation, walls, infill, layer height), the
 * assembly steps and the cautions. Markdown for the repository and terminals,
 * HTML for a printable page. Built from the sizing result and the normalized
 * design document only; no I/O.
 *
 * Print settings are common practice for a 0.4 mm nozzle (0.2 mm layers);
 * wall counts follow from the design's wall and line width.
 */
import { anchorSlots, anchorSlotsInWords } from '../sizing/lever/lever-frame-volume-mm3.ts';
import { ruleText } from '../sizing/rule-text.ts';
import { OVERHANG_MIN_DEG } from '../sizing/constants.ts';
import { FOOT_FLARE_DEG, PIN_HOLE_ROOF_DEG } from '../sizing/parts/housing-spec.ts';
import { CAUTIONS } from './cautions.ts';
import { termLine, termsUsedIn } from './glossary.ts';
import { materialNotes } from './material-notes.ts';
import { superscriptUnits } from './superscript-units.ts';
import { markdownText } from './safe-text/markdown-text.ts';
import type { NormalizedDoc } from './schema.ts';
import { sizingSections, valveKindText, type Section } from './format-sizing.ts';
import { STANDARD_GRAVITY } from '../sizing/constants.ts';
import { OVERHANG_DEG, standSpecOf } from '../sizing/parts/stand-spec.ts';
import type { DirectSizing, LeverSizing, SizingSuccess } from '../sizing/result.ts';

/** Layer height suggested for every part but the nozzle, mm (common practice for a 0.4 mm nozzle). */
export const LAYER_HEIGHT_MM = 0.2;
/** Finer layers for the nozzle's barb and lip, mm (common practice). */
export const NOZZLE_LAYER_HEIGHT_MM = 0.12;

/** The dry float may weigh this share more or less than modelled and pass (common practice: a few per cent of slicer and filament spread). */
export const DRY_MASS_TOLERANCE = 0.05;
/** A float that gains more than this in a day's soak leaks: reject it, g (DESIGN second part). */
export const SOAK_GAIN_LIMIT_G = 0.5;
/** An inline strainer's openings at most this share of the bore (common practice: one grain on the land holds the valve open). */
export const STRAINER_SHARE_OF_BORE = 1 / 3;

/** Optional details of the files written with the sheet. */
export interface BuildSheetFiles {
  /** file names per part, e.g. { housing: "rooftop-tubs-housing.stl" } */
  stl?: Partial<Record<string, string>>;
  plate3mf?: string;
  /** whether the pad's cutting template was written */
  withPad?: boolean;
  /** whether the seal test stand's two parts were written */
  withTestStand?: boolean;
}

interface Table {
  title: string;
  head: string[];
  rows: string[][];
}

interface Sheet {
  title: string;
  intro: string[];
  figures: Section[];
  boundBy: string[];
  warnings: string[];
  bom: Table;
  print: Table;
  /** said before anything else in the print settings */
  printFirst: string;
  printNotes: string[];
  steps: string[];
  /** the seal test with the stand: empty without it */
  standSteps: string[];
  cautions: { title: string; text: string }[];
  /** the glossary words the sheet uses, each with its explanation */
  words: string[];
}

/** Every string inside a value (object keys left out). */
const textsOf = (v: unknown): string[] =>
  typeof v === 'string' ? [v] : Array.isArray(v) ? v.flatMap(textsOf) : v && typeof v === 'object' ? Object.values(v).flatMap(textsOf) : [];

const f1 = (x: number) => (Math.round(x * 10) / 10).toFixed(1);
const f2 = (x: number) => (Math.round(x * 100) / 100).toFixed(2);

function materialName(doc: NormalizedDoc): string {
  return typeof doc.print.material === 'string' ? doc.print.material : doc.print.material.name;
}

/** Lines of width w to fill t, and whether t is a whole number of lines (DESIGN: warn otherwise). */
function lines(thicknessMm: number, lineMm: number): { count: number; whole: boolean } {
  const exact = thicknessMm / lineMm;
  return { count: Math.ceil(exact - 1e-6), whole: Math.abs(exact - Math.round(exact)) < 1e-6 };
}

/** The parts of the sheet that depend on the valve's kind: bill of materials, print settings, assembly. */
interface OwnSheet {
  bom: Table;
  print: Table;
  printFirst: string;
  printNotes: string[];
  steps: string[];
}

function sheetContent(s: SizingSuccess, doc: NormalizedDoc, files: BuildSheetFiles = {}): Sheet {
  const own = s.architecture === 'direct' ? directSheet(s, doc, files) : leverSheet(s, doc, files);
  const inp = s.inputs;
  const material = materialName(doc);
  const name = doc.name ?? 'Float valve';
  if (files.withTestStand) {
    const st = standSpecOf(s);
    const stl = (part: string) => files.stl?.[part] ?? `${part}.stl`;
    const wall = lines(inp.wallM * 1e3, inp.lineWidthM * 1e3);
    own.print.rows.push(
      ['Test stand base', 'foot down, as it stands', `${wall.count} lines`, '100 %', `${LAYER_HEIGHT_MM} mm`, `none: the roof under the deck and the tube exit's top rise at ${OVERHANG_DEG} degrees`],
      ['Test stand plunger', 'cup rim down', `${wall.count} lines`, '100 % (the printed mass assumes solid plastic)', `${LAYER_HEIGHT_MM} mm`, `none: the cup is a ${OVERHANG_DEG}-degree cone`],
    );
    own.bom.rows.push(
      ['Test stand base (printed)', '1', `${material}, ${f1(st.base.massG)} g, file ${stl('stand-base')}`],
      ['Test stand plunger (printed)', '1', `${material}, ${f1(st.plunger.plasticMassG)} g, file ${stl('stand-plunger')}; with the pad ${f1(st.plunger.massG)} g, printed on it as "${st.plunger.label.text}"`],
      ['Second seal pad and nozzle insert', '1 each', 'for the plunger and the stand, or move the valve\'s own'],
      ['Kitchen scale', '1', 'reads to 1 g or better'],
    );
  }
  if (files.plate3mf) own.printNotes.push(`${files.plate3mf} holds every part laid out on one plate, already in print orientation.`);
  const standSteps = files.withTestStand ? standTestSteps(s) : [];
  const sheet: Sheet = {
    title: `${name}: build sheet`,
    intro: [
      `Tank full ${doc.supply.headMax} and tank low ${doc.supply.headMin} (heads above the nozzle), water depth to hold ${doc.level.target}, printed in ${material}.`,
      `This is a ${valveKindText(s)}. ${s.choice.reason}`,
      ...(doc.notes ? [doc.notes] : []),
    ],
    figures: sizingSections(s),
    boundBy: s.boundBy.map((code) => ruleText(code, s.architecture, s.mount)),
    warnings: s.warnings.map((w) => w.message),
    ...own,
    standSteps,
    cautions: CAUTIONS.map((c) => ({ title: c.title, text: c.text })),
    words: [],
  };
  sheet.words = termsUsedIn(textsOf(sheet).join('\n')).map(termLine);
  return sheet;
}

/** The direct valve's bill of materials, print settings and assembly. */
function directSheet(s: DirectSizing, doc: NormalizedDoc, files: BuildSheetFiles): OwnSheet {
  const P = s.parts;
  const inp = s.inputs;
  const material = materialName(doc);
  const lineMm = inp.lineWidthM * 1e3;
  const wall = lines(P.housing.wallMm, lineMm);
  const shell = lines(P.float.shellMm, lineMm);
  const shellLayers = Math.ceil(P.float.shellMm / LAYER_HEIGHT_MM - 1e-6);
  const name = doc.name ?? 'Float valve';
  const stl = (part: string) => files.stl?.[part] ?? `${part}.stl`;
  const ah = P.housing.foot.anchorHoles;

  const bom: Table = {
    title: 'Bill of materials (one valve)',
    head: ['item', 'quantity', 'details'],
    rows: [
      ['Housing (printed)', '1', `${material}, ${f1(s.mass.byPart.housing)} g, file ${stl('housing')}`],
      ['Float (printed)', '1', `${material}, ${f1(s.mass.byPart.float)} g, file ${stl('float')}`],
      ['Nozzle insert (printed)', '1', `${material}, ${f2(s.mass.byPart.nozzle)} g, file ${stl('nozzle')}`],
      ['Retainer pin (printed)', '1', `${material}, ${f2(s.mass.byPart.pin)} g, file ${stl('pin')}`],
      [
        'Seal pad',
        '1',
        `disc ${f1(P.float.padDiameterMm)} mm across, ${f1(P.float.padThicknessMm)} mm thick, cut from ${s.seal.padDescription}` +
          (files.withPad ? ` (${stl('pad')} is a cutting template: print it in any filament, lay it on the sheet and cut round it)` : '') +
          `; ${f2(s.mass.byPart.pad)} g, counted in the float's mass`,
      ],
      ['Feed tube', `${doc.supply.tubeLength}`, `inside width ${doc.supply.tubeInnerDiameter}, pushed over the barb`],
      [
        'Inline strainer',
        '1',
        `in the feed tube before the valve, openings finer than ${f2(P.nozzle.orificeMm * STRAINER_SHARE_OF_BORE)} mm (a third of the ${f1(P.nozzle.orificeMm)} mm nozzle hole): one grain caught on the nozzle lip holds the valve open`,
      ],
      [
        'Hold-down',
        s.holdDown.neededN > 0 ? '1 set' : 'none needed',
        s.holdDown.neededN > 0
          ? `${f1(s.holdDown.ballastSteelG)} g of steel on the foot, or ${ah.count} pins or M3 screws through the ${f1(ah.diameterMm)} mm anchor holes into the container floor`
          : `the housing outweighs the flooded float's uplift; the ${ah.count} anchor holes are there if you want them`,
      ],
    ],
  };

  const print: Table = {
    title: 'Print settings',
    head: ['part', 'on the bed', 'walls', 'infill', 'layer height', 'supports'],
    rows: [
      [
        'Housing',
        'deck down, foot up',
        `${wall.count} lines (${f2(P.housing.wallMm)} mm wall at ${f2(lineMm)} mm)`,
        '100 %',
        `${LAYER_HEIGHT_MM} mm`,
        `none: the foot flares at ${FOOT_FLARE_DEG} degrees, pin holes are teardrops with a ${PIN_HOLE_ROOF_DEG}-degree roof, anchor holes point out of the flare, drain notches and the guide's air slots open at the print's top`,
      ],
      [
        'Float',
        'flat bottom down',
        `${shell.count} lines; ${shellLayers} top and bottom layers`,
        'any: the shell is modelled solid and the cavity hollow, so the mass does not depend on infill',
        `${LAYER_HEIGHT_MM} mm`,
        P.float.cavityRoofRadiusMm > 0
          ? `none: the cavity roof is a 50-degree cone with a ${f1(2 * P.float.cavityRoofRadiusMm)} mm bridge at the top`
          : 'none: the cavity roof is a 50-degree cone that closes to a point, so there is no bridge inside, whatever the perimeter count',
      ],
      [
        'Nozzle insert',
        'sealing face down (tip down)',
        '3 lines or more',
        '100 %',
        `${NOZZLE_LAYER_HEIGHT_MM} mm`,
        'none; no brim or raft on the sealing face: the first layer is the seal',
      ],
      ['Retainer pin', 'flat side down', '3 lines', '100 %', `${LAYER_HEIGHT_MM} mm`, 'none'],
      ...(files.withPad ? [['Pad cutting template (optional, any filament)', 'flat', '2 lines', '100 %', `${LAYER_HEIGHT_MM} mm`, 'none']] : []),
    ],
  };
  const printFirst =
    'Supports: off. The float is sealed: any support the slicer put inside it could never come out and would weigh the float down ' +
    `for good. Nothing needs it: every overhang of every part is ${OVERHANG_MIN_DEG} degrees or steeper from the bed (the foot ${FOOT_FLARE_DEG})` +
    (P.float.cavityRoofRadiusMm > 0
      ? `, and the one bridge, ${f1(2 * P.float.cavityRoofRadiusMm)} mm under the float's pad, prints without.`
      : ', and the float\'s sealed cavity closes to a point: no bridge inside it.');
  const printNotes = [
    `Material: ${material} (${f2(inp.materialDensityKgM3 / 1000)} g/cm3). The masses assume solid plastic.`,
    `Every fit has the same clearance, ${f2(P.printClearanceMm)} mm per side; the nozzle's crush ribs take up the printer's spread in the seat.`,
    ...materialNotes(material).map((n) => `${n.title}. ${n.text} Basis: ${n.basis}`),
  ];
  if (!wall.whole) {
    printNotes.push(
      `The housing wall (${f2(P.housing.wallMm)} mm) is not a whole number of ${f2(lineMm)} mm lines: the slicer will leave a gap or a thin fill line; a wall of ${f2(Math.round(P.housing.wallMm / lineMm) * lineMm)} mm would print cleaner.`,
    );
  }
  if (!shell.whole) printNotes.push(`The float shell (${f2(P.float.shellMm)} mm) is not a whole number of lines; check the slicer fills it solid.`);

  const steps = [
    'Rinse every part. Look at the nozzle\'s sealing face: it must be flat and clean, with no strings or blobs; clear the nozzle hole with a needle or a ' +
      `${f1(P.nozzle.orificeMm)} mm drill turned by hand.`,
    `Push the nozzle insert into the seat from inside the housing, barb first, until its shoulder sits against the boss under the deck. The sealing face then stands ${f1(P.mount.nozzleTipZMm)} mm above the base.`,
    `Put the seal pad in the float's pocket (${f1(2 * P.float.pocketRadiusMm)} mm across, ${f1(P.float.pocketDepthMm)} mm deep); it should stand ${f1(P.float.padProudMm)} mm proud. A drop of flexible glue keeps it there.`,
    `Test the float before it goes in. Weigh it dry, without the pad: it should weigh ${f1(s.float.dryMassG)} g, within ${f1(DRY_MASS_TOLERANCE * 100)} % ` +
      `(${f1(s.float.dryMassG * (1 - DRY_MASS_TOLERANCE))} to ${f1(s.float.dryMassG * (1 + DRY_MASS_TOLERANCE))} g). Hold it fully under water for a day, ` +
      `dry the outside and weigh it again: reject it if it gained more than ${f1(SOAK_GAIN_LIMIT_G)} g. ` +
      `(It can take in ${f1(s.float.leakToleranceMl)} mL before it no longer shuts with the tank full; by then the shut-tight level has risen about ${f1(s.float.leakToleranceMl * s.float.levelRisePerMlMm)} mm.)`,
    'Slide the float into the housing from below, flat bottom down, pad up, until its top collar slides into the sleeve under the deck (it should move freely there: the sleeve guides it and stops it).',
    `Slide the retainer pin through the two holes near the base, flat side down, head outside. The float now rests on it, ${f1(P.mount.pinTopZMm)} mm above the base, and cannot fall out.`,
    'Push the feed tube over the barb on the deck.',
    s.holdDown.neededN > 0
      ? `Stand the housing on the container floor and hold it down: ${f1(s.holdDown.ballastSteelG)} g of steel on the foot, or pins or screws through the anchor holes.`
      : 'Stand the housing on the container floor (anchor it if you like).',
    `Open the supply. The throttle band starts at ${f1(s.levels.throttleStartMm)} mm: there the valve starts to close, and it closes gradually: while the plants drink ${f1(s.inputs.demandLpd)} L a day the level holds near ${f1(s.levels.heldAtDemandMm)} mm with the tank full (${f1(s.levels.heldAtDemandLowTankMm)} mm when it runs low). With no one drinking it shuts tight at ${f1(s.levels.shutOffAtHeadMaxMm)} mm (${f1(s.levels.shutOffAtHeadMinMm)} mm with the tank low), the highest it rises. Check for drips at the nozzle with the tank full.`,
  ];

  return { bom, print, printFirst, printNotes, steps };
}

/** M3 screws of the rim mount: two hold the stem to the hanger, two the frame to the stem, one clamps the wall (rim-mount-spec.ts). */
const RIM_SCREWS = 5;

/** The lever valve's bill of materials, print settings and assembly (with the rim mount's when it hangs). */
function leverSheet(s: LeverSizing, doc: NormalizedDoc, files: BuildSheetFiles): OwnSheet {
  const P = s.parts;
  const inp = s.inputs;
  const material = materialName(doc);
  const lineMm = inp.lineWidthM * 1e3;
  const wall = lines(P.frame.wallMm, lineMm);
  const shell = lines(P.float.shellMm, lineMm);
  const shellLayers = Math.ceil(P.float.shellMm / LAYER_HEIGHT_MM - 1e-6);
  const stl = (part: string) => files.stl?.[part] ?? `${part}.stl`;
  const b = s.mass.byPart;
  const rim = P.rim;
  const lv = s.lever;
  const bom: Table = {
    title: 'Bill of materials (one valve)',
    head: ['item', 'quantity', 'details'],
    rows: [
      ['Frame (printed)', '1', `${material}, ${f1(b.frame)} g, file ${stl('frame')}`],
      ['Arm (printed)', '1', `${material}, ${f1(b.arm)} g, file ${stl('arm')}`],
      ['Float (printed)', '1', `${material}, ${f1(b.float)} g, file ${stl('float')}`],
      ['Nozzle insert (printed)', '1', `${material}, ${f2(b.nozzle)} g, file ${stl('nozzle')}`],
      ['Pivot pin (printed)', '1', `${material}, ${f2(b.pin)} g, file ${stl('pin')}`],
      ...(rim
        ? [
            ['Rim hanger (printed)', '1', `${material}, ${f1(b.hanger)} g, file ${stl('hanger')}`],
            ['Slotted stem (printed)', '1', `${material}, ${f1(b.stem)} g, file ${stl('stem')}`],
            ['M3 screws, 12 to 16 mm', `${RIM_SCREWS}`, 'two hold the stem to the hanger through its slot, two hold the frame to the stem, one through the hanger\'s outer leg clamps the wall; they cut their own thread in the pilot holes'],
          ]
        : []),
      [
        'Seal pad',
        '1',
        `disc ${f1(P.pad.diameterMm)} mm across, ${f1(P.pad.thicknessMm)} mm thick, cut from ${s.seal.padDescription}; ${f2(b.pad)} g`,
      ],
      ['Waterproof glue', 'a drop', "holds the float on the arm's tongue (two-part epoxy or a glue made for your plastic)"],
      ['Feed tube', `${doc.supply.tubeLength}`, `inside width ${doc.supply.tubeInnerDiameter}, pushed over the barb`],
      [
        'Inline strainer',
        '1',
        `in the feed tube before the valve, openings finer than ${f2(P.nozzle.orificeMm * STRAINER_SHARE_OF_BORE)} mm (a third of the ${f1(P.nozzle.orificeMm)} mm nozzle hole): one grain caught on the nozzle lip holds the valve open`,
      ],
      ...(rim
        ? []
        : [[
            'Hold-down',
            s.holdDown.anchorForceN > 0 ? '1 set' : 'none needed',
            s.holdDown.anchorForceN > 0
              ? `${f1(s.holdDown.ballastSteelG)} g of steel on the anchor wings, or ${anchorSlots(P.frame)} pins or M3 screws through the ${f1(P.frame.anchorDiameterMm)} mm anchor slots into the container floor`
              : "the valve outweighs the flooded float's lift; the anchor slots are there if you want them",
          ]]),
    ],
  };
  const print: Table = {
    title: 'Print settings',
    head: ['part', 'on the bed', 'walls', 'infill', 'layer height', 'supports'],
    rows: [
      ['Frame', 'deck down', `${wall.count} lines (${f2(P.frame.wallMm)} mm wall at ${f2(lineMm)} mm)`, '100 %', `${LAYER_HEIGHT_MM} mm`, `none: the pin holes are teardrops with a ${P.frame.holeRoofAngleDeg}-degree roof and the anchor wings stand on ${OVERHANG_MIN_DEG}-degree wedges`],
      ['Arm', 'top face down (the pad pocket on the bed side)', `${wall.count} lines`, '100 %', `${LAYER_HEIGHT_MM} mm`, "none: the pocket's floor is the one short bridge; the pin hole is a teardrop"],
      [
        'Float',
        'flat bottom down',
        `${shell.count} lines; ${shellLayers} top and bottom layers`,
        'any: the shell is modelled solid and the cavity hollow, so the mass does not depend on infill',
        `${LAYER_HEIGHT_MM} mm`,
        'none: the cavity roof is a 50-degree cone that closes to a point inside the collar, so there is no bridge inside, whatever the perimeter count',
      ],
      ['Nozzle insert', 'sealing face down (tip down)', '3 lines or more', '100 %', `${NOZZLE_LAYER_HEIGHT_MM} mm`, 'none; no brim or raft on the sealing face: the first layer is the seal'],
      ['Pivot pin', 'flat side down', '3 lines', '100 %', `${LAYER_HEIGHT_MM} mm`, 'none'],
      ...(rim
        ? [
            ['Rim hanger', 'on its side', `${wall.count} lines`, '100 %', `${LAYER_HEIGHT_MM} mm`, 'none: its screw holes are teardrops'],
            ['Slotted stem', 'flat', `${wall.count} lines`, '100 %', `${LAYER_HEIGHT_MM} mm`, 'none'],
          ]
        : []),
      ...(files.withPad ? [['Pad cutting template (optional, any filament)', 'flat', '2 lines', '100 %', `${LAYER_HEIGHT_MM} mm`, 'none']] : []),
    ],
  };
  const printFirst =
    'Supports: off. The float is sealed: any support the slicer put inside it could never come out and would weigh the float down ' +
    `for good. Nothing needs it: every overhang of every part is ${OVERHANG_MIN_DEG} degrees or steeper from the bed, and the float's sealed cavity closes to a point: no bridge inside it.`;
  const printNotes = [
    `Material: ${material} (${f2(inp.materialDensityKgM3 / 1000)} g/cm3). The masses assume solid plastic.`,
    `Every fit has the same clearance, ${f2(P.printClearanceMm)} mm per side; the nozzle's crush ribs take up the printer's spread in the seat.`,
    ...materialNotes(material).map((n) => `${n.title}. ${n.text} Basis: ${n.basis}`),
  ];
  if (!wall.whole) printNotes.push(`The wall (${f2(P.frame.wallMm)} mm) is not a whole number of ${f2(lineMm)} mm lines: the slicer will leave a gap or a thin fill line.`);
  if (!shell.whole) printNotes.push(`The float shell (${f2(P.float.shellMm)} mm) is not a whole number of lines; check the slicer fills it solid.`);
  const rimSteps = rim
    ? [
        `Screw the slotted stem to the frame's back wall: two M3 screws through the holes at the stem's foot into the pilot holes in the wall.`,
        `Hang the hanger over the container's wall (it is made for a ${f1(s.rim!.wallThicknessMm)} mm wall) and screw the clamp screw through its outer leg until it just bites the wall.`,
        `Set the level with the slot: put the two upper screws through the slot into the hanger's pilot holes with the stem at the middle of the slot, and tighten. The valve then holds the target, ${doc.level.target}. To trim it after a first fill, loosen the two screws, slide the stem up or down (up to ${f1(rim.adjustMm)} mm either way from the middle; every millimetre the valve moves, the level moves the same) and tighten again.`,
      ]
    : [
        s.holdDown.anchorForceN > 0
          ? `Stand the frame on the container floor and hold it down: ${f1(s.holdDown.ballastSteelG)} g of steel on the anchor wings, or pins or screws through the ${anchorSlotsInWords(P.frame)} anchor slots.`
          : 'Stand the frame on the container floor (anchor it through the slots in its wings if you like).',
      ];
  const steps = [
    'Rinse every part. Look at the nozzle\'s sealing face: it must be flat and clean, with no strings or blobs; clear the nozzle hole with a needle or a ' +
      `${f1(P.nozzle.orificeMm)} mm drill turned by hand.`,
    `Push the nozzle insert into the seat in the frame's deck from below, barb first, until its shoulder sits against the boss under the deck. The sealing face then points down, ${f1(P.mount.nozzleTipZMm)} mm above the container floor${rim ? ' with the stem at the middle of its slot' : ''}.`,
    `Put the seal pad in the arm's pocket (${f1(P.arm.pocketDiameterMm)} mm across, ${f1(P.arm.pocketDepthMm)} mm deep); it should stand ${f1(P.pad.proudMm)} mm proud. A drop of flexible glue keeps it there.`,
    `Test the float before it goes on. Weigh it dry: it should weigh ${f1(s.float.dryMassG)} g, within ${f1(DRY_MASS_TOLERANCE * 100)} % ` +
      `(${f1(s.float.dryMassG * (1 - DRY_MASS_TOLERANCE))} to ${f1(s.float.dryMassG * (1 + DRY_MASS_TOLERANCE))} g). Hold it fully under water for a day, ` +
      `dry the outside and weigh it again: reject it if it gained more than ${f1(SOAK_GAIN_LIMIT_G)} g. ` +
      `(It can take in ${f1(s.float.leakToleranceMl)} mL before it no longer shuts with the tank full; every mL raises the shut-tight level by ${f2(s.float.levelRisePerMlMm)} mm.)`,
    `Glue the float to the arm: the round tongue under the arm's tip goes into the socket in the float's top, and the arm's underside rests on the float's collar. Let the glue set with the arm level.`,
    `Set the arm between the frame's cheeks, pad up under the nozzle, and push the pivot pin through the cheeks and the arm's eye, flat side down, head outside. The arm must swing freely; it rests on its stop with the pad ${f1(lv.restTravelMm)} mm below the nozzle lip.`,
    ...rimSteps,
    'Push the feed tube over the barb on the deck.',
    `Open the supply. The throttle band starts at ${f1(s.levels.throttleStartMm)} mm: there the valve starts to close, and it closes gradually: while the plants drink ${f1(s.inputs.demandLpd)} L a day the level holds near ${f1(s.levels.heldAtDemandMm)} mm with the tank full (${f1(s.levels.heldAtDemandLowTankMm)} mm when it runs low). With no one drinking it shuts tight at ${f1(s.levels.shutOffAtHeadMaxMm)} mm (${f1(s.levels.shutOffAtHeadMinMm)} mm with the tank low), the highest it rises; the pivot's friction lets it reopen up to ${f1(lv.hysteresisMm)} mm lower. Check for drips at the nozzle with the tank full.`,
  ];
  return { bom, print, printFirst, printNotes, steps };
}

/**
 * The seal test with the stand: one (head, mass) point per head, two heads or
 * more for the line F = F_seat + A rho g H that `seal.calibration` fits
 * (generator/sizing/hydrostatics/fit-seal-calibration.ts).
 */
function standTestSteps(s: SizingSuccess): string[] {
  const st = standSpecOf(s);
  const g = STANDARD_GRAVITY;
  const atMax = (s.closingForce.atHeadMaxN * 1000) / g;
  const atMin = (s.closingForce.atHeadMinN * 1000) / g;
  const steps = [
    `Push a nozzle insert into the stand's seat from above, barb first, until its shoulder sits on the deck: the nozzle lip points up, as in the housing's seat turned over. Push the feed tube over the barb from below and lead it out through the opening at the foot.`,
    `Put a pad in the plunger's pocket (${f1(2 * st.plunger.pocketRadiusMm)} mm across, ${f1(st.plunger.pocketDepthMm)} mm deep), with a drop of flexible glue: it faces down in use. The plunger weighs ${f1(st.plunger.massG)} g with its pad; the figure is printed on its pad face.`,
    'Set the tank so its water surface stands at a known height above the nozzle lip (the head); measure it with a tape from the lip to the surface. Open the supply: water runs out of the nozzle and away through the slots and the foot.',
    `Lower the plunger into the guide so the pad rests on the lip. Pour water into its cup a little at a time until the drip stops and stays stopped for a minute. The cup holds ${f1(st.plunger.cupCapacityMl)} mL` +
      (st.cupCapped ? ': at high heads that may not be enough; stand a small jar on the cup for more.' : '.'),
    `Lift the plunger out with its cup and water and weigh them together: that mass, with the head, is one point. The plunger's own mass is part of it.`,
    'Repeat at a second head, as far from the first as the tank allows (two heads or more: the points give both the pad\'s seating force and the area the pressure acts on; one head gives only their sum).',
    `Enter the points as bench points in the workbench, or in the design file as "calibration" inside "seal", for example [{ "head": "0.8 m", "mass": "35 g" }, { "head": "1.6 m", "mass": "60 g" }], then size again. The model now expects about ${f1(atMin)} g with the tank low and ${f1(atMax)} g with it full.`,
  ];
  if (st.plunger.massG >= atMin) {
    steps.push(
      `The plunger alone (${f1(st.plunger.massG)} g) already outweighs the ${f1(atMin)} g the model expects with the tank low: test at heads where the drip still runs with the plunger resting on the lip.`,
    );
  }
  return steps;
}

/** Every text in the Markdown sheet, ours or the grower's (name, notes, material): one line, Markdown characters escaped, powers of units raised. */
const mdCell = (text: string) => markdownText(superscriptUnits(text));

function mdTable(head: string[], rows: string[][]): string[] {
  return [`| ${head.map(mdCell).join(' | ')} |`, `| ${head.map(() => '---').join(' | ')} |`, ...rows.map((r) => `| ${r.map(mdCell).join(' | ')} |`)];
}

/** The build sheet as Markdown. */
export function buildSheetMarkdown(sizing: SizingSuccess, document: NormalizedDoc, files?: BuildSheetFiles): string {
  const c = sheetContent(sizing, document, files);
  const m = mdCell;
  const out: string[] = [`# ${m(c.title)}`, '', ...c.intro.flatMap((p) => [m(p), '']), '## Cautions', ''];
  out.push(...c.cautions.map((x) => `- **${m(x.title)}.** ${m(x.text)}`), '', '## Sizing', '');
  for (const section of c.figures) {
    out.push(`### ${m(section.title)}`, '', ...mdTable(['quantity', 'value', 'unit'], section.rows.map((r) => [r.label, r.value, r.unit])), '');
  }
  out.push('What set the size:', '', ...c.boundBy.map((b) => `- ${m(b)}`), '');
  out.push('Warnings:', '', ...(c.warnings.length ? c.warnings.map((w) => `- ${m(w)}`) : ['- none']), '');
  out.push(`## ${m(c.bom.title)}`, '', ...mdTable(c.bom.head, c.bom.rows), '');
  out.push(`## ${m(c.print.title)}`, '', `**${m(c.printFirst)}**`, '', ...mdTable(c.print.head, c.print.rows), '', ...c.printNotes.map((n) => `- ${m(n)}`), '');
  out.push('## Assembly', '', ...c.steps.map((step, i) => `${i + 1}. ${m(step)}`), '');
  if (c.standSteps.length) out.push('## Seal test with the stand', '', ...c.standSteps.map((step, i) => `${i + 1}. ${m(step)}`), '');
  out.push('## Words on this sheet', '', ...c.words.map((w) => `- ${m(w)}`), '');
  return out.join('\n');
}

const esc = (text: string) =>
  superscriptUnits(text).replace(/[&<>"']/g, (ch) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[ch] as string);

function htmlTable(head: string[], rows: string[][], caption?: string): string {
  return [
    '<table>',
    caption ? `<caption>${esc(caption)}</caption>` : '',
    `<thead><tr>${head.map((h) => `<th>${esc(h)}</th>`).join('')}</tr></thead>`,
    `<tbody>${rows.map((r) => `<tr>${r.map((cell) => `<td>${esc(cell)}</td>`).join('')}</tr>`).join('')}</tbody>`,
    '</table>',
  ].join('');
}

/** The build sheet as a self-contained printable HTML page. */
export function buildSheetHtml(sizing: SizingSuccess, document: NormalizedDoc, files?: BuildSheetFiles): string {
  const c = sheetContent(sizing, document, files);
  const style = [
    'body{font:14px/1.45 system-ui,sans-serif;max-width:60rem;margin:1.5rem auto;padding:0 1rem;color:#111}',
    'table{border-collapse:collapse;margin:.5rem 0 1rem;width:100%}',
    'th,td{border:1px solid #999;padding:.2rem .45rem;text-align:left;vertical-align:top}',
    'caption{text-align:left;font-weight:600;padding:.3rem 0}',
    '.cautions{border:2px solid #000;padding:.4rem 1rem;margin:1rem 0}',
    '.figures{columns:2;column-gap:1.5rem}.figures table{break-inside:avoid}',
    '@media print{body{margin:0;max-width:none;font-size:11px}.figures{columns:2}h2{break-after:avoid}}',
  ].join('');
  const body = [
    `<h1>${esc(c.title)}</h1>`,
    ...c.intro.map((p) => `<p>${esc(p)}</p>`),
    '<section class="cautions"><h2>Cautions</h2><ul>',
    ...c.cautions.map((x) => `<li><strong>${esc(x.title)}.</strong> ${esc(x.text)}</li>`),
    '</ul></section>',
    '<h2>Sizing</h2><div class="figures">',
    ...c.figures.map((s) => htmlTable(['quantity', 'value', 'unit'], s.rows.map((r) => [r.label, r.value, r.unit]), s.title)),
    '</div>',
    `<p><strong>What set the size:</strong></p><ul>${c.boundBy.map((b) => `<li>${esc(b)}</li>`).join('')}</ul>`,
    `<p><strong>Warnings:</strong></p><ul>${(c.warnings.length ? c.warnings : ['none']).map((w) => `<li>${esc(w)}</li>`).join('')}</ul>`,
    `<h2>${esc(c.bom.title)}</h2>`,
    htmlTable(c.bom.head, c.bom.rows),
    `<h2>${esc(c.print.title)}</h2>`,
    `<p><strong>${esc(c.printFirst)}</strong></p>`,
    htmlTable(c.print.head, c.print.rows),
    `<ul>${c.printNotes.map((n) => `<li>${esc(n)}</li>`).join('')}</ul>`,
    '<h2>Assembly</h2><ol>',
    ...c.steps.map((step) => `<li>${esc(step)}</li>`),
    '</ol>',
    ...(c.standSteps.length ? ['<h2>Seal test with the stand</h2><ol>', ...c.standSteps.map((step) => `<li>${esc(step)}</li>`), '</ol>'] : []),
    '<h2>Words on this sheet</h2><ul>',
    ...c.words.map((w) => `<li>${esc(w)}</li>`),
    '</ul>',
  ].join('\n');
  return `<!doctype html>\n<html lang="en">\n<head>\n<meta charset="utf-8">\n<title>${esc(c.title)}</title>\n<style>${style}</style>\n</head>\n<body>\n${body}\n</body>\n</html>\n`;
}
