/**
 * fw-app under happy-dom with a fake build worker: it sizes with the real
 * sizing core and answers when the test says, so "a build is pending" is a
 * state the test holds, not a race.
 */
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import type { WorkerReply, WorkerRequest } from '../../viewer/worker/protocol.ts';
import '../../viewer/components/fw-app.ts';

export class FakeWorker {
  sent: WorkerRequest[] = [];
  onmessage: ((e: MessageEvent<WorkerReply>) => void) | null = null;
  onerror: ((e: ErrorEvent) => void) | null = null;
  postMessage(req: WorkerRequest) {
    this.sent.push(req);
  }
  /** answer every build request sent so far with the real sizing; exports with the document they were given */
  answer() {
    const pending = this.sent.splice(0);
    for (const req of pending) {
      const data: WorkerReply =
        req.type === 'build'
          ? { type: 'built', id: req.id, sizing: sizeDesign(req.inputs), meshes: null, transforms: null, sizeMs: 1, buildMs: 0 }
          : { type: 'exported', id: req.id, files: [{ name: 'design.json', mime: 'application/json', bytes: new TextEncoder().encode(JSON.stringify(req.document)) }] };
      this.onmessage?.({ data } as MessageEvent<WorkerReply>);
    }
  }
  terminate() {}
}

export type App = HTMLElement & { updateComplete: Promise<unknown>; workerFactory: unknown };
/** the fake workers of the app mounted last */
export let workers: FakeWorker[] = [];

export async function mountApp(): Promise<App> {
  workers = [];
  const app = document.createElement('fw-app') as App;
  app.workerFactory = () => {
    const w = new FakeWorker();
    workers.push(w);
    return w as unknown as Worker;
  };
  document.body.append(app);
  await app.updateComplete;
  return app;
}

/** Answer the builds until nothing is pending, and let the screen catch up. */
export async function settle(app: App) {
  for (let i = 0; i < 5; i++) {
    for (const w of workers) w.answer();
    await new Promise((r) => setTimeout(r, 60)); // the typing pause (TYPING_PAUSE_MS, 10 ms) and Lit's update
    await app.updateComplete;
  }
}

export const root = (app: App) => app.shadowRoot!;
export const form = (app: App) => root(app).querySelector('fw-design-form')! as HTMLElement & { updateComplete: Promise<unknown> };

/** Type `value` into the valve form's box for `path`, as the grower would. */
export async function edit(app: App, path: string, value: string) {
  const input = form(app).shadowRoot!.querySelector(`[name="${path}"]`) as HTMLInputElement;
  input.value = value;
  input.dispatchEvent(new Event('input'));
  await app.updateComplete;
}

/** Every export and build request the app has sent, in order. */
export const sentRequests = () => workers.flatMap((w) => w.sent);
