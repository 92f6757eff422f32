/**
 * floatwright's command line: picks the subcommand and guards against faults.
 *
 * Adding a command: write generator/cli/commands/NAME.ts exporting
 * `command: Command`, then add one line to COMMANDS below. Commands load on
 * demand, so `size` never pays for the geometry libraries `build` needs.
 */
import { EXIT_FAULT, EXIT_INPUT, EXIT_OK, processIo, type Command, type Io } from './command.ts';

const COMMANDS: Record<string, () => Promise<{ command: Command }>> = {
  size: () => import('./commands/size.ts'),
  plan: () => import('./commands/plan.ts'),
  build: () => import('./commands/build.ts'),
};

const VERSION = '0.1.0';

async function usage(): Promise<string> {
  const lines = [
    'floatwright: sizes low-pressure float valves for gravity-fed grow containers and writes printable parts.',
    '',
    'Usage: floatwright <command> [options]',
    '',
    'Commands:',
  ];
  for (const [name, load] of Object.entries(COMMANDS)) {
    const { command } = await load();
    lines.push(`  ${name.padEnd(8)} ${command.summary}`);
  }
  lines.push('', 'Run "floatwright <command> --help" for the options of a command.', '');
  return lines.join('\n');
}

/** One-line report of a fault in floatwright itself (not in the grower's input); the stack only with --debug. */
export function reportFault(error: unknown, debug: boolean, io: Io): number {
  const text = error instanceof Error ? error.message : String(error);
  io.err(
    `floatwright: sorry, something went wrong inside floatwright (${text.split('\n')[0]}). ` +
      'This is a fault in the program, not in your design: please report it with the command you ran and your design file' +
      (debug ? '.\n' : ', and run it again with --debug to add the details.\n'),
  );
  if (debug && error instanceof Error && error.stack) io.err(`${error.stack}\n`);
  return EXIT_FAULT;
}

/** Run the command line with these arguments (without node and the script); returns the exit code. */
export async function runCli(argv: string[], io: Io = processIo): Promise<number> {
  const debug = argv.includes('--debug');
  try {
    const [name, ...rest] = argv;
    if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
      const topic = name === 'help' ? rest[0] : undefined;
      if (topic && COMMANDS[topic]) {
        io.out((await COMMANDS[topic]()).command.help);
        return EXIT_OK;
      }
      io.out(await usage());
      return name === undefined ? EXIT_INPUT : EXIT_OK;
    }
    if (name === '--version' || name === '-v') {
      io.out(`floatwright ${VERSION}\n`);
      return EXIT_OK;
    }
    const load = COMMANDS[name];
    if (!load) {
      io.err(`floatwright: there is no command "${name}". Commands: ${Object.keys(COMMANDS).join(', ')}. Try "floatwright --help".\n`);
      return EXIT_INPUT;
    }
    const { command } = await load();
    return await command.run(rest, io);
  } catch (error) {
    return reportFault(error, debug, io);
  }
}
