import { z } from 'zod';
import type { Role } from '@/lib/domain';
import { getCurrentUser, type CurrentUser } from '@/lib/auth/current-user';
import { AccessError, assertRole } from '@/lib/auth/roles';
import { HttpError, describeIssues, jsonError, zodIssues } from './errors';
import { pathId } from '@/lib/validations/path-id';

/** Bodies above this are refused before parsing (a scene document is far smaller). */
export const MAX_JSON_BODY = 2 * 1024 * 1024;
/**
 * Deepest nesting accepted in a JSON body. A scene document nests about eight levels (document, objects,
 * object, polygon, point); JSON.stringify and zod recurse, so a body thousands deep would overflow the stack.
 */
export const MAX_JSON_DEPTH = 64;

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
  const declared = Number(req.headers.get('content-length') ?? '0');
  if (declared > MAX_JSON_BODY) throw new HttpError(413, 'body: the request body is larger than 2 MB', [{ path: 'body', message: 'Too large' }]);
  let text: string;
  try {
    text = await req.text();
  } catch {
    // The client went away mid-body (a closed tab, a dropped connection): its fault, not the server's.
    throw new HttpError(400, 'body: could not be read; the connection closed before the whole body arrived', [{ path: 'body', message: 'Could not be read' }]);
  }
  if (text.length > MAX_JSON_BODY) throw new HttpError(413, 'body: the request body is larger than 2 MB', [{ path: 'body', message: 'Too large' }]);
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
 * Wraps a route handler: session and role first (401/403), then params, query and body through zod (400),
 * then the handler. Handlers throw HttpError for 404/409; anything else unexpected is logged and becomes 500.
 */
export function route<P extends z.ZodType = z.ZodUnknown, B extends z.ZodType = z.ZodUnknown, Q extends z.ZodType = z.ZodUnknown>(
  options: RouteOptions<P, B, Q>,
  handler: (ctx: RouteContext<z.output<P>, z.output<B>, z.output<Q>>) => Promise<Response | unknown>,
) {
  return async (req: Request, context?: NextContext): Promise<Response> => {
    try {
      const user = assertRole(await getCurrentUser(), options.roles);
      const rawParams = context?.params ? await context.params : {};
      const params = options.params ? parseWith(options.params, rawParams, 'params') : rawParams;
      const url = new URL(req.url);
      const query = options.query ? parseWith(options.query, Object.fromEntries(url.searchParams), 'query') : {};
      const body = options.body ? parseWith(options.body, await readJson(req), 'body') : undefined;
      const out = await handler({ req, user, params, body, query } as RouteContext<z.output<P>, z.output<B>, z.output<Q>>);
      return out instanceof Response ? out : Response.json(out ?? { ok: true });
    } catch (err) {
      if (err instanceof AccessError) return jsonError(err.status, err.message);
      if (err instanceof HttpError) return jsonError(err.status, err.message, err.issues);
      console.error('Unhandled route error', err);
      return jsonError(500, 'Something went wrong on the server');
    }
  };
}

/** Path id: a positive whole number written plainly ("12", not "1e1", " 12" or "0x0c"). */
export const idParams = z.object({ id: pathId('id') });
