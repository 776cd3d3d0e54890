// Child processes that the stack owns. Each is started in its own process group so that a
// terminal's Ctrl-C reaches only the orchestrator, which then stops them in order and waits.
import { spawn, spawnSync } from 'node:child_process';

export function run(command, args, options = {}) {
  const result = spawnSync(command, args, { stdio: options.quiet ? 'pipe' : 'inherit', encoding: 'utf8', ...options });
  if (result.error) throw result.error;
  return result;
}

export function commandExists(command) {
  return spawnSync('sh', ['-c', `command -v ${command}`], { stdio: 'ignore' }).status === 0;
}

export function startOwned(name, command, args, options = {}) {
  const child = spawn(command, args, { detached: true, stdio: ['ignore', 'pipe', 'pipe'], ...options });
  const exited = new Promise((resolve) => child.once('exit', (code, signal) => resolve({ code, signal })));
  const output = [];
  const keep = (chunk) => {
    output.push(chunk.toString());
    if (output.length > 200) output.shift();
    if (options.echo) process.stdout.write(chunk);
  };
  child.stdout?.on('data', keep);
  child.stderr?.on('data', keep);
  return {
    name,
    child,
    exited,
    recentOutput: () => output.join(''),
    async stop(timeoutMs = 20000) {
      if (child.exitCode !== null || child.signalCode !== null) return;
      try { process.kill(-child.pid, 'SIGTERM'); } catch { return; }
      const timer = setTimeout(() => { try { process.kill(-child.pid, 'SIGKILL'); } catch { /* gone */ } }, timeoutMs);
      await exited;
      clearTimeout(timer);
    },
  };
}

export async function waitFor(check, { timeoutMs = 30000, intervalMs = 200, what, failIf } = {}) {
  const deadline = Date.now() + timeoutMs;
  let lastError;
  while (Date.now() < deadline) {
    if (failIf) {
      const reason = failIf();
      if (reason) throw new Error(reason);
    }
    try {
      if (await check()) return;
    } catch (error) {
      lastError = error;
    }
    await new Promise((r) => setTimeout(r, intervalMs));
  }
  throw new Error(`${what} did not answer within ${timeoutMs / 1000} s${lastError ? ` (${lastError.message})` : ''}`);
}
