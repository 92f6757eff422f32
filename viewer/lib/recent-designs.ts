/**
 * Earlier designs kept in the browser, so opening a share link, a preset or a
 * file never loses the design that was on screen: the newest first, at most
 * RECENT_MAX, the same design kept once. Stored under its own key, apart from
 * the current design (storage.ts).
 */
export const RECENT_KEY = 'floatwright.workbench.recent.v1';
export const RECENT_MAX = 8;

export interface RecentDesign {
  /** when it was set aside, ms since 1970 */
  at: number;
  /** what replaced it ("a share link", "the preset Rooftop tubs", ...) */
  replacedBy: string;
  doc: Record<string, unknown>;
}

export function loadRecent(storage: Pick<Storage, 'getItem'> | undefined): RecentDesign[] {
  try {
    const list = JSON.parse(storage?.getItem(RECENT_KEY) ?? '[]') as unknown;
    if (!Array.isArray(list)) return [];
    return list
      .filter((r): r is RecentDesign => !!r && typeof r === 'object' && typeof r.at === 'number' && typeof r.replacedBy === 'string' && !!r.doc && typeof r.doc === 'object' && !Array.isArray(r.doc))
      .slice(0, RECENT_MAX);
  } catch {
    return [];
  }
}

/** The list with `doc` put first (an equal design already in it moves up); saved when storage allows. */
export function keepRecent(storage: Pick<Storage, 'getItem' | 'setItem'> | undefined, doc: Record<string, unknown>, replacedBy: string, at = Date.now()): RecentDesign[] {
  const text = JSON.stringify(doc);
  const list = [{ at, replacedBy, doc }, ...loadRecent(storage).filter((r) => JSON.stringify(r.doc) !== text)].slice(0, RECENT_MAX);
  try {
    storage?.setItem(RECENT_KEY, JSON.stringify(list));
  } catch {
    // storage full or blocked: the list still holds for this visit
  }
  return list;
}

/** A short title for the list: the design's name, else its head and level. */
export function recentTitle(r: RecentDesign): string {
  const d = r.doc as { name?: unknown; supply?: { headMax?: unknown }; level?: { target?: unknown } };
  const what = typeof d.name === 'string' && d.name.trim() ? d.name.trim().slice(0, 40) : `head ${String(d.supply?.headMax ?? '?')}, level ${String(d.level?.target ?? '?')}`;
  const when = new Date(r.at).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' });
  return `${what} (${when}, before ${r.replacedBy})`;
}
