/**
 * TEMPORARY build sheet until generator/doc/build-sheet.ts lands: a printable
 * page with the part sizes, levels, masses, warnings and the cautions.
 */
import { CAUTIONS } from '../../generator/doc/cautions.ts';
import type { SizingSuccess } from '../../generator/sizing/result.ts';

const esc = (s: string) => s.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]!);
const mm = (x: number) => `${x.toFixed(1)} mm`;

export function buildSheetHtml(s: SizingSuccess, document: unknown): string {
  const name = document && typeof document === 'object' && typeof (document as { name?: unknown }).name === 'string' ? (document as { name: string }).name : 'Float valve';
  const rows: [string, string][] = [
    ['Float', `${mm(s.float.outerDiameterMm)} across, ${mm(s.float.heightMm)} tall, ${s.float.massG.toFixed(1)} g`],
    ['Housing', `${mm(s.housing.outerDiameterMm)} across, ${mm(s.housing.heightMm)} tall, foot ${mm(s.housing.footDiameterMm)}`],
    ['Nozzle', `hole ${mm(s.nozzle.orificeMm)}, lip ${mm(s.nozzle.sealDiameterMm)}`],
    ['Water held at full tank', mm(s.levels.shutOffAtHeadMaxMm)],
    ['Water held at low tank', mm(s.levels.shutOffAtHeadMinMm)],
    ['Plastic', `${s.mass.totalG.toFixed(0)} g, ${s.mass.filamentM.toFixed(1)} m of 1.75 mm filament (${esc(s.inputs.materialName)})`],
    ['Ballast if flooded', s.holdDown.ballastSteelG > 0 ? `${s.holdDown.ballastSteelG.toFixed(0)} g of steel, or pin the foot down` : 'none needed'],
  ];
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>${esc(name)} – build sheet</title>
<style>body{font:14px/1.4 system-ui,sans-serif;max-width:46rem;margin:2rem auto;color:#222}td,th{padding:.25rem .6rem;text-align:left;border-bottom:1px solid #ccc}.c{border:2px solid #a33;padding:.5rem 1rem;margin-top:1rem}</style></head>
<body><h1>${esc(name)}</h1><table>${rows.map(([k, v]) => `<tr><th>${esc(k)}</th><td>${v}</td></tr>`).join('')}</table>
<h2>Warnings</h2><ul>${s.warnings.map((w) => `<li>${esc(w.message)}</li>`).join('') || '<li>none</li>'}</ul>
<div class="c"><h2>Before you use it</h2><ul>${CAUTIONS.map((c) => `<li><b>${esc(c.title)}.</b> ${esc(c.text)}</li>`).join('')}</ul></div>
</body></html>`;
}
