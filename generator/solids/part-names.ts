/**
 * The printed parts of each kind of valve, by name (no geometry here, so the
 * workbench's page can list them without loading the part builders).
 */
import type { SizingSuccess } from '../sizing/result.ts';

/** The direct valve's printed parts. */
export type DirectPartName = 'housing' | 'float' | 'nozzle' | 'pin';
/** The lever valve's printed parts (hanger and stem only on the rim). */
export type LeverPartName = 'frame' | 'arm' | 'float' | 'nozzle' | 'pin' | 'hanger' | 'stem';
export type PartName = DirectPartName | LeverPartName;
/** The direct valve's parts, in build order. */
export const PART_NAMES: readonly DirectPartName[] = ['housing', 'float', 'nozzle', 'pin'];

/** The printed parts of a sized valve, in build order. */
export function valvePartNames(sizing: Pick<SizingSuccess, 'architecture' | 'parts'>): PartName[] {
  if (sizing.architecture === 'direct') return [...PART_NAMES];
  const rim = 'rim' in sizing.parts && sizing.parts.rim !== null;
  return ['frame', 'arm', 'float', 'nozzle', 'pin', ...(rim ? (['hanger', 'stem'] as const) : [])];
}

/** Each part in a grower's words. */
export const PART_WORDS: Record<PartName, string> = {
  housing: 'Housing',
  frame: 'Frame',
  arm: 'Arm',
  float: 'Float',
  nozzle: 'Nozzle',
  pin: 'Pin',
  hanger: 'Rim hanger',
  stem: 'Slotted stem',
};
