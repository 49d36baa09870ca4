import type { INestApplication } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA, ROUTE_ARGS_METADATA } from '@nestjs/common/constants';
import { RequestMethod } from '@nestjs/common/enums/request-method.enum';
import { RouteParamtypes } from '@nestjs/common/enums/route-paramtypes.enum';
import { ModulesContainer } from '@nestjs/core';

/** A route of the running API, with the query keys and headers its handler reads. */
export interface FuzzRoute {
  method: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  /** OpenAPI syntax, as in route-access.ts: `/api/resuscitations/{id}`. */
  path: string;
  queryKeys: string[];
  headers: string[];
}

interface ArgMeta {
  index: number;
  data?: unknown;
  pipes?: unknown[];
}

/** The keys of a zod object schema, through optional/default/refine/pipe wrappers. */
function schemaKeys(schema: unknown): string[] {
  let s = schema as { shape?: object; def?: Record<string, unknown> } | undefined;
  for (let i = 0; i < 10 && s; i += 1) {
    if (s.shape && typeof s.shape === 'object') return Object.keys(s.shape);
    const def = s.def ?? {};
    s = (def.in ?? def.innerType ?? def.schema) as typeof s;
  }
  return [];
}

function pipeKeys(pipes: unknown[] = []): string[] {
  return pipes.flatMap((p) =>
    p && typeof p === 'object' && 'schema' in p
      ? schemaKeys((p as { schema: unknown }).schema)
      : [],
  );
}

const join = (...parts: string[]) =>
  `/${parts
    .flatMap((p) => p.split('/'))
    .filter(Boolean)
    .join('/')}`.replace(/:(\w+)/g, '{$1}');

function routesOf(controller: { prototype: object }): FuzzRoute[] {
  const base = Reflect.getMetadata(PATH_METADATA, controller) as string | string[];
  const proto = controller.prototype as Record<string, unknown>;
  return Object.getOwnPropertyNames(proto).flatMap((name) => {
    const handler = proto[name];
    if (name === 'constructor' || typeof handler !== 'function') return [];
    const method = Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod | undefined;
    const sub = Reflect.getMetadata(PATH_METADATA, handler) as string | string[] | undefined;
    if (method === undefined || sub === undefined) return [];
    const args = (Reflect.getMetadata(ROUTE_ARGS_METADATA, controller, name) ?? {}) as Record<
      string,
      ArgMeta
    >;
    const queryKeys = new Set<string>();
    const headers = new Set<string>();
    for (const [key, arg] of Object.entries(args)) {
      const type = Number(key.split(':')[0]);
      if (type === Number(RouteParamtypes.QUERY)) {
        if (typeof arg.data === 'string') queryKeys.add(arg.data);
        pipeKeys(arg.pipes).forEach((k) => queryKeys.add(k));
      }
      if (type === Number(RouteParamtypes.HEADERS) && typeof arg.data === 'string')
        headers.add(arg.data);
    }
    return [base].flat().flatMap((b) =>
      [sub].flat().map((s) => ({
        method: RequestMethod[method] as FuzzRoute['method'],
        path: join('api', b, s),
        queryKeys: [...queryKeys],
        headers: [...headers],
      })),
    );
  });
}

/** Every route of every controller of the application, read from Nest's own metadata. */
export function discoverRoutes(app: INestApplication): FuzzRoute[] {
  const modules = app.get(ModulesContainer);
  const seen = new Set<unknown>();
  const routes: FuzzRoute[] = [];
  for (const mod of modules.values())
    for (const wrapper of mod.controllers.values()) {
      const type = wrapper.metatype as { prototype: object } | null;
      if (!type || seen.has(type)) continue;
      seen.add(type);
      routes.push(...routesOf(type));
    }
  return routes;
}
