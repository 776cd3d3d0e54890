import { createConvectionHost, type HostMessage, type HostRequest } from './convection-host.js';

export interface ConvectionRunner {
  post(request: HostRequest): void;
  dispose(): void;
  /** Whether the solver runs off the main thread. */
  readonly inWorker: boolean;
}

/**
 * Starts the solver in a module Web Worker. The `new Worker(new URL(…, import.meta.url))` form is
 * the one bundlers (Vite among them) recognise and bundle, also when this file is consumed from
 * @mantlepiece/shared's dist. Where there is no Worker (server-side rendering, jsdom) the same host
 * runs on the main thread, answering asynchronously as the worker would.
 */
export function startConvectionRunner(onMessage: (message: HostMessage) => void): ConvectionRunner {
  if (typeof Worker !== 'undefined') {
    const worker = new Worker(new URL('./convection.worker.js', import.meta.url), { type: 'module' });
    worker.addEventListener('message', (event: MessageEvent<HostMessage>) => onMessage(event.data));
    return { post: (request) => worker.postMessage(request), dispose: () => worker.terminate(), inWorker: true };
  }
  let disposed = false;
  const handle = createConvectionHost((message) => {
    if (!disposed) onMessage(message);
  });
  return {
    post: (request) => setTimeout(() => !disposed && handle(request), 0),
    dispose: () => {
      disposed = true;
    },
    inWorker: false,
  };
}
