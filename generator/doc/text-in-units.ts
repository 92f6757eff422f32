/**
 * Quantities written in a sentence (messages, warnings, the build sheet),
 * rewritten in US customary units for a grower who chose imperial:
 * "drops 32.0 mm" -> "drops 1.26 in", "2.2 m" -> "7.22 ft", "66 g" -> "2.33 oz",
 * "3.0 L/day" -> "0.79 gal/day", "30 kPa" -> "4.35 psi", "55 °C" -> "131 °F".
 * Metric text is returned as it is.
 *
 * Lengths under 10 mm stay in millimetres: that is the scale of print settings,
 * bores and fits, which the workbench keeps in millimetres in both systems
 * (slicers work in mm); areas in mm2 likewise. A range or a pair shares its unit
 * ("2-3 mm", "220 x 220 mm") and is converted whole. A quantity already followed
 * by its imperial value ("3.05 m is about 10 ft") is left alone. In a page, a
 * table's value and unit cells are converted together.
 *
 * Factors: NIST SP 811 (2008), appendix B: 1 in = 25.4 mm, 1 ft = 0.3048 m,
 * 1 oz = 28.349523125 g, 1 lb = 0.45359237 kg, 1 psi = 6.894757 kPa,
 * 1 US gal = 3.785411784 L, 1 US fl oz = 29.5735295625 mL, 1 in3 = 16.387064 cm3; degrees
 * Fahrenheit = 1.8 x degrees Celsius + 32.
 * Rounding: shownNumber (the unit's everyday step, at least three significant digits), and no more
 * than one significant digit beyond the number as written.
 */
import { roundShown } from './shown-number.ts';

export type TextUnits = 'metric' | 'imperial';

interface Rewrite {
  to: string;
  convert: (x: number) => number;
  /** the group is left as written when every number in it is below this */
  keepBelow?: number;
}

const US_GALLON_L = 3.785411784;
const REWRITES: Record<string, Rewrite | null> = {
  'L/day': { to: 'gal/day', convert: (x) => x / US_GALLON_L },
  'L/h': { to: 'gal/h', convert: (x) => x / US_GALLON_L },
  'L a day': { to: 'gal a day', convert: (x) => x / US_GALLON_L },
  'mm²': null,
  mm2: null,
  'm²': { to: 'ft²', convert: (x) => x / 0.3048 ** 2 },
  m2: { to: 'ft2', convert: (x) => x / 0.3048 ** 2 },
  mm: { to: 'in', convert: (x) => x / 25.4, keepBelow: 10 },
  cm: { to: 'in', convert: (x) => x / 2.54 },
  mL: { to: 'fl oz', convert: (x) => x / 29.5735295625 },
  cm3: { to: 'in3', convert: (x) => x / 16.387064 },
  m: { to: 'ft', convert: (x) => x / 0.3048 },
  kg: { to: 'lb', convert: (x) => x / 0.45359237 },
  g: { to: 'oz', convert: (x) => x / 28.349523125 },
  kPa: { to: 'psi', convert: (x) => x / 6.894757 },
  '°C': { to: '°F', convert: (x) => x * 1.8 + 32 },
};

const NUM = String.raw`\d+(?:\.\d+)?`;
const SEP = String.raw`(?:\s*[x×\-–]\s*|\s+to\s+)`;
const UNIT_ALTERNATIVES = Object.keys(REWRITES)
  .sort((a, b) => b.length - a.length)
  .map((u) => u.replace(/[/.]/g, '\\$&').replace(/ /g, '\\s'))
  .join('|');
const QUANTITY = new RegExp(String.raw`(?<![\w.])(${NUM}(?:${SEP}${NUM})*)\s?(${UNIT_ALTERNATIVES})(?![\w²³/])`, 'g');
/** an imperial value right after: the text already gives both */
const ALREADY_BOTH = /^\s*(?:is about|\(|,|or|=)\s*(?:about\s*)?\d[\d.]*\s*(?:ft|in|psi|oz|lb|gal|°F)\b/;

export function textInUnits(text: string, system: TextUnits): string {
  if (system === 'metric') return text;
  return text.replace(QUANTITY, (match: string, group: string, unit: string, offset: number, whole: string) => {
    const rewrite = REWRITES[unit.replace(/\s/g, ' ')];
    if (!rewrite) return match;
    const numbers = group.match(/\d+(?:\.\d+)?/g)!.map(Number);
    if (rewrite.keepBelow !== undefined && Math.max(...numbers) < rewrite.keepBelow) return match;
    if (ALREADY_BOTH.test(whole.slice(offset + match.length, offset + match.length + 30))) return match;
    return `${convertNumbers(group, rewrite)} ${rewrite.to}`;
  });
}

/**
 * Every number in `text` converted (a percentage is left as it is), rounded by shownNumber and to at most
 * one significant digit more than it was written with (754 m is 2474 ft, not 2473.75 ft).
 */
function convertNumbers(text: string, rewrite: Rewrite): string {
  const unitKey = rewrite.to.replace(' a day', '/day').replace('²', '2');
  return text.replace(/\d+(?:\.\d+)?(?!\d|\.\d|\s*%)/g, (n) => {
    const written = n.replace('.', '').replace(/^0+/, '').length;
    return String(Number(roundShown(rewrite.convert(Number(n)), unitKey).toPrecision(Math.max(3, written + 1))));
  });
}

/** A table row whose last two cells are a value and its unit ("<td>68.2 (30.6)</td><td>mm</td></tr>"). */
const VALUE_AND_UNIT_CELLS = /<td>([^<]*)<\/td><td>([^<]+)<\/td><\/tr>/g;

function cellsInUnits(page: string): string {
  return page.replace(VALUE_AND_UNIT_CELLS, (match: string, value: string, unit: string) => {
    const rewrite = REWRITES[unit];
    if (!rewrite) return match;
    const numbers = (value.match(/\d+(?:\.\d+)?(?!\d|\.\d|\s*%)/g) ?? []).map(Number);
    if (!numbers.length || (rewrite.keepBelow !== undefined && Math.max(...numbers) < rewrite.keepBelow)) return match;
    return `<td>${convertNumbers(value, rewrite)}</td><td>${rewrite.to}</td></tr>`;
  });
}

/** The same for an HTML page: text between tags only (never a tag, a style sheet or a script). */
export function htmlInUnits(page: string, system: TextUnits): string {
  if (system === 'metric') return page;
  let inRaw = false;
  return cellsInUnits(page)
    .split(/(<[^>]*>)/)
    .map((part) => {
      if (part.startsWith('<')) {
        if (/^<(style|script)\b/i.test(part)) inRaw = true;
        else if (/^<\/(style|script)\b/i.test(part)) inRaw = false;
        return part;
      }
      return inRaw ? part : textInUnits(part, system);
    })
    .join('');
}
