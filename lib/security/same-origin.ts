/** Methods that change something; only these need the same-origin rule (reads must stay side-effect free). */
export const STATE_CHANGING = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/**
 * Origins this app answers as: the one the request was addressed to, and NEXTAUTH_URL's (the public
 * address when a proxy in front rewrites the Host header).
 */
function ownOrigins(req: Request): Set<string> {
  const own = new Set([new URL(req.url).origin]);
  const configured = process.env.NEXTAUTH_URL;
  if (configured) {
    try {
      own.add(new URL(configured).origin);
    } catch {
      // A malformed NEXTAUTH_URL adds nothing; next-auth itself refuses to start with one.
    }
  }
  return own;
}

/**
 * Why a state-changing request is not same-origin, or null when it is. Browsers send `Origin` on every
 * cross-origin POST/PUT/PATCH/DELETE; where it is missing, `Sec-Fetch-Site` says where the request came
 * from. A request with neither comes from a non-browser client, which cannot carry a victim's cookie, so
 * it is allowed (its session still has to be valid).
 */
export function crossOriginReason(req: Request): string | null {
  const origin = req.headers.get('origin');
  if (origin !== null) {
    return ownOrigins(req).has(origin) ? null : `Origin ${origin.slice(0, 100)} is not this site`;
  }
  const site = req.headers.get('sec-fetch-site');
  if (site !== null && site !== 'same-origin' && site !== 'none') return `Sec-Fetch-Site is ${site.slice(0, 40)}`;
  return null;
}

/** True when the Content-Type header names JSON (parameters such as charset allowed). */
export function isJsonContentType(value: string | null): boolean {
  if (!value) return false;
  const media = value.split(';')[0].trim().toLowerCase();
  return media === 'application/json';
}
