import { ruleText } from '../../generator/sizing/rule-text.ts';
import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import { PART_WORDS, valvePartNames } from '../../generator/solids/part-names.ts';
import type { SizingResult, SizingSuccess, WayOut } from '../../generator/sizing/result.ts';
import { labelFor, shownMessage } from '../lib/field-label.ts';
import { textInUnits } from '../../generator/doc/text-in-units.ts';
import * as f from '../lib/format.ts';
import { markTerms } from '../lib/mark-terms.ts';
import { GLOSSARY, type TermKey } from '../../generator/doc/glossary.ts';
import type { UnitSystem } from '../lib/units-system.ts';
import { flowBandWords } from './fw-flow-plot.ts';
import { shared } from './shared-styles.ts';

/**
 * The sized valve in numbers, or why it cannot be sized with one-click ways out.
 * Emits `apply-way-out` with the WayOut chosen.
 */
@customElement('fw-results')
export class FwResults extends LitElement {
  static override styles = [
    shared,
    css`
      :host { display: block; }
      section { background: var(--panel); border: 1px solid var(--line); border-radius: 8px; padding: 0.5rem 0.8rem; margin-bottom: 0.7rem; }
      dl { display: grid; grid-template-columns: auto auto; gap: 0.1rem 0.8rem; margin: 0; }
      dt { color: var(--muted); }
      .why { margin: 0.4rem 0 0; font-size: 0.9rem; color: var(--muted); }
      dd { margin: 0; font-variant-numeric: tabular-nums; text-align: right; }
      .headline { display: flex; gap: 0.6rem; flex-wrap: wrap; }
      .big { background: var(--leaf-soft); border-radius: 6px; padding: 0.3rem 0.6rem; }
      .big b { display: block; font-size: 1.15rem; }
      .warn { background: var(--warn-soft); color: #4d3400; border-left: 4px solid var(--warn); padding: 0.3rem 0.6rem; margin: 0.3rem 0; border-radius: 4px; }
      .fail { background: var(--bad-soft); border-color: var(--bad); }
      .fail h2 { color: var(--bad); }
      .ways button { display: block; margin: 0.3rem 0; text-align: left; }
      .stale { opacity: 0.55; }
      ul { margin: 0.2rem 0; padding-left: 1.2rem; }
      .band { margin: 0.2rem 0 0.5rem; }
      .timing { color: var(--muted); font-size: 0.8rem; margin: 0.2rem 0; }
      dl { grid-template-columns: minmax(0, 1.4fr) minmax(0, 1fr); }
      dd { overflow-wrap: anywhere; }
    `,
  ];

  @property({ attribute: false }) result: SizingResult | null = null;
  /** last design that sized, kept on screen while the current one fails */
  @property({ attribute: false }) lastGood: SizingSuccess | null = null;
  @property() units: UnitSystem = 'metric';
  @property({ type: Boolean }) stale = false;
  /** which part to show: the headline and any failure ('summary'), the figures under it ('details'), or both */
  @property() show: 'summary' | 'details' | 'all' = 'all';
  /** how long the last sizing and parts took, said at the foot of the details (never in the page header) */
  @property() timing = '';

  private wayOut(w: WayOut) {
    this.dispatchEvent(new CustomEvent<WayOut>('apply-way-out', { detail: w, bubbles: true, composed: true }));
  }

  private renderSummary(s: SizingSuccess) {
    const u = this.units;
    return html`
      <section aria-label="Valve size">
        <h2>Your valve</h2>
        <div class="headline">
          <div class="big" data-result="float">Float <b>${f.lengthMm(s.float.outerDiameterMm, u)} × ${f.lengthMm(s.float.heightMm, u)}</b></div>
          ${s.architecture === 'direct'
            ? html`<div class="big" data-result="housing">Housing <b>${f.lengthMm(s.housing.outerDiameterMm, u)} × ${f.lengthMm(s.housing.heightMm, u)}</b></div>`
            : html`<div class="big" data-result="lever">On an arm, ${s.mount === 'rim' ? 'hung from the rim' : 'on the floor'} <b>${f.lengthMm(s.footprintMm, u)} across, ${s.lever.ratio.toFixed(1)}× push</b></div>`}
          <div class="big" data-result="held-full">Holds water at <b>${f.lengthMm(s.levels.heldAtDemandMm, u)}</b></div>
        </div>
        <p class="why" data-result="choice">${markTerms(shownMessage(textInUnits(s.choice.reason, u)), Object.keys(GLOSSARY) as TermKey[])}</p>
      </section>`;
  }

  private renderDetails(s: SizingSuccess) {
    const u = this.units;
    const same = Math.abs(s.inputs.headMaxM - s.inputs.headMinM) < 1e-9;
    return html`
      <section aria-label="Water levels">
        <h2>Water levels</h2>
        <p class="band" data-result="band-words">${flowBandWords(s, u).join(' ')}</p>
        <dl>
          <dt>${markTerms(`Held while the plants drink ${f.demandPerDay(s.inputs.demandLpd, u)}, tank full (${f.headM(s.inputs.headMaxM, u)})`, ['tank-full'])}</dt><dd data-result="held-demand-full">${f.lengthMm(s.levels.heldAtDemandMm, u)}</dd>
          ${same ? nothing : html`<dt>${markTerms(`The same, tank low (${f.headM(s.inputs.headMinM, u)})`, ['tank-low'])}</dt><dd data-result="held-demand-low">${f.lengthMm(s.levels.heldAtDemandLowTankMm, u)}</dd>`}
          <dt>${markTerms('Throttle band starts (the flow begins to ease off) at', ['throttle-band'])}</dt><dd data-result="throttle-start">${f.lengthMm(s.levels.throttleStartMm, u)}</dd>
          <dt>Half flow / a tenth / a hundredth, tank full</dt><dd>${f.lengthMm(s.levels.flow50Mm, u)} / ${f.lengthMm(s.levels.flow10Mm, u)} / ${f.lengthMm(s.levels.flow1Mm, u)}</dd>
          <dt>${markTerms('Shut tight (the highest it can rise), tank full', ['shut-tight'])}</dt><dd data-result="level-full">${f.lengthMm(s.levels.shutOffAtHeadMaxMm, u)}</dd>
          ${same ? nothing : html`<dt>Shut tight, tank low</dt><dd data-result="level-low">${f.lengthMm(s.levels.shutOffAtHeadMinMm, u)}</dd>`}
          <dt>${s.architecture === 'direct' ? markTerms('Float lifts off its retainer pin at', ['retainer-pin']) : 'Float lifts off its rest (the arm down) at'}</dt><dd>${f.lengthMm(s.levels.liftOffMm, u)}</dd>
          <dt>Shallowest depth this float can hold</dt><dd>${f.lengthMm(s.levels.minimumReachableMm, u)}</dd>
        </dl>
      </section>
      <section aria-label="Flow">
        <h2>Refill</h2>
        <dl>
          <dt>Flow wide open, tank full</dt><dd data-result="flow-full">${f.flowLph(s.flow.atHeadMaxLph, u)}</dd>
          <dt>Likely range (print and tube tolerance)</dt><dd data-result="flow-band">${f.flowLph(s.flow.atHeadMaxLowLph, u)} to ${f.flowLph(s.flow.atHeadMaxHighLph, u)}</dd>
          ${same ? nothing : html`<dt>Flow, tank low</dt><dd>${f.flowLph(s.flow.atHeadMinLph, u)}</dd>`}
          ${s.fill.timeToHeldMin !== null ? html`<dt>Refill time while the plants drink</dt><dd data-result="fill-time">${f.minutes(s.fill.timeToHeldMin)}</dd>` : nothing}
          <dt>Push needed to shut, tank full</dt><dd>${f.forceN(s.closingForce.atHeadMaxN, u)}</dd>
          <dt>${markTerms("Float's lift under water, and its spare lift", ['spare-lift'])}</dt><dd data-result="spare-lift">${f.forceN(s.float.availableForceN, u)}, ${s.float.reserve.toFixed(2)}×</dd>
          ${s.architecture === 'direct'
            ? html`<dt>${markTerms('Drain slots at the bottom', ['drain-slots'])}</dt><dd>${s.drain.notchCount}, ${f.areaMm2(s.drain.providedAreaMm2, u)} (needs ${f.areaMm2(s.drain.requiredAreaMm2, u)})</dd>
                <dt>${markTerms('Air vents on top', ['air-vents'])}</dt><dd>${s.vents.count} × ${f.printMm(s.vents.diameterMm)}</dd>`
            : html`<dt>Float's push, tank full (the arm multiplies it ${s.lever.ratio.toFixed(2)}×)</dt><dd>${f.forceN(s.lever.floatPushAtHeadMaxN, u)}</dd>
                <dt>Reopens below where it shut by (pivot friction)</dt><dd data-result="hysteresis">${f.printMm(s.lever.hysteresisMm, 2)}</dd>`}
          ${s.closingForce.fromCalibration ? html`<dt>${markTerms('Nozzle lip width your bench points act like', ['nozzle-lip', 'bench-points'])}</dt><dd data-result="calibrated-lip">${f.printMm(s.closingForce.equivalentSealDiameterMm, 2)}</dd>` : nothing}
        </dl>
      </section>
      <section aria-label="Seal pad and float">
        <h2>Seal pad and float</h2>
        <dl>
          <dt>${markTerms(`Seal pad${s.seal.padChosen ? ' (chosen for this valve)' : ''}`, ['seal-pad'])}</dt><dd data-result="pad">${s.seal.padMaterial}, ${f.printMm(s.seal.padThicknessMm)} thick</dd>
          <dt>${markTerms('Pad squeeze when shut, tank full', ['pad-squeeze'])}</dt><dd>${f.printMm(s.seal.indentationMm, 2)} (${(s.seal.strainAtSeal * 100).toFixed(0)} %)</dd>
          <dt>Most pad squeeze in use (a stop holds it)</dt><dd>${(s.seal.worstStrain * 100).toFixed(0)} %</dd>
          <dt>Float shell</dt><dd>${f.printMm(s.float.shellMm, 2)}</dd>
          <dt>Float weighs dry, before the pad</dt><dd data-result="float-dry">${f.massG(s.float.dryMassG, u, 1)}</dd>
          <dt>Water the float can take in and still shut</dt><dd data-result="leak-tolerance">${f.leakTolerance(s.float.leakToleranceMl, s.float.levelRisePerMlMm, u)}</dd>
        </dl>
      </section>
      <section aria-label="Holding down">
        <h2>${markTerms('Hold-down', ['hold-down'])}</h2>
        <p data-result="ballast">${s.architecture === 'lever' && s.mount === 'rim'
          ? (s.holdDown.anchorForceN > 0 ? html`If the container floods the float lifts the valve ${f.forceN(s.holdDown.upliftN, u)}: tighten the hanger's clamp screw against the wall.` : 'The valve is heavy enough to stay on the rim if the container floods.')
          : s.holdDown.ballastSteelG > 0
          ? html`If the container floods the float lifts ${f.forceN(s.holdDown.upliftN, u)}: pin the foot down or add <b>${f.massG(s.holdDown.ballastSteelG, u)}</b> of steel.`
          : 'The valve is heavy enough to stay put if the container floods.'}</p>
      </section>
      <section aria-label="Plastic">
        <h2>Plastic (${s.inputs.materialName})</h2>
        <dl>
          ${valvePartNames(s).map((p) => html`<dt>${PART_WORDS[p]}</dt><dd>${f.massG((s.mass.byPart as Record<string, number>)[p] ?? 0, u, 1)}</dd>`)}
          <dt>All parts</dt><dd data-result="mass-total"><b>${f.massG(s.mass.totalG, u)}</b>, ${f.filamentLength(s.mass.filamentM, u)} of filament</dd>
        </dl>
      </section>
      <section aria-label="What set the size">
        <h2>What set the size</h2>
        <ul>${s.boundBy.map((b) => html`<li>${shownMessage(textInUnits(ruleText(b, s.architecture, s.mount), u))}</li>`)}</ul>
        ${s.warnings.map((w) => html`<div class="warn" data-warning=${w.code}>${shownMessage(textInUnits(w.message, u))}</div>`)}
      </section>
      ${this.timing ? html`<p class="timing" data-timing>${this.timing}</p>` : nothing}`;
  }

  private renderSuccess(s: SizingSuccess) {
    if (this.show === 'summary') return this.renderSummary(s);
    if (this.show === 'details') return this.renderDetails(s);
    return html`${this.renderSummary(s)}${this.renderDetails(s)}`;
  }

  override render() {
    const r = this.result;
    const failure = r && !r.ok ? r : null;
    const shown = r && r.ok ? r : this.lastGood;
    if (this.show === 'details') {
      return html`<div class=${failure || this.stale ? 'stale' : ''}>${shown ? this.renderDetails(shown) : nothing}</div>`;
    }
    return html`
      ${failure
        ? html`<section class="fail" role="alert" aria-label="Cannot size">
            <h2>No valve fits these numbers</h2>
            <ul>${failure.reasons.map((x) => html`<li>${shownMessage(textInUnits(x.message, this.units))}</li>`)}</ul>
            ${failure.waysOut.length
              ? html`<div class="ways"><p>Any one of these would work:</p>
                  ${failure.waysOut.map(
                    (w) => html`<button data-way-out=${w.field} @click=${() => this.wayOut(w)}>Set ${[w, ...(w.also ?? [])].map((c) => `"${labelFor(c.field)}" to ${c.value}`).join(' and ')}: ${w.message}</button>`,
                  )}</div>`
              : nothing}
            ${shown ? html`<p>Below: the last design that worked.</p>` : nothing}
          </section>`
        : nothing}
      <div class=${failure || this.stale ? 'stale' : ''}>${shown ? this.renderSuccess(shown) : html`<p>${this.stale ? 'Nothing sized yet: correct the boxes marked in red.' : 'Sizing…'}</p>`}</div>
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'fw-results': FwResults;
  }
}
