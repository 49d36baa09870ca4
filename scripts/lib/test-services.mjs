// The services `npm test` starts: its own PostgreSQL and the built app with a mail sink. Each
// gets a free port; when one fails to start, the tail of its log is printed and the log kept.
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { keepLog } from './logs.mjs';
import { freePort, freePorts } from './ports.mjs';
import { startCluster } from './postgres.mjs';
import { log } from './run.mjs';
import { waitForHttp } from './wait.mjs';

const portRace = /already in use|could not bind|could not create any TCP\/IP sockets/i;

/** Starts a throwaway cluster under `work`; tries another port when another run took this one. */
export async function startTestCluster(root, work, preferredPort) {
  let port = await freePort(preferredPort);
  for (let attempt = 1; ; attempt++) {
    const runDir = path.join(work, 'run');
    const logFile = path.join(runDir, 'pg.log');
    try {
      const cluster = startCluster({ dataDir: path.join(work, 'pg'), runDir, port, fast: true });
      return { ...cluster, port };
    } catch (error) {
      const text = fs.existsSync(logFile) ? fs.readFileSync(logFile, 'utf8') : '';
      keepLog(root, logFile, `test-${process.pid}-pg-${attempt}.log`, 'PostgreSQL did not start');
      if (attempt >= 3 || !portRace.test(text)) throw error;
      fs.rmSync(logFile, { force: true });
      port = await freePort(0, new Set([port]));
      log(`port taken meanwhile: trying PostgreSQL on ${port}`);
    }
  }
}

function spawnApp(root, logFile, env) {
  const fd = fs.openSync(logFile, 'w');
  const server = spawn('node', ['api/dist/src/main.js'], {
    cwd: root,
    env,
    stdio: ['ignore', fd, fd],
  });
  fs.closeSync(fd);
  return server;
}

/**
 * The built app for the browser tests on free ports (`envFor({ app, smtp })` makes its
 * environment), its output in `<work>/app.log`. Resolves with `up` (it answered /api/health
 * within two minutes), `port`, `smtpPort`, `stop` and `keep`, which keeps its log.
 */
export async function startTestApp(root, work, preferred, envFor) {
  const logFile = path.join(work, 'app.log');
  const keep = (what) => keepLog(root, logFile, `test-${process.pid}-app.log`, what);
  for (let attempt = 1; ; attempt++) {
    const ports = await freePorts(attempt === 1 ? preferred : { app: 0, smtp: 0 });
    const server = spawnApp(root, logFile, envFor(ports));
    const stop = () => server.kill('SIGTERM');
    const health = `http://127.0.0.1:${ports.app}/api/health`;
    if (await waitForHttp(health, 120_000, server))
      return { up: true, port: ports.app, smtpPort: ports.smtp, stop, keep };
    stop();
    const raced = /EADDRINUSE/.test(fs.readFileSync(logFile, 'utf8'));
    if (attempt >= 3 || !raced) {
      keep('the app did not start');
      return { up: false, stop: () => undefined, keep };
    }
    log('a port was taken meanwhile: starting the app on other ports');
  }
}
