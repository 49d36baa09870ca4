import fc from 'fast-check';
import type { Role } from '@upstroke/contracts';
import { startAdminTestApp } from './admin/admin-helpers';
import {
  fuzzIds,
  type FuzzIds,
  monitorFileLines,
  needsSigned,
  uploadRoutes,
  validBodies,
} from './fuzz/fixtures';
import { hostileBody, hostileParam, hostileStrings, toJsonText } from './fuzz/hostile';
import { discoverRoutes, type FuzzRoute } from './fuzz/routes';
import { storedHostile } from './fuzz/stored';
import { routeAccess } from './route-access';
import { demoSiteId, demoUnits, type TestApp } from './test-app';

/**
 * Hostile input on every route: each write route gets its valid body with one or two places
 * replaced by hostile values, each route hostile path ids, query values and headers. The
 * API must answer 4xx or 2xx, never 5xx, and store nothing implausible. Routes, their query
 * keys and headers come from the running application (route-access.ts lists every route),
 * so a new route is fuzzed without a change here. Fixed seed and run counts: reproducible
 * and bounded.
 */
// FUZZ_SEED / FUZZ_RUNS explore further by hand; `npm test` always runs the fixed ones.
const SEED = Number(process.env.FUZZ_SEED ?? 20261205);
const RUNS = Number(process.env.FUZZ_RUNS ?? 10);
const roleOrder: Role[] = ['lead', 'admin', 'quality', 'recorder'];

function encode(s: string): string {
  try {
    return encodeURIComponent(s);
  } catch {
    // A lone surrogate: send the bytes a careless client would (invalid UTF-8).
    return s
      .replace(/[\ud800-\udfff]/g, '%ED%A0%80')
      .replace(/[^%\w-]/g, (c) => encodeURIComponent(c));
  }
}

/** A value sent unencoded (a stray `%` included); what would break the URL made a `%`. */
const rawText = (v: string) => v.replace(/[^\x21-\x7e]|[&#]/g, '%');

/** `key=value`, `key[]=a&key[]=b` or `key[x]=value`: what Express's query parser accepts. */
const queryPart = (keys: string[]) =>
  fc
    .tuple(
      fc.constantFrom(...keys),
      hostileParam,
      fc.constantFrom('plain', 'array', 'object', 'raw'),
    )
    .map(([k, v, shape]) =>
      shape === 'array'
        ? `${k}[]=${encode(v)}&${k}[]=x`
        : shape === 'object'
          ? `${k}[gt]=${encode(v)}`
          : shape === 'raw'
            ? `${k}=${rawText(v)}`
            : `${k}=${encode(v)}`,
    );

/** Header values must be visible ASCII to leave the client at all. */
const headerValue = hostileParam.map((v) => v.replace(/[^\x20-\x7e]/g, '?').slice(0, 4000));

/** A short account of a case for the failure message. */
function describeCase(c: Case): string {
  const text = toJsonText(c.body) ?? '';
  return JSON.stringify({ ...c, body: text.length > 400 ? `${text.slice(0, 400)}…` : text });
}

/** Ids beyond int32 and safe integers, and dates PostgreSQL or JavaScript cannot hold. */
const idExamples = ['2147483648', '123456789012345678901234567890', '-1', '%00'];
const queryExamples = ['0000-01-01', '9999-12-31T23:59:59Z', '2147483648', '1e39'];

/** Cases always tried first: every path id, then every query key, at each listed extreme. */
function examplesFor(route: FuzzRoute, key: string): [Case][] {
  const names = [...route.path.matchAll(/\{(\w+)\}/g)].map((m) => m[1]);
  const body = route.method === 'GET' ? undefined : (validBodies[key]?.() ?? {});
  const base = { params: {}, query: [], headers: [], body, fileLine: null };
  const byId = names.length
    ? idExamples.map((v): [Case] => [
        { ...base, params: Object.fromEntries(names.map((n) => [n, v])) },
      ])
    : [];
  const byQuery = route.queryKeys.length
    ? queryExamples.map((v): [Case] => [
        { ...base, query: route.queryKeys.map((k) => `${k}=${encodeURIComponent(v)}`) },
      ])
    : [];
  return [...byId, ...byQuery];
}

interface Case {
  params: Record<string, string | null>;
  query: string[];
  headers: [string, string][];
  body: unknown;
  fileLine: [number, string] | null;
}

describe('hostile input on every route', () => {
  let t: TestApp;
  let ids: FuzzIds;
  let routes: Map<string, FuzzRoute>;
  beforeAll(async () => {
    // With the app's mail sink: invitations and e-mailed debriefs are really sent.
    t = await startAdminTestApp();
    ids = await fuzzIds(t);
    routes = new Map(discoverRoutes(t.app).map((r) => [`${r.method} ${r.path}`, r]));
  });
  afterAll(() => t.close());

  it('knows every route the application has', () => {
    expect([...routes.keys()].sort()).toEqual(Object.keys(routeAccess).sort());
  });

  const fresh = new Map<string, Promise<{ id: string; importId: string }>>();
  /** The ids a route's path takes when no hostile id replaces them. */
  async function realParams(key: string): Promise<Record<string, string>> {
    const writesRecord = /^(POST|PATCH) \/api\/resuscitations\/\{id\}/.test(key);
    if (writesRecord && !needsSigned.has(key) && !fresh.has(key)) fresh.set(key, ids.record());
    const rec = writesRecord && !needsSigned.has(key) ? await fresh.get(key)! : ids.signed;
    const byPrefix: [string, string][] = [
      ['/api/users/', ids.user],
      ['/api/sites/', demoSiteId],
      ['/api/protocol-profiles/', ids.profile],
      ['/api/admin/mail/', ids.mail],
    ];
    const path = key.split(' ')[1];
    return {
      id: byPrefix.find(([p]) => path.startsWith(p))?.[1] ?? rec.id,
      resuscitationId: ids.signed.id,
      unitId: demoUnits[0].id,
      importId: rec.importId,
    };
  }

  function caseOf(route: FuzzRoute, key: string): fc.Arbitrary<Case> {
    const paramNames = [...route.path.matchAll(/\{(\w+)\}/g)].map((m) => m[1]);
    const param = fc.option(hostileParam, { freq: 3 });
    const valid = validBodies[key]?.() ?? {};
    const lines = monitorFileLines();
    return fc.record({
      params: fc.record(Object.fromEntries(paramNames.map((n) => [n, param]))),
      query: route.queryKeys.length
        ? fc.array(queryPart(route.queryKeys), { maxLength: 3 })
        : fc.constant([]),
      headers: fc.array(fc.tuple(fc.constantFrom(...route.headers, 'content-type'), headerValue), {
        maxLength: route.headers.length ? 2 : 0,
      }),
      body: route.method === 'GET' ? fc.constant(undefined) : hostileBody(valid),
      fileLine: uploadRoutes.has(key)
        ? fc.tuple(fc.nat(lines.length - 1), fc.constantFrom(...hostileStrings)).map((x) => x)
        : fc.constant(null),
    });
  }

  async function send(route: FuzzRoute, key: string, c: Case, real: Record<string, string>) {
    const path = route.path.replace(/\{(\w+)\}/g, (_, n: string) =>
      c.params[n] === null || c.params[n] === undefined ? real[n] : encode(c.params[n]),
    );
    const url = c.query.length ? `${path}?${c.query.join('&')}` : path;
    const rule = routeAccess[key];
    const role = rule === 'public' ? null : roleOrder.find((r) => rule.includes(r));
    let req = t.http()[route.method.toLowerCase() as 'get' | 'post' | 'patch'](url);
    if (role) req = req.set('Authorization', `Bearer ${await t.tokenFor(role)}`);
    for (const [h, v] of c.headers) req = req.set(h, v);
    if (c.fileLine) {
      const lines = monitorFileLines();
      lines[c.fileLine[0]] = c.fileLine[1];
      return req.attach('file', Buffer.from(lines.join('\n')), 'monitor.csv');
    }
    if (c.body === undefined) return req;
    const headerSet = c.headers.some(([h]) => h === 'content-type');
    return (headerSet ? req : req.set('Content-Type', 'application/json')).send(toJsonText(c.body));
  }

  it.each(Object.keys(routeAccess))('%s never answers 5xx', async (key) => {
    const route = routes.get(key);
    expect(route).toBeDefined();
    if (!route) return;
    // Failures are collected rather than thrown: fast-check would print (and shrink) values
    // nested 5000 deep. Each names the route, the status and the case.
    const found: string[] = [];
    await fc.assert(
      fc.asyncProperty(caseOf(route, key), async (c) => {
        const res = await send(route, key, c, await realParams(key));
        if (res.status >= 500)
          found.push(`${res.status} ${JSON.stringify(res.body)} ← ${describeCase(c)}`);
      }),
      { seed: SEED, numRuns: RUNS, examples: examplesFor(route, key) },
    );
    expect(found).toEqual([]);
  });

  it('stored no hostile item', async () => {
    expect(await storedHostile(t.db)).toEqual([]);
  });
});
