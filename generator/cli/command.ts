/**
 * What every subcommand of the command line looks like. A command parses its
 * own arguments, writes through `io` and returns its exit code; it throws only
 * for faults in floatwright itself (main turns those into exit 1).
 */
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

/** Io on the process's own streams. */
export const processIo: Io = {
  out: (text) => process.stdout.write(text),
  err: (text) => process.stderr.write(text),
};
