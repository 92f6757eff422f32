/**
 * A sizing result as plain text: sections of label / value / unit rows,
 * aligned for a terminal. The build sheet and the plan report reuse the rows.
 */
import { ruleText } from '../sizing/rule-text.ts';
import { superscriptUnits } from './superscript-units.ts';
import { cautionLines } from './cautions.ts';
import type { FieldError } from './fields.ts';
import type { DirectSizing, LeverSizing, SizingFailure, SizingSuccess, Warning } from '../sizing/result.ts';

export interface Row {
  label: string;
  /** already formatted */
  value: string;
  unit: string;
}

export interface Section {
  title: string;
  rows: Row[];
}

/** Fixed decimals, with "-" for a missing or non-finite value. */
export function fixed(value: number | null | undefined, decimals: number): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '-';
  const text = value.toFixed(decimals);
  return text === `-${(0).toFixed(decimals)}` ? (0).toFixed(decimals) : text;
}

const row = (label: string, value: string, unit = ''): Row => ({ label, value, unit });

/** The valve's kind and mount in words, e.g. "lever valve, hung from the rim". */
export function valveKindText(result: SizingSuccess): string {
  const kind = result.architecture === 'lever' ? 'lever valve (the float on an arm)' : 'direct valve (the float under the pad)';
  return `${kind}, ${result.mount === 'rim' ? "hung from the container's rim" : 'standing on the container floor'}`;
}

/** The result as titled sections of rows (the valve chosen, closing force, float, the valve's own parts, levels, the level held in use, flow, hold-down, mass). */
export function sizingSections(result: SizingSuccess): Section[] {
  const { closingForce: cf, pressure, float: fl, seal, levels, flow, mass, nozzle } = result;
  const headMaxM = result.inputs.headMaxM;
  const headMinM = result.inputs.headMinM;
  const percent = (strain: number) => fixed(strain * 100, 0);
  const fill = (minutes: number | null) => (minutes === null ? [] : [minutes]);
  const lever = result.architecture === 'lever';
  const own = lever ? leverSections(result) : directSections(result);
  return [
    {
      title: `Valve: ${valveKindText(result)}`,
      rows: [row('widest, seen from above (limit)', `${fixed(result.footprintMm, 1)} (${fixed(result.inputs.maxOuterDiameterM * 1e3, 0)})`, 'mm')],
    },
    {
      title: lever ? 'Push needed to shut tight (at the seal pad)' : 'Push needed to shut tight (float on the seal pad)',
      rows: [
        row(`tank full, ${fixed(headMaxM, 2)} m of head (${fixed(pressure.atHeadMaxKPa, 1)} kPa)`, fixed(cf.atHeadMaxN, 3), 'N'),
        row(`tank low, ${fixed(headMinM, 2)} m of head (${fixed(pressure.atHeadMinKPa, 1)} kPa)`, fixed(cf.atHeadMinN, 3), 'N'),
        row(cf.fromCalibration ? 'seating push (fitted to your bench points)' : 'seating push (pad on the nozzle lip, no pressure)', fixed(cf.seatN, 3), 'N'),
        row(
          cf.fromCalibration ? 'area the water pushes on (fitted to your bench points)' : 'area the water pushes on (gasket-factor form)',
          `${fixed(cf.modelAreaMm2, 1)} (d ${fixed(cf.equivalentSealDiameterMm, 2)} mm)`,
          'mm2',
        ),
      ],
    },
    {
      title: 'Seal pad',
      rows: [
        row(`seal pad${seal.padChosen ? ' (chosen for this design)' : ''}`, seal.padMaterial),
        row('stiffness (compressive modulus)', fixed(seal.padStiffnessKpa, 0), 'kPa'),
        row('pad squeeze when shut, tank full / tank low', `${fixed(seal.indentationMm, 2)} (${percent(seal.strainAtSeal)} %) / ${fixed(seal.indentationAtHeadMinMm, 2)}`, 'mm'),
        row('a hard stop takes the push from a pad squeeze of', fixed(seal.stopIndentationMm, 2), 'mm'),
        row('most pad squeeze in use (empty tank, flooded)', percent(seal.worstStrain), '%'),
      ],
    },
    {
      title: 'Float',
      rows: [
        row('outer diameter', fixed(fl.outerDiameterMm, 1), 'mm'),
        row('height (straight side)', `${fixed(fl.heightMm, 1)} (${fixed(fl.cylinderHeightMm, 1)})`, 'mm'),
        row('displaced volume, fully submerged', fixed(fl.volumeMm3 / 1000, 1), 'cm3'),
        row(lever ? 'mass' : 'mass with pad', fixed(fl.massG, 1), 'g'),
        row(lever ? 'lift when fully submerged (the float alone)' : 'lift when fully submerged', fixed(fl.availableForceN, 3), 'N'),
        row(lever ? 'spare lift (push it gives at the pad / push needed at tank full)' : 'spare lift (lift / push needed at tank full)', fixed(fl.reserve, 2), 'x'),
        row('depth in the water when shut, tank full / tank low', `${fixed(fl.sealDepthAtHeadMaxMm, 1)} / ${fixed(fl.sealDepthAtHeadMinMm, 1)}`, 'mm'),
        row('shell', fixed(fl.shellMm, 2), 'mm'),
        row('water it can take in and still shut with the tank full', fixed(fl.leakToleranceMl, 1), 'mL'),
        row('rise of the shut-tight level per mL taken in', fixed(fl.levelRisePerMlMm, 2), 'mm'),
      ],
    },
    ...own.parts,
    {
      title: 'Levels (water depth above the container floor)',
      rows: [
        row('water depth to hold', fixed(levels.targetMm, 1), 'mm'),
        row('shut tight, tank full', fixed(levels.shutOffAtHeadMaxMm, 1), 'mm'),
        row('shut tight, tank low', fixed(levels.shutOffAtHeadMinMm, 1), 'mm'),
        row(lever ? 'float lifts off its rest (the arm down)' : 'float lifts off the retainer pin', fixed(levels.liftOffMm, 1), 'mm'),
        row('seal pad first touches the nozzle lip', fixed(levels.firstTouchMm, 1), 'mm'),
        row('shallowest water depth this float can hold', fixed(levels.minimumReachableMm, 1), 'mm'),
        ...(levels.overflowMm === null ? [] : [row('container overflow', fixed(levels.overflowMm, 1), 'mm')]),
      ],
    },
    {
      title: 'The level it holds in use (water depth; tank full / tank low)',
      rows: [
        row('throttle band starts (seal pad first touches the nozzle lip)', `${fixed(levels.throttleStartMm, 1)} / ${fixed(levels.lowTank.throttleStartMm, 1)}`, 'mm'),
        row('flow down to half', `${fixed(levels.flow50Mm, 1)} / ${fixed(levels.lowTank.flow50Mm, 1)}`, 'mm'),
        row('flow down to a tenth', `${fixed(levels.flow10Mm, 1)} / ${fixed(levels.lowTank.flow10Mm, 1)}`, 'mm'),
        row('flow down to a hundredth', `${fixed(levels.flow1Mm, 1)} / ${fixed(levels.lowTank.flow1Mm, 1)}`, 'mm'),
        row(`held while the plants drink ${fixed(result.inputs.demandLpd, 1)} L/day`, `${fixed(levels.heldAtDemandMm, 1)} / ${fixed(levels.heldAtDemandLowTankMm, 1)}`, 'mm'),
        row('shut tight (the highest it rises)', `${fixed(levels.shutOffAtHeadMaxMm, 1)} / ${fixed(levels.shutOffAtHeadMinMm, 1)}`, 'mm'),
        ...(result.fill.timeToHeldMin === null || result.fill.fromLevelMm === null || result.fill.toLevelMm === null
          ? []
          : [row(
              `time to fill the refill depth, ${fixed(result.fill.fromLevelMm, 1)} to ${fixed(result.fill.toLevelMm, 1)} mm, with the plants drinking and the flow at the slow end of its range`,
              fixed(result.fill.timeToHeldMin, 0),
              'min',
            )]),
      ],
    },
    {
      title: 'Flow with the valve wide open',
      rows: [
        row(`tank full (Re ${fixed(flow.reynoldsAtHeadMax, 0)}, ${flow.regimeAtHeadMax})`, fixed(flow.atHeadMaxLph, 1), 'L/h'),
        row('tank full, likely range (nozzle hole printed 0.2 mm small to as drawn)', `${fixed(flow.atHeadMaxLowLph, 1)} to ${fixed(flow.atHeadMaxHighLph, 1)}`, 'L/h'),
        row(
          `nozzle hole ${fixed(nozzle.orificeMm, 2)} mm across and ${fixed(flow.boreLengthMm, 1)} mm long, taken as`,
          flow.boreModel === 'short-tube' ? 'a short tube' : 'a sharp orifice',
        ),
        row(`tank low (Re ${fixed(flow.reynoldsAtHeadMin, 0)})`, fixed(flow.atHeadMinLph, 1), 'L/h'),
        ...fill(flow.fillTimeAtHeadMaxMin).map((m) => row('time to fill the refill depth if the valve stayed wide open and nothing drank, tank full', fixed(m, 1), 'min')),
        ...fill(flow.fillTimeAtHeadMinMin).map((m) => row('the same, tank low', fixed(m, 1), 'min')),
      ],
    },
    ...own.after,
    {
      title: 'Mass and filament',
      rows: [
        row(`total (${result.inputs.materialName})`, fixed(mass.totalG, 1), 'g'),
        row('filament (1.75 mm)', fixed(mass.filamentM, 1), 'm'),
        own.massRow,
        row(`seal pad (${seal.padMaterial}, not printed)`, fixed(mass.byPart.pad, 2), 'g'),
      ],
    },
  ];
}

/** The direct valve's own sections: housing, nozzle and pin (after the float), drain, hold-down and tilt (after the flow). */
function directSections(result: DirectSizing): { parts: Section[]; after: Section[]; massRow: Row } {
  const { housing, nozzle, pin, drain, vents, holdDown, tilt, seal, mass } = result;
  const halfIndentMm = seal.indentationMm / 2;
  return {
    parts: [
    {
      title: 'Housing',
      rows: [
        row('bore (inside, where the float moves)', fixed(housing.boreMm, 1), 'mm'),
        row('outer diameter (foot)', `${fixed(housing.outerDiameterMm, 1)} (${fixed(housing.footDiameterMm, 1)})`, 'mm'),
        row('height', fixed(housing.heightMm, 1), 'mm'),
        row('wall', fixed(housing.wallMm, 2), 'mm'),
        row('mass', fixed(housing.massG, 1), 'g'),
      ],
    },
    {
      title: 'Nozzle and pin',
      rows: [
        row('nozzle tip above the base', fixed(nozzle.tipHeightMm, 1), 'mm'),
        row("float's room to move (at least)", `${fixed(nozzle.travelMm, 2)} (${fixed(nozzle.minimumTravelMm, 2)})`, 'mm'),
        row('nozzle hole / nozzle lip, across', `${fixed(nozzle.orificeMm, 2)} / ${fixed(nozzle.sealDiameterMm, 2)}`, 'mm'),
        row('retainer pin top above the base', fixed(pin.topHeightMm, 1), 'mm'),
      ],
    },
    ],
    after: [
    {
      title: 'Drain slots and air vents',
      rows: [
        row('drain slot area needed (at the high end of the flow)', fixed(drain.requiredAreaMm2, 1), 'mm2'),
        row(`drain slot area provided (${drain.notchCount} slots)`, fixed(drain.providedAreaMm2, 1), 'mm2'),
        row(`air vents (${vents.count} x ${fixed(vents.diameterMm, 1)} mm)`, fixed(vents.areaMm2, 1), 'mm2'),
      ],
    },
    {
      title: 'Hold-down (container flooded)',
      rows: [
        row('float uplift', fixed(holdDown.upliftN, 3), 'N'),
        row('housing, nozzle and pin weight in water', fixed(holdDown.netWeightN, 3), 'N'),
        row('still needed (1.5 x uplift - weight)', fixed(holdDown.neededN, 3), 'N'),
        row('or steel ballast', fixed(holdDown.ballastSteelG, 0), 'g'),
      ],
    },
    {
      title: 'Tilt',
      rows: [
        row('largest float tilt in the housing', fixed(tilt.maxAngleDeg, 1), 'deg'),
        row(`gap at the nozzle lip when tilted (at most half the pad squeeze, ${fixed(halfIndentMm, 2)})`, fixed(tilt.lipGapMm, 2), 'mm'),
      ],
    },
    ],
    massRow: row('housing / float / nozzle / retainer pin', [mass.byPart.housing, mass.byPart.float, mass.byPart.nozzle, mass.byPart.pin].map((g) => fixed(g, 1)).join(' / '), 'g'),
  };
}

/** The lever valve's own sections: arm and frame, nozzle and pivot, the rim mount (after the float), hold-down and the pad's meeting with the lip (after the flow). */
function leverSections(result: LeverSizing): { parts: Section[]; after: Section[]; massRow: Row } {
  const { lever, rim, frame, nozzle, holdDown, seal, mass } = result;
  const halfIndentMm = seal.indentationMm / 2;
  const b = mass.byPart;
  return {
    parts: [
      {
        title: 'Arm and frame',
        rows: [
          row('ratio (float arm / pad arm)', `${fixed(lever.ratio, 2)} (${fixed(lever.floatArmMm, 1)} / ${fixed(lever.padArmMm, 1)} mm)`, 'x'),
          row("float's push when shut, tank full / tank low", `${fixed(lever.floatPushAtHeadMaxN, 3)} / ${fixed(lever.floatPushAtHeadMinN, 3)}`, 'N'),
          row('arm length (heel to tip)', fixed(lever.armLengthMm, 1), 'mm'),
          row('pivot above the container floor', fixed(lever.pivotHeightMm, 1), 'mm'),
          row('pivot friction band (reopens this much lower)', fixed(lever.hysteresisMm, 2), 'mm'),
          row('frame height / width', `${fixed(frame.heightMm, 1)} / ${fixed(frame.widthMm, 1)}`, 'mm'),
        ],
      },
      {
        title: 'Nozzle',
        rows: [
          row('nozzle tip above the container floor', fixed(nozzle.tipHeightMm, 1), 'mm'),
          row('seal pad drop with the arm at rest (at least)', `${fixed(nozzle.travelMm, 2)} (${fixed(nozzle.minimumTravelMm, 2)})`, 'mm'),
          row('nozzle hole / nozzle lip, across', `${fixed(nozzle.orificeMm, 2)} / ${fixed(nozzle.sealDiameterMm, 2)}`, 'mm'),
        ],
      },
      ...(rim
        ? [{
            title: 'Rim mount',
            rows: [
              row('rim above the floor / wall', `${fixed(rim.rimHeightMm, 1)} / ${fixed(rim.wallThicknessMm, 1)}`, 'mm'),
              row('level adjustment on the slotted stem', `±${fixed(rim.adjustMm, 0)}`, 'mm'),
              row('stem length', fixed(rim.stemLengthMm, 1), 'mm'),
            ],
          }]
        : []),
    ],
    after: [
      {
        title: 'Hold-down (container flooded)',
        rows: [
          row('uplift of the whole valve', fixed(holdDown.upliftN, 3), 'N'),
          row('moment tipping it about the foot\'s back edge', fixed(holdDown.tippingMomentNmm, 1), 'N mm'),
          row(result.mount === 'rim' ? "the hanger's clamp must hold" : 'the anchors must hold', fixed(holdDown.anchorForceN, 3), 'N'),
          ...(result.mount === 'floor' ? [row('or steel ballast on the anchor wings', fixed(holdDown.ballastSteelG, 0), 'g')] : []),
        ],
      },
      {
        title: 'Seal pad on the nozzle lip',
        rows: [
          row('seal pad tilt when it first touches the nozzle lip', fixed(lever.padTiltDeg, 2), 'deg'),
          row(`gap at the nozzle lip's far side then (at most half the pad squeeze, ${fixed(halfIndentMm, 2)})`, fixed(lever.lipGapMm, 2), 'mm'),
        ],
      },
    ],
    massRow: row(
      rim ? 'frame / arm / float / nozzle / pin / hanger / stem' : 'frame / arm / float / nozzle / pin',
      [b.frame, b.arm, b.float, b.nozzle, b.pin, ...(rim ? [b.hanger, b.stem] : [])].map((g) => fixed(g, 1)).join(' / '),
      'g',
    ),
  };
}

/** Sections as aligned text: a title line, then label, right-aligned value, unit. */
export function renderSections(sections: Section[]): string {
  const rows = sections.flatMap((s) => s.rows);
  const labelWidth = Math.max(0, ...rows.map((r) => r.label.length));
  const valueWidth = Math.max(0, ...rows.map((r) => r.value.length));
  const out: string[] = [];
  for (const s of sections) {
    out.push(s.title);
    for (const r of s.rows) out.push(`  ${r.label.padEnd(labelWidth)}  ${r.value.padStart(valueWidth)}${r.unit ? ` ${r.unit}` : ''}`.trimEnd());
    out.push('');
  }
  return out.join('\n');
}

/** Wrap a sentence to `width` columns with a hanging indent. */
export function wrap(text: string, width = 78, indent = '    '): string {
  const words = text.split(/\s+/).filter(Boolean);
  const lines: string[] = [];
  let line = '';
  for (const word of words) {
    if (line && line.length + 1 + word.length > width) {
      lines.push(line);
      line = indent + word;
    } else line = line ? `${line} ${word}` : word;
  }
  if (line) lines.push(line);
  return lines.join('\n');
}

/** What set the size, in words (the rule codes stay in the JSON output; the lever's own words for a lever). */
export function boundByLines(boundBy: readonly string[], architecture: 'direct' | 'lever' = 'direct', mount: 'floor' | 'rim' = 'floor'): string[] {
  return boundBy.map((code) => `  - ${wrap(ruleText(code, architecture, mount), 76)}`);
}

function warningLines(warnings: readonly Warning[]): string[] {
  return warnings.map((w) => `  - ${wrap(w.message, 76)}`);
}

/** The cautions, for the end of every result. */
export function formatCautions(): string {
  return ['Cautions', ...cautionLines().map((line) => `  - ${wrap(line, 76)}`), ''].join('\n');
}

/** A sized design as text: heading, tables, what bound it, warnings, then the cautions. */
export function formatSizingText(result: SizingSuccess, heading?: string): string {
  const parts = [heading ? `${heading}\n` : '', renderSections(sizingSections(result))];
  parts.push(['Why this valve', `  ${wrap(result.choice.reason, 76)}`, ''].join('\n'));
  parts.push(['What set the size', ...boundByLines(result.boundBy, result.architecture, result.mount), ''].join('\n'));
  parts.push(['Warnings', ...(result.warnings.length ? warningLines(result.warnings) : ['  none']), ''].join('\n'));
  parts.push(formatCautions());
  // units with their powers raised (mm², cm³), as on the screen and the build sheet
  return superscriptUnits(parts.join('\n'));
}

/** A design no size fits: why, and what would make it work. */
export function formatFailureText(failure: SizingFailure): string {
  const lines = ['No valve size works for this design.', '', 'Why'];
  lines.push(...failure.reasons.map((r) => `  - ${wrap(r.message, 76)}`));
  lines.push('', 'Ways out');
  if (failure.waysOut.length === 0) lines.push('  - none found within the limits');
  lines.push(...failure.waysOut.map((w) => `  - ${wrap(`${[w, ...(w.also ?? [])].map((c) => `${c.field} = ${c.value}`).join(' and ')}: ${w.message}`, 76)}`));
  if (failure.warnings.length) lines.push('', 'Warnings', ...warningLines(failure.warnings));
  lines.push('', formatCautions());
  return superscriptUnits(lines.join('\n'));
}

/** Input problems, one per line, each with its field (and the flag that sets it, when given). */
export function formatFieldErrors(
  errors: readonly FieldError[],
  flagFor: (field: string) => string | undefined = () => undefined,
  subject = 'the design',
): string {
  const heading = errors.length === 1 ? `There is a problem with ${subject}:` : `There are ${errors.length} problems with ${subject}:`;
  const lines = errors.map((e) => {
    const flag = flagFor(e.field);
    return `  - ${wrap(`${e.field}${flag ? ` (${flag})` : ''}: ${e.message}`, 76)}`;
  });
  return [heading, ...lines, ''].join('\n');
}
