/** A JSON request to one of our routes, same origin with the session cookie; the answer's status and body. */
export async function sendJson(method: 'POST' | 'PATCH', url: string, body?: unknown): Promise<{ ok: boolean; status: number; json: Record<string, unknown> }> {
  try {
    const res = await fetch(url, { method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body ?? {}) });
    const json = (await res.json().catch(() => ({}))) as Record<string, unknown>;
    return { ok: res.ok, status: res.status, json };
  } catch {
    return { ok: false, status: 0, json: { error: 'The server could not be reached. Check the connection and try again.' } };
  }
}

/** The error a failed answer carries, in words. */
export const errorText = (json: Record<string, unknown>) => (typeof json.error === 'string' ? json.error : 'Something went wrong.');
