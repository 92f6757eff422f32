/**
 * Errors on the box the grower changed. A check between two boxes (tank low
 * at most tank full, nozzle hole narrower than its lip, wall at least two
 * lines) is reported by the schema on one box of the pair; when the grower
 * changed the other one last, the message moves there, led by a sentence that
 * names the box it clashes with.
 *
 * `errors`: messages by document path (from parseDesign); `editedAt`: when each
 * path was last typed in (any increasing count; a path never typed in counts as
 * oldest). Returns a new map; `errors` is not changed.
 */
import { labelFor } from './field-label.ts';

interface Pair {
  /** the box the schema reports the clash on */
  reportedOn: string;
  /** the other box of the check */
  partner: string;
  /** tells the clash from the reported box's own range error */
  clash: RegExp;
  /** the lead sentence on the partner's box */
  lead: string;
}

const PAIRS: readonly Pair[] = [
  { reportedOn: 'supply.headMin', partner: 'supply.headMax', clash: /supply\.headMax|tank full|highest head/i, lead: `Now lower than "${labelFor('supply.headMin')}".` },
  { reportedOn: 'nozzle.orifice', partner: 'nozzle.sealDiameter', clash: /nozzle\.sealDiameter|lip/i, lead: `Now not wider than "${labelFor('nozzle.orifice')}".` },
  { reportedOn: 'print.wall', partner: 'print.lineWidth', clash: /line width/i, lead: `"${labelFor('print.wall')}" must be at least two of these.` },
];

export function placeErrors(errors: Readonly<Record<string, string>>, editedAt: ReadonlyMap<string, number>): Record<string, string> {
  const out = { ...errors };
  for (const pair of PAIRS) {
    const message = out[pair.reportedOn];
    if (message === undefined || out[pair.partner] !== undefined || !pair.clash.test(message)) continue;
    if ((editedAt.get(pair.partner) ?? -1) <= (editedAt.get(pair.reportedOn) ?? -1)) continue;
    delete out[pair.reportedOn];
    out[pair.partner] = `${pair.lead} ${message}`;
  }
  return out;
}
