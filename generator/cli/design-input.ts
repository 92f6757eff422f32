/**
 * Getting a design from the command line: a design file (`--design FILE`)
 * and flags that override single values in it. Shared by every command that
 * takes a design (size, build).
 */
import { constants } from 'node:fs';
import { open, stat } from 'node:fs/promises';
import type { ParseArgsConfig } from 'node:util';
import { closestKey, ROOT_FIELD, type FieldError } from '../doc/fields.ts';
import { mergeOverrides, parseDesign, type DesignParse } from '../doc/schema.ts';

/** Largest design file read, bytes (1 MB; a design document is a few hundred bytes). */
export const MAX_DESIGN_BYTES = 1024 * 1024;

/** Flags that set one value of the design document. */
export const DESIGN_FLAGS = [
  { flag: 'head-max', path: 'supply.headMax', help: 'highest supply head: tank water surface above the nozzle tip', example: '2.2m' },
  { flag: 'head-min', path: 'supply.headMin', help: 'lowest supply head (default: the highest head)', example: '1.6m' },
  { flag: 'level', path: 'level.target', help: 'target water depth above the container floor', example: '45mm' },
  { flag: 'material', path: 'print.material', help: 'print material: PLA, PETG, ABS, ASA, PP, PA12, TPU 95A', example: 'petg' },
  { flag: 'wall', path: 'print.wall', help: 'housing wall thickness (default 2.25 mm, five 0.45 mm lines)', example: '2.25mm' },
  { flag: 'orifice', path: 'nozzle.orifice', help: 'nozzle orifice diameter (default 2 mm)', example: '1.5mm' },
  { flag: 'seal-diameter', path: 'nozzle.sealDiameter', help: 'outer diameter of the nozzle lip (default 5 mm)', example: '4mm' },
  { flag: 'tube-diameter', path: 'supply.tubeInnerDiameter', help: 'supply tube inner diameter (default 4 mm)', example: '4mm' },
  { flag: 'tube-length', path: 'supply.tubeLength', help: 'supply tube length (default 5 m)', example: '8m' },
  { flag: 'max-diameter', path: 'limits.maxOuterDiameter', help: 'widest the valve may be (default 120 mm)', example: '90mm' },
  { flag: 'reserve', path: 'reserve', help: 'float lift over the force needed to close (default 1.5)', example: '2' },
  { flag: 'pad', path: 'seal.pad', help: 'seal pad from the table, e.g. "sponge grade 2" or "rubber 40A" (default auto: the softest sponge that fits)', example: 'sponge-2' },
  { flag: 'overflow', path: 'container.overflow', help: 'height of the container overflow above its floor (the valve shuts 10 mm below it at least)', example: '80mm' },
  { flag: 'demand', path: 'container.demand', help: "the plants' peak use (default 3 L/day; also gal/day, L/h)", example: '5L/day' },
  { flag: 'rim-height', path: 'container.rimHeight', help: 'top of the container wall above its floor (only then can the valve hang from the rim)', example: '350mm' },
  { flag: 'container-wall', path: 'container.wallThickness', help: 'container wall thickness at the rim (default 3 mm)', example: '2.5mm' },
  { flag: 'architecture', path: 'valve.architecture', help: 'auto (least plastic), direct, or lever (the float on an arm)', example: 'lever' },
  { flag: 'mount', path: 'valve.mount', help: 'auto, floor, or rim (hung from the container rim; needs --rim-height)', example: 'rim' },
] as const;

/** parseArgs options for --design and the design flags. */
export const DESIGN_OPTIONS = {
  design: { type: 'string' },
  ...Object.fromEntries(DESIGN_FLAGS.map((f) => [f.flag, { type: 'string' }])),
} as NonNullable<ParseArgsConfig['options']>;

/** The flag that sets a document path, e.g. "supply.headMax" -> "--head-max". */
export function flagForField(field: string): string | undefined {
  const found = DESIGN_FLAGS.find((f) => f.path === field);
  return found ? `--${found.flag}` : undefined;
}

/** Help lines for the design flags, aligned. */
export function designFlagsHelp(): string {
  const rows = DESIGN_FLAGS.map((f) => [`  --${f.flag} <value>`, `${f.help}; e.g. ${f.example}`]);
  const width = Math.max(...rows.map((r) => r[0].length)) + 2;
  return rows.map(([a, b]) => a.padEnd(width) + b).join('\n');
}

type FileRead = { ok: true; doc: unknown } | { ok: false; errors: FieldError[] };

/** Line and column of a character offset, for JSON syntax errors. */
function lineAndColumn(text: string, offset: number): string {
  const before = text.slice(0, offset).split('\n');
  return `line ${before.length}, column ${before[before.length - 1].length + 1}`;
}

/** Read and JSON-parse a design file; every problem is a "design" field error. */
export async function readDesignFile(path: string): Promise<FileRead> {
  const fail = (message: string): FileRead => ({ ok: false, errors: [{ field: ROOT_FIELD, message }] });
  let text: string;
  try {
    // Looked at before it is opened: opening a FIFO waits for a writer for ever, a device may never end.
    const first = await stat(path);
    if (first.isDirectory()) return fail(`"${path}" is a folder, not a file; give the path of a design document (.json).`);
    if (!first.isFile()) return fail(`"${path}" is not a regular file (a pipe, a device or a socket); give the path of a design document (.json).`);
    // O_NONBLOCK: should it be swapped for a FIFO after the look, opening still returns at once
    const handle = await open(path, constants.O_RDONLY | constants.O_NONBLOCK);
    try {
      const info = await handle.stat();
      if (!info.isFile()) return fail(`"${path}" is not a regular file (a pipe, a device or a socket); give the path of a design document (.json).`);
      if (info.size > MAX_DESIGN_BYTES) {
        return fail(`"${path}" is ${(info.size / 1024 / 1024).toFixed(1)} MB; a design document must be at most 1 MB.`);
      }
      text = await handle.readFile({ encoding: 'utf8' });
    } finally {
      await handle.close();
    }
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') return fail(`cannot find "${path}"; check the path of the design file.`);
    if (code === 'EACCES' || code === 'EPERM') return fail(`cannot read "${path}": permission denied.`);
    if (code === 'EISDIR') return fail(`"${path}" is a folder; give the path of a design document (.json).`);
    if (code === 'ENAMETOOLONG') return fail(`cannot read "${path}": the name is too long for the file system.`);
    if (code === 'ENOTDIR') return fail(`cannot read "${path}": part of the path is a file, not a folder.`);
    if (code === 'ELOOP') return fail(`cannot read "${path}": too many symbolic links in the path.`);
    return fail(`cannot read "${path}"; check the path and that the file can be read.`);
  }
  if (text.length > MAX_DESIGN_BYTES) return fail(`"${path}" is larger than 1 MB; a design document must be at most 1 MB.`);
  const body = text.replace(/^\uFEFF/, '');
  try {
    return { ok: true, doc: JSON.parse(body) };
  } catch (error) {
    const detail = (error as Error).message;
    const position = /position (\d+)/.exec(detail);
    const where = position ? ` at ${lineAndColumn(body, Number(position[1]))}` : '';
    return fail(`"${path}" is not valid JSON${where}: ${detail}.`);
  }
}

/**
 * The design from --design (if given) with the flag values written over it,
 * checked by the schema.
 */
export async function loadDesign(values: Record<string, unknown>): Promise<DesignParse> {
  let doc: unknown = {};
  if (typeof values.design === 'string') {
    const read = await readDesignFile(values.design);
    if (!read.ok) return read;
    doc = read.doc;
  }
  const overrides: Record<string, unknown> = {};
  for (const f of DESIGN_FLAGS) {
    if (values[f.flag] !== undefined) overrides[f.path] = values[f.flag];
  }
  return parseDesign(mergeOverrides(doc, overrides));
}

/**
 * parseArgs refusals (unknown option, missing value, stray word) as field
 * errors naming the option, with a guess for a typo.
 */
export function argumentError(error: unknown, knownOptions: readonly string[]): FieldError | null {
  const code = (error as { code?: string }).code;
  if (typeof code !== 'string' || !code.startsWith('ERR_PARSE_ARGS')) return null;
  const message = (error as Error).message;
  const quoted = /'([^']+)'/.exec(message)?.[1] ?? '';
  if (code === 'ERR_PARSE_ARGS_UNKNOWN_OPTION') {
    const name = quoted.replace(/^-+/, '');
    const guess = closestKey(name, knownOptions);
    return {
      field: quoted || 'options',
      message: `unknown option ${quoted}${guess ? `; did you mean --${guess}?` : '.'} See --help for the options.`,
    };
  }
  if (code === 'ERR_PARSE_ARGS_UNEXPECTED_POSITIONAL') {
    return { field: 'options', message: `unexpected word "${quoted}"; values go after their option, e.g. --head-max 2.2m. See --help.` };
  }
  const option = quoted.split(' ')[0] || 'options';
  const example = DESIGN_FLAGS.find((f) => `--${f.flag}` === option)?.example ?? 'VALUE';
  return {
    field: option,
    message: `${option} needs a value after it, e.g. ${option} ${example} (a value starting with "-" is written ${option}=-1).`,
  };
}
