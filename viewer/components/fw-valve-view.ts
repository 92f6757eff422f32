import { LitElement, css, html } from 'lit';
import { customElement, property, query } from 'lit/decorators.js';
import * as THREE from 'three';
import { OrbitControls } from 'three/examples/jsm/controls/OrbitControls.js';
import type { SizingSuccess } from '../../generator/sizing/result.ts';
import type { FloatPose, PartMeshes, PartTransforms, ShownPart } from '../worker/parts-contract.ts';
import { ORBIT, fitBoxDistance, needsReframe, type Sphere, type Vec3 } from '../lib/camera-fit.ts';

type Bounds = Sphere & { min: Vec3; max: Vec3 };
import { shared } from './shared-styles.ts';

/** the first view's direction from the valve: in front, a little to the right, from above */
const FIRST_VIEW = new THREE.Vector3(0.45, -1, 0.5);

export interface ViewOptions {
  pose: FloatPose;
  section: boolean;
  exploded: boolean;
  water: boolean;
}

const COLOURS: Record<ShownPart, number> = {
  housing: 0xcdbb98, frame: 0xcdbb98, arm: 0x8a6d9e, hanger: 0xa89c84, stem: 0xa89c84, float: 0xe07b39, nozzle: 0x4f7b9a, pin: 0x6d8f4e, pad: 0x2e2e2e,
};
/** Legend entries: swatch colour (the water as drawn, translucent) and words, for the parts on screen. */
const LEGEND_WORDS: Record<ShownPart, string> = {
  housing: 'housing', frame: 'frame', arm: 'arm', hanger: 'rim hanger', stem: 'slotted stem', float: 'float', nozzle: 'nozzle', pin: 'pin', pad: 'pad',
};
const hex = (c: number) => `#${c.toString(16).padStart(6, '0')}`;

/**
 * Cut faces: a pale, unlit tint of each part's colour with diagonal hatching
 * (the drafting convention for a cut through solid material, ISO 128-50), so
 * a cut wall reads as solid plastic, stands out from the shaded inside
 * surfaces, and stays told apart from its neighbour.
 */
const CUT_COLOURS: Record<ShownPart, number> = {
  housing: 0xf1e6cf, frame: 0xf1e6cf, arm: 0xd9c8e6, hanger: 0xe3dccd, stem: 0xe3dccd, float: 0xf9c7a4, nozzle: 0xb3cde0, pin: 0xc6dcb2, pad: 0x9a9a9a,
};
/** hatch period and line width, in device pixels */
const HATCH_PERIOD_PX = 7;
const HATCH_LINE_PX = 2;

/**
 * A part's material. Where the cut opens a closed part, the eye looks through
 * the opening at the inside of the part's own surfaces, which are back faces:
 * drawn flat and hatched, they read as the cut face (a cap) with no cap
 * geometry and no second pass. Hollows (the float's air space, the nozzle
 * bore) are seen through front faces and stay shaded. One shader program
 * serves every part; the cut colour is a uniform.
 */
function partMaterial(part: ShownPart): THREE.MeshStandardMaterial {
  const material = new THREE.MeshStandardMaterial({ color: COLOURS[part], roughness: 0.75, metalness: 0.02, flatShading: true, side: THREE.DoubleSide });
  const cutColour = new THREE.Color(CUT_COLOURS[part]);
  material.onBeforeCompile = (shader) => {
    shader.uniforms.cutColour = { value: cutColour };
    shader.fragmentShader = `uniform vec3 cutColour;\n${shader.fragmentShader.replace(
      '#include <opaque_fragment>',
      `#include <opaque_fragment>
      if (!gl_FrontFacing) {
        float hatch = mod(gl_FragCoord.x + gl_FragCoord.y, ${HATCH_PERIOD_PX.toFixed(1)}) < ${HATCH_LINE_PX.toFixed(1)} ? 0.55 : 1.0;
        gl_FragColor = vec4(cutColour * hatch, 1.0);
      }`,
    )}`;
  };
  material.customProgramCacheKey = () => 'fw-part-cut-hatch';
  return material;
}

/**
 * The valve in 3D, as mounted: orbit (drag), zoom (wheel), a cut through the
 * axis, the water surface at the level held with the tank full, the float at
 * rest on its pin or shut against the nozzle, and the parts pulled apart.
 * Fires `preview-rendered` after drawing a new set of parts.
 */
/** The water block's material: translucent, cut with the parts. */
function waterMaterial(): THREE.MeshStandardMaterial {
  return new THREE.MeshStandardMaterial({ color: 0x3d8fd1, transparent: true, opacity: 0.28, side: THREE.DoubleSide, depthWrite: false });
}

@customElement('fw-valve-view')
export class FwValveView extends LitElement {
  static override styles = [
    shared,
    css`
      :host { display: block; position: relative; }
      /* The canvas sits absolutely in the stage, so it never sizes the stage: sized by its content, the
         stage grew by its border on every resize (and the redraw slowed with it) on a one-column page. */
      .stage { position: relative; box-sizing: border-box; width: 100%; height: 100%; min-height: 300px; border-radius: 8px; overflow: hidden; background: linear-gradient(#eef3f1, #dfe7e2); border: 1px solid var(--line); }
      canvas { position: absolute; inset: 0; display: block; width: 100%; height: 100%; }
      .legend { position: absolute; left: 0.6rem; bottom: 0.5rem; font-size: 0.78rem; color: #333; background: #ffffffcc; padding: 0.15rem 0.45rem; border-radius: 4px; }
      .legend i { font-style: normal; white-space: nowrap; margin-right: 0.55rem; }
      .legend span.cut { background: repeating-linear-gradient(45deg, #8a7a5a 0 1.5px, #f1e6cf 1.5px 4px); border: 1px solid #b9ab8c; box-sizing: border-box; }
      .legend span { display: inline-block; width: 0.7rem; height: 0.7rem; border-radius: 2px; margin-right: 0.2rem; vertical-align: -1px; }
      .fallback { padding: 1rem; }
    `,
  ];

  @property({ attribute: false }) meshes: PartMeshes | null = null;
  @property({ attribute: false }) transforms: { rest: PartTransforms; seal: PartTransforms } | null = null;
  @property({ attribute: false }) sizing: SizingSuccess | null = null;
  @property({ attribute: false }) options: ViewOptions = { pose: 'rest', section: true, exploded: false, water: true };
  /** id of the build the meshes came from (reported with `preview-rendered`) */
  @property({ type: Number }) buildId = 0;

  @query('.stage') private stage!: HTMLDivElement;

  private renderer: THREE.WebGLRenderer | null = null;
  private scene = new THREE.Scene();
  private camera = new THREE.PerspectiveCamera(35, 1, 1, 5000);
  private controls: OrbitControls | null = null;
  private parts = new Map<ShownPart, THREE.Mesh>();
  private water: THREE.Mesh | null = null;
  private cut = new THREE.Plane(new THREE.Vector3(0, 1, 0), 0);
  /** the bounds and fitting distance the view was last framed to (null: never framed) */
  private framedBounds: Bounds | null = null;
  private framedDistance = 0;
  /** frame again on the next draw (the parts were pulled apart or put back) */
  private reframeWanted = false;
  private frames = 0;
  private resizeObserver: ResizeObserver | null = null;
  private webglError = '';

  override firstUpdated(): void {
    try {
      this.renderer = new THREE.WebGLRenderer({ antialias: true, alpha: true, preserveDrawingBuffer: true });
    } catch (error) {
      this.webglError = error instanceof Error ? error.message : String(error);
      this.requestUpdate();
      return;
    }
    this.renderer.localClippingEnabled = true;
    this.renderer.setPixelRatio(Math.min(2, globalThis.devicePixelRatio || 1));
    this.stage.append(this.renderer.domElement);
    this.renderer.domElement.setAttribute('aria-label', '3D view of the valve: drag to turn, wheel to zoom, arrow keys to move');
    this.renderer.domElement.setAttribute('role', 'img');
    this.camera.up.set(0, 0, 1);
    this.scene.add(new THREE.HemisphereLight(0xffffff, 0x8a8270, 1.6));
    const sun = new THREE.DirectionalLight(0xffffff, 1.6);
    sun.position.set(-150, -250, 300);
    this.scene.add(sun);
    this.controls = new OrbitControls(this.camera, this.renderer.domElement);
    // gentle turning, never flipped to a top view by a small drag (camera-fit.ts)
    this.controls.rotateSpeed = ORBIT.rotateSpeed;
    this.controls.minPolarAngle = ORBIT.minPolarAngle;
    this.controls.maxPolarAngle = ORBIT.maxPolarAngle;
    // keyboard: focus the view (Tab) and use the arrow keys to move it
    this.renderer.domElement.tabIndex = 0;
    this.controls.listenToKeyEvents(this.renderer.domElement);
    this.controls.addEventListener('change', () => {
      this.dataset.polarDeg = THREE.MathUtils.radToDeg(this.controls!.getPolarAngle()).toFixed(1);
      this.draw();
    });
    this.resizeObserver = new ResizeObserver(() => this.resize());
    this.resizeObserver.observe(this.stage);
    this.resize();
    if (!this.meshes) this.compileShaders();
    this.syncScene(true);
  }

  /**
   * Compile the two shader programs (parts, water) while the first build is still in the
   * worker: in software rendering the first draw otherwise spends a large share of the
   * first view's time compiling them. A throwaway box with the parts' material, cut or not
   * as the view starts, shares their program (one cache key for every part).
   */
  private compileShaders(): void {
    if (!this.renderer) return;
    const planes = this.options.section ? [this.cut] : [];
    const part = partMaterial('housing');
    part.clippingPlanes = planes;
    const water = waterMaterial();
    water.clippingPlanes = planes;
    const box = new THREE.BoxGeometry(1, 1, 1);
    const probes = [new THREE.Mesh(box, part), new THREE.Mesh(box, water)];
    this.scene.add(...probes);
    this.renderer.compile(this.scene, this.camera);
    this.scene.remove(...probes);
    // the materials are not disposed: that would release the compiled programs with them
    box.dispose();
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    this.resizeObserver?.disconnect();
    this.controls?.dispose();
    this.renderer?.dispose();
  }

  override updated(changed: Map<string, unknown>): void {
    if (!this.renderer) return;
    const options = changed.get('options') as ViewOptions | undefined;
    if (options && options.exploded !== this.options.exploded) this.reframeWanted = true;
    this.syncScene(changed.has('meshes'));
  }

  private resize(): void {
    if (!this.renderer) return;
    const w = this.stage.clientWidth || 400;
    const h = this.stage.clientHeight || 300;
    this.renderer.setSize(w, h, false);
    this.camera.aspect = w / h;
    this.camera.updateProjectionMatrix();
    this.draw();
  }

  private draw(): void {
    this.renderer?.render(this.scene, this.camera);
  }

  private syncScene(newMeshes: boolean): void {
    if (newMeshes && this.meshes) {
      for (const old of this.parts.values()) {
        this.scene.remove(old);
        old.geometry.dispose();
        (old.material as THREE.Material).dispose();
      }
      this.parts.clear();
      for (const name of Object.keys(this.meshes) as ShownPart[]) {
        const m = this.meshes[name];
        if (!m) continue;
        const geometry = new THREE.BufferGeometry();
        geometry.setAttribute('position', new THREE.BufferAttribute(m.positions, 3));
        geometry.setIndex(new THREE.BufferAttribute(m.indices, 1));
        geometry.computeVertexNormals();
        const mesh = new THREE.Mesh(geometry, partMaterial(name));
        mesh.matrixAutoUpdate = false;
        mesh.name = name;
        this.parts.set(name, mesh);
        this.scene.add(mesh);
      }
    }
    this.placeParts();
    this.placeWater();
    if (this.meshes) this.frameIfNeeded();
    this.draw();
    if (newMeshes && this.meshes) {
      this.dispatchEvent(new CustomEvent('preview-rendered', { detail: { buildId: this.buildId, at: performance.now() }, bubbles: true, composed: true }));
    }
  }

  /** Offsets that pull the parts apart, in mm (float and pad to +x, nozzle up, pin out along its axis to -x). */
  private explodeOffset(name: ShownPart): THREE.Vector3 {
    const s = this.sizing;
    if (!this.options.exploded || !s) return new THREE.Vector3();
    const foot = s.footprintMm;
    const tall = s.architecture === 'direct' ? s.housing.heightMm : s.frame.heightMm;
    if (s.architecture === 'lever') {
      // the float, arm and pad down and out along the arm, the nozzle up, the pin out sideways, the rim mount back
      switch (name) {
        case 'float': return new THREE.Vector3(foot * 0.3, 0, -Math.max(20, tall * 0.25));
        case 'arm':
        case 'pad': return new THREE.Vector3(0, 0, -Math.max(10, tall * 0.1));
        case 'nozzle': return new THREE.Vector3(0, 0, Math.max(25, tall * 0.35));
        case 'pin': return new THREE.Vector3(0, -foot * 0.6, 0);
        case 'hanger':
        case 'stem': return new THREE.Vector3(-foot * 0.3, 0, 0);
        default: return new THREE.Vector3();
      }
    }
    switch (name) {
      case 'float':
      case 'pad': return new THREE.Vector3(foot * 0.95, 0, 0);
      case 'nozzle': return new THREE.Vector3(0, 0, Math.max(25, tall * 0.35));
      case 'pin': return new THREE.Vector3(-foot * 1.15, 0, 0);
      default: return new THREE.Vector3();
    }
  }

  private placeParts(): void {
    const t = this.transforms?.[this.options.pose];
    const planes = this.options.section ? [this.cut] : [];
    for (const [name, mesh] of this.parts) {
      const m = new THREE.Matrix4();
      const placed = t?.[name];
      if (placed) m.fromArray(placed);
      const off = this.explodeOffset(name);
      mesh.matrix.copy(new THREE.Matrix4().makeTranslation(off.x, off.y, off.z).multiply(m));
      mesh.matrixWorldNeedsUpdate = true;
      const material = mesh.material as THREE.Material;
      // a program change only when the cut is switched, not on every redraw
      if ((material.clippingPlanes?.length ?? 0) !== planes.length) material.needsUpdate = true;
      material.clippingPlanes = planes;
    }
  }

  private placeWater(): void {
    const s = this.sizing;
    if (!s) return;
    if (!this.water) {
      this.water = new THREE.Mesh(new THREE.BoxGeometry(1, 1, 1), waterMaterial());
      this.water.renderOrder = 2;
      this.water.name = 'water';
      this.scene.add(this.water);
    }
    // the water in the container up to the level held with the tank full, as a block cut with the parts
    const size = s.footprintMm * 1.5;
    const level = Math.max(0.1, s.levels.shutOffAtHeadMaxMm);
    this.water.scale.set(size, size, level);
    this.water.position.set(0, 0, level / 2);
    this.water.visible = this.options.water;
    (this.water.material as THREE.Material).clippingPlanes = this.options.section ? [this.cut] : [];
  }

  /** The parts' bounding box and sphere as placed now. */
  private bounds(): Bounds {
    const box = new THREE.Box3();
    for (const mesh of this.parts.values()) {
      if (!mesh.geometry.boundingBox) mesh.geometry.computeBoundingBox();
      box.union(mesh.geometry.boundingBox!.clone().applyMatrix4(mesh.matrix));
    }
    const sphere = box.getBoundingSphere(new THREE.Sphere());
    return { center: [sphere.center.x, sphere.center.y, sphere.center.z], radius: sphere.radius, min: box.min.toArray(), max: box.max.toArray() };
  }

  /**
   * Frame the parts on first sight; later only when they outgrow or shrink from the framed view (a size
   * change, parts pulled apart), keeping the grower's direction and zoom.
   */
  private frameIfNeeded(): void {
    if (!this.controls || this.parts.size === 0) return;
    const now = this.bounds();
    if (!this.framedBounds) this.frame(now, false);
    else if (this.reframeWanted || needsReframe(this.framedBounds, now)) this.frame(now, true);
    this.reframeWanted = false;
  }

  /** Put the camera so the parts fill the view: from the first view's direction, or (`keep`) the grower's, at the grower's zoom. */
  private frame(bounds: Bounds, keep: boolean): void {
    if (!this.controls) return;
    const center = new THREE.Vector3(...bounds.center);
    const offset = this.camera.position.clone().sub(this.controls.target);
    const zoom = keep && this.framedDistance > 0 ? THREE.MathUtils.clamp(offset.length() / this.framedDistance, 0.3, 3) : 1;
    const dir = keep && offset.lengthSq() > 0 ? offset.normalize() : FIRST_VIEW.clone().normalize();
    // margin under 1: a round valve stands well inside its box's corners
    const fit = fitBoxDistance(bounds.min, bounds.max, dir.toArray(), this.camera.up.toArray(), this.camera.fov, this.camera.aspect, 0.95);
    const d = fit * zoom;
    this.controls.target.copy(center);
    this.camera.position.copy(center).addScaledVector(dir, d);
    this.camera.near = d / 50;
    this.camera.far = d * 50;
    this.camera.updateProjectionMatrix();
    this.controls.update();
    this.framedBounds = bounds;
    this.framedDistance = fit;
    // for tests: how often the view was framed, and to what
    this.dataset.frames = String(++this.frames);
    this.dataset.frameRadius = bounds.radius.toFixed(1);
    this.dataset.polarDeg = THREE.MathUtils.radToDeg(this.controls.getPolarAngle()).toFixed(1);
  }

  /** The parts on screen for the legend: the sizing's own (a lever's frame and arm), else the direct valve's. */
  private legendParts(): ShownPart[] {
    const s = this.sizing;
    if (s?.architecture === 'lever') return ['frame', 'arm', 'float', 'nozzle', 'pin', ...(s.rim ? (['hanger', 'stem'] as const) : []), 'pad'];
    return ['housing', 'float', 'nozzle', 'pin', 'pad'];
  }

  /** Put the camera back to its first view. */
  resetView(): void {
    if (this.parts.size === 0) return;
    this.frame(this.bounds(), false);
    this.draw();
  }

  override render() {
    return html`<div class="stage">${this.webglError ? html`<p class="fallback">This browser could not start 3D drawing (${this.webglError}). The sizes, plot and downloads still work.</p>` : ''}</div>
      <div class="legend" aria-hidden="true">${[...this.legendParts().map((p): [string, string] => [hex(COLOURS[p]), LEGEND_WORDS[p]]), ['#9cc5e6', 'water held (tank full)']].map(([colour, words]) => html`<i><span style="background:${colour}"></span>${words}</i>`)}${this.options.section ? html`<i><span class="cut"></span>cut faces</i>` : ''}</div>`;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'fw-valve-view': FwValveView;
  }
}
