/**
 * Binary STL reading for tests: parse the file (80-byte header, uint32 count,
 * 50 bytes per triangle, per the STL format as slicers read it), weld corners
 * by exact position (STL carries no indices), and count edge uses. A closed
 * 2-manifold uses every edge exactly twice, once in each direction (3MF Core
 * Specification 4.1, the same rule slicers apply to STL). Source of the rule:
 * the 3MF Core Specification; the STL layout is the open format's.
 */
export interface StlCheck {
  triangles: number;
  vertices: number;
  openEdges: number;
  overusedEdges: number;
  flippedEdges: number;
  closed: boolean;
  /** signed volume, mm3 (positive: normals point out) */
  volumeMm3: number;
  min: [number, number, number];
  max: [number, number, number];
}

export function checkBinaryStl(bytes: Uint8Array): StlCheck {
  if (bytes.length < 84) throw new Error(`STL too short: ${bytes.length} bytes`);
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const count = view.getUint32(80, true);
  if (bytes.length !== 84 + 50 * count) throw new Error(`STL size ${bytes.length} does not match ${count} triangles`);
  const ids = new Map<string, number>();
  const tri: number[] = [];
  const min: [number, number, number] = [Infinity, Infinity, Infinity];
  const max: [number, number, number] = [-Infinity, -Infinity, -Infinity];
  let volume = 0;
  for (let t = 0; t < count; t++) {
    const base = 84 + 50 * t + 12;
    const corners: number[][] = [];
    for (let k = 0; k < 3; k++) {
      const p = [0, 1, 2].map((a) => view.getFloat32(base + 12 * k + 4 * a, true));
      corners.push(p);
      for (let a = 0; a < 3; a++) {
        min[a] = Math.min(min[a], p[a]);
        max[a] = Math.max(max[a], p[a]);
      }
      const key = p.join(',');
      if (!ids.has(key)) ids.set(key, ids.size);
      tri.push(ids.get(key)!);
    }
    const [a, b, c] = corners;
    volume += (a[0] * (b[1] * c[2] - b[2] * c[1]) - a[1] * (b[0] * c[2] - b[2] * c[0]) + a[2] * (b[0] * c[1] - b[1] * c[0])) / 6;
  }
  const uses = new Map<string, { fwd: number; back: number }>();
  for (let t = 0; t < tri.length; t += 3) {
    for (let k = 0; k < 3; k++) {
      const a = tri[t + k], b = tri[t + ((k + 1) % 3)];
      const key = a < b ? `${a}_${b}` : `${b}_${a}`;
      const u = uses.get(key) ?? { fwd: 0, back: 0 };
      if (a < b) u.fwd++;
      else u.back++;
      uses.set(key, u);
    }
  }
  let openEdges = 0, overusedEdges = 0, flippedEdges = 0;
  for (const u of uses.values()) {
    const n = u.fwd + u.back;
    if (n === 1) openEdges++;
    else if (n > 2) overusedEdges++;
    else if (u.fwd !== 1) flippedEdges++;
  }
  return {
    triangles: count,
    vertices: ids.size,
    openEdges,
    overusedEdges,
    flippedEdges,
    closed: count > 0 && openEdges === 0 && overusedEdges === 0 && flippedEdges === 0,
    volumeMm3: volume,
    min,
    max,
  };
}
