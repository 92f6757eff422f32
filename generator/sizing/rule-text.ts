import type { Architecture, Mount } from './inputs.ts';
import { CONSTRAINT_TEXT } from './layout/constraint-text.ts';
import { LEVER_CONSTRAINT_TEXT, LEVER_RIM_TRAVEL_TEXT } from './lever/lever-constraint-text.ts';

/**
 * A rule a valve must meet, in a grower's words: the direct valve's rules, or the lever's, whose travel rule
 * reads by its mount (the floor, or on the rim the floor less the slotted stem's reach). An unknown code is
 * given back as it is.
 *
 * Example: ruleText('travel', 'lever', 'rim') = LEVER_RIM_TRAVEL_TEXT.
 */
export function ruleText(code: string, architecture: Architecture | 'auto' = 'direct', mount: Mount | 'auto' = 'floor'): string {
  if (architecture !== 'lever') return (CONSTRAINT_TEXT as Record<string, string>)[code] ?? code;
  if (code === 'travel' && mount === 'rim') return LEVER_RIM_TRAVEL_TEXT;
  return (LEVER_CONSTRAINT_TEXT as Record<string, string>)[code] ?? code;
}
