import { LitElement, css, html, nothing, svg } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { BenchSolved } from '../worker/bench-protocol.ts';
import { flowLph, headM } from '../lib/format.ts';
import { niceStep } from '../lib/nice-step.ts';
import type { UnitSystem } from '../lib/units-system.ts';
import { shared } from './shared-styles.ts';

const FOOT_M = 0.3048;
const PLOT_H = 300;
const TOP = 30;
const LEFT = 56;
const TANK_W = 70;
const COLUMN_W = 150;
/** Extra room under the lowest floor for the main and the distance labels. */
const BELOW = 64;

/**
 * The bench seen from the side: the tank with its full and low surfaces, the
 * main, and each group's floor, valve (nozzle tip) and water depth, with its
 * flow alone and shared. Heights are to scale on one vertical scale; the
 * groups stand in their order along the main, their distances written (a
 * bench many metres long would otherwise squeeze its shelves into one line).
 * A group that starves is drawn dashed in red AND says STARVES in words.
 */
@customElement('fw-bench-drawing')
export class FwBenchDrawing extends LitElement {
  static override styles = [
    shared,
    css`
      :host { display: block; background: var(--panel); border: 1px solid var(--line); border-radius: 8px; padding: 0.5rem 0.8rem; }
      .scroll { overflow-x: auto; }
      svg { display: block; width: 100%; height: auto; }
      svg text { font: 12px system-ui, sans-serif; fill: var(--ink); }
      .axis text { fill: var(--muted); font-size: 11px; }
      .grid { stroke: #ece8dc; }
      .tank { fill: #f2f6f9; stroke: #4d5b66; stroke-width: 1.5; }
      .water { fill: #b9d8ee; }
      .surface { stroke: var(--water); stroke-width: 1.5; }
      .surface.low { stroke-dasharray: 5 3; }
      .main { stroke: #4d5b66; stroke-width: 3; fill: none; }
      .branch { stroke: #4d5b66; stroke-width: 1.5; fill: none; }
      .box { fill: #fff; stroke: var(--leaf); stroke-width: 2; }
      .starving .box { stroke: var(--bad); stroke-dasharray: 6 3; }
      .valve { fill: var(--leaf); }
      .starving .valve { fill: var(--bad); }
      .flag { fill: var(--bad); font-weight: 700; }
      .nofit { fill: var(--warn); font-weight: 700; }
      .name { font-weight: 600; }
      .note { fill: var(--muted); font-size: 11px; }
      p { margin: 0.3rem 0 0; font-size: 0.82rem; color: var(--muted); }
      .slide { display: none; }
      @media (max-width: 1180px) { .slide { display: block; } }
    `,
  ];

  @property({ attribute: false }) solved: BenchSolved | null = null;
  @property() units: UnitSystem = 'metric';

  override render() {
    const s = this.solved;
    if (!s) return html`<p>The drawing appears when the bench has no problems left.</p>`;
    const groups = s.groups;
    const floors = groups.map((g) => g.floorElevationM);
    const lowest = Math.min(0, ...floors);
    const highest = s.tankFullM;
    const span = Math.max(highest - lowest, 0.1);
    const top = highest + 0.06 * span;
    const bottom = lowest;
    const scale = PLOT_H / (top - bottom);
    const y = (e: number) => TOP + (top - e) * scale;
    const width = LEFT + TANK_W + 30 + COLUMN_W * groups.length + 10;
    const height = TOP + PLOT_H + BELOW;
    const mainY = y(lowest) + 16;
    const imperial = this.units === 'imperial';
    const unitM = imperial ? FOOT_M : 1;
    const step = niceStep((top - bottom) / unitM, 5);
    const ticks: number[] = [];
    for (let v = Math.ceil(bottom / unitM / step) * step; v <= top / unitM + 1e-9; v += step) ticks.push(v);
    const tankX = LEFT + 10;
    const tankBottom = Math.max(s.tankLowM - Math.max(0.15 * (s.tankFullM - s.tankLowM), 0.05), lowest);
    const colX = (i: number) => LEFT + TANK_W + 40 + COLUMN_W * i + COLUMN_W / 2;
    const ordered = [...groups].sort((a, b) => a.mainLengthM - b.mainLengthM || a.index - b.index);
    const mainEnd = colX(ordered.length - 1);
    return html`<div class="scroll"><svg viewBox="0 0 ${width} ${height}" style="min-width:${Math.round(width * 0.8)}px" role="img" aria-label="Side view of the bench: the tank, the main and each group at its height">
      <g class="axis">
        ${ticks.map((v) => svg`<line class="grid" x1=${LEFT} x2=${width - 10} y1=${y(v * unitM)} y2=${y(v * unitM)}></line>
          <text x=${LEFT - 6} y=${y(v * unitM) + 4} text-anchor="end">${Number(v.toFixed(6))} ${imperial ? 'ft' : 'm'}</text>`)}
      </g>
      <line class="branch" x1=${tankX + 12} x2=${tankX + 12} y1=${y(tankBottom)} y2=${mainY}></line>
      <line class="branch" x1=${tankX + TANK_W - 12} x2=${tankX + TANK_W - 12} y1=${y(tankBottom)} y2=${mainY}></line>
      <rect class="water" x=${tankX} width=${TANK_W} y=${y(s.tankFullM)} height=${Math.max(y(tankBottom) - y(s.tankFullM), 1)}></rect>
      <rect class="tank" x=${tankX} width=${TANK_W} y=${y(top)} height=${y(tankBottom) - y(top)} fill-opacity="0"></rect>
      <line class="surface" x1=${tankX} x2=${tankX + TANK_W} y1=${y(s.tankFullM)} y2=${y(s.tankFullM)}></line>
      <line class="surface low" x1=${tankX} x2=${tankX + TANK_W} y1=${y(s.tankLowM)} y2=${y(s.tankLowM)}></line>
      <text x=${tankX + TANK_W / 2} y=${y(top) - 6} text-anchor="middle" class="name">Tank</text>
      <text x=${tankX + TANK_W + 4} y=${y(s.tankFullM) + 4} class="note">full</text>
      <text x=${tankX + TANK_W + 4} y=${y(s.tankLowM) + 4} class="note">low</text>
      <path class="main" d="M ${tankX + TANK_W / 2} ${y(tankBottom)} L ${tankX + TANK_W / 2} ${mainY} L ${mainEnd} ${mainY}"></path>
      <text x=${tankX} y=${mainY + 16} class="note">main, ${imperial ? `${(s.mainInnerDiameterMm / 25.4).toFixed(2)} in` : `${s.mainInnerDiameterMm.toFixed(1)} mm`} inside</text>
      ${ordered.map((g, i) => {
        const x = colX(i);
        const floorY = y(g.floorElevationM);
        const boxH = Math.max(26, (g.targetMm / 1000) * scale * 2.5);
        const waterTop = y(g.floorElevationM + g.targetMm / 1000);
        const fits = g.noFit.length === 0;
        const label = floorY - boxH - 8;
        return svg`<g class=${g.starving ? 'group starving' : 'group'} data-drawn-group=${g.index}>
          <line class="branch" x1=${x} x2=${x} y1=${mainY} y2=${floorY}></line>
          <circle cx=${x} cy=${mainY} r="3" class="valve"></circle>
          <rect class="box" x=${x - 30} width="60" y=${floorY - boxH} height=${boxH}></rect>
          <rect class="water" x=${x - 29} width="58" y=${Math.min(waterTop, floorY - 1)} height=${Math.max(floorY - waterTop, 1)}></rect>
          <path class="valve" d="M ${x - 6} ${y(g.tipElevationM)} L ${x + 6} ${y(g.tipElevationM)} L ${x} ${y(g.tipElevationM) + 7} Z"></path>
          <text x=${x} y=${mainY + 16} text-anchor="middle" class="note">${headM(g.mainLengthM, this.units)} along</text>
          <text x=${x} y=${label - 44} text-anchor="middle" class="name">${g.name} ×${g.count}</text>
          <text x=${x} y=${label - 30} text-anchor="middle">alone ${flowLph(g.aloneFullLph, this.units)}</text>
          <text x=${x} y=${label - 16} text-anchor="middle">shared ${flowLph(g.sharedFullLph, this.units)}</text>
          ${g.starving
            ? svg`<text x=${x} y=${label - 2} text-anchor="middle" class="flag">STARVES</text>`
            : !fits
              ? svg`<text x=${x} y=${label - 2} text-anchor="middle" class="nofit">NO SIZE FITS</text>`
              : nothing}
        </g>`;
      })}
    </svg></div>
    <p class="slide">Slide the drawing sideways to see every group.</p>
    <p>Heights to scale (lines every ${Number(step.toFixed(6))} ${imperial ? 'ft' : 'm'} above your reference level); the groups stand in their order along the main, with their distance from the tank written under the main. Triangle: the valve's nozzle; blue: the water held. Flows with a full tank.</p>`;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'fw-bench-drawing': FwBenchDrawing;
  }
}
