/// <reference lib="webworker" />
import { createConvectionHost, type HostRequest } from './convection-host.js';

// The solver runs here so stepping a fine grid never holds up the page's drawing or touch input.
const scope = self as unknown as DedicatedWorkerGlobalScope;
const handle = createConvectionHost((message, transfer) => scope.postMessage(message, transfer));
scope.addEventListener('message', (event: MessageEvent<HostRequest>) => handle(event.data));
