import type { Role } from '@porestack/types';
import { Router, type Express, type NextFunction, type Request, type RequestHandler, type Response } from 'express';
import { readCache } from '../db/read-cache.js';
import { runInTenant } from '../db/tenant-wall.js';
import { authenticate, authenticateInOrg } from './authenticate.js';
import { UUID_PATTERN } from './params.js';

/**
 * Route policies — the one place where who may call a route is declared.
 *
 * Every API route is registered through `defineRoutes`, never with `router.get(...)`
 * directly. Each entry names its method, its path (relative to the base), its access
 * and its handler; the helper registers the route behind a guard that enforces the
 * access and carries it, so `listRoutes(app)` can read every route's policy back and
 * a test fails when any route was registered without one.
 *
 *   access: 'public'       anyone, signed in or not
 *   access: 'signed-in'    any signed-in user          → req.user
 *   access: ['admin', …]   (a list from ROLE_ACCESS in @porestack/types, which the
 *                          web reads too) a member of `:orgId` holding at least one of these
 *                          roles (a membership may hold several) → req.user and
 *                          req.tenant; a non-member gets 404 (as for a missing
 *                          organisation), a member holding none of them 403.
 *                          The path must contain `:orgId`.
 *
 * Adding a resource under an organisation:
 *
 *   export function testsRouter(): RouteGroup {
 *     return defineRoutes('/api/orgs/:orgId/tests', [
 *       { method: 'get', path: '/', access: ROLE_ACCESS.labReaders, handler: list },
 *       { method: 'post', path: '/', access: ROLE_ACCESS.importers, before: [upload.single('file')], handler: create },
 *     ]);
 *   }
 *   // and in app.ts: app.use(testsRouter());
 */
export type Access = 'public' | 'signed-in' | readonly Role[];

/** The routes of one defineRoutes call, mounted with `app.use(group)`; `stack` is its router's, read by listRoutes. */
export type RouteGroup = RequestHandler & { stack: unknown[] };

export type HttpMethod = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface RouteDefinition {
  method: HttpMethod;
  /** Relative to the base given to defineRoutes; '/' for the base itself. */
  path: string;
  access: Access;
  /** Middleware run after the guard and before the handler (rate limits, uploads). */
  before?: RequestHandler[];
  /** Thin: parse, call a service, send. A rejected promise reaches the error middleware. */
  handler: (req: Request, res: Response) => unknown;
}

export interface RoutePolicy {
  method: string;
  path: string;
  access: Access | undefined;
}

const ACCESS = Symbol('porestack.access');
type Guard = RequestHandler & { [ACCESS]: Access };

function guardFor(access: Access): Guard {
  const guard: RequestHandler = async (req: Request, res: Response, next: NextFunction) => {
    if (access === 'public') return next();
    if (access === 'signed-in') {
      req.user = await authenticate(req);
      return next();
    }
    const orgId = req.params['orgId'] as string | undefined;
    // Within the organisation asked for already (its membership row is behind the wall), so the
    // pooled connection keeps one setting for the whole request instead of switching twice.
    const check = () => authenticateInOrg(req, orgId, access);
    const { user, tenant } = orgId !== undefined && UUID_PATTERN.test(orgId) ? await runInTenant(orgId, check) : await check();
    req.user = user;
    req.tenant = tenant;
    // A change of this organisation's rows: this process's next read of them comes from the database
    // even before PostgreSQL's notice of it arrives (db/read-cache.ts).
    if (req.method !== 'GET' && req.method !== 'HEAD') res.once('finish', () => readCache().forget(tenant.orgId));
    // From here on, every query of this request sees only this organisation's rows.
    runInTenant(tenant.orgId, next);
  };
  return Object.assign(guard, { [ACCESS]: access });
}

function joinPath(base: string, path: string): string {
  if (path === '/' || path === '') return base || '/';
  return `${base.replace(/\/$/, '')}${path.startsWith('/') ? path : `/${path}`}`;
}

/**
 * A pattern every path that `paths` can match starts with: each path's segments up to the first
 * that is not plain text or a `:param`, a param standing for one segment (as path-to-regexp
 * matches it), followed by a slash or the end; case-insensitive, as Express routes are.
 */
export function routeStarts(paths: readonly string[]): RegExp {
  const starts = paths.map((path) => {
    const segments: string[] = [];
    for (const segment of path.split('/').filter(Boolean)) {
      if (/^:\w+$/.test(segment)) segments.push('[^/]+');
      else if (/^[\w.~-]+$/.test(segment)) segments.push(segment.replace(/\./g, '\\.'));
      else break;
    }
    return segments.map((segment) => `/${segment}`).join('');
  });
  return new RegExp(`^(?:${[...new Set(starts)].join('|')})(?:/|$)`, 'i');
}

/**
 * A router whose routes are registered at their full paths (mount it with `app.use(router)`,
 * without a path, so the full paths stay visible to `listRoutes`).
 */
export function defineRoutes(base: string, routes: RouteDefinition[]): RouteGroup {
  const router = Router();
  for (const route of routes) {
    const fullPath = joinPath(base, route.path);
    if (Array.isArray(route.access) && !fullPath.includes(':orgId')) {
      throw new Error(`${route.method.toUpperCase()} ${fullPath}: a role policy needs an :orgId in the path`);
    }
    router[route.method](fullPath, guardFor(route.access), ...(route.before ?? []), async (req, res) => {
      await route.handler(req, res);
    });
  }
  // A request for none of these paths passes by at once, rather than being tried against each route
  // in turn and then leaving the router on the next turn of the event loop (as a router does).
  const paths = routeStarts(routes.map((route) => joinPath(base, route.path)));
  const group: RequestHandler = (req, res, next) => (paths.test(req.path) ? router(req, res, next) : next());
  return Object.assign(group, { stack: router.stack as unknown[] });
}

interface StackLayer {
  route?: { path: string; methods: Record<string, boolean>; stack: Array<{ handle: unknown }> };
  handle?: { stack?: StackLayer[] };
}

function collect(stack: StackLayer[], into: RoutePolicy[]): void {
  for (const layer of stack) {
    if (layer.route) {
      const guard = layer.route.stack[0]?.handle as Partial<Guard> | undefined;
      const access = guard?.[ACCESS];
      for (const method of Object.keys(layer.route.methods)) {
        into.push({ method: method.toUpperCase(), path: layer.route.path, access });
      }
    } else if (layer.handle?.stack) {
      collect(layer.handle.stack, into);
    }
  }
}

/** Every route registered on the app, with its declared access (undefined when it has none). */
export function listRoutes(app: Express): RoutePolicy[] {
  const routes: RoutePolicy[] = [];
  collect((app.router as unknown as { stack: StackLayer[] }).stack, routes);
  return routes;
}
