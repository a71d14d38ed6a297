import { z } from 'zod';
import type { Role } from '@/lib/domain';
import { getCurrentUser, type CurrentUser } from '@/lib/auth/current-user';
import { AccessError, assertRole } from '@/lib/auth/roles';
import { HttpError, describeIssues, jsonError, zodIssues } from './errors';
import { readBodyLimited } from './body';
import { pathId } from '@/lib/validations/path-id';
import { STATE_CHANGING, crossOriginReason, isJsonContentType } from '@/lib/security/same-origin';
import { log, requestIdFor } from '@/lib/log';

/** Bodies above this are refused while streaming (a scene document is far smaller). */
export const MAX_JSON_BODY = 2 * 1024 * 1024;
/**
 * Deepest nesting accepted in a JSON body. A scene document nests about eight levels (document, objects,
 * object, polygon, point); JSON.stringify and zod recurse, so a body thousands deep would overflow the stack.
 */
export const MAX_JSON_DEPTH = 64;
/** Seconds a client is asked to wait when the database stays locked by another writer past the busy timeout. */
export const BUSY_RETRY_AFTER_S = 2;

interface RouteOptions<P extends z.ZodType, B extends z.ZodType, Q extends z.ZodType> {
  /** Roles allowed; omit to allow any signed-in user. */
  roles?: readonly Role[];
  params?: P;
  body?: B;
  query?: Q;
}

export interface RouteContext<P, B, Q> {
  req: Request;
  user: CurrentUser;
  params: P;
  body: B;
  query: Q;
}

type NextContext = { params: Promise<Record<string, string | string[]>> };

function parseWith<T extends z.ZodType>(schema: T, value: unknown, where: string): z.output<T> {
  const parsed = schema.safeParse(value);
  if (!parsed.success) {
    const issues = zodIssues(parsed.error, where === 'body' ? undefined : where);
    throw new HttpError(400, `Invalid ${where}: ${describeIssues(issues)}`, issues);
  }
  return parsed.data;
}

async function readJson(req: Request): Promise<unknown> {
  if (!isJsonContentType(req.headers.get('content-type'))) {
    throw new HttpError(415, 'body: send the body as JSON with Content-Type: application/json', [{ path: 'body', message: 'Content-Type must be application/json' }]);
  }
  const text = new TextDecoder().decode(await readBodyLimited(req, MAX_JSON_BODY));
  if (text.trim() === '') throw new HttpError(400, 'body: a JSON body is required', [{ path: 'body', message: 'Required' }]);
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new HttpError(400, 'body: the request body is not valid JSON', [{ path: 'body', message: 'Malformed JSON' }]);
  }
  const deep = tooDeepAt(value);
  if (deep !== null) {
    throw new HttpError(400, `${deep}: nested more than ${MAX_JSON_DEPTH} levels deep`, [{ path: deep, message: 'Nested too deeply' }]);
  }
  return value;
}

/** The top-level field under which `value` nests deeper than MAX_JSON_DEPTH, or null. Iterative: no recursion. */
function tooDeepAt(value: unknown): string | null {
  const stack: { v: unknown; depth: number; top: string }[] = [{ v: value, depth: 0, top: 'body' }];
  while (stack.length) {
    const { v, depth, top } = stack.pop()!;
    if (v === null || typeof v !== 'object') continue;
    if (depth >= MAX_JSON_DEPTH) return top;
    for (const [k, child] of Object.entries(v)) stack.push({ v: child, depth: depth + 1, top: depth === 0 ? k : top });
  }
  return null;
}

/**
 * SQLITE_BUSY (and its extended codes): another connection held the write lock past the busy timeout.
 * PostgreSQL: a row lock not granted within lock_timeout (55P03), a deadlock (40P01) or a serialization
 * failure (40001); each is worth a retry a moment later.
 */
export function isDatabaseBusy(err: unknown): boolean {
  const code = (err as { code?: unknown } | null)?.code;
  return typeof code === 'string' && (code.startsWith('SQLITE_BUSY') || code.startsWith('SQLITE_LOCKED') || code === '55P03' || code === '40P01' || code === '40001');
}

function answer(err: unknown, requestId: string): Response {
  if (err instanceof AccessError) return jsonError(err.status, err.message);
  if (err instanceof HttpError) return jsonError(err.status, err.message, err.issues);
  if (isDatabaseBusy(err)) {
    const res = jsonError(503, 'The database is busy with another writer; try again shortly');
    res.headers.set('Retry-After', String(BUSY_RETRY_AFTER_S));
    return res;
  }
  log.error({ requestId, err }, 'unhandled route error');
  return jsonError(500, 'Something went wrong on the server');
}

/**
 * Wraps a route handler: state-changing calls must be same-origin (403), then session and role (401/403),
 * then params, query and body through zod (400; a JSON body needs Content-Type application/json, 415),
 * then the handler. Handlers throw HttpError for 404/409; a database locked past the busy timeout is 503
 * with Retry-After; anything else unexpected is logged and becomes 500. Every call is logged once.
 */
export function route<P extends z.ZodType = z.ZodUnknown, B extends z.ZodType = z.ZodUnknown, Q extends z.ZodType = z.ZodUnknown>(
  options: RouteOptions<P, B, Q>,
  handler: (ctx: RouteContext<z.output<P>, z.output<B>, z.output<Q>>) => Promise<Response | unknown>,
) {
  return wrap(options, true, handler as (ctx: RouteContext<unknown, unknown, unknown>) => Promise<Response | unknown>);
}

export type PublicRouteContext<P, B, Q> = Omit<RouteContext<P, B, Q>, 'user'>;

/**
 * The same wrapper for the few calls made before anyone is signed in (completing a password reset from an
 * e-mailed link): same-origin check, zod parsing, error answers and logging as `route`, but no session or
 * role. The handler must prove who the caller is by other means (a one-time token).
 */
export function publicRoute<P extends z.ZodType = z.ZodUnknown, B extends z.ZodType = z.ZodUnknown, Q extends z.ZodType = z.ZodUnknown>(
  options: Omit<RouteOptions<P, B, Q>, 'roles'>,
  handler: (ctx: PublicRouteContext<z.output<P>, z.output<B>, z.output<Q>>) => Promise<Response | unknown>,
) {
  return wrap(options, false, handler as (ctx: RouteContext<unknown, unknown, unknown>) => Promise<Response | unknown>);
}

function wrap(
  options: RouteOptions<z.ZodType, z.ZodType, z.ZodType>,
  needsSession: boolean,
  handler: (ctx: RouteContext<unknown, unknown, unknown>) => Promise<Response | unknown>,
) {
  return async (req: Request, context?: NextContext): Promise<Response> => {
    const started = performance.now();
    const requestId = requestIdFor(req);
    let userId: number | null = null;
    let res: Response;
    try {
      if (STATE_CHANGING.has(req.method)) {
        const reason = crossOriginReason(req);
        if (reason) throw new HttpError(403, `Cross-site request refused: ${reason}`);
      }
      const user = needsSession ? assertRole(await getCurrentUser(), options.roles) : undefined;
      userId = user?.id ?? null;
      const rawParams = context?.params ? await context.params : {};
      const params = options.params ? parseWith(options.params, rawParams, 'params') : rawParams;
      const url = new URL(req.url);
      const query = options.query ? parseWith(options.query, Object.fromEntries(url.searchParams), 'query') : {};
      const body = options.body ? parseWith(options.body, await readJson(req), 'body') : undefined;
      const out = await handler({ req, user, params, body, query } as RouteContext<unknown, unknown, unknown>);
      res = out instanceof Response ? out : Response.json(out ?? { ok: true });
    } catch (err) {
      res = answer(err, requestId);
    }
    // A streamed answer (an image) may come with immutable headers; only add the id where we can.
    try {
      res.headers.set('X-Request-Id', requestId);
    } catch {
      // Immutable headers: the log line still carries the id.
    }
    log.info({ requestId, userId, method: req.method, route: new URL(req.url).pathname, status: res.status, ms: Math.round(performance.now() - started) }, 'api');
    return res;
  };
}

/** Path id: a positive whole number written plainly ("12", not "1e1", " 12" or "0x0c"). */
export const idParams = z.object({ id: pathId('id') });
