import { HttpError } from './errors';

const tooLarge = (limit: number, field: string) =>
  new HttpError(413, `${field}: the request body is larger than ${formatLimit(limit)}`, [{ path: field, message: 'Too large' }]);

function formatLimit(bytes: number): string {
  return bytes % (1024 * 1024) === 0 ? `${bytes / (1024 * 1024)} MB` : `${bytes} bytes`;
}

/**
 * Reads the body, refusing it with 413 as soon as it passes `limit` bytes: a declared Content-Length over
 * the limit is refused before reading anything, and a chunked body (no length) is counted while it streams,
 * so an endless body never sits in memory beyond the limit.
 */
export async function readBodyLimited(req: Request, limit: number, field = 'body'): Promise<Uint8Array> {
  const declared = req.headers.get('content-length');
  if (declared !== null && Number(declared) > limit) {
    await req.body?.cancel().catch(() => undefined);
    throw tooLarge(limit, field);
  }
  if (!req.body) return new Uint8Array(0);
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > limit) {
        await reader.cancel().catch(() => undefined);
        throw tooLarge(limit, field);
      }
      chunks.push(value);
    }
  } catch (err) {
    if (err instanceof HttpError) throw err;
    // The client went away mid-body (a closed tab, a dropped connection): its fault, not the server's.
    throw new HttpError(400, `${field}: could not be read; the connection closed before the whole body arrived`, [{ path: field, message: 'Could not be read' }]);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}
