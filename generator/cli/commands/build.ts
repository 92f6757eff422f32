/**
 * `floatwright build`: size one valve and write its printable files (one STL
 * per part, a 3MF plate, the design document, the build sheet) into a folder.
 */
import { standSpecOf } from '../../sizing/parts/stand-spec.ts';
import type { FieldError } from '../../doc/fields.ts';
import { sizeDesign } from '../../sizing/size-design.ts';
import { writeDesignFiles } from '../../solids/write-design-files.ts';
import { EXIT_INPUT, EXIT_OK, type Command, type Io } from '../command.ts';
import { readCommandLine, reportInputErrors } from '../command-line.ts';
import { DESIGN_OPTIONS, designFlagsHelp, flagForField, loadDesign } from '../design-input.ts';
import { fixed, formatCautions, formatFailureText } from '../../doc/format-sizing.ts';
import { writeIntoOutFolder } from '../output/write-into-out-folder.ts';

const OPTIONS = {
  ...DESIGN_OPTIONS,
  out: { type: 'string' },
  quality: { type: 'string' },
  'with-pad': { type: 'boolean' },
  'with-test-stand': { type: 'boolean' },
  json: { type: 'boolean' },
  help: { type: 'boolean', short: 'h' },
  debug: { type: 'boolean' },
} as const;

const HELP = `Usage: floatwright build --design FILE --out DIR [options]

Sizes one float valve and writes the files to print it into DIR: one binary STL
per part (housing, float, nozzle insert, retainer pin) in print orientation, a
3MF with every part on one plate, the design document and a build sheet
(Markdown and a printable HTML page). Files are named after the design.

  --design FILE            design document (JSON); flags below override its values
  --out DIR                folder for the files (made if missing, with a marker file
                           .floatwright-output; a file or a symbolic link is refused)
  --quality Q              export (default: chord error at most 0.05 mm) or preview (coarse, quick)
  --with-pad               also write the seal pad's disc as a cutting template (the pad itself is cut from sponge or rubber sheet)
  --with-test-stand        also write the seal test stand (stand-base, stand-plunger) and its page in the build sheet
${designFlagsHelp()}
  --json                   print the sizing result as JSON with a "parts" list of the files written
  --debug                  show the stack trace if floatwright itself fails
  -h, --help               show this help

Examples:
  floatwright build --design presets/rooftop-tubs.json --out out/rooftop
  floatwright build --design presets/bucket-tote.json --out out/tote --quality preview --json

Exit status: 0 written; 2 bad input, no size fits, a part could not be built, the folder
is busy (another run writes there) or cannot be written (nothing is written then);
130 / 143 stopped by Ctrl-C / SIGTERM (the earlier files are put back); 1 a fault in floatwright.
`;

const STYLE = { command: 'build', subject: 'the design', flagFor: flagForField, help: HELP };

async function run(argv: string[], io: Io): Promise<number> {
  const json = argv.includes('--json');
  const args = readCommandLine(argv, OPTIONS, STYLE, io);
  if (typeof args === 'number') return args;
  const { values } = args;
  const problems: FieldError[] = [];
  const out = values.out;
  if (typeof out !== 'string' || out.trim() === '') {
    problems.push({ field: '--out', message: 'give the folder to write the files into, e.g. --out out/my-valve.' });
  }
  const quality = (values.quality ?? 'export') as string;
  if (quality !== 'export' && quality !== 'preview') {
    problems.push({ field: '--quality', message: `${JSON.stringify(quality)} is not a quality; allowed: export or preview.` });
  }
  if (problems.length) return reportInputErrors(STYLE, problems, json, io, 'the command line');

  const parsed = await loadDesign(values);
  if (!parsed.ok) return reportInputErrors(STYLE, parsed.errors, json, io);
  const result = sizeDesign(parsed.inputs);
  if (!result.ok) {
    if (json) io.out(`${JSON.stringify(result, null, 2)}\n`);
    else io.err(formatFailureText(result));
    return EXIT_INPUT;
  }

  const written = await writeIntoOutFolder(out as string, (dir, signal) =>
    writeDesignFiles(result, parsed.document, dir, { quality: quality as 'export' | 'preview', withPad: values['with-pad'] === true, withTestStand: values['with-test-stand'] === true, signal }),
  );
  if (!written.ok) {
    const { field, message, status } = written;
    if (json) io.out(`${JSON.stringify({ ok: false, errors: [{ field, message }] }, null, 2)}\n`);
    else io.err(`floatwright build: ${message}\n`);
    return status;
  }

  if (json) {
    // the sizing result's part dimensions move to `partSpecs`; `parts` lists the files written
    const { parts: partSpecs, ...rest } = result;
    const testStand = values['with-test-stand'] === true ? { testStand: standSpecOf(result) } : {};
    io.out(`${JSON.stringify({ ...rest, partSpecs, ...testStand, parts: written.value.parts, files: written.value.files }, null, 2)}\n`);
    return EXIT_OK;
  }
  const { parts, files } = written.value;
  const rows = parts.map(
    (p) =>
      `  ${p.name.padEnd(13)} ${fixed(p.volumeMm3 / 1000, 2).padStart(8)} cm3 ${fixed(p.massG, 1).padStart(7)} g ${String(p.triangles).padStart(7)} triangles  ${p.file}`,
  );
  const others = files.filter((f) => !parts.some((p) => p.file === f));
  io.out(
    [
      `floatwright build: ${parsed.document.name ?? 'design'} (${quality} quality)`,
      '',
      'Parts (print orientation, resting on z = 0)',
      ...rows,
      '',
      'Also written',
      ...others.map((f) => `  ${f}`),
      '',
      formatCautions(),
    ].join('\n'),
  );
  return EXIT_OK;
}

export const command: Command = {
  name: 'build',
  summary: 'size one valve and write its printable STL / 3MF files and build sheet',
  help: HELP,
  run,
};
