// Types for stack.mjs, as far as the TypeScript tests use it.
import type { OwnedProcess } from './processes.mjs';

/** The checkout's root folder. */
export const root: string;

export function ensureDependencies(): void;

export function buildShared(phaseName: string, env: NodeJS.ProcessEnv): void;

export function startStack(options: {
  dataDir: string;
  dbPort: number;
  smtpPort: number;
  s3Port?: number;
  replicationPorts?: { primaryPort: number; replicaPort: number };
  port: number;
  demoPassword?: string;
  nodeEnv?: string;
  extraDatabases?: string[];
  echoServer?: boolean;
}): Promise<{ env: NodeJS.ProcessEnv; url: string; stop(): Promise<void>; processes: OwnedProcess[] }>;
