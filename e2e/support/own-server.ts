import { type ChildProcess, spawn } from 'node:child_process';
import path from 'node:path';
import { databaseUrl } from './env';

const root = path.resolve(__dirname, '..', '..');

// One helper for a free loopback port, shared with the API's tests.
export { freePort } from '../../api/test/free-port';

async function healthy(url: string, timeoutMs: number): Promise<boolean> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    try {
      if ((await fetch(`${url}/api/health`)).ok) return true;
    } catch {
      // Not listening yet.
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  return false;
}

/**
 * The built app (API + web) in a process of this test's own, on the test database, so the
 * test can kill it with SIGKILL mid-request and start it again on the same port.
 */
export class OwnServer {
  private child: ChildProcess | null = null;

  constructor(readonly port: number) {}

  get url(): string {
    return `http://localhost:${this.port}`;
  }

  async start(): Promise<void> {
    // The built API loads the built packages: not the test runner's source-first conditions.
    const { NODE_OPTIONS: _runnerOptions, ...inherited } = process.env;
    this.child = spawn('node', [path.join(root, 'api', 'dist', 'src', 'main.js')], {
      cwd: root,
      stdio: ['ignore', 'ignore', 'inherit'],
      env: {
        ...inherited,
        NODE_ENV: 'production',
        LOG_LEVEL: 'warn',
        PORT: String(this.port),
        DATABASE_URL: databaseUrl,
        WEB_DIST: path.join(root, 'web', 'dist'),
        // The same secret across restarts: the tablet's session outlives the process.
        JWT_SECRET: 'own-server-secret',
        LOGIN_LIMIT_PER_MINUTE: '100',
        // Sign-in attempts are counted in the shared database, across every test's server.
        LOGIN_IP_LIMIT_PER_MINUTE: '1000',
      },
    });
    if (!(await healthy(this.url, 30_000))) throw new Error('the app did not start');
  }

  /** SIGKILL: no shutdown hooks, requests in flight die with it. Resolves once it is gone. */
  kill(): Promise<void> {
    const child = this.child;
    this.child = null;
    if (!child || child.exitCode !== null) return Promise.resolve();
    return new Promise((resolve) => {
      child.once('exit', () => resolve());
      child.kill('SIGKILL');
    });
  }
}
