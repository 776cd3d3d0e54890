// Types for stack.mjs, as far as the TypeScript tests use it.
import type { OwnedProcess } from './processes.mjs';

/** The checkout's root folder. */
export const root: string;

export function ensureDependencies(): void;

export function buildShared(phaseName: string, env: NodeJS.ProcessEnv): void;

/** The S3_* settings of a server that uses the S3 stand-in, from the run's S3_STAND_IN_* settings. */
export function s3StandInEnv(env?: NodeJS.ProcessEnv): Record<'S3_BUCKET' | 'S3_ENDPOINT' | 'S3_REGION' | 'S3_ACCESS_KEY_ID' | 'S3_SECRET_ACCESS_KEY' | 'S3_FORCE_PATH_STYLE', string>;

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
