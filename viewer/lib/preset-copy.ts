/**
 * A valve preset as the grower gets it: a copy of its design without the
 * preset's own notes (they describe our demo scenario, not the grower's valve;
 * kept in the design they would follow a renamed copy into its build sheet).
 * The notes become the preset's description, said once when it is opened.
 */
import type { Preset } from './presets.ts';

export interface PresetCopy extends Preset {
  /** the preset file's notes, shown when it is opened (default none) */
  description?: string;
}

export function presetCopy(preset: Preset): PresetCopy {
  const { notes, ...doc } = preset.doc;
  return { ...preset, doc: structuredClone(doc), ...(typeof notes === 'string' && notes.trim() ? { description: notes.trim() } : {}) };
}
