// Types for processes.mjs, for the TypeScript tests that start processes the same way.
import type { ChildProcess, SpawnOptions, SpawnSyncOptions, SpawnSyncReturns } from 'node:child_process';

export function run(command: string, args: readonly string[], options?: SpawnSyncOptions & { quiet?: boolean }): SpawnSyncReturns<string>;

export function commandExists(command: string): boolean;

export interface OwnedProcess {
  name: string;
  child: ChildProcess;
  exited: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
  recentOutput(): string;
  stop(timeoutMs?: number): Promise<void>;
}

export function startOwned(name: string, command: string, args: readonly string[], options?: SpawnOptions & { echo?: boolean }): OwnedProcess;

export function waitFor(
  check: () => unknown,
  options?: { timeoutMs?: number; intervalMs?: number; what?: string; failIf?: () => string | null | undefined },
): Promise<void>;
