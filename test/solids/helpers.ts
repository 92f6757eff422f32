/**
 * Shared by the solids tests: sized designs from the presets, and the
 * sizing core's analytic volumes evaluated for the facets the builders draw.
 *
 * Faceting (elementary geometry): a regular N-gon with its corners on a circle
 * of radius r has area (N/2) r^2 sin(2 pi / N) = k r^2 pi, k = N sin(2pi/N)/(2pi);
 * one with its flats on the circle (a hole drawn so a pin still fits) has
 * area N r^2 tan(pi / N) = k' r^2 pi, k' = N tan(pi/N)/pi. A circle of radius
 * r sqrt(k) (or r sqrt(k')) has the same area, so the analytic formulas fed with
 * those equal-area radii give the volume of the faceted solid (exactly for a
 * solid of revolution, to second order for cuts through curved walls).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseDesign, type NormalizedDoc } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import type { DirectSizing, SizingSuccess } from '../../generator/sizing/result.ts';
import { direct } from '../sizing/fixtures.ts';
import { housingVolumeMm3, nozzleVolumeMm3 } from '../../generator/sizing/parts/part-volumes.ts';
import { segmentsFor, type Quality } from '../../generator/solids/mesh/index.ts';

export const ROOT = fileURLToPath(new URL('../..', import.meta.url));

/** The design presets whose own choice is the direct valve (the housing's tests run on these). */
export function directPresetFiles(): string[] {
  return presetFiles().filter((f) => sizeAnyPreset(f).sizing.architecture === 'direct');
}

export function presetFiles(): string[] {
  return readdirSync(join(ROOT, 'presets'))
    .filter((f) => f.endsWith('.json'))
    .filter((f) => {
      // design presets only (a plan preset holds several designs)
      const doc = JSON.parse(readFileSync(join(ROOT, 'presets', f), 'utf8'));
      return doc && typeof doc === 'object' && 'supply' in doc && 'level' in doc;
    })
    .sort();
}

/** A document sized, whatever valve it gives. */
export function sizeAnyDoc(doc: unknown): { sizing: SizingSuccess; document: NormalizedDoc } {
  const parsed = parseDesign(doc);
  if (!parsed.ok) throw new Error(`design refused: ${JSON.stringify(parsed.errors)}`);
  const sizing = sizeDesign(parsed.inputs);
  if (!sizing.ok) throw new Error(`no size fits: ${JSON.stringify(sizing.reasons)}`);
  return { sizing, document: parsed.document };
}

/** A document sized as the direct valve (the housing's tests): asked for in the document, so whatever "auto" picks. */
export function sizeDoc(doc: unknown): { sizing: DirectSizing; document: NormalizedDoc } {
  const asked = doc && typeof doc === 'object' ? { ...(doc as Record<string, unknown>), valve: { ...((doc as { valve?: object }).valve ?? {}), architecture: 'direct', mount: 'floor' } } : doc;
  const { sizing, document } = sizeAnyDoc(asked);
  return { sizing: direct(sizing), document };
}

/** A preset sized as it stands (its own choice of valve). */
export function sizeAnyPreset(file: string): { sizing: SizingSuccess; document: NormalizedDoc } {
  return sizeAnyDoc(JSON.parse(readFileSync(join(ROOT, 'presets', file), 'utf8')));
}

/** A preset sized as the direct valve. */
export function sizePreset(file: string): { sizing: DirectSizing; document: NormalizedDoc } {
  return sizeDoc(JSON.parse(readFileSync(join(ROOT, 'presets', file), 'utf8')));
}

/** DESIGN's worked scale example (2.2 m head, 45 mm level, defaults). */
export const SCALE_EXAMPLE = { supply: { headMax: '2.2 m' }, level: { target: '45 mm' } };

/** Area ratio of an N-gon with corners on the circle. */
export const cornersOn = (n: number) => (n * Math.sin((2 * Math.PI) / n)) / (2 * Math.PI);
/** Area ratio of an N-gon with flats on the circle. */
export const flatsOn = (n: number) => (n * Math.tan(Math.PI / n)) / Math.PI;

/** Shoelace area of a closed polygon, counter-clockwise positive. */
export function shoelace(points: readonly (readonly [number, number])[]): number {
  let s = 0;
  for (let i = 0; i < points.length; i++) {
    const [x0, y0] = points[i];
    const [x1, y1] = points[(i + 1) % points.length];
    s += x0 * y1 - x1 * y0;
  }
  return s / 2;
}

/** Regular N-gon (corners on radius r, first corner on +x) clipped to y >= yMin (one Sutherland-Hodgman pass). */
export function clippedPolygon(r: number, n: number, yMin: number): [number, number][] {
  const ring: [number, number][] = Array.from({ length: n }, (_, k) => [r * Math.cos((2 * Math.PI * k) / n), r * Math.sin((2 * Math.PI * k) / n)]);
  const out: [number, number][] = [];
  for (let i = 0; i < n; i++) {
    const a = ring[i];
    const b = ring[(i + 1) % n];
    const ina = a[1] >= yMin;
    const inb = b[1] >= yMin;
    if (ina) out.push(a);
    if (ina !== inb) {
      const t = (yMin - a[1]) / (b[1] - a[1]);
      out.push([a[0] + t * (b[0] - a[0]), yMin]);
    }
  }
  return out;
}

/** Analytic volumes for the faceted parts (helpers.ts explains the equal-area radii). */
export function facetedHousingMm3(s: DirectSizing, q: Quality): number {
  const h = structuredClone(s.parts.housing);
  const n = segmentsFor(h.foot.outerDiameterMm / 2, q);
  const outer = Math.sqrt(cornersOn(n));
  const hole = Math.sqrt(flatsOn(n));
  h.outerDiameterMm *= outer;
  h.foot.outerDiameterMm *= outer;
  h.bossOuterDiameterMm *= outer;
  h.boreMm *= hole;
  h.seatBoreMm *= hole;
  for (const d of [h.vents, h.foot.anchorHoles, h.pinHoles]) d.diameterMm *= Math.sqrt(flatsOn(segmentsFor(d.diameterMm / 2, q)));
  return housingVolumeMm3(h);
}

export function facetedNozzleMm3(s: SizingSuccess, q: Quality): number {
  const n = structuredClone(s.parts.nozzle);
  const f = Math.sqrt(cornersOn(segmentsFor(n.shoulderDiameterMm / 2, q)));
  n.orificeMm *= f;
  n.lipDiameterMm *= f;
  n.shoulderDiameterMm *= f;
  n.collarDiameterMm *= f;
  n.barb.rootDiameterMm *= f;
  n.barb.crestDiameterMm *= f;
  return nozzleVolumeMm3(n);
}

export function facetedPinMm3(s: SizingSuccess, q: Quality): number {
  const p = s.parts.pin;
  const n = segmentsFor(p.diameterMm / 2, q);
  // the section: the N-gon on the pin's circle, less what lies below the flat
  const section = shoelace(clippedPolygon(p.diameterMm / 2, n, -p.flatOffsetMm));
  return section * p.lengthMm + p.head.lengthMm * p.head.widthMm * p.head.heightMm;
}

/** Filament pushed (mm) in each ;TYPE: section of a G-code file, absolute (M82) or relative (M83) extrusion. */
export function extrusionByType(gcode: string): Map<string, number> {
  const out = new Map<string, number>();
  let relative = false;
  let e = 0;
  let type = '';
  for (const line of gcode.split('\n')) {
    if (line.startsWith(';TYPE:')) type = line.slice(6).trim();
    else if (line.startsWith('M82')) relative = false;
    else if (line.startsWith('M83')) relative = true;
    else if (line.startsWith('G92')) {
      const m = / E(-?[\d.]+)/.exec(line);
      if (m) e = Number(m[1]);
    } else if (line.startsWith('G1 ') || line.startsWith('G0 ')) {
      const m = / E(-?[\d.]+)/.exec(line);
      if (!m) continue;
      const v = Number(m[1]);
      const d = relative ? v : v - e;
      if (!relative) e = v;
      if (d > 0) out.set(type, (out.get(type) ?? 0) + d);
    }
  }
  return out;
}
