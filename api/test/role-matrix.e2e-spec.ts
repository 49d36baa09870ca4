import { randomUUID } from 'node:crypto';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import type { Role } from '@upstroke/contracts';
import { startTestApp, type TestApp } from './test-app';
import { routeAccess } from './route-access';

const roles: Role[] = ['recorder', 'lead', 'quality', 'admin'];

/**
 * Every route the API has, each role against each route: allowed, 403, or 401 without a
 * token. The list of routes comes from the running application, so a new route without an
 * entry in route-access.ts fails here.
 */
describe('role matrix', () => {
  let t: TestApp;
  let routes: { method: string; path: string }[];
  beforeAll(async () => {
    t = await startTestApp();
    const doc = SwaggerModule.createDocument(t.app, new DocumentBuilder().build());
    routes = Object.entries(doc.paths).flatMap(([path, ops]) =>
      Object.keys(ops as object)
        .filter((m) => ['get', 'post', 'patch', 'put', 'delete'].includes(m))
        .map((method) => ({ method: method.toUpperCase(), path })),
    );
  });
  afterAll(() => t.close());

  it('has an access rule for every route', () => {
    expect(routes.length).toBeGreaterThan(5);
    const missing = routes
      .map((r) => `${r.method} ${r.path}`)
      .filter((key) => !(key in routeAccess));
    expect(missing).toEqual([]);
  });

  it('answers each role as the rules say', async () => {
    const outcomes: string[] = [];
    for (const route of routes) {
      const rule = routeAccess[`${route.method} ${route.path}`];
      const url = route.path.replace(/\{[^}]+\}/g, randomUUID());
      const call = () => {
        const m = route.method.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete';
        return t.http()[m](url);
      };
      const anonymous = await call().send({});
      if (rule === 'public') {
        outcomes.push(
          `${route.method} ${route.path} anon ${anonymous.status === 401 ? 'refused' : 'ok'}`,
        );
        continue;
      }
      expect(`${route.method} ${route.path} anon ${anonymous.status}`).toBe(
        `${route.method} ${route.path} anon 401`,
      );
      for (const role of roles) {
        const res = await call()
          .set('Authorization', `Bearer ${await t.tokenFor(role)}`)
          .send({});
        const allowed = rule.includes(role);
        const got =
          res.status === 403 ? 'forbidden' : res.status === 401 ? 'unauthenticated' : 'allowed';
        outcomes.push(`${route.method} ${route.path} ${role} ${got}`);
        expect(`${route.method} ${route.path} ${role} ${got}`).toBe(
          `${route.method} ${route.path} ${role} ${allowed ? 'allowed' : 'forbidden'}`,
        );
      }
    }
    expect(outcomes.length).toBeGreaterThan(routes.length);
  });
});
