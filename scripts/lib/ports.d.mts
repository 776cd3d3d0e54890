// Types for ports.mjs.
export function assertPortFree(port: number, what: string): Promise<void>;

export function freePort(): Promise<number>;
