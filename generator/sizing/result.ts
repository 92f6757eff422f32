/**
 * What the sizing core returns. Millimetres, grams, newtons and litres per
 * hour here (the unit is in every name); the solids are built from `parts`
 * alone, so every dimension a builder needs is in it.
 */
import type { Architecture, DesignInputs, Mount } from './inputs.ts';
import type { LeverArmSpec, LeverFrameSpec } from './lever/lever-types.ts';
import type { RimMountSpec } from './rim/rim-mount-spec.ts';

export interface Warning {
  /** stable machine-readable code, e.g. "tilt-gap" */
  code: string;
  /** one plain sentence for the grower */
  message: string;
}

/** Float: closed hollow shell, flat bottom, 50-degree cone, guide collar whose top is the plateau with the pad pocket. Mounted z up, bottom at 0. */
export interface FloatSpec {
  outerDiameterMm: number;
  /** cylindrical part's height (h_c) */
  cylinderHeightMm: number;
  /** 50-degree cone height (h_k = (D_f/2 - collar radius) tan 50deg) */
  coneHeightMm: number;
  /** the guide collar's height above the cone (a vertical cylinder of plateauRadiusMm) */
  collarHeightMm: number;
  /** total printed height h_f = h_c + h_k + collar (pad not included) */
  heightMm: number;
  /** radius of the guide collar, whose top is the plateau */
  plateauRadiusMm: number;
  /** shell wall (side, bottom and cone normal thickness) */
  shellMm: number;
  /**
   * cavity: inner cylinder radius, bottom z, z where the inner cone starts and where it ends, roof z, roof radius;
   * with a guide collar the cone closes to a point (top = roof z, roof radius 0: no bridge), without one it ends at a flat roof
   */
  cavityRadiusMm: number;
  cavityBottomZMm: number;
  cavityConeStartZMm: number;
  cavityConeTopZMm: number;
  cavityRoofZMm: number;
  cavityRoofRadiusMm: number;
  /** pad pocket cut into the plateau top */
  pocketRadiusMm: number;
  pocketDepthMm: number;
  /** seal pad disc that sits in the pocket */
  padDiameterMm: number;
  padThicknessMm: number;
  /** how far the pad stands above the plateau */
  padProudMm: number;
}

export interface HousingSpec {
  boreMm: number;
  wallMm: number;
  outerDiameterMm: number;
  /** overall height, base to top of the seat boss */
  heightMm: number;
  /** underside of the deck (nozzle shoulder rests against it) */
  deckBottomZMm: number;
  deckThicknessMm: number;
  /** seat: bore through deck and boss for the nozzle collar */
  seatBoreMm: number;
  bossOuterDiameterMm: number;
  bossHeightMm: number;
  vents: { count: number; diameterMm: number; circleRadiusMm: number };
  /** drain notches at the bottom rim, from z = 0 up, cut radially through tube and foot */
  drainNotches: { count: number; widthMm: number; heightMm: number; angleOffsetDeg: number };
  /** two opposed horizontal teardrop holes for the retainer pin (axis along x); the teardrop tip points down when mounted (up in print) */
  pinHoles: { diameterMm: number; centerZMm: number };
  /**
   * The float's guide (mounted z): the boss (bossOuterDiameterMm) goes on down as a sleeve of
   * bore boreMm to its mouth at mouthZMm; inside it, a stop ring of bore stopBoreMm reaches
   * down to stopZMm, where the float's collar top lands at the pad's hard-stop indentation.
   * Air slots (width, count, from the mouth up to riseMm into the boss) keep the sleeve vented.
   */
  guide: {
    boreMm: number;
    mouthZMm: number;
    stopZMm: number;
    stopBoreMm: number;
    slots: { count: number; widthMm: number; riseMm: number; angleOffsetDeg: number };
  };
  /** foot: flat flange from z = 0, then a flare at FOOT_FLARE_DEG (60 degrees) back to the tube */
  foot: {
    outerDiameterMm: number;
    flangeThicknessMm: number;
    flareWidthMm: number;
    anchorHoles: { count: number; diameterMm: number; circleRadiusMm: number; angleOffsetDeg: number };
  };
}

/** Nozzle insert, mounted z up with the sealing face at z = 0 (printed tip down as is). */
export interface NozzleSpec {
  orificeMm: number;
  /** lip: flat sealing ring, outer diameter d_s */
  lipDiameterMm: number;
  lipHeightMm: number;
  /** 50-degree flare from the lip out to the shoulder */
  shoulderDiameterMm: number;
  shoulderHeightMm: number;
  /** collar pressed into the seat; crush ribs stand proud of it */
  collarDiameterMm: number;
  collarLengthMm: number;
  crushRibs: { count: number; heightMm: number; baseWidthMm: number };
  /** barb for the supply tube: a short stem then `count` teeth (50-degree step out, long taper in) */
  barb: { stemLengthMm: number; rootDiameterMm: number; crestDiameterMm: number; taperLengthMm: number; count: number };
  /** how far the sealing face sits below the deck underside */
  protrusionMm: number;
  totalLengthMm: number;
}

/** Retainer pin: a round bar with a flat along its length (printed on the flat) and a tab head. Axis along x. */
export interface PinSpec {
  diameterMm: number;
  /** distance from the axis to the flat (r cos 50deg keeps every overhang at 50 degrees or steeper) */
  flatOffsetMm: number;
  lengthMm: number;
  head: { lengthMm: number; widthMm: number; heightMm: number };
}

export interface PartVolumes {
  housingMm3: number;
  floatMm3: number;
  nozzleMm3: number;
  pinMm3: number;
}

export interface PartsSpec {
  printClearanceMm: number;
  housing: HousingSpec;
  float: FloatSpec;
  nozzle: NozzleSpec;
  pin: PinSpec;
  /** analytic solid volumes (exact for true circles) */
  volumes: PartVolumes;
  /** mounted positions, z up from the housing base */
  mount: {
    /** float bottom when resting on the pin */
    floatRestZMm: number;
    /** float bottom when sealed at H_max */
    floatSealZMm: number;
    nozzleTipZMm: number;
    pinTopZMm: number;
  };
}

/** One architecture and mount the sizing weighed, with its printed plastic or why it does not fit. */
export interface ChoiceOption {
  architecture: Architecture;
  mount: Mount;
  /** printed plastic, g (the pad not counted: it is cut, not printed); null when it does not fit */
  plasticG: number | null;
  /** one plain sentence: what it weighs, or why not */
  note: string;
}

/**
 * How the architecture and the mount were settled: fixed by the document, the direct valve because it fits
 * ("auto" keeps it wherever it does), or the least plastic of those that fit.
 */
export interface Choice {
  by: 'document' | 'direct-first' | 'least-plastic';
  /** one or two plain sentences for the grower */
  reason: string;
  options: ChoiceOption[];
}

/** What every sized valve reports, direct or lever. */
interface SizingCommon {
  ok: true;
  /** the inputs, with the demand also in litres per day */
  inputs: DesignInputs & { demandLpd: number };
  architecture: Architecture;
  mount: Mount;
  /** the valve's widest extent seen from above (what limits.maxOuterDiameter limits), mm */
  footprintMm: number;
  choice: Choice;
  /** the force the pad needs on the lip (for a lever: at the pad, the float's own push is float.availableForceN and lever.*) */
  closingForce: {
    atHeadMaxN: number;
    atHeadMinN: number;
    /** seating force F_seat (the bench fit's intercept when calibrated); same as seatN */
    preloadN: number;
    /** area the pressure acts on in the force model (gasket-factor area, or the calibration fit); same as modelAreaMm2 */
    sealAreaMm2: number;
    /** d_s equivalent to that area */
    equivalentSealDiameterMm: number;
    fromCalibration: boolean;
    /** area in the tight-seal force model: (pi/4) G^2 + 2 pi b G m, or the bench fit's */
    modelAreaMm2: number;
    /** seating force: max(y on the land, push that seats the pad 0.2 mm), or the bench fit's intercept */
    seatN: number;
    /** film force area of the land and the bore area, for comparison */
    filmAreaMm2: number;
    boreAreaMm2: number;
  };
  seal: {
    /** the pad's table name, e.g. "sponge grade 2" */
    padMaterial: string;
    /** what the pad is, with the source of its stiffness */
    padDescription: string;
    /** true when the sizing chose the pad (document: "auto" or nothing) */
    padChosen: boolean;
    /** compressive modulus used by the contact model, kPa */
    padStiffnessKpa: number;
    gasketFactor: number;
    seatingStressKpa: number;
    padThicknessMm: number;
    /** indentation and strain at the tight seal at H_max */
    indentationMm: number;
    strainAtSeal: number;
    /** indentation at the tight seal at H_min (less pressure: shallower) */
    indentationAtHeadMinMm: number;
    /** indentation at which the hard stop takes the float's push (25 % of the pad) */
    stopIndentationMm: number;
    /** largest strain in service (tank empty with the reservoir full; flooded), as the pad sees it behind the stop */
    worstStrain: number;
    /** the same without a stop: what the float alone would do to the pad */
    worstStrainWithoutStop: number;
  };
  pressure: { atHeadMaxKPa: number; atHeadMinKPa: number };
  float: {
    outerDiameterMm: number;
    heightMm: number;
    cylinderHeightMm: number;
    /** displaced volume at full submersion (outer envelope) */
    volumeMm3: number;
    /** printed plastic of the float shell */
    shellVolumeMm3: number;
    massG: number;
    /** the float's own lift fully submerged, N (for a lever: at the float, before the arm multiplies it) */
    availableForceN: number;
    /** available force over the force needed at H_max (for a lever: the pad force it gives, through the arm) */
    reserve: number;
    /** submerged depth when sealed at H_max and H_min */
    sealDepthAtHeadMaxMm: number;
    sealDepthAtHeadMinMm: number;
    /** shell thickness (four extrusion lines) */
    shellMm: number;
    /** printed float alone, dry, before the pad goes in: the weigh-soak-weigh test's reference */
    dryMassG: number;
    /** water the float can take in before it can no longer shut tight at full tank, mL */
    leakToleranceMl: number;
    /** rise of the tight shut-off level at full tank per mL taken in, mm */
    levelRisePerMlMm: number;
  };
  nozzle: { tipHeightMm: number; travelMm: number; minimumTravelMm: number; orificeMm: number; sealDiameterMm: number; massG: number };
  levels: {
    targetMm: number;
    shutOffAtHeadMaxMm: number;
    shutOffAtHeadMinMm: number;
    liftOffMm: number;
    firstTouchMm: number;
    /** throttling starts: the first touch (the same figure, by the name the characteristic uses), full tank, mm */
    throttleStartMm: number;
    /** the pad rests on the lip (the film down to the contact gap), full tank, mm */
    contactMm: number;
    /** levels at 50, 10 and 1 % of the open flow, full tank, mm */
    flow50Mm: number;
    flow10Mm: number;
    flow1Mm: number;
    /** level held at the container's demand (inputs.demandLpd), full tank and low tank, mm */
    heldAtDemandMm: number;
    heldAtDemandLowTankMm: number;
    /** the band at low tank */
    lowTank: { throttleStartMm: number; contactMm: number; flow50Mm: number; flow10Mm: number; flow1Mm: number };
    minimumReachableMm: number;
    /** the container's overflow height, when given (the tight shut-off at full tank stays 10 mm below it) */
    overflowMm: number | null;
  };
  flow: {
    /** open flow at full tank, nominal (drawn bore, linear friction bridge), L/h */
    atHeadMaxLph: number;
    /** the flow band at full tank: bore 0.2 mm small and the friction bridge's high end; drawn bore and its low end, L/h */
    atHeadMaxLowLph: number;
    atHeadMaxHighLph: number;
    /** the bore as a short tube (at least three bores long) or a sharp orifice */
    boreModel: 'short-tube' | 'orifice';
    /** the bore's length: the nozzle insert's whole length, mm */
    boreLengthMm: number;
    atHeadMinLph: number;
    reynoldsAtHeadMax: number;
    reynoldsAtHeadMin: number;
    regimeAtHeadMax: 'laminar' | 'transitional' | 'turbulent';
    fillTimeAtHeadMaxMin: number | null;
    fillTimeAtHeadMinMin: number | null;
  };
  /** the valve's characteristic Q(level) at full and low tank: from the float on its pin (open) to the tight shut-off (zero) */
  characteristic: { headMax: { levelMm: number; flowLph: number }[]; headMin: { levelMm: number; flowLph: number }[] };
  /**
   * fill time with the demand drawn, on the low end of the flow band at full tank, from (level held - reservoir.rise)
   * to 1 mm below the level held, min; null without reservoir.area and rise, or when the valve cannot outpace the demand
   */
  fill: { timeToHeldMin: number | null; fromLevelMm: number | null; toLevelMm: number | null };
  /** which constraints stopped a lighter design */
  boundBy: string[];
  warnings: Warning[];
}

/** The float pushing the pad straight up, in a housing standing on the floor. */
export interface DirectSizing extends SizingCommon {
  architecture: 'direct';
  mount: 'floor';
  lever: null;
  rim: null;
  housing: {
    boreMm: number;
    outerDiameterMm: number;
    footDiameterMm: number;
    heightMm: number;
    wallMm: number;
    massG: number;
  };
  pin: { topHeightMm: number; massG: number };
  /** drains sized on the high end of the flow band */
  drain: { requiredAreaMm2: number; providedAreaMm2: number; notchCount: number };
  vents: { count: number; diameterMm: number; areaMm2: number };
  holdDown: {
    upliftN: number;
    /** weight in the liquid of housing, insert and pin (negative: they float) */
    netWeightN: number;
    /** 1.5 uplift minus net weight, when positive */
    neededN: number;
    ballastSteelG: number;
  };
  /** the float pressed on the lip, tipped as far as its bore and guide allow (DESIGN "Tilt, guide and stability") */
  tilt: {
    /** worst tilt, pivot at the pad */
    maxAngleDeg: number;
    /** the lip's far-side gap at that tilt, d_s tan(theta) */
    lipGapMm: number;
    /** the pad centre's largest offset from the lip centre */
    padOffsetMm: number;
    /** pad radius minus lip radius */
    padMarginMm: number;
    /** what guides the float: its top collar sliding in a sleeve under the deck */
    guide: 'collar-in-sleeve';
    /** the collar's radial play in the sleeve: print clearance + running gap */
    guidePlayMm: number;
    /** side load on the guide at the worst tilt with the closing force at H_max (0 when the float stands up alone) */
    guideSideLoadN: number;
    /** whether the float, pressed on the lip with the closing force at H_max, would stand up without the guide */
    stableWithoutGuide: boolean;
    /** pad indentation at which the collar lands on the stop ring */
    hardStopIndentationMm: number;
  };
  mass: {
    /** printed parts and the pad, g */
    totalG: number;
    filamentM: number;
    byPart: { housing: number; float: number; nozzle: number; pin: number; pad: number };
  };
  parts: PartsSpec;
}

/** The lever's own figures (issue 13, size --json): mm, N. */
export interface LeverFigures {
  /** mechanical advantage a_float / a_pad */
  ratio: number;
  /** pivot axis above the container floor */
  pivotHeightMm: number;
  /** the arm from its heel to its tip */
  armLengthMm: number;
  /** the pivot's friction band on the level: the valve reopens this much below where it shut */
  hysteresisMm: number;
  padArmMm: number;
  floatArmMm: number;
  /** the float's push at the tight seal, full and low tank (closing, friction against it) */
  floatPushAtHeadMaxN: number;
  floatPushAtHeadMinN: number;
  /** pivot friction torque at the seal, full tank */
  frictionTorqueNmm: number;
  /** the arm with its pad: dry weight (above the water at the seal) and its centroid's distance from the pivot */
  armWeightN: number;
  armCentroidMm: number;
  /** the pad's tilt and the open lip at first touch (the arm turns the pad onto the lip) */
  padTiltDeg: number;
  lipGapMm: number;
  /** the pad's drop from the lip with the arm at rest */
  restTravelMm: number;
  /**
   * the pad force a float push gives through the arm (water rising: the arm's weight and the pivot's friction
   * against it), a straight line: pad force = perNewton x float push + offsetN (offsetN < 0: the arm's weight)
   */
  padForceFromPush: { perNewton: number; offsetN: number };
}

/** The rim mount's figures, mm, g. */
export interface RimFigures {
  /** the slotted stem's travel either way from the middle, after printing */
  adjustMm: number;
  rimHeightMm: number;
  wallThicknessMm: number;
  stemLengthMm: number;
  /** the valve's top as hung at the middle of the slot, above the container floor */
  valveTopZMm: number;
}

/** A lever valve's part dimensions and mounted positions, for the solids (z up from the container floor). */
export interface LeverPartsSpec {
  printClearanceMm: number;
  arm: LeverArmSpec;
  frame: LeverFrameSpec;
  float: FloatSpec;
  nozzle: NozzleSpec;
  /** the pivot pin (the retainer pin's shape, spanning the frame) */
  pin: PinSpec;
  rim: RimMountSpec | null;
  /** the seal pad disc in the arm's pocket */
  pad: { diameterMm: number; thicknessMm: number; proudMm: number };
  volumes: { armMm3: number; frameMm3: number; floatMm3: number; nozzleMm3: number; pinMm3: number; hangerMm3: number; stemMm3: number };
  mount: {
    pivotZMm: number;
    /** nozzle tip (sealing face) */
    nozzleTipZMm: number;
    /** float bottom with the arm level at the seal, full tank */
    floatSealZMm: number;
    /** the arm's turn, nose down, at rest, rad */
    restTurnRad: number;
  };
}

/** The float on an arm that multiplies its push, on the floor or hung from the rim. */
export interface LeverSizing extends SizingCommon {
  architecture: 'lever';
  lever: LeverFigures;
  rim: RimFigures | null;
  frame: { heightMm: number; widthMm: number; massG: number };
  arm: { massG: number };
  pin: { diameterMm: number; massG: number };
  /**
   * flooded: the valve's uplift (positive: it would float off), the moment tipping it about the foot's back edge,
   * and what holds it with 1.5 on the flood uplift: the anchors' pull or steel ballast at them (floor), or the
   * hanger's hold on the wall (rim)
   */
  holdDown: { upliftN: number; tippingMomentNmm: number; anchorForceN: number; ballastSteelG: number };
  mass: {
    totalG: number;
    filamentM: number;
    byPart: { frame: number; arm: number; float: number; nozzle: number; pin: number; pad: number; hanger: number; stem: number };
  };
  parts: LeverPartsSpec;
}

export type SizingSuccess = DirectSizing | LeverSizing;

export interface WayOut {
  /** document path of the setting to change, e.g. "level.target" */
  field: string;
  /** value that would make the design work, in the field's unit (as text with unit) */
  value: string;
  message: string;
  /** other fields to set with it, for the document's rules to hold (e.g. supply.headMin with a lower supply.headMax) */
  also?: { field: string; value: string }[];
}

export interface SizingFailure {
  ok: false;
  /** why no size works */
  reasons: Warning[];
  /** concrete changes that would make it work */
  waysOut: WayOut[];
  warnings: Warning[];
}

export type SizingResult = SizingSuccess | SizingFailure;
