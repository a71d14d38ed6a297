/** An API error as the client sees it: the status and the server's `{ error, issues? }` body. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly body: { error?: string; issues?: { path: string; message: string }[]; [k: string]: unknown },
  ) {
    super(message);
  }
}

/** fetch + JSON for our own API. Non-2xx answers throw ApiError carrying the server's message. */
export async function fetchJson<T>(url: string, init?: RequestInit): Promise<T> {
  const res = await fetch(url, {
    ...init,
    headers: { accept: 'application/json', ...(init?.body ? { 'content-type': 'application/json' } : {}), ...init?.headers },
  });
  const text = await res.text();
  let body: unknown = null;
  try {
    body = text ? JSON.parse(text) : null;
  } catch {
    body = { error: text.slice(0, 200) };
  }
  if (!res.ok) {
    const b = (body ?? {}) as ApiError['body'];
    throw new ApiError(res.status, b.error ?? `Request failed (${res.status})`, b);
  }
  return body as T;
}
