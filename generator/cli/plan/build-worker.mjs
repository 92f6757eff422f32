// Worker entry for `floatwright plan`: Node 20 does not pass the parent's tsx loader to worker threads
// (and ignores `--import tsx` in a worker's execArgv), so register tsx here, as bin.js does, then load the TypeScript worker.
import { register } from 'tsx/esm/api';

register();
await import('./build-worker.ts');
