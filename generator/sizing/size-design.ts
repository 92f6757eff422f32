import { flowFigures } from './flow-figures.ts';
import { sealFigures } from './seal-figures.ts';
import { FILAMENT_DIAMETER_MM, HOLD_DOWN_FACTOR, OVERFLOW_MARGIN_M, PAD_STOP_STRAIN, PART_SIZE_CAP_MM, PRINT_CLEARANCE_MM, STANDARD_GRAVITY, STEEL_DENSITY } from './constants.ts';
import { depthForForceMm } from './float/depth-for-force.ts';
import { circleArea } from './hydrostatics/circle-area.ts';
import { pressurePa } from './hydrostatics/pressure-pa.ts';
import { drainAreaRequiredM2, supplyFlow } from './hydraulics/index.ts';
import { designBasis, type DesignBasis } from './layout/design-basis.ts';
import { floatTilt } from './layout/evaluate-candidate.ts';
import { PADS } from './seal/pads.ts';
import { printBedMm } from './parts/print-bed.ts';
import { tippingStiffnessNmPerRad } from './float/tipping-stiffness.ts';
import { CONSTRAINT_TEXT } from './layout/constraint-text.ts';
import { searchSize } from './layout/search-size.ts';
import { nozzleThinnestWallMm } from './parts/nozzle-spec.ts';
import { landStrain } from './seal/land-strain.ts';
import { leakToleranceMl } from './float/leak-tolerance-ml.ts';
import type { Candidate } from './layout/evaluate-candidate.ts';
import type { Architecture, DesignInputs, Mount } from './inputs.ts';
import type { Choice, ChoiceOption, DirectSizing, SizingFailure, SizingResult, SizingSuccess, Warning, WayOut } from './result.ts';
import { LEVER_CONSTRAINT_TEXT } from './lever/lever-constraint-text.ts';
import { ruleText } from './rule-text.ts';
import type { LeverSearchOutcome } from './lever/search-lever.ts';
import { leverPlasticG, leverSizing, leverTooNearOverflow, searchLeverFor, type LeverFlows } from './size-lever.ts';
import { wayOutApplies } from './way-out-applies.ts';
import { lineForDesign, type FlowBand } from './throttle/line-for-design.ts';
import { throttleReport } from './throttle/throttle-report.ts';

const fmt = (x: number, digits = 1) => Number(x.toFixed(digits)).toString();

/** How a deeper level is offered as a way out (one wording, so the lowest of several can be kept). */
const AT_LEAST_LEVEL = 'a water depth to hold of at least';
/** How a lower tank is offered as a way out (one wording, so the highest of several can be kept). */
const NO_HIGHER_TANK = 'tank full no higher than';

/** Open-valve flow of a design at a head, at one point of the flow band (the bore a short tube when long enough). */
function flowAt(b: DesignBasis, headM: number, band: FlowBand = 'nominal') {
  const line = lineForDesign(b.inputs, headM, b.nozzle.totalLengthMm * 1e-3, band);
  return supplyFlow(line);
}

/** Checks that need no float: the nozzle's own walls. */
function nozzleProblems(b: DesignBasis): { reasons: Warning[]; waysOut: WayOut[] } {
  const inp = b.inputs;
  const line = inp.lineWidthM * 1e3;
  const reasons: Warning[] = [];
  const waysOut: WayOut[] = [];
  if (nozzleThinnestWallMm(b.nozzle) < 2 * line - 1e-9) {
    const maxBore = b.nozzle.barb.rootDiameterMm - 4 * line;
    const minTube = b.nozzle.orificeMm + 4 * line;
    reasons.push({
      code: 'barb-wall',
      message: `A ${fmt(b.nozzle.orificeMm, 2)} mm nozzle hole through the barb for a ${fmt(b.nozzle.barb.rootDiameterMm, 2)} mm feed tube leaves a wall thinner than two print lines (${fmt(2 * line, 2)} mm).`,
    });
    waysOut.push({ field: 'nozzle.orifice', value: `${fmt(Math.floor(maxBore * 10) / 10, 1)} mm`, message: 'a narrower nozzle hole' });
    waysOut.push({ field: 'supply.tubeInnerDiameter', value: `${fmt(Math.ceil(minTube * 10) / 10, 1)} mm`, message: 'a wider feed tube' });
  }
  if ((inp.sealDiameterM - inp.orificeM) * 1e3 / 2 < 2 * line - 1e-9) {
    reasons.push({
      code: 'lip-wall',
      message: `A ${fmt(inp.sealDiameterM * 1e3, 2)} mm nozzle lip around a ${fmt(inp.orificeM * 1e3, 2)} mm nozzle hole leaves a sealing ring thinner than two print lines.`,
    });
    waysOut.push({
      field: 'nozzle.sealDiameter',
      value: `${fmt(Math.ceil((inp.orificeM * 1e3 + 4 * line) * 10) / 10, 1)} mm`,
      message: 'a wider nozzle lip (it needs a little more float)',
    });
  }
  return { reasons, waysOut };
}

/** The pad's own check: at the tight seal at H_max it must not already lean on the hard stop. */
function padOnStop(b: DesignBasis): boolean {
  return b.indentationMm > b.padStopIndentationMm + 1e-9;
}

function padProblems(b: DesignBasis): { reasons: Warning[]; waysOut: WayOut[] } {
  if (!padOnStop(b)) return { reasons: [], waysOut: [] };
  const inp = b.inputs;
  const reasons: Warning[] = [{
    code: 'pad-on-stop',
    message: `The ${b.pad.name} pad (${fmt(b.padStiffnessKpa, 0)} kPa) is squeezed ${fmt(b.indentationMm, 2)} mm at the tight seal at ${fmt(inp.headMaxM, 2)} m of head, past the hard stop at ${fmt(b.padStopIndentationMm, 2)} mm (${fmt(PAD_STOP_STRAIN * 100, 0)} % of its ${fmt(b.padThicknessMm, 2)} mm): the seal would lean on the stop instead of the pad.`,
  }];
  const waysOut: WayOut[] = [];
  const stiffer = PADS.find((p) => p.stiffnessPa > b.pad.stiffnessPa && works({ ...inp, padName: p.name }));
  if (stiffer) waysOut.push({ field: 'seal.pad', value: stiffer.name, message: `a stiffer pad: ${stiffer.name}` });
  if (inp.padName !== null && works({ ...inp, padName: null })) {
    waysOut.push({ field: 'seal.pad', value: 'auto', message: 'let floatwright choose the pad' });
  }
  const maxThickness = 0.01;
  if (works({ ...inp, padThicknessM: maxThickness })) {
    // thicker pads seat with a smaller strain; find the thinnest that works (bisection on the 0.5 mm steps sponge comes in)
    let t = Math.ceil(inp.padThicknessM * 2e3) / 2e3;
    while (t < maxThickness && !works({ ...inp, padThicknessM: t })) t += 0.0005;
    waysOut.push({ field: 'seal.padThickness', value: `${fmt(t * 1e3, 1)} mm`, message: `a pad at least ${fmt(t * 1e3, 1)} mm thick` });
  }
  return { reasons, waysOut };
}

/** Checks that need no float: the nozzle's walls and the pad against its stop. */
function basisProblems(b: DesignBasis): { reasons: Warning[]; waysOut: WayOut[] } {
  const nozzle = nozzleProblems(b);
  if (nozzle.reasons.length) return nozzle;
  return padProblems(b);
}

/** Whether some float works for these inputs (used to search for ways out). */
function works(inp: DesignInputs): boolean {
  try {
    const b = designBasis(inp);
    if (nozzleProblems(b).reasons.length || padOnStop(b)) return false;
    if (inp.demandM3s > flowAt(b, inp.headMinM).flowM3s) return false;
    const q = flowAt(b, inp.headMaxM, 'high');
    return searchSize(b, drainAreaRequiredM2({ flowM3s: q.flowM3s }) * 1e6).best !== null;
  } catch {
    return false;
  }
}

/** Largest value in [lo, hi] for which `ok` holds, assuming it holds at lo and fails at hi (bisection). */
function largestWorking(lo: number, hi: number, ok: (x: number) => boolean, tolerance: number): number {
  while (hi - lo > tolerance) {
    const mid = (lo + hi) / 2;
    if (ok(mid)) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Why no direct valve fits, in words (cheap: what the search already counted). */
function directReasons(b: DesignBasis, outcome: ReturnType<typeof searchSize>): Warning[] {
  const inp = b.inputs;
  const reasons: Warning[] = [...outcome.rejections.keys()].map((code) => ({ code, message: CONSTRAINT_TEXT[code] }));
  if (reasons.length === 0) {
    // No diameter up to the part-size cap had any workable cylinder (the search skips those as "too small"):
    // even the largest float cannot lift the reserve times the closing force at H_max. Say so, never nothing.
    reasons.push({
      code: 'reserve',
      message: `${CONSTRAINT_TEXT.reserve} (${fmt(b.forceAtHeadMaxN, 2)} N at ${fmt(inp.headMaxM, 2)} m); no float up to ${PART_SIZE_CAP_MM} mm can do that.`,
    });
  }
  return reasons;
}

function failure(b: DesignBasis, outcome: ReturnType<typeof searchSize>): SizingFailure {
  const inp = b.inputs;
  const reasons = directReasons(b, outcome);
  const waysOut: WayOut[] = [];
  const targetMm = inp.targetLevelM * 1e3;
  if (Number.isFinite(outcome.lowestReachableMm) && outcome.lowestReachableMm > targetMm) {
    const v = Math.ceil(outcome.lowestReachableMm * 2) / 2;
    waysOut.push({ field: 'level.target', value: `${fmt(v)} mm`, message: `${AT_LEAST_LEVEL} ${fmt(v)} mm at this head` });
  }
  if (works({ ...inp, headMaxM: 0.01, headMinM: 0.01 })) {
    const h = largestWorking(0.01, inp.headMaxM, (x) => works({ ...inp, headMaxM: x, headMinM: Math.min(inp.headMinM, x) }), 0.005);
    const v = Math.floor(h * 100) / 100;
    // the lowest head may not stay above the highest: lowered with it when it would
    const also = v < inp.headMinM ? [{ field: 'supply.headMin', value: `${fmt(v, 2)} m` }] : undefined;
    waysOut.push({ field: 'supply.headMax', value: `${fmt(v, 2)} m`, message: `${NO_HIGHER_TANK} ${fmt(v, 2)} m above the nozzle for this water depth`, ...(also ? { also } : {}) });
  }
  if (!b.fromCalibration) {
    const line = inp.lineWidthM;
    const smallest = inp.orificeM + 4 * line;
    if (smallest < inp.sealDiameterM && works({ ...inp, sealDiameterM: smallest })) {
      const d = largestWorking(smallest, inp.sealDiameterM, (x) => works({ ...inp, sealDiameterM: x }), 1e-5);
      const v = Math.floor(d * 1e4) / 10;
      waysOut.push({ field: 'nozzle.sealDiameter', value: `${fmt(v)} mm`, message: `a nozzle lip of at most ${fmt(v)} mm across` });
    }
  }
  if (outcome.rejections.has('tilt-gap') || outcome.rejections.has('tilt-offset')) {
    // a pad pressed deeper at the seal tolerates a wider far-side gap: the first pad in the table that works
    const pad = PADS.find((p) => p.name !== inp.padName && works({ ...inp, padName: p.name }));
    if (pad) waysOut.push({ field: 'seal.pad', value: pad.name, message: `a ${pad.name} pad, pressed deep enough that a tipped float still closes the lip all round` });
  }
  const bed = printBedMm(inp);
  if (outcome.rejections.has('bed-size')) {
    // a larger bed, square, to the millimetre (the document's print.bed takes "W x D mm")
    const at = (mm: number) => works({ ...inp, bedWidthM: mm / 1e3, bedDepthM: mm / 1e3 });
    const from = Math.max(bed.widthMm, bed.depthMm);
    if (at(1000)) {
      const v = Math.ceil(largestWorking(from, 1000, (x) => !at(x), 0.5) + 0.5);
      waysOut.push({ field: 'print.bed', value: `${v} x ${v} mm`, message: `a printer bed of at least ${v} x ${v} mm` });
    }
  }
  if (Number.isFinite(outcome.smallestWorkingFootMm) && outcome.smallestWorkingFootMm > inp.maxOuterDiameterM * 1e3) {
    const v = Math.ceil(outcome.smallestWorkingFootMm);
    waysOut.push({ field: 'limits.maxOuterDiameter', value: `${v} mm`, message: `allow a housing foot of ${v} mm across` });
  }
  // Neither the level nor the limit alone is enough: name the pair that works together.
  const any = outcome.nearestLevelAndFoot;
  if (waysOut.length === 0 && Number.isFinite(any.levelMm)) {
    // the nearest design was laid out at the present target; raised to the new one its housing changes a little,
    // so the pair is checked as offered and, where it falls just short, the foot (then the level) is eased a step
    // or two (soak seed 1004493665: 118.5 mm with a 207 mm foot needed 210 mm)
    const pairWorks = (levelMm: number, footMm: number) => works({ ...inp, targetLevelM: levelMm / 1e3, maxOuterDiameterM: footMm / 1e3 });
    const level0 = Math.ceil(Math.max(any.levelMm, targetMm) * 2) / 2;
    const foot0 = Math.ceil(any.footMm);
    let pair: { level: number; foot: number } | null = null;
    for (let dl = 0; dl <= 4 && !pair; dl++) {
      for (let df = 0; df <= 12 && !pair; df += 2) if (pairWorks(level0 + dl * 0.5, foot0 + df)) pair = { level: level0 + dl * 0.5, foot: foot0 + df };
    }
    if (pair) {
      const { level, foot } = pair;
      const both = `a water depth to hold of at least ${fmt(level)} mm together with a housing foot of ${foot} mm across`;
      waysOut.push({ field: 'level.target', value: `${fmt(level)} mm`, message: both });
      waysOut.push({ field: 'limits.maxOuterDiameter', value: `${foot} mm`, message: both });
    }
  }
  return { ok: false, reasons, waysOut: applicable(inp, waysOut), warnings: [] };
}

/** The ways out the document accepts (wayOutApplies); a pair offered together (one message) goes when either part does. */
function applicable(inp: DesignInputs, waysOut: WayOut[]): WayOut[] {
  const refused = new Set(waysOut.filter((w) => !wayOutApplies(inp, w)).map((w) => w.message));
  return waysOut.filter((w) => !refused.has(w.message));
}

/** The tight shut-off at full tank comes within 10 mm of the container's overflow: refused, with what works. */
function overflowFailure(inp: DesignInputs, shutOffMaxMm: number): SizingFailure {
  const overflowMm = inp.overflowM! * 1e3;
  const marginMm = OVERFLOW_MARGIN_M * 1e3;
  const reasons: Warning[] = [{
    code: 'overflow',
    message: `With the tank full the valve shuts tight at ${fmt(shutOffMaxMm)} mm, within ${fmt(marginMm, 0)} mm of the container's overflow at ${fmt(overflowMm)} mm: the container would spill before the valve shut.`,
  }];
  const waysOut: WayOut[] = [];
  // the shut-off at full tank is the target (the layout places the nozzle so); keep it the margin below the overflow
  const lower = Math.floor((overflowMm - marginMm - (shutOffMaxMm - inp.targetLevelM * 1e3)) * 2) / 2;
  if (lower >= 5 && works({ ...inp, targetLevelM: lower / 1e3, overflowM: null })) {
    waysOut.push({ field: 'level.target', value: `${fmt(lower)} mm`, message: `a water depth to hold of at most ${fmt(lower)} mm` });
  }
  const higher = Math.ceil(shutOffMaxMm + marginMm);
  waysOut.push({ field: 'container.overflow', value: `${higher} mm`, message: `an overflow at least ${higher} mm above the container floor` });
  return { ok: false, reasons, waysOut: applicable(inp, waysOut), warnings: [] };
}

/** The plants drink more than the valve gives at low tank: the container would never fill. */
function demandFailure(inp: DesignInputs, openLowTankLph: number): SizingFailure {
  const demandLpd = inp.demandM3s * 8.64e7;
  const canLpd = openLowTankLph * 24;
  const reasons: Warning[] = [{
    code: 'demand',
    message: `container.demand: ${fmt(demandLpd, 1)} L/day is more than this valve gives wide open with the tank low, ${fmt(canLpd, 1)} L/day (${fmt(openLowTankLph, 2)} L/h): the container would never fill.`,
  }];
  const waysOut: WayOut[] = [];
  const most = Math.floor(canLpd * 10) / 10;
  if (most > 0) waysOut.push({ field: 'container.demand', value: `${fmt(most, 1)} L/day`, message: `a demand of at most ${fmt(most, 1)} L/day (or a second valve)` });
  return { ok: false, reasons, waysOut: applicable(inp, waysOut), warnings: [] };
}

/** Warnings for any valve of these inputs: the wall, the flow at low tank, the bench points, old fields, the pad. */
function commonWarnings(b: DesignBasis, lowFlow: boolean): Warning[] {
  const inp = b.inputs;
  const w: Warning[] = [];
  const wallMm = inp.wallM * 1e3;
  const line = inp.lineWidthM * 1e3;
  const lines = wallMm / line;
  if (Math.abs(lines - Math.round(lines)) > 0.02) {
    w.push({
      code: 'wall-lines',
      message: `The ${fmt(wallMm, 2)} mm wall is ${fmt(lines, 2)} line widths; a whole number (${fmt(Math.round(lines) * line, 2)} mm) prints without gap fill.`,
    });
  }
  if (lowFlow) {
    w.push({ code: 'low-flow', message: 'With the tank low the valve passes under 1 L/h: refilling will be slow.' });
  }
  if (b.fromCalibration && (b.sealAreaM2 < b.boreAreaM2 || b.sealAreaM2 > 2 * circleArea(inp.sealDiameterM))) {
    w.push({
      code: 'calibration-area',
      message: `The bench points give a seal area of ${fmt(b.sealAreaM2 * 1e6, 1)} mm2, outside the bore's ${fmt(b.boreAreaM2 * 1e6, 1)} mm2 to twice the lip's ${fmt(2 * circleArea(inp.sealDiameterM) * 1e6, 1)} mm2: the points are more likely wrong than the pad; repeat them.`,
    });
  }
  if (inp.retiredFields.length) {
    w.push({
      code: 'retired-fields',
      message: `${inp.retiredFields.join(' and ')} no longer count${inp.retiredFields.length === 1 ? 's' : ''} and ${inp.retiredFields.length === 1 ? 'was' : 'were'} ignored: the pad (seal.pad) now sets the seating force and the squeeze.`,
    });
  }
  if (!b.padChosen && b.pad.kind === 'rubber') {
    w.push({
      code: 'rubber-pad',
      message: `A ${b.pad.name} pad needs ${fmt(b.preloadN, 2)} N just to seat on the lip and gives only ${fmt(b.indentationMm, 2)} mm; a closed-cell sponge (seal.pad "auto") seals with a smaller float.`,
    });
  }
  if (b.fromCalibration && b.calibrationRmsN > 0.05 * b.forceAtHeadMaxN) {
    w.push({ code: 'calibration-scatter', message: 'The bench points scatter more than 5 % about the fitted line: repeat the measurements.' });
  }
  return w;
}

/** The direct valve's own warnings: a housing that floats, holding it down, a long drop to the pin. */
function directWarnings(b: DesignBasis, c: Candidate, netWeightN: number, ballastG: number): Warning[] {
  const inp = b.inputs;
  const w: Warning[] = [];
  if (netWeightN < 0) {
    w.push({ code: 'housing-floats', message: `Printed in ${inp.materialName} the housing floats on its own; it must be pinned or weighted down.` });
  }
  if (ballastG > 0) {
    w.push({
      code: 'hold-down',
      message: `If the container floods, the float lifts the housing: pin the foot down or add ${fmt(ballastG, 0)} g of steel ballast.`,
    });
  }
  if (c.travelMm > b.preferredTravelMm + 1e-6) {
    w.push({ code: 'long-travel', message: `The float drops ${fmt(c.travelMm)} mm onto its retainer pin when the container runs dry.` });
  }
  return w;
}

/**
 * What "auto" weighs first. true: the direct valve whenever it fits (four parts, no pivot, a guided float),
 * the lightest lever or rim valve only where it does not; false: the least plastic of every option that
 * fits (issue 13's rule, which makes nearly every valve a lever: 32 g against 133 g on the rooftop tubs).
 * Kept true for now, so the designs growers already have stay as they are; see the issue-13 notes.
 */
const AUTO_PREFERS_DIRECT = true;

type Flows = LeverFlows;
type Option = { architecture: Architecture; mount: Mount };
type Tried =
  | { option: Option; ok: true; plasticG: number; make: (choice: Choice, common: Warning[]) => SizingSuccess }
  /** `reasons` at once; `failure` (with its ways out, which re-size: dear) only if no option fits */
  | {
      option: Option;
      ok: false;
      reasons: Warning[];
      failure: () => SizingFailure;
      /** a lever that failed the travel rule: the search's estimate of the lowest level it reaches, mm (leverLevelWayOut) */
      levelFromMm?: number;
      /** a lever no candidate of the search fitted (a lower tank may: leverHeadWayOut) */
      leverNoFit?: boolean;
    };

/** A failed option whose failure (ways out and all) is worked out once, when asked for. */
function failed(option: Option, reasons: Warning[], make: () => SizingFailure, lever?: { levelFromMm?: number }): Tried {
  let made: SizingFailure | null = null;
  const base = { option, ok: false as const, reasons, failure: () => (made ??= make()) };
  return lever ? { ...base, leverNoFit: true, ...(lever.levelFromMm === undefined ? {} : { levelFromMm: lever.levelFromMm }) } : base;
}

const ARCHITECTURE_WORDS: Record<Architecture, string> = { direct: 'a direct valve', lever: 'a lever valve' };
const MOUNT_WORDS: Record<Mount, string> = { floor: 'standing on the container floor', rim: "hung from the container's rim" };
const optionWords = (o: Option) => `${ARCHITECTURE_WORDS[o.architecture]} ${MOUNT_WORDS[o.mount]}`;
const capital = (t: string) => t.charAt(0).toUpperCase() + t.slice(1);
const lowerFirst = (t: string) => t.charAt(0).toLowerCase() + t.slice(1);

/** The architectures and mounts the sizing weighs for these inputs (the document's fixed ones alone). */
function optionsFor(inp: DesignInputs): Option[] {
  const architectures: Architecture[] = inp.architecture !== 'auto' ? [inp.architecture] : ['direct', 'lever'];
  const mounts: Mount[] = inp.mount !== 'auto' ? [inp.mount] : inp.rimHeightM !== null ? ['floor', 'rim'] : ['floor'];
  // the direct valve stands on the floor only (its housing has no back plate for the stem)
  return architectures.flatMap((architecture) => mounts.filter((mount) => architecture === 'lever' || mount === 'floor').map((mount) => ({ architecture, mount })));
}

/** The direct valve: the float search, then every figure, or why no float fits. */
function tryDirect(b: DesignBasis, flows: Flows): Tried {
  const option: Option = { architecture: 'direct', mount: 'floor' };
  const inp = b.inputs;
  // DESIGN second part: drains sized on the high end of the flow band
  const drainRequiredMm2 = drainAreaRequiredM2({ flowM3s: flows.qMaxHigh.flowM3s }) * 1e6;
  // The housing stands from the floor to its deck, over the float, which seals on its straight side above the
  // water line: at least the target, the pad proud less its squeeze, the nozzle under the deck, the boss and the
  // deck. Past the part-size cap no float fits: said at once (the search runs only if no other valve fits either).
  const lowestHousingMm = inp.targetLevelM * 1e3 + b.padProudMm - b.indentationMm + b.nozzle.protrusionMm + b.bossHeightMm + b.deckThicknessMm;
  if (lowestHousingMm > PART_SIZE_CAP_MM) {
    return failed(option, [{ code: 'part-size', message: CONSTRAINT_TEXT['part-size'] }], () => failure(b, searchSize(b, drainRequiredMm2)));
  }
  const outcome = searchSize(b, drainRequiredMm2);
  const c = outcome.best;
  if (!c) return failed(option, directReasons(b, outcome), () => failure(b, outcome));
  const shutOffMax = c.sealBottomMm + depthForForceMm(c.float, b.forceAtHeadMaxN, c.massKg, inp.liquidDensityKgM3);
  if (inp.overflowM !== null && shutOffMax > (inp.overflowM - OVERFLOW_MARGIN_M) * 1e3 + 1e-9) {
    const f = overflowFailure(inp, shutOffMax);
    return failed(option, f.reasons, () => f);
  }
  const v = c.volumes;
  const plasticG = (v.housingMm3 + v.nozzleMm3 + v.pinMm3 + v.floatMm3) * 1e-9 * inp.materialDensityKgM3 * 1e3;
  return { option, ok: true, plasticG, make: (choice, common) => directSizing(b, c, outcome, flows, drainRequiredMm2, choice, common) };
}

/** A lever valve on one mount: the lever search, then every figure, or why no lever fits. */
function tryLever(b: DesignBasis, mount: Mount, flows: Flows, alone: boolean): Tried {
  const option: Option = { architecture: 'lever', mount };
  const inp = b.inputs;
  const outcome = searchLeverFor(b, mount)!;
  const c = outcome.best;
  if (!c) {
    const from = leverLevelFromMm(inp, outcome);
    // weighed with other valves, the deeper level is worked out once for them all (combinedFailure)
    return failed(option, leverReasons(b, mount, outcome), () => leverFailure(b, mount, outcome, alone, from), { levelFromMm: from });
  }
  if (leverTooNearOverflow(c, inp.overflowM)) {
    const f = overflowFailure(inp, c.shutOffAtHeadMaxMm);
    return failed(option, f.reasons, () => f);
  }
  return { option, ok: true, plasticG: leverPlasticG(c, inp.materialDensityKgM3), make: (choice, common) => leverSizing(b, c, outcome, flows, choice, common) };
}

/** The lever search's estimate of the lowest level a lever reaches, rounded up to the half millimetre, when above the target. */
function leverLevelFromMm(inp: DesignInputs, outcome: LeverSearchOutcome): number | undefined {
  return Number.isFinite(outcome.lowestReachableMm) && outcome.lowestReachableMm > inp.targetLevelM * 1e3 ? Math.ceil(outcome.lowestReachableMm * 2) / 2 : undefined;
}

/** Steps above the search's estimate at which a deeper level is checked, mm (a deeper level changes the valve a little). */
const LEVEL_STEPS_MM = [0, 0.5, 1.5, 3.5, 7.5];

/**
 * A deeper level as a way out for a lever on this mount: the search's estimate (its nearest candidates raised
 * until the float clears the floor), checked as offered and eased up a few steps where it falls just short;
 * only levels under `belowMm` are tried (a lower one is already offered), and only those the document accepts
 * (wayOutApplies: within its range, and not above the container's rim when one is given). Null when none works.
 */
function leverLevelWayOut(inp: DesignInputs, mount: Mount, fromMm: number, belowMm: number): WayOut | null {
  for (const step of LEVEL_STEPS_MM) {
    const mm = fromMm + step;
    const way: WayOut = { field: 'level.target', value: `${fmt(mm)} mm`, message: `${AT_LEAST_LEVEL} ${fmt(mm)} mm at this head` };
    // past the document's range, or above a rim the grower gave, it can only get worse higher up
    if (mm >= belowMm || !wayOutApplies(inp, way)) return null;
    if (leverWorks({ ...inp, targetLevelM: mm / 1e3 }, mount)) return way;
  }
  return null;
}

/** Steps of the lower tank a lever's way out offers, m: a round figure to set a tank or a break tank by. */
const HEAD_STEP_M = 0.1;

/**
 * A lower tank as a way out for a lever on this mount: the highest full-tank head on the HEAD_STEP_M grid,
 * under the present one and above `aboveM` (a higher one is already offered), at which a lever fits, the low
 * tank lowered with it where it would stand higher (bisection: a lower head asks less of the float, so the
 * heads that fit run from the bottom up). Null when none does, or the document would refuse it.
 */
function leverHeadWayOut(inp: DesignInputs, mount: Mount, aboveM: number): WayOut | null {
  const wayAt = (k: number): WayOut => {
    const v = Number((k * HEAD_STEP_M).toFixed(2));
    const also = v < inp.headMinM ? [{ field: 'supply.headMin', value: `${fmt(v, 2)} m` }] : undefined;
    return { field: 'supply.headMax', value: `${fmt(v, 2)} m`, message: `${NO_HIGHER_TANK} ${fmt(v, 2)} m above the nozzle for this water depth`, ...(also ? { also } : {}) };
  };
  const fits = (k: number) => wayOutApplies(inp, wayAt(k)) && leverWorks({ ...inp, headMaxM: k * HEAD_STEP_M, headMinM: Math.min(inp.headMinM, k * HEAD_STEP_M) }, mount);
  let lo = Math.floor(aboveM / HEAD_STEP_M + 1e-9) + 1;
  let hi = Math.ceil(inp.headMaxM / HEAD_STEP_M - 1e-9);
  if (lo >= hi || !fits(lo)) return null;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (fits(mid)) lo = mid;
    else hi = mid;
  }
  return wayAt(lo);
}

/** Whether a lever valve on this mount fits these inputs (for ways out). */
function leverWorks(inp: DesignInputs, mount: Mount): boolean {
  try {
    const b = designBasis(inp);
    if (nozzleProblems(b).reasons.length || padOnStop(b)) return false;
    return searchLeverFor(b, mount)?.best != null;
  } catch {
    return false;
  }
}

/** No lever fits on this mount: the rules that rejected every candidate, and what would make one fit. */
function leverReasons(b: DesignBasis, mount: Mount, outcome: LeverSearchOutcome): Warning[] {
  const inp = b.inputs;
  // the rule that turned away the most candidates first
  const reasons: Warning[] = [...outcome.rejections.entries()].sort((x, y) => y[1] - x[1]).map(([code]) => ({ code, message: ruleText(code, 'lever', mount) }));
  if (reasons.length === 0) {
    reasons.push({ code: 'reserve', message: `${LEVER_CONSTRAINT_TEXT.reserve} (${fmt(b.forceAtHeadMaxN, 2)} N at ${fmt(inp.headMaxM, 2)} m); no float and arm within the limits can do that.` });
  }
  return reasons;
}

/**
 * No lever fits on this mount: its reasons and ways out. `alone` (the only valve weighed): the deeper level
 * (from `levelFromMm`) and the lower tank are offered here; weighed with others, combinedFailure works them out
 * once for all.
 */
function leverFailure(b: DesignBasis, mount: Mount, outcome: LeverSearchOutcome, alone: boolean, levelFromMm?: number): SizingFailure {
  const inp = b.inputs;
  const reasons = leverReasons(b, mount, outcome);
  const waysOut: WayOut[] = [];
  const level = alone && levelFromMm !== undefined ? leverLevelWayOut(inp, mount, levelFromMm, Infinity) : null;
  if (level !== null) waysOut.push(level);
  const tank = alone ? leverHeadWayOut(inp, mount, 0) : null;
  if (tank !== null) waysOut.push(tank);
  if (outcome.rejections.has('outer-diameter-limit')) {
    const wide = searchLeverFor(b, mount, 250);
    if (wide?.best && wide.smallestFootprintMm > inp.maxOuterDiameterM * 1e3) {
      // the narrowest valve the wide search saw; the search at that limit may step over it (coarse grid), so
      // widen a little at a time up to the lightest one's footprint, which it finds for certain
      const from = Math.ceil(wide.smallestFootprintMm);
      const to = Math.ceil(wide.best.footprintMm);
      for (let v = from; v <= to; v = v === to ? to + 1 : Math.min(to, v + 3)) {
        if (!leverWorks({ ...inp, maxOuterDiameterM: v / 1e3 }, mount)) continue;
        waysOut.push({ field: 'limits.maxOuterDiameter', value: `${v} mm`, message: `allow a valve ${v} mm across, seen from above` });
        break;
      }
    }
  }
  if (mount === 'floor' && inp.rimHeightM === null && (outcome.rejections.has('part-size') || outcome.rejections.has('travel'))) {
    const rim = Math.ceil(inp.targetLevelM * 1e3 + 100);
    if (leverWorks({ ...inp, rimHeightM: rim / 1e3, mount: 'rim' }, 'rim')) {
      waysOut.push({ field: 'container.rimHeight', value: `${rim} mm`, message: `hang it from the container's rim (give your rim's real height; ${rim} mm works)`, also: [{ field: 'valve.mount', value: 'rim' }] });
    }
  }
  if (mount === 'rim' && leverWorks({ ...inp, mount: 'floor' }, 'floor')) {
    waysOut.push({ field: 'valve.mount', value: inp.architecture === 'lever' ? 'floor' : 'auto', message: 'stand it on the container floor' });
  }
  if (mount === 'floor' && inp.rimHeightM !== null && leverWorks(inp, 'rim')) {
    waysOut.push({ field: 'valve.mount', value: 'rim', message: "hang it from the container's rim" });
  }
  if (inp.architecture === 'lever' && works({ ...inp, architecture: 'direct', mount: 'floor' })) {
    waysOut.push({ field: 'valve.architecture', value: 'direct', message: 'a direct valve, the float pushing the pad straight up', ...(inp.mount === 'rim' ? { also: [{ field: 'valve.mount', value: 'floor' }] } : {}) });
  }
  return { ok: false, reasons, waysOut: applicable(inp, waysOut), warnings: [] };
}

/** The reason for the choice, in plain words. */
function choiceFor(inp: DesignInputs, chosen: Tried & { ok: true }, tried: Tried[]): Choice {
  const options: ChoiceOption[] = tried.map((t) => ({
    architecture: t.option.architecture,
    mount: t.option.mount,
    plasticG: t.ok ? t.plasticG : null,
    note: t.ok ? `${fmt(t.plasticG)} g of plastic` : `does not fit: ${t.reasons[0]?.message ?? 'no size works'}`,
  }));
  const what = capital(optionWords(chosen.option));
  const limit = `${fmt(inp.maxOuterDiameterM * 1e3, 0)} mm`;
  // "valve.architecture set to ..." reads as '"Valve kind" set to ...' on the workbench (document paths become labels)
  const fixed = [inp.architecture !== 'auto' ? `valve.architecture set to "${inp.architecture}"` : '', inp.mount !== 'auto' ? `valve.mount set to "${inp.mount}"` : ''].filter(Boolean);
  if (tried.length === 1) {
    const reason = fixed.length
      ? `${what}, as the design asks (${fixed.join(', ')}): ${fmt(chosen.plasticG)} g of plastic within ${limit}.`
      : `${what}: it fits within ${limit} (${fmt(chosen.plasticG)} g of plastic), and floatwright makes the direct valve wherever it fits. For a lever valve instead, set valve.architecture to "lever".`;
    return { by: fixed.length ? 'document' : 'direct-first', reason, options };
  }
  const others = tried
    .filter((t) => t !== chosen)
    .map((t) => (t.ok ? `${optionWords(t.option)} takes ${fmt(t.plasticG)} g` : `${optionWords(t.option)} does not fit (${lowerFirst(t.reasons[0]?.message ?? 'no size works').replace(/\.$/, '')})`));
  const reason = `${what}: the least plastic that fits within ${limit}, ${fmt(chosen.plasticG)} g; ${others.join('; ')}.${fixed.length ? ` The design fixes ${fixed.join(' and ')}.` : ''}`;
  return { by: 'least-plastic', reason, options };
}

/** Every option failed: their reasons (named by option when there were several) and every way out. */
function combinedFailure(inp: DesignInputs, b: DesignBasis, tried: (Tried & { ok: false })[]): SizingFailure {
  if (tried.length === 1) {
    const only = tried[0]!;
    return only.failure();
  }
  const reasons = tried.flatMap((t) => t.failure().reasons.map((r) => ({ code: r.code, message: `${capital(optionWords(t.option))}: ${r.message}` })));
  const seen = new Set<string>();
  const all = tried.flatMap((t) => t.failure().waysOut);
  // "at least" must hold of every kind of valve: only the lowest level any of them reaches is offered; the
  // levers' are tried lowest estimate first, each only below the lowest found so far
  const leastLevel = (w: WayOut) => w.field === 'level.target' && w.message.startsWith(AT_LEAST_LEVEL);
  let lowest = Math.min(...all.filter(leastLevel).map((w) => Number.parseFloat(w.value)));
  const levers = tried.filter((t) => t.levelFromMm !== undefined).sort((x, y) => x.levelFromMm! - y.levelFromMm!);
  for (const t of levers) {
    const w = leverLevelWayOut(inp, t.option.mount, t.levelFromMm!, lowest);
    if (w) {
      all.unshift(w);
      lowest = Number.parseFloat(w.value);
    }
  }
  // "no higher than" likewise: only the highest tank any of them takes
  const noHigher = (w: WayOut) => w.field === 'supply.headMax' && w.message.startsWith(NO_HIGHER_TANK);
  let highest = Math.max(0, ...all.filter(noHigher).map((w) => Number.parseFloat(w.value)));
  for (const t of tried.filter((x) => x.leverNoFit)) {
    const w = leverHeadWayOut(inp, t.option.mount, highest);
    if (w) {
      all.push(w);
      highest = Number.parseFloat(w.value);
    }
  }
  const waysOut = all.filter((w) => {
    const key = `${w.field}=${w.value}`;
    if (seen.has(key) || (leastLevel(w) && Number.parseFloat(w.value) > lowest) || (noHigher(w) && Number.parseFloat(w.value) < highest)) return false;
    seen.add(key);
    return true;
  });
  return { ok: false, reasons, waysOut, warnings: [] };
}

/**
 * Sizes a complete float valve (DESIGN.md, "Sizing model"): forces, float,
 * layout, flow, drain, vents, hold-down, tilt and masses, with every part's
 * dimensions for the solids. Pure: numbers in, numbers out.
 *
 * Architecture and mount (issue 13): the document's, or (valve.architecture and
 * valve.mount "auto") the option with the least printed plastic among those that
 * fit limits.maxOuterDiameter, the valve's widest extent seen from above. The rim
 * is only weighed when container.rimHeight is given; the direct valve only stands
 * on the floor. For now (AUTO_PREFERS_DIRECT) "auto" keeps the direct valve
 * whenever it fits and weighs the others only where it does not.
 */
export function sizeDesign(inp: DesignInputs): SizingResult {
  const b = designBasis(inp);
  const early = basisProblems(b);
  if (early.reasons.length) return { ok: false, reasons: early.reasons, waysOut: applicable(inp, early.waysOut), warnings: [] };

  const qMin = flowAt(b, inp.headMinM);
  // the plants must not drink more than the valve gives wide open at the lowest tank level (no float changes that)
  if (inp.demandM3s > qMin.flowM3s) return demandFailure(inp, qMin.flowLph);
  const flows: Flows = { qMax: flowAt(b, inp.headMaxM), qMin, qMaxLow: flowAt(b, inp.headMaxM, 'low'), qMaxHigh: flowAt(b, inp.headMaxM, 'high') };
  if (inp.architecture === 'direct' && inp.mount === 'rim') return directOnRimFailure(inp);

  const options = optionsFor(inp);
  const alone = options.length === 1;
  const attempt = (o: Option) => (o.architecture === 'direct' ? tryDirect(b, flows) : tryLever(b, o.mount, flows, alone));
  const tried: Tried[] = [];
  if (AUTO_PREFERS_DIRECT && inp.architecture === 'auto' && options[0]?.architecture === 'direct') {
    const first = attempt(options[0]);
    if (first.ok) return first.make(choiceFor(inp, first, [first]), commonWarnings(b, flows.qMin.flowLph < 1));
    tried.push(first);
    options.shift();
  }
  tried.push(...options.map(attempt));
  const fitting = tried.filter((t): t is Tried & { ok: true } => t.ok);
  if (fitting.length === 0) return combinedFailure(inp, b, tried as (Tried & { ok: false })[]);
  // least plastic; a tie to the simpler direct valve, then the floor (the order tried)
  const chosen = fitting.reduce((best, t) => (Math.round(t.plasticG * 100) < Math.round(best.plasticG * 100) ? t : best));
  return chosen.make(choiceFor(inp, chosen, tried), commonWarnings(b, flows.qMin.flowLph < 1));
}

/** A direct valve asked to hang from the rim: not made (its housing has no back plate for the stem). */
function directOnRimFailure(inp: DesignInputs): SizingFailure {
  const reasons: Warning[] = [{
    code: 'direct-on-rim',
    message: "A direct valve stands on the container floor; only the lever valve hangs from the rim (the direct valve's round housing has nothing for the slotted stem to hold).",
  }];
  const waysOut: WayOut[] = [];
  if (leverWorks({ ...inp, architecture: 'lever' }, 'rim')) waysOut.push({ field: 'valve.architecture', value: 'lever', message: 'a lever valve hung from the rim' });
  if (works({ ...inp, mount: 'floor' })) waysOut.push({ field: 'valve.mount', value: 'floor', message: 'the direct valve standing on the container floor' });
  return { ok: false, reasons, waysOut: applicable(inp, waysOut), warnings: [] };
}

/** The direct valve's every figure from the chosen candidate. */
function directSizing(b: DesignBasis, c: Candidate, outcome: ReturnType<typeof searchSize>, flows: Flows, drainRequiredMm2: number, choice: Choice, common: Warning[]): DirectSizing {
  const inp = b.inputs;
  const rho = inp.liquidDensityKgM3;
  const { qMax, qMin } = flows;
  const f = c.float;
  const depthAt = (forceN: number, massKg = c.massKg) => depthForForceMm(f, forceN, massKg, rho);
  const deltaMm = b.indentationMm;
  const floatingDepth = depthAt(0);
  const shutOffMax = c.sealBottomMm + depthAt(b.forceAtHeadMaxN);
  const shutOffMin = c.sealBottomMm + depthAt(b.forceAtHeadMinN);
  const throttle = throttleReport(b, c, qMax.flowLph, qMin.flowLph);

  // The pad in service (DESIGN second part): with the tank empty and the reservoir full the float's whole
  // push F_seal(H_max) bears on the land; flooded, its whole lift F_avail. The stop caps the strain at 25 %.
  const strainUnder = (forceN: number) =>
    landStrain({ forceN, pressurePa: 0, boreAreaM2: b.boreAreaM2, landAreaM2: b.landAreaM2, stiffnessPa: b.pad.stiffnessPa });
  const worstWithoutStop = Math.max(b.strainAtSeal, strainUnder(b.forceAtHeadMaxN), strainUnder(c.availableN));
  // Water taken in adds rho V of mass; the float sinks until it displaces V more. Per mL, from the last
  // 0.01 mL before the seal (a backward step, so a float with no leak tolerance left still has a figure).
  const stepM3 = 1e-8;
  const levelRisePerMl = (depthAt(b.forceAtHeadMaxN) - depthAt(b.forceAtHeadMaxN, c.massKg - rho * stepM3)) / (stepM3 * 1e6);

  const rhoM = inp.materialDensityKgM3;
  const gramsOf = (mm3: number) => mm3 * 1e-9 * rhoM * 1e3;
  const housingG = gramsOf(c.volumes.housingMm3);
  const nozzleG = gramsOf(c.volumes.nozzleMm3);
  const pinG = gramsOf(c.volumes.pinMm3);
  const floatPlasticG = gramsOf(c.volumes.floatMm3);
  const padG = b.padMassKg * 1e3;
  const plasticMm3 = c.volumes.housingMm3 + c.volumes.nozzleMm3 + c.volumes.pinMm3 + c.volumes.floatMm3;

  // Hold-down (DESIGN): uplift of the flooded float against the submerged weight of the rest.
  const upliftN = c.availableN;
  const netWeightN = ((housingG + nozzleG + pinG) / 1e3) * (1 - rho / rhoM) * STANDARD_GRAVITY;
  const neededN = Math.max(0, HOLD_DOWN_FACTOR * upliftN - netWeightN);
  const ballastG = (neededN / ((1 - rho / STEEL_DENSITY) * STANDARD_GRAVITY)) * 1e3;

  // Tilt (DESIGN "Tilt, guide and stability"): worst tilt in the bore and the guide, pivot at the pad.
  const tilt = floatTilt(b, f);
  const sealDepthMm = depthAt(b.forceAtHeadMaxN);
  const stiffness = tippingStiffnessNmPerRad({
    float: f,
    shellMassKg: c.massKg - b.padMassKg,
    padMassKg: b.padMassKg,
    depthMm: sealDepthMm,
    pivotZMm: tilt.pivotZMm,
    densityKgM3: rho,
  });
  // At the worst tilt an unstable float leans on the bore at its bottom rim and on the guide at the
  // collar's top: with the pad free to slide, the two side loads are equal, M / (collar top - rim).
  const overturningNm = Math.max(0, -stiffness) * ((tilt.maxAngleDeg * Math.PI) / 180);
  const guideSideLoadN = overturningNm / (f.heightMm * 1e-3);


  const vents = c.housing.vents;
  const notches = c.housing.drainNotches;
  const result: DirectSizing = {
    ok: true,
    inputs: { ...inp, demandLpd: inp.demandM3s * 8.64e7 },
    architecture: 'direct',
    mount: 'floor',
    footprintMm: c.housing.foot.outerDiameterMm,
    choice,
    lever: null,
    rim: null,
    ...sealFigures(b, worstWithoutStop),
    float: {
      outerDiameterMm: f.outerDiameterMm,
      heightMm: f.heightMm,
      cylinderHeightMm: f.cylinderHeightMm,
      volumeMm3: c.outerVolumeMm3,
      shellVolumeMm3: c.shellVolumeMm3,
      massG: c.massKg * 1e3,
      availableForceN: c.availableN,
      reserve: c.reserve,
      sealDepthAtHeadMaxMm: depthAt(b.forceAtHeadMaxN),
      sealDepthAtHeadMinMm: depthAt(b.forceAtHeadMinN),
      shellMm: f.shellMm,
      dryMassG: floatPlasticG,
      leakToleranceMl: leakToleranceMl(c.availableN, b.forceAtHeadMaxN, rho),
      levelRisePerMlMm: levelRisePerMl,
    },
    housing: {
      boreMm: c.housing.boreMm,
      outerDiameterMm: c.housing.outerDiameterMm,
      footDiameterMm: c.housing.foot.outerDiameterMm,
      heightMm: c.housing.heightMm,
      wallMm: c.housing.wallMm,
      massG: housingG,
    },
    nozzle: {
      tipHeightMm: c.tipMm,
      travelMm: c.travelMm,
      minimumTravelMm: b.minimumTravelMm,
      orificeMm: inp.orificeM * 1e3,
      sealDiameterMm: inp.sealDiameterM * 1e3,
      massG: nozzleG,
    },
    pin: { topHeightMm: c.pinTopMm, massG: pinG },
    levels: {
      targetMm: inp.targetLevelM * 1e3,
      shutOffAtHeadMaxMm: shutOffMax,
      shutOffAtHeadMinMm: shutOffMin,
      liftOffMm: c.pinTopMm + floatingDepth,
      firstTouchMm: c.sealBottomMm - deltaMm + floatingDepth,
      throttleStartMm: c.sealBottomMm - deltaMm + floatingDepth,
      contactMm: throttle.headMax.contactMm,
      flow50Mm: throttle.flow50Mm,
      flow10Mm: throttle.flow10Mm,
      flow1Mm: throttle.flow1Mm,
      heldAtDemandMm: throttle.heldAtDemandMm,
      heldAtDemandLowTankMm: throttle.heldAtDemandLowTankMm,
      lowTank: {
        throttleStartMm: c.sealBottomMm - deltaMm + floatingDepth,
        contactMm: throttle.headMin.contactMm,
        ...throttle.lowTank,
      },
      minimumReachableMm: c.minimumReachableMm,
      overflowMm: inp.overflowM === null ? null : inp.overflowM * 1e3,
    },
    ...flowFigures(inp, b.nozzle.totalLengthMm, flows, throttle),
    drain: {
      requiredAreaMm2: drainRequiredMm2,
      providedAreaMm2: notches.count * notches.widthMm * notches.heightMm,
      notchCount: notches.count,
    },
    vents: { count: vents.count, diameterMm: vents.diameterMm, areaMm2: vents.count * circleArea(vents.diameterMm) },
    holdDown: { upliftN, netWeightN, neededN, ballastSteelG: ballastG },
    tilt: {
      maxAngleDeg: tilt.maxAngleDeg,
      lipGapMm: tilt.lipGapMm,
      padOffsetMm: tilt.padOffsetMm,
      padMarginMm: tilt.padMarginMm,
      guide: 'collar-in-sleeve',
      guidePlayMm: b.guide.playMm,
      guideSideLoadN,
      stableWithoutGuide: stiffness > 0,
      hardStopIndentationMm: b.padStopIndentationMm,
    },
    mass: {
      totalG: housingG + nozzleG + pinG + floatPlasticG + padG,
      filamentM: plasticMm3 / circleArea(FILAMENT_DIAMETER_MM) / 1e3,
      byPart: { housing: housingG, float: floatPlasticG, nozzle: nozzleG, pin: pinG, pad: padG },
    },
    boundBy: outcome.boundBy,
    warnings: [...common, ...directWarnings(b, c, netWeightN, ballastG)],
    parts: {
      printClearanceMm: PRINT_CLEARANCE_MM,
      housing: c.housing,
      float: f,
      nozzle: b.nozzle,
      pin: c.pin,
      volumes: c.volumes,
      mount: {
        floatRestZMm: c.pinTopMm,
        floatSealZMm: c.sealBottomMm,
        nozzleTipZMm: c.tipMm,
        pinTopZMm: c.pinTopMm,
      },
    },
  };
  return result;
}
