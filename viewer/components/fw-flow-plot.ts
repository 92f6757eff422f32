import { LitElement, css, html, svg, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import { demandPerDay, flowAxis, levelAxis } from '../lib/format.ts';
import { niceStep } from '../lib/nice-step.ts';
import type { UnitSystem } from '../lib/units-system.ts';
import { plotFrame, shared } from './shared-styles.ts';

/**
 * The part of a sizing result (SizingSuccess) the flow plot draws: flow through
 * the valve against water depth at full and low tank, the grower's demand, and
 * the levels where throttling starts, where demand is met and where it shuts
 * tight. Drawn from the worker's result as it is: nothing recomputed here.
 */
export interface FlowBand {
  characteristic: { headMax: { levelMm: number; flowLph: number }[]; headMin: { levelMm: number; flowLph: number }[] };
  inputs: { demandLpd: number };
  levels: {
    throttleStartMm: number;
    heldAtDemandMm: number;
    heldAtDemandLowTankMm: number;
    shutOffAtHeadMaxMm: number;
    shutOffAtHeadMinMm: number;
  };
}

const W = 460, H = 230, L = 52, R = 14, T = 14, B = 40;

/** The band in plain words, in the chosen units: the flow eases off / held at the demand / shut tight. */
export function flowBandWords(b: FlowBand, units: UnitSystem): string[] {
  const unit = units === 'metric' ? 'mm' : 'in';
  const d = units === 'metric' ? 1 : 2;
  const at = (mm: number) => `${levelAxis(mm, units).toFixed(d)} ${unit}`;
  const held = b.inputs.demandLpd > 0
    ? `While the plants drink ${demandPerDay(b.inputs.demandLpd, units)}, the water stays at about ${at(b.levels.heldAtDemandMm)} with the tank full and ${at(b.levels.heldAtDemandLowTankMm)} with it low.`
    : `With no water drawn, the water rises until the valve shuts tight.`;
  return [
    `The flow starts to ease off (the throttle band begins) when the water reaches ${at(b.levels.throttleStartMm)}.`,
    held,
    `It shuts tight at ${at(b.levels.shutOffAtHeadMaxMm)} with the tank full (${at(b.levels.shutOffAtHeadMinMm)} with it low), the highest the water can rise.`,
  ];
}

@customElement('fw-flow-plot')
export class FwFlowPlot extends LitElement {
  static override styles = [
    shared,
    plotFrame,
    css`
      .full { fill: none; stroke: var(--water); stroke-width: 2.5; }
      .low { fill: none; stroke: var(--warn); stroke-width: 2; stroke-dasharray: 5 3; }
      .demand { stroke: var(--leaf); stroke-width: 1.5; stroke-dasharray: 2 3; }
      figcaption { color: var(--muted); font-size: 0.85rem; margin-top: 0.3rem; }
    `,
  ];

  @property({ attribute: false }) band: FlowBand | null = null;
  @property() units: UnitSystem = 'metric';

  override render() {
    const b = this.band;
    if (!b || b.characteristic.headMax.length < 2) return nothing;
    const u = this.units;
    const unit = u === 'metric' ? 'mm' : 'in';
    const all = [...b.characteristic.headMax, ...b.characteristic.headMin];
    const x0 = levelAxis(Math.min(...all.map((p) => p.levelMm)), u);
    const x1 = levelAxis(Math.max(...all.map((p) => p.levelMm)), u);
    const demandLph = b.inputs.demandLpd / 24;
    const flowUnit = u === 'metric' ? 'L/h' : 'gal/h';
    const yMax = flowAxis(Math.max(...all.map((p) => p.flowLph), demandLph), u) * 1.08 || 1;
    const px = (mm: number) => L + ((levelAxis(mm, u) - x0) / (x1 - x0 || 1)) * (W - L - R);
    const py = (y: number) => T + (1 - y / yMax) * (H - T - B);
    const pyLph = (lph: number) => py(flowAxis(lph, u));
    const line = (pts: { levelMm: number; flowLph: number }[]) => pts.map((p, i) => `${i ? 'L' : 'M'}${px(p.levelMm).toFixed(1)},${pyLph(p.flowLph).toFixed(1)}`).join('');
    const xStep = niceStep(x1 - x0 || 1);
    const yStep = niceStep(yMax, 4);
    const xTicks: number[] = [];
    for (let x = Math.ceil(x0 / xStep) * xStep; x <= x1 + 1e-9; x += xStep) xTicks.push(x);
    const yTicks: number[] = [];
    for (let y = 0; y <= yMax + 1e-9; y += yStep) yTicks.push(y);
    const held = b.levels.heldAtDemandMm;
    const words = flowBandWords(b, u);
    return html`<figure style="margin:0">
      <svg viewBox="0 0 ${W} ${H}" role="img" aria-label="Flow against water depth, tank full and low. ${words.join(' ')}">
        ${yTicks.map((y) => svg`<line class="grid" x1=${L} x2=${W - R} y1=${py(y)} y2=${py(y)}></line><text x=${L - 6} y=${py(y) + 4} text-anchor="end">${Number(y.toFixed(2))}</text>`)}
        ${xTicks.map((x) => svg`<line class="grid" y1=${T} y2=${H - B} x1=${L + ((x - x0) / (x1 - x0 || 1)) * (W - L - R)} x2=${L + ((x - x0) / (x1 - x0 || 1)) * (W - L - R)}></line>`)}
        <line class="axis" x1=${L} x2=${W - R} y1=${py(0)} y2=${py(0)}></line>
        <line class="axis" x1=${L} x2=${L} y1=${T} y2=${H - B}></line>
        <text x=${(L + W - R) / 2} y=${H - 6} text-anchor="middle">water depth in the container (${unit})</text>
        <text transform="translate(12 ${(T + H - B) / 2}) rotate(-90)" text-anchor="middle">flow (${flowUnit})</text>
        <line class="demand" x1=${L} x2=${W - R} y1=${pyLph(demandLph)} y2=${pyLph(demandLph)}></line>
        <text x=${W - R - 4} y=${pyLph(demandLph) - 4} text-anchor="end">what the plants drink</text>
        <path class="low" d=${line(b.characteristic.headMin)}></path>
        <path class="full" d=${line(b.characteristic.headMax)}></path>
        ${Number.isFinite(held) ? svg`<circle data-mark="held" cx=${px(held)} cy=${pyLph(demandLph)} r="4" fill="var(--water)"></circle>` : nothing}
      </svg>
      <figcaption>Solid line: tank full; dashed: tank low; dot: where the flow matches what the plants drink. ${words.map((w) => html`<span>${w} </span>`)}</figcaption>
    </figure>`;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'fw-flow-plot': FwFlowPlot;
  }
}
