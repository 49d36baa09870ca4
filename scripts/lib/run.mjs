// Small process helpers for the set-up scripts. Node built-ins only: these run before `npm ci`.
import { spawn, spawnSync } from 'node:child_process';

export const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

export function log(message) {
  process.stdout.write(`\u001b[36m[upstroke]\u001b[0m ${message}\n`);
}

/** Runs a command to completion, inheriting output; throws with its exit code on failure. */
export function run(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { stdio: 'inherit', ...options });
  if (result.error) throw result.error;
  if (result.status !== 0) {
    const error = new Error(`${cmd} ${args.join(' ')} exited with ${result.status}`);
    error.exitCode = result.status ?? 1;
    throw error;
  }
  return result;
}

/** Runs a command and returns its exit status and output, never throwing. */
export function capture(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { encoding: 'utf8', ...options });
  return { status: result.status ?? 1, stdout: result.stdout ?? '', stderr: result.stderr ?? '' };
}

/** Runs a command asynchronously; resolves with its exit code. */
export function runAsync(cmd, args, options = {}) {
  return new Promise((resolve) => {
    const child = spawn(cmd, args, { stdio: 'inherit', ...options });
    child.on('error', () => resolve(1));
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0)));
  });
}

export function commandExists(cmd) {
  return capture('sh', ['-c', `command -v ${cmd}`]).status === 0;
}

/** Installs Debian packages when missing (as root, or through sudo when available). */
export function aptInstall(packages) {
  const sudo = isRoot ? [] : ['sudo'];
  log(`installing Debian packages: ${packages.join(' ')}`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  run(sudo[0] ?? 'apt-get', [...(sudo.length ? ['apt-get'] : []), 'update', '-qq'], { env });
  run(
    sudo[0] ?? 'apt-get',
    [...(sudo.length ? ['apt-get'] : []), 'install', '-y', '-qq', ...packages],
    {
      env,
    },
  );
}
