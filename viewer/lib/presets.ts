/// <reference types="vite/client" />
/** Starting designs: the project's presets/*.json, plus a built-in starter when none are present. */
export interface Preset {
  id: string;
  title: string;
  doc: Record<string, unknown>;
}

const STARTER: Preset = {
  id: 'starter',
  title: 'Starter: 2.2 m tank, 45 mm of water',
  doc: { name: 'Starter valve', supply: { headMax: '2.2 m' }, level: { target: '45 mm' } },
};

const files = import.meta.glob('../../presets/*.json', { eager: true, import: 'default' }) as Record<string, unknown>;

function titleOf(id: string, doc: Record<string, unknown>): string {
  if (typeof doc.name === 'string' && doc.name.trim()) return doc.name;
  return id.replace(/[-_]/g, ' ').replace(/^./, (c) => c.toUpperCase());
}

export function presets(): Preset[] {
  const list: Preset[] = [];
  for (const [path, doc] of Object.entries(files)) {
    if (!doc || typeof doc !== 'object' || Array.isArray(doc)) continue;
    const id = path.replace(/^.*\//, '').replace(/\.json$/, '');
    list.push({ id, title: titleOf(id, doc as Record<string, unknown>), doc: doc as Record<string, unknown> });
  }
  list.sort((a, b) => (a.id === 'rooftop-tubs' ? -1 : b.id === 'rooftop-tubs' ? 1 : a.id.localeCompare(b.id)));
  return list.length ? list : [STARTER];
}
