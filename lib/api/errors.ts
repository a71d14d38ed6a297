import type { z } from 'zod';
import { transition, type PlanStatus } from '@/lib/review/lifecycle';

export interface FieldIssue {
  /** Dotted path of the field, e.g. "document.objects.0.x"; "body" for the body as a whole. */
  path: string;
  message: string;
}

export class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly issues?: FieldIssue[],
  ) {
    super(message);
  }
}

function joinPath(prefix: string | undefined, path: PropertyKey[]): string {
  return [prefix, ...path.map(String)].filter((p) => p !== undefined && p !== '').join('.') || prefix || 'body';
}

export function zodIssues(error: z.ZodError, prefix?: string): FieldIssue[] {
  return error.issues.flatMap((i) =>
    // A strict object reports its unknown keys in one issue at the object; name each key instead.
    i.code === 'unrecognized_keys'
      ? i.keys.map((k) => ({ path: joinPath(prefix, [...i.path, k]), message: 'Unknown field' }))
      : [{ path: joinPath(prefix, i.path), message: i.message }],
  );
}

/** "title: Too small; revision: Expected number" — a one-line message that names each field. */
export function describeIssues(issues: FieldIssue[]): string {
  const shown = issues.slice(0, 5).map((i) => `${i.path}: ${i.message}`);
  return shown.join('; ') + (issues.length > 5 ? `; and ${issues.length - 5} more` : '');
}

export function jsonError(status: number, error: string, issues?: FieldIssue[]): Response {
  return Response.json(issues ? { error, issues } : { error }, { status });
}

/** The body of a 409 for a write based on an older revision: names the field and carries the current revision. */
export function staleRevisionBody(what: string, sent: number, current: number) {
  return {
    error: `revision: ${what} was based on revision ${sent}, but the scene is now at revision ${current}`,
    issues: [{ path: 'revision', message: 'Stale revision' }],
    currentRevision: current,
  };
}

/**
 * The status a plan takes when it is edited (a returned plan goes back to draft), or a 409 naming `status`
 * when its status freezes it (submitted, approved, archived). The one check for every route that edits a plan.
 */
export function statusAfterEdit(status: PlanStatus): PlanStatus {
  const t = transition(status, 'edit');
  if (!t.ok) throw new HttpError(409, t.message, [{ path: 'status', message: `The plan is ${status}` }]);
  return t.to;
}
