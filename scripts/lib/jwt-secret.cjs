// The token-signing secret of `npm start` (CommonJS so the API tests can check it too).
/* eslint-disable @typescript-eslint/no-require-imports -- CommonJS on purpose (see above) */
const { randomBytes } = require('node:crypto');
const fs = require('node:fs');
const path = require('node:path');

/**
 * JWT_SECRET when set; otherwise one generated on the first start and kept in
 * `<root>/.local/jwt-secret` (readable by this user only), so a restart keeps tablets
 * signed in. Returns the secret and whether it was generated now.
 */
function jwtSecret(root, env = process.env) {
  if (env.JWT_SECRET) return { secret: env.JWT_SECRET, generated: false };
  const file = path.join(root, '.local', 'jwt-secret');
  if (fs.existsSync(file))
    return { secret: fs.readFileSync(file, 'utf8').trim(), generated: false };
  fs.mkdirSync(path.dirname(file), { recursive: true });
  const secret = randomBytes(32).toString('hex');
  fs.writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  return { secret, generated: true };
}

module.exports = { jwtSecret };
