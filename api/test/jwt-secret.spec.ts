import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

// The helper `npm start` uses (plain CommonJS, shared with scripts/start.mjs).
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { jwtSecret } = require('../../scripts/lib/jwt-secret.cjs') as {
  jwtSecret: (
    root: string,
    env?: Record<string, string | undefined>,
  ) => { secret: string; generated: boolean };
};

/** `npm start` keeps its token-signing secret, so a restart does not sign tablets out. */
describe('the JWT secret of npm start', () => {
  let root: string;
  beforeEach(() => {
    root = fs.mkdtempSync(path.join(os.tmpdir(), 'upstroke-secret-'));
  });
  afterEach(() => fs.rmSync(root, { recursive: true, force: true }));

  it('is generated once under .local/, readable by its owner only, and the same after a restart', () => {
    const first = jwtSecret(root, {});
    expect(first.generated).toBe(true);
    expect(first.secret).toMatch(/^[0-9a-f]{64}$/);
    const file = path.join(root, '.local', 'jwt-secret');
    expect(fs.statSync(file).mode & 0o777).toBe(0o600);
    expect(jwtSecret(root, {})).toEqual({ secret: first.secret, generated: false });
  });

  it('takes JWT_SECRET when it is set, and writes nothing', () => {
    expect(jwtSecret(root, { JWT_SECRET: 'from-the-environment' }).secret).toBe(
      'from-the-environment',
    );
    expect(fs.existsSync(path.join(root, '.local'))).toBe(false);
  });
});
