// The project's own PostgreSQL on loopback, from Debian's packages, with data under .local/.
import fs from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { aptInstall, capture, isRoot, log, run } from './run.mjs';

const { appRole, ownerRole, rolesSql } = createRequire(import.meta.url)('./db-roles.cjs');

function findBinDir() {
  const root = '/usr/lib/postgresql';
  if (!fs.existsSync(root)) return null;
  const versions = fs
    .readdirSync(root)
    .filter((v) => fs.existsSync(path.join(root, v, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return versions.length ? path.join(root, versions[0], 'bin') : null;
}

export function ensurePostgresInstalled() {
  let bin = findBinDir();
  if (!bin) {
    aptInstall(['postgresql']);
    bin = findBinDir();
  }
  if (!bin)
    throw new Error('PostgreSQL binaries not found after installing the postgresql package');
  return bin;
}

/** initdb refuses to run as root: as root, the cluster belongs to the `postgres` OS user. */
function asOwner(bin, tool, args, options = {}) {
  const cmd = path.join(bin, tool);
  if (!isRoot) return run(cmd, args, options);
  return run('runuser', ['-u', 'postgres', '--', cmd, ...args], options);
}

function ensureOsUser() {
  if (!isRoot) return;
  if (capture('id', ['-u', 'postgres']).status !== 0) {
    run('useradd', ['--system', '--no-create-home', 'postgres']);
  }
}

function ownDir(dir) {
  fs.mkdirSync(dir, { recursive: true });
  if (isRoot) run('chown', ['-R', 'postgres:', dir]);
}

/**
 * Starts a cluster in `dataDir` on 127.0.0.1:`port` (initialising it on first use) and
 * returns a stop function. `runDir` holds the socket and the log.
 */
export function startCluster({ dataDir, runDir, port, fast = false }) {
  const bin = ensurePostgresInstalled();
  ensureOsUser();
  if (isRoot) {
    // The parent folders must be traversable by the postgres user.
    fs.mkdirSync(path.dirname(dataDir), { recursive: true });
    for (let d = path.dirname(dataDir); d !== '/'; d = path.dirname(d)) {
      const mode = fs.statSync(d).mode;
      if ((mode & 0o001) === 0) fs.chmodSync(d, mode | 0o001);
    }
  }
  ownDir(runDir);
  if (!fs.existsSync(path.join(dataDir, 'PG_VERSION'))) {
    log(`initialising PostgreSQL cluster in ${dataDir}`);
    ownDir(dataDir);
    asOwner(
      bin,
      'initdb',
      ['-D', dataDir, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8'],
      {
        stdio: ['ignore', 'ignore', 'inherit'],
      },
    );
  } else if (isRoot) {
    run('chown', ['-R', 'postgres:', dataDir]);
  }
  const opts = [`-c listen_addresses=127.0.0.1`, `-p ${port}`, `-k ${runDir}`];
  if (fast) opts.push('-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off');
  const pgCtl = path.join(bin, 'pg_ctl');
  const status = isRoot
    ? capture('runuser', ['-u', 'postgres', '--', pgCtl, '-D', dataDir, 'status'])
    : capture(pgCtl, ['-D', dataDir, 'status']);
  if (status.status === 0) {
    log(`PostgreSQL already running in ${dataDir}`);
  } else {
    asOwner(
      bin,
      'pg_ctl',
      // Two minutes: a busy machine can be slow to bring up a fresh cluster.
      [
        '-D',
        dataDir,
        '-l',
        path.join(runDir, 'pg.log'),
        '-w',
        '-t',
        '120',
        '-o',
        opts.join(' '),
        'start',
      ],
      {
        stdio: ['ignore', 'ignore', 'inherit'],
      },
    );
  }
  log(`PostgreSQL listening on 127.0.0.1:${port}`);
  const stop = () => {
    try {
      asOwner(bin, 'pg_ctl', ['-D', dataDir, '-m', 'fast', '-w', 'stop'], { stdio: 'ignore' });
    } catch {
      // Already stopped.
    }
  };
  return { bin, stop };
}

/** Creates a database when absent, through psql over TCP (trust authentication on loopback). */
export function ensureDatabase({ bin, port, name, drop = false }) {
  const psql = path.join(bin, 'psql');
  const base = ['-h', '127.0.0.1', '-p', String(port), '-U', 'postgres', '-d', 'postgres', '-tAc'];
  if (drop)
    run(psql, [...base, `drop database if exists "${name}" with (force)`], { stdio: 'ignore' });
  const exists = capture(psql, [...base, `select 1 from pg_database where datname = '${name}'`]);
  if (exists.stdout.trim() !== '1')
    run(psql, [...base, `create database "${name}"`], { stdio: 'ignore' });
  return `postgres://postgres@127.0.0.1:${port}/${name}`;
}

/**
 * Makes the owner role (migrations, seeds) and the API's role (least privilege) for the
 * database `name` and returns a URL for each (trust authentication on loopback).
 */
export function ensureRoles({ bin, port, name }) {
  const psql = path.join(bin, 'psql');
  const target = ['-h', '127.0.0.1', '-p', String(port), '-U', 'postgres', '-d', name];
  run(psql, [...target, '-v', 'ON_ERROR_STOP=1', '-qc', rolesSql(name)], {
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const url = (role) => `postgres://${role}@127.0.0.1:${port}/${name}`;
  return { ownerUrl: url(ownerRole), appUrl: url(appRole) };
}
