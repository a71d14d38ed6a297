/**
 * True when a URL path holds a percent-escape that does not decode (e.g. "%FF" alone is not UTF-8, "%G1"
 * is not hex). Route params are decoded with decodeURIComponent, which throws on these: the proxy answers
 * 400 first so such a path never reaches a handler as a 500.
 */
export function hasMalformedEscape(rawPath: string): boolean {
  for (const segment of rawPath.split('/')) {
    if (!segment.includes('%')) continue;
    try {
      decodeURIComponent(segment);
    } catch {
      return true;
    }
  }
  return false;
}

/** The path exactly as the client sent it (before any normalising), from an absolute request URL. */
export function rawPathOf(url: string): string {
  const afterScheme = url.indexOf('//');
  const pathStart = url.indexOf('/', afterScheme >= 0 ? afterScheme + 2 : 0);
  if (pathStart < 0) return '/';
  const end = url.slice(pathStart).search(/[?#]/);
  return end < 0 ? url.slice(pathStart) : url.slice(pathStart, pathStart + end);
}
