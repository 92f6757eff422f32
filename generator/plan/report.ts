/**
 * The plan report a grower prints: one table row per container (head range,
 * level at full and low tank, flow alone and shared, fill time, float and
 * housing size, plastic, ballast, warnings), which containers starve, the
 * design list with quantities, the totals to buy, and the shared cautions.
 * Markdown for terminals and files; HTML for a browser's print button.
 */
import { CAUTIONS } from '../doc/cautions.ts';
import { markdownText } from '../doc/safe-text/markdown-text.ts';
import type { PlanResult } from './types.ts';

export interface PlanReportTable {
  headers: string[];
  rows: string[][];
  /** rows to stand out (the containers that starve), by row index; a flag, never read back from a cell's text */
  marked?: boolean[];
}

export interface PlanReport {
  title: string;
  summary: string[];
  containers: PlanReportTable;
  designs: PlanReportTable;
  totals: PlanReportTable;
  starving: string[];
  warnings: string[];
  cautions: { title: string; text: string }[];
}

const f = (x: number | null | undefined, d: number) => (x === null || x === undefined || !Number.isFinite(x) ? '-' : x.toFixed(d));

/** Short words for the sizing's warning codes, for a table cell; the full sentences follow the table. */
const WARNING_WORDS: Record<string, string> = {
  'tilt-gap': 'tilt',
  'wall-lines': 'wall',
  'housing-floats': 'floats',
  'hold-down': 'pin down',
  'low-flow': 'slow',
  'calibration-scatter': 'calibration',
  'long-travel': 'long drop',
};

/** The report as data (tables of formatted cells), rendered by planMarkdown and planHtml. */
export function planReport(result: PlanResult, files: Readonly<Record<string, readonly string[]>> = {}, plates: readonly string[] = []): PlanReport {
  const p = result.plan;
  const rows = result.containers.map((c) => {
    const s = c.sizing;
    const warn = [
      ...(c.starving ? ['STARVES'] : []),
      ...(s.ok ? s.warnings.map((w) => WARNING_WORDS[w.code] ?? w.code) : ['NO SIZE FITS']),
      ...(c.tipConverged ? [] : ['tip cycle']),
    ];
    const plasticG = s.ok ? s.mass.totalG - s.mass.byPart.pad : null;
    return [
      `${c.name}${c.starving ? ' (!)' : ''}`,
      String(c.count),
      c.design ?? '-',
      f(c.floorElevationM, 2),
      `${f(c.headMaxM, 2)} / ${f(c.headMinM, 2)}`,
      `${f(c.targetMm, 0)}: ${f(c.shutOffAtHeadMaxMm, 1)} / ${f(c.shutOffAtHeadMinMm, 1)}`,
      `${f(c.aloneFull.flowLph, 1)} / ${f(c.sharedFull.flowLph, 1)} (${f(c.sharedLow.flowLph, 1)})`,
      `${f(c.aloneFull.fillTimeMin, 1)} / ${f(c.sharedFull.fillTimeMin, 1)}`,
      s.ok ? `${f(s.float.outerDiameterMm, 1)} x ${f(s.float.heightMm, 1)}` : '-',
      s.ok ? (s.architecture === 'direct' ? `${f(s.housing.footDiameterMm, 0)} x ${f(s.housing.heightMm, 0)}` : `${s.architecture}${s.mount === 'rim' ? ' on rim' : ''} ${f(s.footprintMm, 0)} x ${f(s.frame.heightMm, 0)}`) : '-',
      f(plasticG, 0),
      s.ok ? f(s.holdDown.ballastSteelG, 0) : '-',
      warn.join(', ') || '-',
    ];
  });

  const designs = result.designs.map((d) => {
    const s = d.sizing;
    const names = d.containerIndices.map((i) => result.containers.find((c) => c.index === i)!.name);
    return [
      d.id,
      String(d.quantity),
      names.join(', '),
      `${s.inputs.materialName}, ${f(s.mass.totalG - s.mass.byPart.pad, 0)} g, ${f(s.mass.filamentM, 1)} m each`,
      (files[d.id] ?? []).join(' '),
    ];
  });

  const t = result.totals;
  const totals = [
    ['valves', String(t.valves)],
    ['printed parts (housing, float, nozzle, pin each; a lever valve frame, arm, float, nozzle, pin and on the rim hanger and stem)', String(t.parts)],
    ['filament', `${f(t.filamentG / 1000, 2)} kg, ${f(t.filamentM, 0)} m of 1.75 mm`],
    ['steel ballast (or anchor pins instead)', `${f(t.ballastSteelG / 1000, 2)} kg`],
    ['seal pads to cut', String(t.valves)],
    ...(plates.length ? [['build plates (every part, 256 mm bed)', `${plates.length}: ${plates.join(' ')}`]] : []),
    ['tank outflow, every valve open', `${f(t.mainFlowLph, 0)} L/h full, ${f(t.mainFlowLowLph, 0)} L/h low`],
  ];

  const starving = result.containers.filter((c) => c.starving).map((c) => `${c.name}: ${c.starvingReason}.`);
  const warnings: string[] = [];
  for (const c of result.containers) {
    if (!c.sizing.ok) {
      warnings.push(`${c.name}: no size fits: ${c.sizing.reasons.map((r) => r.message.replace(/\.$/, '')).join('; ')}.`);
      for (const w of c.waysOut) warnings.push(`${c.name}: way out: ${w.field} = ${w.value} (${w.message}).`);
      continue;
    }
    for (const w of c.sizing.warnings) warnings.push(`${c.name}: ${w.message}`);
    if (!c.tipConverged) warnings.push(`${c.name}: the nozzle height sits on a float-size step; the larger float was kept, so the level may differ from the target by a millimetre.`);
  }

  const summary = [
    `Tank surface ${f(p.tankFullSurfaceElevationM, 2)} m full, ${f(p.tankLowSurfaceElevationM, 2)} m low; main ${f(p.mainInnerDiameterM * 1e3, 1)} mm bore.`,
    `A container starves when, with every valve open, it gets less than its plants' peak use, or less than ${Math.round(p.starvingShare * 100)} % of what it gets alone.`,
    starving.length === 0 ? 'No container starves.' : `${starving.length} of ${result.containers.length} container rows would starve: see below.`,
    ...(result.ok ? [] : [`No valve size fits ${result.containers.filter((c) => !c.sizing.ok).map((c) => c.name).join(', ')}: see the warnings for what would.`]),
  ];
  return {
    title: `floatwright plan${p.name ? `: ${p.name}` : ''}`,
    summary,
    containers: {
      headers: [
        'container', 'count', 'design', 'floor m', 'head m full / low', 'level mm target: full / low',
        'flow L/h alone / shared (shared, low tank)', 'fill min alone / shared', 'float mm dia x h', 'housing (or lever) mm wide x h',
        'plastic g each', 'ballast g each', 'warnings',
      ],
      rows,
      marked: result.containers.map((c) => c.starving),
    },
    designs: { headers: ['design', 'print', 'for', 'material and plastic', 'files'], rows: designs },
    totals: { headers: ['to buy and print', 'amount'], rows: totals },
    starving,
    warnings,
    cautions: CAUTIONS.map((c) => ({ title: c.title, text: c.text })),
  };
}

/** Every text in the Markdown report, ours or the grower's (names, notes): one line, Markdown characters escaped. */
const cell = markdownText;

function markdownTable(t: PlanReportTable): string[] {
  return [`| ${t.headers.map(cell).join(' | ')} |`, `|${t.headers.map(() => '---').join('|')}|`, ...t.rows.map((r) => `| ${r.map(cell).join(' | ')} |`)];
}

/** The report as Markdown. */
export function planMarkdown(report: PlanReport): string {
  const lines = [`# ${cell(report.title)}`, '', ...report.summary.map(cell), '', '## Containers', '', ...markdownTable(report.containers), ''];
  lines.push('Levels: the depth each valve holds when the tank is full and when it is at its lowest. (!) after a name and STARVES in the warnings mark a container that starves.', '');
  if (report.starving.length) lines.push('## Would starve', '', ...report.starving.map((s) => `- ${cell(s)}`), '');
  lines.push('## Designs', '', ...markdownTable(report.designs), '', '## Totals', '', ...markdownTable(report.totals), '');
  if (report.warnings.length) lines.push('## Warnings', '', ...report.warnings.map((w) => `- ${cell(w)}`), '');
  lines.push('## Cautions', '', ...report.cautions.map((c) => `- **${cell(c.title)}.** ${cell(c.text)}`), '');
  return lines.join('\n');
}

const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

function htmlTable(t: PlanReportTable): string {
  const head = `<tr>${t.headers.map((h) => `<th>${esc(h)}</th>`).join('')}</tr>`;
  const body = t.rows.map((r, i) => `<tr${t.marked?.[i] ? ' class="starving"' : ''}>${r.map((c) => `<td>${esc(c)}</td>`).join('')}</tr>`).join('\n');
  return `<table>\n<thead>${head}</thead>\n<tbody>\n${body}\n</tbody>\n</table>`;
}

/** The report as a self-contained HTML page, laid out to print on landscape paper. */
export function planHtml(report: PlanReport): string {
  const list = (items: string[]) => `<ul>${items.map((i) => `<li>${esc(i)}</li>`).join('')}</ul>`;
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>${esc(report.title)}</title>
<style>
@page { size: landscape; margin: 12mm; }
body { font: 11px/1.4 system-ui, sans-serif; margin: 1.5em; color: #111; }
table { border-collapse: collapse; margin: 0.5em 0 1.2em; }
th, td { border: 1px solid #999; padding: 3px 6px; text-align: left; vertical-align: top; }
th { background: #eee; }
tr.starving td { background: #fde2e2; font-weight: 600; }
.cautions { border: 2px solid #b00; padding: 0.3em 1em; }
</style></head><body>
<h1>${esc(report.title)}</h1>
${report.summary.map((s) => `<p>${esc(s)}</p>`).join('\n')}
<h2>Containers</h2>
${htmlTable(report.containers)}
${report.starving.length ? `<h2>Would starve</h2>${list(report.starving)}` : ''}
<h2>Designs</h2>
${htmlTable(report.designs)}
<h2>Totals</h2>
${htmlTable(report.totals)}
${report.warnings.length ? `<h2>Warnings</h2>${list(report.warnings)}` : ''}
<div class="cautions"><h2>Cautions</h2><ul>${report.cautions.map((c) => `<li><strong>${esc(c.title)}.</strong> ${esc(c.text)}</li>`).join('')}</ul></div>
</body></html>
`;
}
