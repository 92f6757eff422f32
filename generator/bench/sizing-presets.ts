/**
 * `npx tsx generator/bench/sizing-presets.ts` (`--json` for JSON): the sizing's time on every design preset
 * (presets/*.json but the bench plans, plan-*.json), each as the median of 30 runs after 10 warm-ups, the
 * lowest of 3 rounds (other sessions share the machine: the lowest round is the least disturbed), with
 * the valve each gives. `npm run bench` times rooftop-tubs alone, after 3 warm-ups; this shows every preset,
 * the lever ones too. Target (2-core machine): at most 10 ms each. A benchmark, not a test.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parseDesign } from '../doc/schema.ts';
import { sizeDesign } from '../sizing/size-design.ts';

const WARMUP = 10;
const RUNS = 30;
const ROUNDS = 3;
const PRESETS = fileURLToPath(new URL('../../presets/', import.meta.url));

export interface PresetTiming {
  preset: string;
  /** 'direct' or 'lever', or 'none' when no valve fits */
  valve: string;
  sizingMs: number;
  /** each round's median, ms */
  roundsMs: number[];
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return (s[(s.length - 1) >> 1] + s[s.length >> 1]) / 2;
}

/** Times sizeDesign on one preset file. */
export function timePreset(file: string): PresetTiming {
  const parsed = parseDesign(JSON.parse(readFileSync(PRESETS + file, 'utf8')));
  if (!parsed.ok) throw new Error(`preset ${file} refused: ${JSON.stringify(parsed.errors)}`);
  const roundsMs: number[] = [];
  for (let r = 0; r < ROUNDS; r++) {
    for (let i = 0; i < WARMUP; i++) sizeDesign(parsed.inputs);
    const times: number[] = [];
    for (let i = 0; i < RUNS; i++) {
      const t0 = performance.now();
      sizeDesign(parsed.inputs);
      times.push(performance.now() - t0);
    }
    roundsMs.push(Number(median(times).toFixed(3)));
  }
  const sized = sizeDesign(parsed.inputs);
  return { preset: file.replace(/\.json$/, ''), valve: sized.ok ? sized.architecture : 'none', sizingMs: Math.min(...roundsMs), roundsMs };
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const files = readdirSync(PRESETS).filter((f) => f.endsWith('.json') && !f.startsWith('plan-')).sort();
  const timings = files.map(timePreset);
  if (process.argv.includes('--json')) process.stdout.write(`${JSON.stringify(timings, null, 2)}\n`);
  else {
    for (const t of timings) {
      process.stdout.write(`${t.preset.padEnd(18)} ${t.valve.padEnd(6)} ${t.sizingMs.toFixed(2).padStart(6)} ms   (rounds ${t.roundsMs.map((m) => m.toFixed(2)).join(', ')}; target <= 10 ms)\n`);
    }
  }
}
