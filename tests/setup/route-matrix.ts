import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { CurrentUser } from '@/lib/auth/current-user';
import { signInAs } from './auth-mock';
import { demoUser } from './db';
import { changedTables, snapshotDb } from './snapshot';
import { buildTemplate, resetToTemplate } from './template-db';
import { addAccessFixtures } from './fixtures';

/** Columns of every matrix row, in this order. */
export const ACTORS = ['signed out', 'operator', 'supervisor', 'trainer', 'admin', 'other-org operator'] as const;
export type Actor = (typeof ACTORS)[number];
/** Expected status for each actor, in ACTORS order. */
export type Statuses = readonly [number, number, number, number, number, number];

const ACTOR_EMAIL: Record<Exclude<Actor, 'signed out'>, Parameters<typeof demoUser>[0]> = {
  operator: 'operator@harrow.example',
  supervisor: 'supervisor@harrow.example',
  trainer: 'trainer@harrow.example',
  admin: 'admin@harrow.example',
  'other-org operator': 'operator@cobalt.example',
};

export type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

/** What a target resolves to in a fresh copy of the fixture database. */
export interface Target {
  /** Path id ("[id]"), if the route has one. */
  id?: string;
  /** Anything a body builder needs (a revision, a profile id, a flag). */
  [key: string]: unknown;
}
export type TargetResolver = () => Promise<Target>;

export interface MatrixRoute {
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** As in the app folder: '/api/scenes/[id]'. */
  path: string;
  handler: Handler;
  /** Tables a successful call changes, exactly. Reads leave this out and must change nothing. */
  writes?: readonly string[];
  body?: (t: Target) => unknown;
  query?: string;
  /** Builds the request body and headers itself (multipart uploads); overrides `body`. */
  init?: (t: Target) => RequestInit;
  /** Path params, when the route has more than [id]. */
  params?: (t: Target) => Record<string, string>;
  /** A successful GET on an [id] route answers that object, with its id; false for lists under an id. */
  checkId?: boolean;
  /** Expected statuses per target name (a key of the targets table). */
  expect: Record<string, Statuses>;
  /** Per-test timeout, ms, for routes that do heavy work (rendering a document) on a shared machine. */
  timeout?: number;
}

/**
 * Strings that must never appear in a response to this actor: the other organisation's names, people,
 * scenes and trucks, and for the Harrow operator also a colleague's draft.
 */
export type LeakMarkers = Record<Actor, readonly string[]>;

function request(route: MatrixRoute, target: Target): Request {
  const path = route.path.replace('[id]', target.id ?? 'missing-target-id');
  const url = `http://arcline.test${path}${route.query ? `?${route.query}` : ''}`;
  if (route.init) return new Request(url, { ...route.init(target), method: route.method });
  const init: RequestInit = { method: route.method };
  if (route.body) {
    init.body = JSON.stringify(route.body(target));
    init.headers = { 'content-type': 'application/json' };
  }
  return new Request(url, init);
}

/**
 * Declares one test per route × target × actor. Each test signs in, snapshots every table, calls the
 * handler, and checks the status, that nothing leaked, and that the database changed exactly when the
 * call succeeded (a successful write is followed by a fresh copy of the fixture database).
 */
export function describeMatrix(title: string, routes: MatrixRoute[], targets: Record<string, TargetResolver>, leaks: LeakMarkers) {
  describe(title, () => {
    let template = '';
    let dirty = true;
    const users = new Map<Actor, CurrentUser>();

    beforeAll(async () => {
      template = await buildTemplate(addAccessFixtures);
      await resetToTemplate(template);
      for (const [actor, email] of Object.entries(ACTOR_EMAIL)) users.set(actor as Actor, await demoUser(email));
      dirty = false;
    });
    beforeEach(async () => {
      if (dirty) await resetToTemplate(template);
      dirty = false;
    });

    for (const route of routes) {
      for (const [targetName, statuses] of Object.entries(route.expect)) {
        if (!targets[targetName]) throw new Error(`${route.method} ${route.path}: unknown target "${targetName}"`);
        ACTORS.forEach((actor, i) => {
          const want = statuses[i];
          it(`${route.method} ${route.path} · ${targetName} · ${actor} → ${want}`, async () => {
            const target = await targets[targetName]();
            signInAs(actor === 'signed out' ? null : users.get(actor)!);
            const before = await snapshotDb();
            const params = route.params ? route.params(target) : target.id ? { id: target.id } : {};
            const res = await route.handler(request(route, target), { params: Promise.resolve<Record<string, string>>(params) });
            const text = await res.text();
            expect(res.status, text.slice(0, 300)).toBe(want);
            const isJson = (res.headers.get('content-type') ?? '').includes('json');
            const json = isJson ? JSON.parse(text) : {};
            for (const marker of leaks[actor]) expect(text, `leaked "${marker}"`).not.toContain(marker);
            const changed = changedTables(before, await snapshotDb());
            if (res.ok && route.writes) {
              dirty = true;
              expect(changed).toEqual([...route.writes].sort());
            } else {
              expect(changed).toEqual([]);
            }
            if (!res.ok) expect(isJson && typeof json.error).toBe('string');
            else if (target.id && route.method === 'GET' && route.checkId !== false) expect(String(json.id)).toBe(target.id);
          }, route.timeout);
        });
      }
    }
  });
}
