/**
 * A way out written in the unit of the box it changes, so an inch box gets
 * inches: "28.5 mm" for "Water depth to hold" becomes "1.13 in" in imperial.
 * The value is rounded to the box's shown step away from the present value
 * (up when the way out raises it, down when it lowers it), so that the rounded
 * value still works: every way out is a bound the design works beyond
 * (generator/sizing/size-design.ts finds them by bisection on monotonic checks).
 * Fields the form does not show in another unit (print settings, the pad, the
 * bed) and values that do not parse are left as the sizing wrote them.
 */
import type { WayOut } from '../../generator/sizing/result.ts';
import { DEFAULT_DOCUMENT } from '../../generator/doc/schema.ts';
import { shownDecimals } from '../../generator/doc/shown-number.ts';
import { textInUnits } from '../../generator/doc/text-in-units.ts';
import { fromSi, parseQuantity } from '../../generator/doc/units.ts';
import { getAt, type Doc } from './doc-path.ts';
import { ALL_FIELDS } from './form-fields.ts';
import { documentUnit, unitFor, type UnitSystem } from './units-system.ts';

type Change = { field: string; value: string };

/** The change in the box's unit, or null when the box shows the value's own unit (or it does not parse). */
function changeInUnits(change: Change, message: string, doc: Doc, system: UnitSystem): Change | null {
  const def = ALL_FIELDS.find((f) => f.path === change.field);
  const unit = def && unitFor(def, system);
  if (!def || !unit || unit === def.metric) return null;
  const wanted = parseQuantity(change.value, def.kind);
  if (!wanted.ok || wanted.quantity.unit === unit || wanted.quantity.dimension === 'pressure') return null;
  const present = parseQuantity(getAt(doc, def.path) ?? getAt(DEFAULT_DOCUMENT, def.path), def.kind, documentUnit(def.path) || undefined);
  const raise = present.ok ? wanted.quantity.si > present.quantity.si : /at least|higher|wider|larger/.test(message);
  const value = fromSi(wanted.quantity.si, unit);
  const decimals = shownDecimals(value, unit);
  const step = 10 ** -decimals;
  const rounded = (raise ? Math.ceil(value / step - 1e-9) : Math.floor(value / step + 1e-9)) * step;
  return { field: change.field, value: `${Number(rounded.toFixed(decimals))} ${unit}` };
}

export function wayOutInUnits(way: WayOut, doc: Doc, system: UnitSystem): WayOut {
  if (system === 'metric') return way;
  const changes: Change[] = [way, ...(way.also ?? [])];
  const converted = changes.map((c) => changeInUnits(c, way.message, doc, system));
  // a way out into a box kept in millimetres (print settings, the bed) keeps its words as written
  if (!converted[0]) return way;
  let message = way.message;
  changes.forEach((c, i) => {
    if (converted[i]) message = message.split(c.value).join(converted[i]!.value);
  });
  const [main, ...also] = changes.map((c, i) => converted[i] ?? c);
  return { ...way, value: main.value, message: textInUnits(message, system), ...(way.also ? { also: also.map(({ field, value }) => ({ field, value })) } : {}) };
}
