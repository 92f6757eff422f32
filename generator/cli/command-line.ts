/**
 * What every command does with its arguments before its own work: read them
 * strictly with node:util parseArgs, and report input problems the same way
 * (JSON `{ ok: false, errors }` on standard output with --json, else a
 * readable list on standard error), exiting 2.
 */
import { parseArgs, type ParseArgsConfig } from 'node:util';
import type { FieldError } from '../doc/fields.ts';
import { EXIT_INPUT, EXIT_OK, type Io } from './command.ts';
import { argumentError } from './design-input.ts';
import { formatFieldErrors } from '../doc/format-sizing.ts';

export type CommandOptions = NonNullable<ParseArgsConfig['options']>;

export interface CommandArgs {
  values: Record<string, unknown>;
  positionals: string[];
}

/** How a command words its input errors: its name, what its input is called, and the flag that sets a field. */
export interface ErrorStyle {
  command: string;
  /** "the design", "the plan" */
  subject: string;
  flagFor?: (field: string) => string | undefined;
}

export function reportInputErrors(style: ErrorStyle, errors: FieldError[], json: boolean, io: Io, subject = style.subject): number {
  if (json) io.out(`${JSON.stringify({ ok: false, errors }, null, 2)}\n`);
  else io.err(`floatwright ${style.command}: ${formatFieldErrors(errors, style.flagFor ?? (() => undefined), subject)}`);
  return EXIT_INPUT;
}

/**
 * Reads the arguments. Returns them, or the exit code when the command is
 * already done: a bad option (reported, 2) or --help (printed, 0).
 */
export function readCommandLine(
  argv: string[],
  options: CommandOptions,
  style: ErrorStyle & { help: string; allowPositionals?: boolean },
  io: Io,
): CommandArgs | number {
  const json = argv.includes('--json');
  let args: CommandArgs;
  try {
    args = parseArgs({ args: argv, options, strict: true, allowPositionals: style.allowPositionals ?? false }) as CommandArgs;
  } catch (error) {
    const problem = argumentError(error, Object.keys(options));
    if (!problem) throw error;
    return reportInputErrors(style, [problem], json, io, 'the command line');
  }
  if (args.values.help) {
    io.out(style.help);
    return EXIT_OK;
  }
  return args;
}
