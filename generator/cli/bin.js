#!/usr/bin/env node
// floatwright command line: registers tsx so Node runs the TypeScript sources as they are, then hands over to main.ts.
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { register } from 'tsx/esm/api';

const tsconfig = fileURLToPath(new URL('../../tsconfig.json', import.meta.url));
register({ tsconfig: existsSync(tsconfig) ? tsconfig : false });

// A reader that stops early (`floatwright size ... | head`) is not a fault.
process.stdout.on('error', (error) => {
  if (error.code === 'EPIPE') process.exit(process.exitCode ?? 0);
  throw error;
});

const { runCli } = await import('./main.ts');
process.exitCode = await runCli(process.argv.slice(2));
