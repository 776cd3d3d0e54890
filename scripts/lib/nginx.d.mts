// Types for nginx.mjs.
import type { OwnedProcess } from './processes.mjs';

export function startNginx(options: { dir: string; port: number; upstreams: readonly number[]; keepalive?: number }): Promise<OwnedProcess>;
