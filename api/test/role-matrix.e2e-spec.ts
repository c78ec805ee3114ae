import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { GlobalRole } from '@homeground/shared';
import { RequestMethod } from '@nestjs/common';
import { GUARDS_METADATA, METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants.js';
import { ModulesContainer } from '@nestjs/core';
import { ROLES_KEY } from '../src/common/decorators/roles.decorator.js';
import { PUBLIC_KEY } from '../src/common/decorators/public.decorator.js';
import { JwtAuthGuard } from '../src/common/guards/jwt-auth.guard.js';
import { OptionalJwtAuthGuard } from '../src/common/guards/optional-jwt-auth.guard.js';
import { signIn } from './support/plant-share.js';
import { createTestApp, type TestApp } from './support/test-app.js';

type Persona = 'anonymous' | 'member' | 'grower' | 'organiser' | 'curator' | 'admin';
/** Each persona's global role (group roles are the groups' own business, checked in their services). */
const GLOBAL: Record<Exclude<Persona, 'anonymous'>, GlobalRole> = {
  member: 'member',
  grower: 'member',
  organiser: 'member',
  curator: 'curator',
  admin: 'admin',
};

type Decision =
  | { kind: 'public' }
  | { kind: 'optional-sign-in' }
  | { kind: 'signed-in'; roles: GlobalRole[] }
  | { kind: 'contradictory' | 'none' };

interface Route {
  method: string;
  path: string;
  controller: string;
  handler: string;
  decision: Decision;
}

const normalise = (...parts: string[]) => `/${parts.join('/')}`.replace(/\/+/g, '/').replace(/\/$/, '') || '/';

/**
 * Every route Nest registered, read from the controllers' own metadata (path, method, guards, roles,
 * @Public), so a route added tomorrow is in this list without anyone editing the test.
 */
function registeredRoutes(t: TestApp): Route[] {
  const routes: Route[] = [];
  for (const mod of t.app.get(ModulesContainer).values()) {
    for (const wrapper of mod.controllers.values()) {
      const cls = wrapper.metatype as (new (...a: never[]) => unknown) | null;
      if (!cls) continue;
      const base: string | string[] = Reflect.getMetadata(PATH_METADATA, cls) ?? '';
      const classGuards: unknown[] = Reflect.getMetadata(GUARDS_METADATA, cls) ?? [];
      const classPublic = Reflect.getMetadata(PUBLIC_KEY, cls) === true;
      const classRoles: GlobalRole[] | undefined = Reflect.getMetadata(ROLES_KEY, cls);
      for (const name of Object.getOwnPropertyNames(cls.prototype)) {
        const handler = (cls.prototype as Record<string, unknown>)[name];
        if (name === 'constructor' || typeof handler !== 'function') continue;
        const sub: string | string[] | undefined = Reflect.getMetadata(PATH_METADATA, handler);
        if (sub === undefined) continue;
        const method = RequestMethod[Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod];
        const guards = [...classGuards, ...((Reflect.getMetadata(GUARDS_METADATA, handler) as unknown[]) ?? [])];
        const isPublic = classPublic || Reflect.getMetadata(PUBLIC_KEY, handler) === true;
        const required = guards.includes(JwtAuthGuard);
        const optional = guards.includes(OptionalJwtAuthGuard);
        const roles: GlobalRole[] = Reflect.getMetadata(ROLES_KEY, handler) ?? classRoles ?? [];
        const decisions = [isPublic, required, optional].filter(Boolean).length;
        const decision: Decision =
          decisions > 1
            ? { kind: 'contradictory' }
            : isPublic
              ? { kind: 'public' }
              : optional
                ? { kind: 'optional-sign-in' }
                : required
                  ? { kind: 'signed-in', roles }
                  : { kind: 'none' };
        for (const b of [base].flat())
          for (const s of [sub].flat())
            routes.push({ method, path: normalise('api', b, s), controller: cls.name, handler: name, decision });
      }
    }
  }
  return routes;
}

/** Fills path parameters with values that pass validation and name nothing that exists (or the demo group). */
function concrete(path: string): string {
  return path
    .replace(':slug', path.startsWith('/api/species') ? 'zz-no-such-species' : 'larkfield-commons-growers')
    .replace(/:(\w*[iI]d)\b/g, '0b7b1d1e-4a4f-4c59-9d4a-0d1f4e8b9c21')
    .replace(/:token\b/g, 'A'.repeat(43))
    .replace(/:(\w+)/g, 'x');
}

/**
 * The role matrix, generated: each route is called as anonymous, a member, a grower, an organiser, a
 * curator and an admin. Guards run before any parameter is read, so a 401 or 403 here is the access
 * decision and not a validation answer; anything else (400, 404, 409, 2xx) means the guard let it through.
 * Source: the access rules in DEVELOPERS.md ("API conventions": @Auth(), @Auth('curator'), admins pass
 * every role) and OWASP ASVS 4.0 V4.1.3 (least privilege) / V4.1.5 (access control fails closed).
 */
/** Where the catalogue-sync middleware (species.module.ts) is mounted: every route, not a handler. */
const MIDDLEWARE_PATH = '/api/*path';

describe('role matrix generated from the controllers (e2e, demo data)', () => {
  let t: TestApp;
  let routes: Route[];
  const tokens: Partial<Record<Persona, string>> = {};

  beforeAll(async () => {
    t = await createTestApp({ DEMO_DATA: 'true', LOGIN_THROTTLE_LIMIT: '1000' });
    routes = registeredRoutes(t);
    tokens.member = await signIn(t, 'priya.vantongeren@example.org', 'larkfield-priya');
    tokens.grower = await signIn(t, 'juniper.okafor@example.org', 'larkfield-juniper');
    tokens.organiser = await signIn(t, 'mara.ellsworth@example.org', 'larkfield-mara');
    tokens.curator = await signIn(t, 'ines.calder@example.org', 'larkfield-ines');
    tokens.admin = await signIn(t, 'wes.hollenbeck@example.org', 'larkfield-wes');
  });
  afterAll(() => t.close());

  it('finds every route Express serves under /api in the controllers metadata', () => {
    const router = (
      t.app.getHttpAdapter().getInstance() as {
        router: { stack: { route?: { path: string; methods: Record<string, boolean> } }[] };
      }
    ).router;
    const served = router.stack
      // Nest registers middleware applied to every route (the catalogue sync) as an Express route of its own.
      .filter((l) => l.route && l.route.path.startsWith('/api/') && !l.route.path.startsWith('/api/docs'))
      .filter((l) => l.route!.path !== MIDDLEWARE_PATH)
      .flatMap((l) => Object.keys(l.route!.methods).map((m) => `${m.toUpperCase()} ${l.route!.path}`));
    const known = new Set(routes.map((r) => `${r.method} ${r.path}`));
    expect(served.length).toBeGreaterThan(60);
    // An @All() handler is served for every method Express knows.
    expect(served.filter((s) => !known.has(s) && !known.has(`ALL ${s.slice(s.indexOf(' ') + 1)}`))).toEqual([]);
  });

  it('has an explicit access decision on every route (@Public or @Auth), never both', () => {
    const undecided = routes
      .filter((r) => r.decision.kind === 'none' || r.decision.kind === 'contradictory')
      .map((r) => `${r.method} ${r.path} (${r.controller}.${r.handler}): ${r.decision.kind}`);
    expect(undecided).toEqual([]);
  });

  it('answers each persona as the route decides: 401 without sign-in, 403 without the role, through otherwise', async () => {
    const personas: Persona[] = ['anonymous', 'member', 'grower', 'organiser', 'curator', 'admin'];
    const wrong: string[] = [];
    let calls = 0;
    /** Group routes read without a body: the group's own check (in its service) answers before any validation. */
    const groupReads = new Map<string, Partial<Record<Persona, number>>>();
    // Every write here has an empty body or an unknown id, so one that passes its guard is refused by
    // validation or lookup and changes nothing the next persona's call meets. Admins come last.
    for (const persona of personas) {
      for (const r of routes) {
        const d = r.decision;
        if (d.kind !== 'public' && d.kind !== 'optional-sign-in' && d.kind !== 'signed-in') continue;
        const url = concrete(r.path);
        // An @All() handler (the plant share's stand-in on PostgreSQL) is asked with GET.
        let req = t.http[(r.method === 'ALL' ? 'GET' : r.method).toLowerCase() as 'get'](url);
        if (persona !== 'anonymous') req = req.set('Authorization', `Bearer ${tokens[persona]}`);
        if (['POST', 'PUT', 'PATCH'].includes(r.method)) req = req.send({});
        const status = (await req).status;
        calls++;
        if (r.method === 'GET' && d.kind === 'signed-in' && r.path.startsWith('/api/groups/:slug/'))
          groupReads.set(url, { ...groupReads.get(url), [persona]: status });
        let expected: 'through' | 401 | 403;
        if (d.kind !== 'signed-in') expected = 'through';
        else if (persona === 'anonymous') expected = 401;
        else if (d.roles.length === 0 || GLOBAL[persona] === 'admin' || d.roles.includes(GLOBAL[persona]))
          expected = 'through';
        else expected = 403;
        // A signed-in route may still answer 403 from a group check in its service (e.g. a member on an
        // organiser's page): only the guard's own decisions are asserted for those.
        const ok =
          status < 500 &&
          (expected === 'through'
            ? status !== 401 && (d.kind !== 'signed-in' || d.roles.length === 0 || status !== 403)
            : status === expected);
        if (!ok) wrong.push(`${persona} ${r.method} ${url} → ${status}, expected ${expected}`);
      }
    }
    expect(calls).toBeGreaterThan(6 * 60);
    expect(wrong).toEqual([]);

    // Group roles, for every group page read: the group's organiser and an admin are never refused; someone
    // outside the group (the curator) always is; and the roles nest, member ⊂ grower ⊂ organiser, so a
    // page a member may read a grower may too, and one a grower may read the organiser may too.
    expect(groupReads.size).toBeGreaterThan(10);
    for (const [url, by] of groupReads) {
      const through = (p: Persona) => by[p] !== 403 && by[p] !== 401;
      const line = `${url}: ${JSON.stringify(by)}`;
      expect([line, through('organiser'), through('admin'), by.curator]).toEqual([line, true, true, 403]);
      if (through('member')) expect([line, through('grower')]).toEqual([line, true]);
      if (through('grower')) expect([line, through('organiser')]).toEqual([line, true]);
    }
    // And the roles do differ somewhere (else the nesting above would hold vacuously).
    const reads = [...groupReads.values()];
    expect(reads.some((by) => by.member === 403 && by.grower !== 403)).toBe(true);
    expect(reads.some((by) => by.grower === 403 && by.organiser !== 403)).toBe(true);
  });

  it('keeps the curator and admin routes to their roles (a sample, named, so the matrix above is not vacuous)', () => {
    const decisionOf = (method: string, path: string) =>
      routes.find((r) => r.method === method && r.path === path)?.decision;
    expect(decisionOf('POST', '/api/species/import')).toEqual({ kind: 'signed-in', roles: ['curator'] });
    expect(decisionOf('GET', '/api/users')).toEqual({ kind: 'signed-in', roles: ['admin'] });
    expect(decisionOf('GET', '/api/species')).toEqual({ kind: 'public' });
    expect(decisionOf('POST', '/api/auth/login')).toEqual({ kind: 'public' });
    // Deleting a pickup slot needs a sign-in; the group's organiser role is checked by the service
    // (plant-share-changes.e2e-spec.ts calls it as each persona).
    expect(decisionOf('DELETE', '/api/groups/:slug/plant-share/slots/:slotId')).toEqual({
      kind: 'signed-in',
      roles: [],
    });
  });
});
