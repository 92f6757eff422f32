import { LitElement, css, html, svg, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { SizingSuccess } from '../../generator/sizing/result.ts';
import { levelAxis, pushAxis } from '../lib/format.ts';
import { pushCurve } from '../lib/net-push.ts';
import { niceStep } from '../lib/nice-step.ts';
import type { UnitSystem } from '../lib/units-system.ts';
import { plotFrame, shared } from './shared-styles.ts';

const W = 460, H = 230, L = 52, R = 14, T = 14, B = 40;

/**
 * How hard the float pushes the pad up as the water rises (float held shut at
 * the nozzle), against the push the nozzle needs at full and low tank. Where the
 * curve meets a line is the depth the valve holds at that tank height.
 */
@customElement('fw-push-plot')
export class FwPushPlot extends LitElement {
  static override styles = [
    shared,
    plotFrame,
    css`
      .curve { fill: none; stroke: var(--leaf); stroke-width: 2.5; }
      .need-max { stroke: var(--bad); stroke-width: 1.5; stroke-dasharray: 6 3; }
      .need-min { stroke: var(--warn); stroke-width: 1.5; stroke-dasharray: 2 3; }
      .held { stroke: var(--water); stroke-width: 1.2; }
      .lab-max { fill: var(--bad); } .lab-min { fill: var(--warn); } .lab-held { fill: var(--water); }
      figcaption { color: var(--muted); font-size: 0.85rem; margin-top: 0.3rem; }
    `,
  ];

  @property({ attribute: false }) sizing: SizingSuccess | null = null;
  @property() units: UnitSystem = 'metric';

  override render() {
    const s = this.sizing;
    if (!s) return nothing;
    const c = pushCurve(s);
    const u = this.units;
    const unit = u === 'metric' ? 'mm' : 'in';
    const xs = c.points.map((p) => levelAxis(p.levelMm, u));
    const x0 = xs[0], x1 = xs[xs.length - 1];
    // pushes in newtons (metric) or ounces of weight (imperial)
    const push = (n: number) => pushAxis(n, u);
    const pushUnit = u === 'metric' ? 'N' : 'oz of weight';
    const ys = c.points.map((p) => push(p.pushN));
    const needMax = push(c.closeAtHeadMaxN);
    const needMin = push(c.closeAtHeadMinN);
    const yMin = Math.min(0, ...ys);
    const yMax = Math.max(...ys, needMax * 1.1);
    const px = (x: number) => L + ((x - x0) / (x1 - x0)) * (W - L - R);
    const py = (y: number) => T + (1 - (y - yMin) / (yMax - yMin)) * (H - T - B);
    const path = c.points.map((_, i) => `${i ? 'L' : 'M'}${px(xs[i]).toFixed(1)},${py(ys[i]).toFixed(1)}`).join('');
    const xStep = niceStep(x1 - x0);
    const yStep = niceStep(yMax - yMin, 4);
    const yDigits = Math.max(0, -Math.floor(Math.log10(yStep) + 1e-9));
    const xTicks: number[] = [];
    for (let x = Math.ceil(x0 / xStep) * xStep; x <= x1 + 1e-9; x += xStep) xTicks.push(x);
    const yTicks: number[] = [];
    for (let y = Math.ceil(yMin / yStep) * yStep; y <= yMax + 1e-9; y += yStep) yTicks.push(y);
    const same = Math.abs(c.closeAtHeadMaxN - c.closeAtHeadMinN) < 1e-9;
    const heldMax = levelAxis(c.holdsAtHeadMaxMm, u);
    const heldMin = levelAxis(c.holdsAtHeadMinMm, u);
    const digits = u === 'metric' ? 1 : 2;
    const lever = s.architecture === 'lever';
    return html`<figure style="margin:0">
      <svg viewBox="0 0 ${W} ${H}" role="img" aria-label="${lever ? 'Push at the seal pad' : 'Float push'} against water depth. The valve holds ${heldMax.toFixed(digits)} ${unit} with the tank full${same ? '' : ` and ${heldMin.toFixed(digits)} ${unit} with the tank low`}.">
        ${yTicks.map((y) => svg`<line class="grid" x1=${L} x2=${W - R} y1=${py(y)} y2=${py(y)}></line><text x=${L - 6} y=${py(y) + 4} text-anchor="end">${y.toFixed(yDigits)}</text>`)}
        ${xTicks.map((x) => svg`<line class="grid" y1=${T} y2=${H - B} x1=${px(x)} x2=${px(x)}></line><text x=${px(x)} y=${H - B + 14} text-anchor="middle">${Number(x.toFixed(3))}</text>`)}
        <line class="axis" x1=${L} x2=${W - R} y1=${py(0)} y2=${py(0)}></line>
        <line class="axis" x1=${L} x2=${L} y1=${T} y2=${H - B}></line>
        <text x=${(L + W - R) / 2} y=${H - 6} text-anchor="middle">water depth in the container (${unit})</text>
        <text transform="translate(12 ${(T + H - B) / 2}) rotate(-90)" text-anchor="middle">${lever ? 'push at the seal pad' : 'float push'} (${pushUnit})</text>
        <line class="need-max" x1=${L} x2=${W - R} y1=${py(needMax)} y2=${py(needMax)}></line>
        <text class="lab-max" x=${L + 4} y=${py(needMax) - 4}>needed to shut, tank full</text>
        ${same ? nothing : svg`<line class="need-min" x1=${L} x2=${W - R} y1=${py(needMin)} y2=${py(needMin)}></line>
          <text class="lab-min" x=${L + 4} y=${py(needMin) + 12}>needed to shut, tank low</text>`}
        ${Number.isFinite(heldMax) ? svg`<line class="held" x1=${px(heldMax)} x2=${px(heldMax)} y1=${py(needMax)} y2=${H - B}></line>
          <circle cx=${px(heldMax)} cy=${py(needMax)} r="4" fill="var(--bad)"></circle>
          <text class="lab-held" x=${px(heldMax) + 4} y=${H - B - 4}>${heldMax.toFixed(digits)}</text>` : nothing}
        ${!same && Number.isFinite(heldMin) ? svg`<line class="held" x1=${px(heldMin)} x2=${px(heldMin)} y1=${py(needMin)} y2=${H - B}></line>
          <circle cx=${px(heldMin)} cy=${py(needMin)} r="4" fill="var(--warn)"></circle>
          <text class="lab-held" x=${px(heldMin) - 4} y=${H - B - 16} text-anchor="end">${heldMin.toFixed(digits)}</text>` : nothing}
        <path class="curve" d=${path}></path>
      </svg>
      <figcaption>The green line is ${lever ? `the push the float gives at the pad through the arm (${s.lever.ratio.toFixed(1)} times its own, less the arm's weight)` : "the float's push"} with the pad on the nozzle. It shuts the water off where it crosses the push needed:
        <b data-result="plot-held-full">${heldMax.toFixed(digits)} ${unit}</b> with the tank full${same ? '' : html`, <b>${heldMin.toFixed(digits)} ${unit}</b> with the tank low`}.</figcaption>
    </figure>`;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'fw-push-plot': FwPushPlot;
  }
}
