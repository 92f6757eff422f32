/**
 * An indexed mesh moved by a 4x4 matrix (column-major, as JSCAD and three
 * store them). Returns a new mesh; the indices are shared. A mirroring matrix
 * (negative determinant) would turn the triangles inside out, so the winding is
 * flipped then to keep the normals outward.
 */
import { jscad, type IndexedMesh } from '../mesh/index.ts';

type Mat4 = Parameters<typeof jscad.transforms.transform>[0];

export function transformMesh(mesh: IndexedMesh, m: readonly number[]): IndexedMesh {
  if (m.length !== 16) throw new RangeError(`transformMesh.matrix has ${m.length} entries; allowed: 16 (4x4, column-major)`);
  const p = mesh.positions;
  const out = new Float32Array(p.length);
  for (let i = 0; i < p.length; i += 3) {
    const x = p[i], y = p[i + 1], z = p[i + 2];
    out[i] = m[0] * x + m[4] * y + m[8] * z + m[12];
    out[i + 1] = m[1] * x + m[5] * y + m[9] * z + m[13];
    out[i + 2] = m[2] * x + m[6] * y + m[10] * z + m[14];
  }
  const det =
    m[0] * (m[5] * m[10] - m[9] * m[6]) - m[4] * (m[1] * m[10] - m[9] * m[2]) + m[8] * (m[1] * m[6] - m[5] * m[2]);
  if (det >= 0) return { positions: out, indices: mesh.indices };
  const flipped = new Uint32Array(mesh.indices.length);
  for (let t = 0; t < flipped.length; t += 3) {
    flipped[t] = mesh.indices[t];
    flipped[t + 1] = mesh.indices[t + 2];
    flipped[t + 2] = mesh.indices[t + 1];
  }
  return { positions: out, indices: flipped };
}

/** Column-major translation matrix. */
export function translation(x: number, y: number, z: number): number[] {
  return [1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, x, y, z, 1];
}

/** Column-major matrix from three rows of a rotation (or any 3x3) and a translation. */
export function fromRows(r0: readonly number[], r1: readonly number[], r2: readonly number[], t: readonly number[] = [0, 0, 0]): number[] {
  return [r0[0], r1[0], r2[0], 0, r0[1], r1[1], r2[1], 0, r0[2], r1[2], r2[2], 0, t[0], t[1], t[2], 1];
}

/** Product a * b of two column-major 4x4 matrices (apply b first, then a). */
export function multiply(a: readonly number[], b: readonly number[]): number[] {
  const out = new Array<number>(16).fill(0);
  for (let c = 0; c < 4; c++) {
    for (let r = 0; r < 4; r++) {
      let s = 0;
      for (let k = 0; k < 4; k++) s += a[k * 4 + r] * b[c * 4 + k];
      out[c * 4 + r] = s;
    }
  }
  return out;
}

/** The same matrix typed as JSCAD's Mat4 (a 16-entry column-major array). */
export function asMat4(m: readonly number[]): Mat4 {
  if (m.length !== 16) throw new RangeError(`asMat4.matrix has ${m.length} entries; allowed: 16`);
  return m as unknown as Mat4;
}
