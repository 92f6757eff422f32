/**
 * `floatwright size`: size one valve from a design file and/or flags, and
 * print the result as a table (with the cautions) or as JSON.
 */
import { sizeDesign } from '../../sizing/size-design.ts';
import { EXIT_INPUT, EXIT_OK, type Command, type Io } from '../command.ts';
import { readCommandLine, reportInputErrors } from '../command-line.ts';
import { DESIGN_OPTIONS, designFlagsHelp, flagForField, loadDesign } from '../design-input.ts';
import { formatFailureText, formatSizingText } from '../../doc/format-sizing.ts';

const OPTIONS = {
  ...DESIGN_OPTIONS,
  json: { type: 'boolean' },
  help: { type: 'boolean', short: 'h' },
  debug: { type: 'boolean' },
} as const;

const HELP = `Usage: floatwright size [--design FILE] [options]

Sizes one float valve: float, housing, nozzle height and the levels it holds,
for your tank height, target depth and printer. Prints a table, or JSON with --json.

  --design FILE            design document (JSON); flags below override its values
${designFlagsHelp()}
  --json                   print the result as JSON on standard output
  --debug                  show the stack trace if floatwright itself fails
  -h, --help               show this help

Values take a unit ("2.2m", "7 ft", "3 psi", "45mm", "1.8 in"); a bare number is in
the field's unit (heads and tube length in m, other lengths in mm).
Without --design, --head-max and --level are required.

Examples:
  floatwright size --design presets/rooftop-tubs.json
  floatwright size --head-max 2.2m --head-min 1.6m --level 45mm --material petg
  floatwright size --design presets/bucket-tote.json --level 30mm --json

Exit status: 0 sized; 2 bad input or no size fits (the reasons are printed); 1 a fault in floatwright.
`;

const STYLE = { command: 'size', subject: 'the design', flagFor: flagForField, help: HELP };

async function run(argv: string[], io: Io): Promise<number> {
  const json = argv.includes('--json');
  const args = readCommandLine(argv, OPTIONS, STYLE, io);
  if (typeof args === 'number') return args;
  const { values } = args;

  const parsed = await loadDesign(values);
  if (!parsed.ok) return reportInputErrors(STYLE, parsed.errors, json, io);

  const result = sizeDesign(parsed.inputs);
  if (!result.ok) {
    if (json) io.out(`${JSON.stringify(result, null, 2)}\n`);
    else io.err(formatFailureText(result));
    return EXIT_INPUT;
  }
  if (json) {
    io.out(`${JSON.stringify(result, null, 2)}\n`);
  } else {
    const name = parsed.document.name ? `${parsed.document.name}: ` : '';
    const { supply, level, print } = parsed.document;
    const material = typeof print.material === 'string' ? print.material : print.material.name;
    const heading = `floatwright size: ${name}head ${supply.headMax} full / ${supply.headMin} low, level ${level.target}, ${material}`;
    io.out(formatSizingText(result, heading));
  }
  return EXIT_OK;
}

export const command: Command = {
  name: 'size',
  summary: 'size one valve for a head, a water depth to hold and a printer',
  help: HELP,
  run,
};
