/**
 * The cautions shown wherever results are shown: terminal table, build sheet,
 * plan report and the workbench. One list, so every place says the same.
 */
export interface Caution {
  /** short heading */
  title: string;
  /** one or two plain sentences */
  text: string;
}

export const CAUTIONS: readonly Caution[] = [
  {
    title: 'Low pressure only',
    text: 'For gravity feed from a tank at most 3 m (10 ft) above the valve. Never connect it to mains pressure.',
  },
  {
    title: 'Protect the drinking-water supply',
    text: 'A tank filled from a drinking-water supply needs the air gap or backflow prevention that your local plumbing code asks for.',
  },
  {
    title: 'Plan for a stuck valve',
    text: 'A valve stuck open floods its container: give every container an overflow path or a tray.',
  },
  {
    title: 'Printed plastic and water',
    text: 'Printed plastics are not certified for drinking water or food contact. Rinse parts before use, print in an opaque colour to keep light and algae out, and check monthly for roots and biofilm.',
  },
  {
    title: 'Local rules come first',
    text: 'Follow local codes and licensed practice where they apply.',
  },
];

/** The cautions as plain text lines, for terminals and Markdown. */
export function cautionLines(): string[] {
  return CAUTIONS.map((c) => `${c.title}: ${c.text}`);
}
