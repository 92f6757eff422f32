/**
 * The document as it is sized, saved to a file and put in a link: the form's
 * document less what is not in use yet. A bench row with an empty box, and one
 * of the two refill boxes without the other, wait for the grower instead of
 * stopping the sizing (clearing "Water surface area" must not stop it).
 */
import { getAt, setAt, type Doc } from './doc-path.ts';
import { loneRefillBox } from './lone-refill-box.ts';

const blank = (v: unknown) => v === undefined || v === null || (typeof v === 'string' && v.trim() === '');

export function docToSize(doc: Doc): Doc {
  let out = doc;
  const points = getAt(out, 'seal.calibration');
  if (Array.isArray(points)) {
    const kept = points.filter((p) => !(p && typeof p === 'object' && (blank((p as Doc).head) || blank((p as Doc).mass))));
    out = setAt(out, 'seal.calibration', kept.length ? kept : undefined);
  }
  const lone = loneRefillBox(out);
  if (lone) out = setAt(out, lone, undefined);
  return out;
}
