/**
 * 3MF package of one or more parts laid out on one build plate.
 *
 * Follows the 3MF Core Specification (3MF Consortium, 1.x): an OPC zip with
 * [Content_Types].xml, _rels/.rels pointing at /3D/3dmodel.model, and one
 * model in millimetres. Each part is an <object type="model"> carrying the
 * part's name, with a welded mesh: every vertex listed once and triangles
 * referring to it by index, so each edge is shared by exactly two triangles
 * by index (spec 4.1, "Manifold Edges"). Each object gets one build <item>.
 *
 * Parts are placed side by side (layoutOnPlate: shelf packing by bounding
 * box, centred), each resting on z = 0; the placement is baked into the
 * vertices, so items need no transform.
 *
 * Refuses, with a message naming the field: no objects, a blank name, an
 * empty or open mesh (set checkClosed false to skip the edge check), or an
 * arrangement that does not fit the plate.
 */
import { strToU8, zipSync } from 'fflate';
import { xmlText } from '../../doc/safe-text/xml-text.ts';
import { countEdgeUses } from './count-edge-uses.ts';
import { formatFloat32 } from './format-float32.ts';
import { isIndexedMesh } from './is-indexed-mesh.ts';
import { layoutOnPlate, type PlateOptions } from './layout-on-plate.ts';
import { meshBounds } from './mesh-bounds.ts';
import type { IndexedMesh } from './types.ts';

export interface ThreeMfObject {
  /** part name, shown by slicers (e.g. "housing") */
  name: string;
  mesh: IndexedMesh;
}

export interface ThreeMfOptions extends PlateOptions {
  /** model title metadata; default none */
  title?: string;
  /** count edge uses and refuse a mesh that is not closed; default true */
  checkClosed?: boolean;
}

const CORE_NAMESPACE = 'http://schemas.microsoft.com/3dmanufacturing/core/2015/02';
const MODEL_RELATIONSHIP = 'http://schemas.microsoft.com/3dmanufacturing/2013/01/3dmodel';
const MODEL_CONTENT_TYPE = 'application/vnd.ms-package.3dmanufacturing-3dmodel+xml';
const RELATIONSHIPS_CONTENT_TYPE = 'application/vnd.openxmlformats-package.relationships+xml';
// Fixed zip timestamp: the same parts always give the same bytes.
const ZIP_TIME = new Date(2020, 0, 1);

export function write3mf(objects: readonly ThreeMfObject[], options: ThreeMfOptions): Uint8Array {
  if (!Array.isArray(objects) || objects.length === 0) {
    throw new RangeError(`write3mf.objects = ${Array.isArray(objects) ? '[] (empty)' : String(objects)}; allowed: a list of one or more { name, mesh }`);
  }
  const bounds = objects.map((object, i) => {
    const path = `write3mf.objects[${i}]`;
    if (typeof object?.name !== 'string' || object.name.trim() === '') {
      throw new RangeError(`${path}.name = ${JSON.stringify(object?.name)}; allowed: a non-empty part name`);
    }
    if (!isIndexedMesh(object.mesh) || object.mesh.indices.length === 0) {
      throw new RangeError(`${path}.mesh ("${object.name}") is empty or not an indexed mesh; allowed: { positions: Float32Array, indices: Uint32Array } with at least one triangle`);
    }
    if (options?.checkClosed !== false) {
      const edges = countEdgeUses(object.mesh);
      if (!edges.closed) {
        throw new RangeError(
          `${path}.mesh ("${object.name}") is not a closed 2-manifold: ${edges.boundaryEdges} open edges, ` +
            `${edges.overusedEdges} edges shared by 3 or more triangles, ${edges.inconsistentlyOriented} flipped, ` +
            `${edges.degenerateTriangles} degenerate triangles; allowed: every edge shared by exactly two triangles`,
        );
      }
    }
    return meshBounds(object.mesh);
  });

  const layout = layoutOnPlate(
    bounds.map((b) => ({ widthMm: b.max[0] - b.min[0], depthMm: b.max[1] - b.min[1] })),
    options,
    'write3mf.options',
  );
  if (!layout.fits) {
    throw new RangeError(
      `write3mf.options: plate ${options.plateWidthMm} × ${options.plateDepthMm} mm is too small for ${objects.length === 1 ? 'this part' : `these ${objects.length} parts`} ` +
        `(they need ${layout.usedWidthMm.toFixed(1)} × ${layout.usedDepthMm.toFixed(1)} mm with spacingMm = ${options.spacingMm}); ` +
        `allowed: a plate at least that large, or fewer parts per file`,
    );
  }

  const model: string[] = [
    '<?xml version="1.0" encoding="UTF-8"?>\n',
    `<model unit="millimeter" xml:lang="en-US" xmlns="${CORE_NAMESPACE}">\n`,
    ' <metadata name="Application">floatwright</metadata>\n',
  ];
  if (options.title) model.push(` <metadata name="Title">${escapeXml(options.title)}</metadata>\n`);
  model.push(' <resources>\n');
  objects.forEach((object, i) => {
    const offset = [
      layout.placements[i].xMm - bounds[i].min[0],
      layout.placements[i].yMm - bounds[i].min[1],
      -bounds[i].min[2],
    ];
    model.push(`  <object id="${i + 1}" type="model" name="${escapeXml(object.name)}">\n   <mesh>\n`);
    appendMesh(model, object.mesh, offset);
    model.push('   </mesh>\n  </object>\n');
  });
  model.push(' </resources>\n <build>\n');
  objects.forEach((_, i) => model.push(`  <item objectid="${i + 1}"/>\n`));
  model.push(' </build>\n</model>\n');

  const contentTypes =
    '<?xml version="1.0" encoding="UTF-8"?>\n' +
    '<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types">\n' +
    ` <Default Extension="rels" ContentType="${RELATIONSHIPS_CONTENT_TYPE}"/>\n` +
    ` <Default Extension="model" ContentType="${MODEL_CONTENT_TYPE}"/>\n` +
    '</Types>\n';
  const relationships =
    '<?xml version="1.0" encoding="UTF-8"?>\n' +
    '<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships">\n' +
    ` <Relationship Target="/3D/3dmodel.model" Id="rel0" Type="${MODEL_RELATIONSHIP}"/>\n` +
    '</Relationships>\n';

  return zipSync(
    {
      '[Content_Types].xml': strToU8(contentTypes),
      '_rels/.rels': strToU8(relationships),
      '3D/3dmodel.model': strToU8(model.join('')),
    },
    { level: 6, mtime: ZIP_TIME },
  );
}

/** Vertices (only those used, in first-use order) and triangles of one object, moved by `offset`. */
function appendMesh(out: string[], mesh: IndexedMesh, offset: number[]): void {
  const { positions: p, indices } = mesh;
  const newIndex = new Int32Array(p.length / 3).fill(-1);
  const triangles: string[] = [];
  out.push('    <vertices>\n');
  let next = 0;
  const use = (v: number): number => {
    if (newIndex[v] < 0) {
      newIndex[v] = next++;
      const x = formatFloat32(p[3 * v] + offset[0]);
      const y = formatFloat32(p[3 * v + 1] + offset[1]);
      const z = formatFloat32(p[3 * v + 2] + offset[2]);
      out.push(`     <vertex x="${x}" y="${y}" z="${z}"/>\n`);
    }
    return newIndex[v];
  };
  for (let t = 0; t < indices.length; t += 3) {
    const a = use(indices[t]);
    const b = use(indices[t + 1]);
    const c = use(indices[t + 2]);
    triangles.push(`     <triangle v1="${a}" v2="${b}" v3="${c}"/>\n`);
  }
  out.push('    </vertices>\n    <triangles>\n');
  for (const triangle of triangles) out.push(triangle); // no spread: large meshes would overflow the argument list
  out.push('    </triangles>\n');
}

/** Names and the title as XML text: characters XML 1.0 forbids become U+FFFD (xmlText), then & < > " ' are escaped. */
function escapeXml(text: string): string {
  return xmlText(text).replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' })[c] as string);
}
