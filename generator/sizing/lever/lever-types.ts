/**
 * The lever valve's part dimensions, mm. Mounted frame: x along the arm from the
 * pivot axis towards the float, y across, z up; the arm level (as at the seal).
 */
import type { FloatSpec, NozzleSpec, PinSpec } from '../result.ts';
import type { DesignBasis } from '../layout/design-basis.ts';
import type { RimMountSpec } from '../rim/rim-mount-spec.ts';

/**
 * The arm: a straight bar whose top face is z = 0. Around the pivot a deeper eye
 * block carries the pin hole (axis y, its pointed roof facing down mounted, up in
 * the print, which lies top face down); at the pad arm a square table carries the
 * pad pocket; at the float arm a round tongue hangs under the bar into the
 * float's socket.
 */
export interface LeverArmSpec {
  padArmMm: number;
  floatArmMm: number;
  /** bar: width (y), depth (z, down from the top face), from x = tailXMm to x = tipXMm */
  barWidthMm: number;
  barDepthMm: number;
  tailXMm: number;
  tipXMm: number;
  /** eye block: x from tailXMm (its heel, the rest stop) to eyeHalfLengthMm, depth eyeDepthMm from the top face */
  eyeHalfLengthMm: number;
  eyeDepthMm: number;
  /** pin hole: nominal diameter (pin + 2 clearances), centre depth below the top face, roof angle */
  holeDiameterMm: number;
  holeCentreDepthMm: number;
  holeRoofAngleDeg: number;
  /** pad table: square of side 2 * tableHalfSideMm centred on the pad arm, bar depth */
  tableHalfSideMm: number;
  /** pad pocket in the top face at the pad arm */
  pocketDiameterMm: number;
  pocketDepthMm: number;
  /** round tongue under the bar at the float arm, into the float's socket */
  tongueDiameterMm: number;
  tongueLengthMm: number;
}

/**
 * The frame that carries the nozzle and the pivot: two cheeks either side of the
 * arm around the pivot (the pin crosses both), a back wall joining them behind
 * the pivot, a deck over the arm from the back wall to past the nozzle, with the
 * nozzle seat and its boss as in the direct valve's housing. On the floor the
 * cheeks stand on anchor wings (a plate each side and one behind, each with an
 * anchor slot open to its edge, carried by 50-degree wedges so that they print deck down without
 * support); on the rim the back wall takes the stem's two screws.
 */
export interface LeverFrameSpec {
  mount: 'floor' | 'rim';
  wallMm: number;
  /** gap between the cheeks (arm width + 2 clearances) and the frame's width over the cheeks */
  cheekGapMm: number;
  widthMm: number;
  /** cheeks span x in [-postHalfLengthMm, postHalfLengthMm], z from cheekBottomZMm to the deck; the back wall is one wall behind them */
  postHalfLengthMm: number;
  cheekBottomZMm: number;
  /** pivot axis height, mm above the floor; pin hole diameter (its pointed roof faces down mounted) */
  pivotZMm: number;
  pinHoleDiameterMm: number;
  holeRoofAngleDeg: number;
  /** deck: x from the back wall's back face (-postHalfLengthMm - wallMm) to deckFrontXMm, width deckWidthMm */
  padArmMm: number;
  deckFrontXMm: number;
  deckWidthMm: number;
  deckBottomZMm: number;
  deckThicknessMm: number;
  /** nozzle seat through deck and boss at x = pad arm */
  seatBoreMm: number;
  bossOuterDiameterMm: number;
  bossHeightMm: number;
  /** floor: anchor wings wingMm wide, plate footThicknessMm, wedge wingMm tan(50deg) tall, anchor slots anchorDiameterMm wide, open to the wings' edges; 0 on the rim */
  wingMm: number;
  /** floor: whether a third wing, with its anchor slot, runs across the back (false on the rim) */
  backWing: boolean;
  footThicknessMm: number;
  anchorDiameterMm: number;
  /** rim: the stem's two screws go into pilot holes through the back wall, pitch apart, the upper one stemUpperHoleZMm high */
  stemPilotDiameterMm: number;
  stemPitchMm: number;
  stemUpperHoleZMm: number;
  /**
   * the pad's hard stop: a block hanging from the deck's front edge over the arm (x from stopFrontXMm - stopLengthMm
   * to stopFrontXMm = deckFrontXMm, stopWidthMm across), its face stopBottomZMm above the floor; the arm's top
   * meets it when the pad is indented padStopIndentationMm
   */
  stopLengthMm: number;
  stopWidthMm: number;
  stopBottomZMm: number;
  /** the plan's back edge (wings or back wall) and its width there */
  footBackXMm: number;
  footWidthMm: number;
  heightMm: number;
}

/** What the lever search needs from the direct valve's design basis (DesignBasis, generator/sizing/layout). */
export type LeverBasisFields = Pick<
  DesignBasis,
  'inputs' | 'nozzle' | 'deckThicknessMm' | 'bossHeightMm' | 'padProudMm' | 'floatShellMm' | 'minimumTravelMm' | 'preferredTravelMm'
>;

export interface LeverBasis {
  basis: LeverBasisFields;
  /** force at the pad for a tight seal at a head (DesignBasis.sealForceN once the seal model lands), N */
  sealForceN: (headM: number) => number;
  /** pad indentation at the tight seal, mm (DesignBasis.indentationMm once the seal model lands) */
  indentationMm: number;
  /** indentation at which a hard stop takes the float's further push, mm (DesignBasis.padStopIndentationMm once it lands; until then 25 % of the pad) */
  padStopIndentationMm: number;
}

/** One laid-out lever valve and what it fails, if anything. */
export interface LeverCandidate {
  mount: 'floor' | 'rim';
  arm: LeverArmSpec;
  frame: LeverFrameSpec;
  float: FloatSpec;
  pin: PinSpec;
  nozzle: NozzleSpec;
  /** hanger and slotted stem, on the rim */
  rim: RimMountSpec | null;
  /** mechanical advantage a_float / a_pad */
  ratio: number;
  floatMassKg: number;
  /** float's own lift at full submersion, N */
  floatAvailableN: number;
  /** pad force available with the float fully under (closing, friction included) over the force needed at H_max */
  reserve: number;
  /** float push needed at H_max and H_min (closing), N, and the pad forces, N */
  floatPushAtHeadMaxN: number;
  padForceAtHeadMaxN: number;
  padForceAtHeadMinN: number;
  /** submerged depth of the float at the seal, H_max, mm */
  sealDepthMm: number;
  /** float bottom at the seal (H_max), pad face (nozzle tip), pivot axis, mm above the floor (or the mount's datum) */
  floatBottomZMm: number;
  tipZMm: number;
  pivotZMm: number;
  /** shut-off levels (water rising) at H_max and H_min, mm */
  shutOffAtHeadMaxMm: number;
  shutOffAtHeadMinMm: number;
  /** friction band on the level at H_max, mm (the valve reopens this much lower) */
  hysteresisMm: number;
  pivotReactionN: number;
  frictionTorqueNmm: number;
  /** arm's weight (dry, with the pad) and its centroid, mm from the pivot */
  armWeightN: number;
  armCentroidMm: number;
  /** pad face tilt and open lip at first touch, slide over the last turn */
  padTiltDeg: number;
  lipGapMm: number;
  padSlideMm: number;
  /** pad travel at rest (the arm on its stop, or the float on the floor), mm; the float's lowest point then */
  restTravelMm: number;
  restLowestZMm: number;
  /**
   * how much higher the whole valve, and so the level, would have to sit for the pad to drop the minimum travel
   * with the float clear of the floor, mm (0 when it does; Infinity when the arm's stop alone allows less)
   */
  travelShortfallMm: number;
  /** widest extent seen from above, mm */
  footprintMm: number;
  /** printed volumes, mm3; pad mass kg; total printed plus pad, kg */
  volumes: { armMm3: number; frameMm3: number; floatMm3: number; nozzleMm3: number; pinMm3: number };
  /**
   * flooded: uplift of the whole valve (N; positive: it would float off), the moment tipping it up about
   * the foot's back edge (N mm), and what holds it with the direct valve's 1.5 on the flood uplift: the
   * anchors' pull (N) or steel ballast at the anchors (g); on the rim the hanger must hold 1.5 x the uplift
   * on the wall (anchorForceN) and takes the moment through the stem, so no ballast
   */
  holdDown: { upliftN: number; tippingMomentNmm: number; anchorForceN: number; ballastSteelG: number };
  padMassKg: number;
  totalMassKg: number;
  violations: LeverConstraint[];
}

export type LeverConstraint =
  | 'float-shape'
  | 'reserve'
  | 'seal-in-cylinder'
  | 'travel'
  | 'float-clearance'
  | 'arm-clearance'
  | 'pad-arc'
  | 'outer-diameter-limit'
  | 'part-size'
  | 'rim-height'
  | 'bed-size'
  | 'pad-stop';
