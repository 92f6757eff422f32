/**
 * The bench (a plan document as the grower left it, errors and all) kept in
 * the browser between visits, and the one it last replaced (a preset or a
 * file), so opening something never loses the bench that was on screen.
 * Also which page was open.
 */
export const BENCH_KEY = 'floatwright.bench.v1';
export const BENCH_PREVIOUS_KEY = 'floatwright.bench.previous.v1';
export const PAGE_KEY = 'floatwright.page.v1';

export type Page = 'valve' | 'bench';

type Store = Pick<Storage, 'getItem' | 'setItem'> | undefined;

function read(storage: Store, key: string): Record<string, unknown> | null {
  try {
    const value = JSON.parse(storage?.getItem(key) ?? 'null') as unknown;
    return value && typeof value === 'object' && !Array.isArray(value) ? (value as Record<string, unknown>) : null;
  } catch {
    return null;
  }
}

function write(storage: Store, key: string, value: unknown): void {
  try {
    storage?.setItem(key, JSON.stringify(value));
  } catch {
    // storage full or blocked: the bench stays on screen, only the reload memory is lost
  }
}

export const loadBench = (storage: Store) => read(storage, BENCH_KEY);
export const saveBench = (storage: Store, plan: Record<string, unknown>) => write(storage, BENCH_KEY, plan);
export const loadPreviousBench = (storage: Store) => read(storage, BENCH_PREVIOUS_KEY);
export const savePreviousBench = (storage: Store, plan: Record<string, unknown>) => write(storage, BENCH_PREVIOUS_KEY, plan);

export function loadPage(storage: Store): Page {
  try {
    return storage?.getItem(PAGE_KEY) === 'bench' ? 'bench' : 'valve';
  } catch {
    return 'valve';
  }
}

export function savePage(storage: Store, page: Page): void {
  try {
    storage?.setItem(PAGE_KEY, page);
  } catch {
    // blocked: the page opens on the valve next time
  }
}

/** A plan document rather than a valve design: it lists containers or names a tank. */
export function isPlanDocument(doc: unknown): boolean {
  if (!doc || typeof doc !== 'object' || Array.isArray(doc)) return false;
  const d = doc as Record<string, unknown>;
  return Array.isArray(d.containers) || (!!d.tank && typeof d.tank === 'object');
}
