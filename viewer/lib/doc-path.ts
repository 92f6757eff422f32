/** Reading and writing a design document by dotted path ("supply.headMax"), without touching the original. */
export type Doc = Record<string, unknown>;

const UNSAFE = new Set(['__proto__', 'constructor', 'prototype']);

export function getAt(doc: unknown, path: string): unknown {
  let node: unknown = doc;
  for (const key of path.split('.')) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string, unknown>)[key];
  }
  return node;
}

/** A copy of `doc` with `value` at `path`; `undefined` removes the key (and sections left empty). */
export function setAt(doc: Doc, path: string, value: unknown): Doc {
  const keys = path.split('.');
  if (keys.some((k) => UNSAFE.has(k) || k === '')) return doc;
  const copy = structuredClone(doc) as Doc;
  let node: Record<string, unknown> = copy;
  const trail: Record<string, unknown>[] = [];
  for (const key of keys.slice(0, -1)) {
    const next = node[key];
    if (next === null || typeof next !== 'object' || Array.isArray(next)) node[key] = {};
    trail.push(node);
    node = node[key] as Record<string, unknown>;
  }
  const last = keys[keys.length - 1];
  if (value === undefined) {
    delete node[last];
    for (let i = trail.length - 1; i >= 0; i--) {
      const child = trail[i][keys[i]] as Record<string, unknown>;
      if (Object.keys(child).length === 0) delete trail[i][keys[i]];
      else break;
    }
  } else node[last] = value;
  return copy;
}
