/**
 * What every subcommand of the command line looks like. A command parses its
 * own arguments, writes through `io` and returns its exit code; it throws only
 * for faults in floatwright itself (main turns those into exit 1).
 */
import { terminalText } from '../doc/safe-text/terminal-text.ts';

export interface Io {
  /** standard output (results, and JSON in --json mode) */
  out(text: string): void;
  /** standard error (messages for a person) */
  err(text: string): void;
}

export interface Command {
  /** the word after `floatwright` */
  name: string;
  /** one line for the command list */
  summary: string;
  /** full text for `floatwright NAME --help` */
  help: string;
  run(argv: string[], io: Io): Promise<number>;
}

/** Exit codes: 0 done; 1 a fault inside floatwright; 2 bad input or a design that cannot be built. */
export const EXIT_OK = 0;
export const EXIT_FAULT = 1;
export const EXIT_INPUT = 2;

/**
 * Io on the process's own streams. Everything printed loses its control
 * characters (terminalText): a name or a value holding an escape sequence
 * cannot drive the terminal. JSON output is unaffected in meaning: JSON.stringify
 * already writes C0 characters as \u escapes; C1 and direction overrides are dropped.
 */
export const processIo: Io = {
  out: (text) => process.stdout.write(printable(text)),
  err: (text) => process.stderr.write(printable(text)),
};

/** terminalText, keeping a carriage return that opens the text: the progress bar redraws its line with it. */
function printable(text: string): string {
  return text.startsWith('\r') ? `\r${terminalText(text.slice(1))}` : terminalText(text);
}
