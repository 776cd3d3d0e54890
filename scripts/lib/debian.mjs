// Installs a Debian package the stack needs, when it is missing and we may (root); otherwise says
// the one command to run.
import { commandExists, run } from './processes.mjs';
import { PhaseError } from './phase.mjs';

let aptUpdated = false;

export function ensureDebianPackage({ command, pkg, phaseName }) {
  if (commandExists(command) || commandExists(`/usr/sbin/${command}`)) return;
  if (process.getuid?.() !== 0) {
    throw new PhaseError(phaseName, `${command} is missing. Run: sudo apt-get install -y ${pkg}`);
  }
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!aptUpdated) {
    run('apt-get', ['update', '-qq'], { env, quiet: true });
    aptUpdated = true;
  }
  const result = run('apt-get', ['install', '-y', '-qq', pkg], { env, quiet: true });
  if (result.status !== 0 || !(commandExists(command) || commandExists(`/usr/sbin/${command}`))) {
    throw new PhaseError(phaseName, `could not install Debian package ${pkg}: ${(result.stderr || '').trim().split('\n').pop()}`);
  }
}
