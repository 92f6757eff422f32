/**
 * Binary STL of one solid, millimetres.
 *
 * Layout (the open STL format as every slicer reads it): an 80-byte header,
 * a little-endian uint32 triangle count, then per triangle 50 bytes: the unit
 * normal and three corners as 12 float32, and a uint16 attribute (0). The
 * header must not start with "solid", or some readers take the file for ASCII
 * STL. STL has no vertex indices; readers weld corners by position.
 *
 * Options: `header` (default "floatwright binary STL, millimetres"), cut to
 * 80 bytes of ASCII.
 */
import { geom3ToMesh } from './geom3-to-mesh.ts';
import { isIndexedMesh } from './is-indexed-mesh.ts';
import type { Geom3 } from './jscad.ts';
import type { IndexedMesh } from './types.ts';

export interface StlOptions {
  header?: string;
}

const HEADER_BYTES = 80;
const TRIANGLE_BYTES = 50;

export function writeStlBinary(solid: IndexedMesh | Geom3, options: StlOptions = {}): Uint8Array {
  const mesh = isIndexedMesh(solid) ? solid : geom3ToMesh(solid);
  const { positions: p, indices } = mesh;
  const triangles = indices.length / 3;
  const bytes = new Uint8Array(HEADER_BYTES + 4 + TRIANGLE_BYTES * triangles);
  const view = new DataView(bytes.buffer);

  let header = (options.header ?? 'floatwright binary STL, millimetres').replace(/[^\x20-\x7e]/g, '?');
  if (/^solid/i.test(header)) header = 'STL ' + header; // keep readers from guessing ASCII
  for (let i = 0; i < Math.min(header.length, HEADER_BYTES); i++) bytes[i] = header.charCodeAt(i);
  view.setUint32(HEADER_BYTES, triangles, true);

  let offset = HEADER_BYTES + 4;
  for (let t = 0; t < indices.length; t += 3) {
    const a = 3 * indices[t];
    const b = 3 * indices[t + 1];
    const c = 3 * indices[t + 2];
    // normal = (b - a) × (c - a), normalised; zero for a degenerate triangle
    const ux = p[b] - p[a], uy = p[b + 1] - p[a + 1], uz = p[b + 2] - p[a + 2];
    const vx = p[c] - p[a], vy = p[c + 1] - p[a + 1], vz = p[c + 2] - p[a + 2];
    let nx = uy * vz - uz * vy;
    let ny = uz * vx - ux * vz;
    let nz = ux * vy - uy * vx;
    const length = Math.hypot(nx, ny, nz);
    if (length > 0) {
      nx /= length;
      ny /= length;
      nz /= length;
    }
    view.setFloat32(offset, nx, true);
    view.setFloat32(offset + 4, ny, true);
    view.setFloat32(offset + 8, nz, true);
    offset += 12;
    for (const v of [a, b, c]) {
      view.setFloat32(offset, p[v], true);
      view.setFloat32(offset + 4, p[v + 1], true);
      view.setFloat32(offset + 8, p[v + 2], true);
      offset += 12;
    }
    view.setUint16(offset, 0, true);
    offset += 2;
  }
  return bytes;
}
