import type { Handler } from './route-matrix';

export interface Call {
  handler: Handler;
  method: string;
  /** Path id, when the route has one. */
  id?: string;
  query?: string;
  /** A string is sent as is (malformed JSON, huge bodies); anything else is JSON.stringify'd. */
  body?: unknown;
  /** Extra or replacing headers (a body is sent as application/json unless this says otherwise). */
  headers?: Record<string, string>;
}

export async function call(c: Call): Promise<{ status: number; json: { error?: unknown; issues?: { path: string; message: string }[] } & Record<string, unknown>; text: string }> {
  const url = `http://arcline.test/api/x${c.query ? `?${c.query}` : ''}`;
  const init: RequestInit = { method: c.method };
  if (c.body !== undefined) {
    init.body = typeof c.body === 'string' ? c.body : JSON.stringify(c.body);
    init.headers = { 'content-type': 'application/json' };
  }
  if (c.headers) init.headers = { ...(init.headers as Record<string, string> | undefined), ...c.headers };
  const res = await c.handler(new Request(url, init), { params: Promise.resolve<Record<string, string>>(c.id !== undefined ? { id: c.id } : {}) });
  const text = await res.text();
  return { status: res.status, json: JSON.parse(text), text };
}
