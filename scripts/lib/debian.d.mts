// Types for debian.mjs.
export function ensureDebianPackage(options: { command: string; pkg: string; phaseName: string }): void;
