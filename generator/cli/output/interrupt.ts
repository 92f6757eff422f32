/**
 * Ctrl-C (SIGINT) and SIGTERM while files are written: instead of dying half
 * way, the run is told to stop (an AbortSignal the writers check between
 * steps), cleans up, puts back the earlier files and exits with 128 + the
 * signal's number (130, 143: common practice for Unix tools). A second signal
 * of the same kind ends the process at once (the handlers are `once`).
 */
export interface Interrupt {
  signal: AbortSignal;
  /** the exit status to use when a signal stopped the run, else null */
  exitStatus(): number | null;
  /** the signal's name, for the message */
  name(): string | null;
  dispose(): void;
}

const STATUS: Record<string, number> = { SIGINT: 130, SIGTERM: 143 };

export function catchInterrupt(): Interrupt {
  const controller = new AbortController();
  let caught: string | null = null;
  const handlers = Object.keys(STATUS).map((name) => {
    const handler = () => {
      caught = name;
      controller.abort(new InterruptedError(name));
    };
    process.once(name, handler);
    return () => process.off(name, handler);
  });
  return {
    signal: controller.signal,
    exitStatus: () => (caught ? STATUS[caught]! : null),
    name: () => caught,
    dispose: () => handlers.forEach((off) => off()),
  };
}

/** Thrown where a writer notices the run was told to stop. */
export class InterruptedError extends Error {
  constructor(readonly signalName: string) {
    super(`stopped by ${signalName}`);
    this.name = 'InterruptedError';
  }
}
