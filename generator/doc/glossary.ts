/**
 * The words floatwright uses for the parts and figures of a valve: one name
 * per thing, used the same way on screen, in messages, on the build sheet and
 * in the text report, each with a short explanation (the workbench shows it on
 * hover and keyboard focus; the build sheet lists the ones it uses).
 *
 * `trade` is the word the trade uses when ours differs ("orifice" for the
 * nozzle hole), so a grower who meets it elsewhere can find it here. Names are
 * lower case; a label starts them with a capital. The explanations are ours;
 * figures in them are worked below where they are given.
 */
export interface Term {
  /** the one name, as written mid-sentence */
  name: string;
  /** one or two plain sentences */
  explain: string;
  /** the trade's own word for it, when ours differs */
  trade?: string;
}

/**
 * 1 m of water is 998.2 kg/m3 x 9.80665 m/s2 x 1 m = 9.79 kPa (hydrostatics, p = rho g h; water at 20 degC,
 * the schema's default density); 1 ft of water: 2.98 kPa = 0.433 psi (1 psi = 6894.757 Pa, NIST SP 811).
 */
export const GLOSSARY = {
  head: {
    name: 'head',
    explain:
      "How high the tank's water surface stands above the valve's nozzle. It is what pushes the water through: each metre of head pushes with about 9.8 kPa (each foot about 0.43 psi).",
  },
  'tank-full': {
    name: 'tank full',
    explain: 'The head with the tank at its fullest. The valve is sized to shut tight against it.',
  },
  'tank-low': {
    name: 'tank low',
    explain: 'The head when the tank has run as low as you let it. The valve fills most slowly then.',
  },
  'feed-tube': {
    name: 'feed tube',
    explain: "The tube from the tank to the valve. It pushes over the barb on the valve's top; its width and length slow the flow.",
  },
  barb: {
    name: 'barb',
    explain: "The ridged spout on top of the valve. The feed tube pushes over it and the ridges grip the tube's inside.",
  },
  'nozzle-hole': {
    name: 'nozzle hole',
    trade: 'orifice',
    explain: 'The hole through the nozzle that the water runs through. A wider hole fills faster but needs a bigger float to shut.',
  },
  'nozzle-lip': {
    name: 'nozzle lip',
    explain: 'The raised ring round the nozzle hole. The seal pad presses on it to shut the water off; the wider the lip, the harder the float must push.',
  },
  'seal-pad': {
    name: 'seal pad',
    explain: 'The soft disc in the top of the float that presses on the nozzle lip and stops the water.',
  },
  'pad-squeeze': {
    name: 'pad squeeze',
    explain: 'How far the nozzle lip presses into the seal pad when the valve is shut. A little squeeze seals; too much tires the pad, so a stop takes over.',
  },
  'spare-lift': {
    name: 'spare lift',
    explain:
      'How many times over the float can give the push needed to shut at tank full. Above 1 it still shuts after the float takes in a little water or the pad stiffens with age.',
  },
  'throttle-band': {
    name: 'throttle band',
    explain:
      'The rise in water level over which the valve goes from wide open to shut tight. The pad first touches the lip at its foot; in use the level settles inside it, where the inflow matches what the plants drink.',
  },
  'shut-tight': {
    name: 'shut tight',
    explain: 'The level at which the pad seals the lip and the flow stops altogether: the highest the water rises.',
  },
  'water-depth': {
    name: 'water depth to hold',
    explain: 'The depth of water above the container floor that the valve is sized for: it shuts tight there with the tank full.',
  },
  'retainer-pin': {
    name: 'retainer pin',
    explain: 'The pin across the housing near its base. The float rests on it when the water is low and cannot fall out.',
  },
  'drain-slots': {
    name: 'drain slots',
    explain: 'Notches round the foot of the housing that let water in and out under the float, so the float follows the level.',
  },
  'air-vents': {
    name: 'air vents',
    explain: 'Holes in the top of the housing that let air out as the water rises inside, so the float is not held down by trapped air.',
  },
  'hold-down': {
    name: 'hold-down',
    explain: 'What keeps the valve on the floor if the container floods and the float pushes up: steel on the foot, or pins or screws through the anchor holes.',
  },
  'bench-points': {
    name: 'bench points',
    explain: 'Your own test of your pad: at two or more heads, the smallest weight on the pad that stops the flow. With them, the sizing uses your pad instead of book values.',
  },
  'rim-height': {
    name: 'rim height',
    explain:
      "The top of the container's wall, measured from its floor. Given it, the valve can hang from the rim on a hanger, with a slotted stem that trims the level about 10 mm up or down after printing.",
  },
  'valve-kind': {
    name: 'valve kind',
    explain:
      'Direct: the float sits under the nozzle and pushes the pad straight up. On an arm: the float rides at the end of a pivoted arm with the pad near the pivot, so the arm multiplies its push; it suits shallow water.',
  },
  main: {
    name: 'main',
    explain: "The one pipe from the tank that every group's branch tube tees off. Its width and length share the tank's head out among the groups.",
  },
  branch: {
    name: 'branch tube',
    explain: "The tube from a tee on the main to one group's valves. Each group has its own.",
  },
  starves: {
    name: 'starves',
    explain:
      "A group starves when, with every valve on the bench open at once, it gets less than its plants' peak use, or less than a set share (half, unless the bench file says otherwise) of the flow it gets alone.",
  },
  'line-width': {
    name: 'line width',
    explain: "The width of one line of plastic your printer lays (your slicer's extrusion width). Walls are whole numbers of lines.",
  },
} as const satisfies Record<string, Term>;

export type TermKey = keyof typeof GLOSSARY;

/** The term's one name; `capital` starts it with a capital letter, for labels and headings. */
export function termName(key: TermKey, capital = false): string {
  const name: string = GLOSSARY[key].name;
  return capital ? name[0].toUpperCase() + name.slice(1) : name;
}

/** "Nozzle hole (orifice): The hole ...": the term, its trade word, its explanation, for lists of words. */
export function termLine(key: TermKey): string {
  const term: Term = GLOSSARY[key];
  return `${termName(key, true)}${term.trade ? ` (${term.trade})` : ''}: ${term.explain}`;
}

/**
 * The glossary words a text uses (whole words, any case), in glossary order: for a list of the words a
 * sheet or report uses, with their explanations.
 */
export function termsUsedIn(text: string): TermKey[] {
  return (Object.keys(GLOSSARY) as TermKey[]).filter((key) => new RegExp(`\\b${GLOSSARY[key].name.replace(/[-]/g, '\\-')}\\b`, 'i').test(text));
}
