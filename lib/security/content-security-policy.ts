/**
 * The page Content-Security-Policy. Scripts run only with this response's nonce ('strict-dynamic' lets
 * Next's nonce'd loader pull in its chunks); <style> elements need the nonce too. Style *attributes* stay
 * allowed (style-src-attr): React renders a few on the server (table column widths), and an attribute
 * cannot run script. Canvas images (Konva) and background previews use blob: and data: URLs.
 */
export function pageCsp(nonce: string, dev = process.env.NODE_ENV === 'development'): string {
  return [
    "default-src 'self'",
    // React's development build evaluates source maps for error overlays; production never needs eval.
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ''}`,
    `style-src 'self' 'nonce-${nonce}'`,
    "style-src-attr 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self' data:",
    "connect-src 'self'",
    "worker-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'none'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ');
}

/** API answers are data, never documents: nothing may load from them, and no one may frame them. */
export const API_CSP = "default-src 'none'; frame-ancestors 'none'";

/** Uploaded files: shown as images only; opened directly they run nothing (sandbox) and load nothing. */
export const UPLOAD_CSP = "default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; frame-ancestors 'none'; sandbox";

/** A fresh, unguessable nonce per response (128 random bits, base64). */
export function newNonce(): string {
  const bytes = new Uint8Array(16);
  crypto.getRandomValues(bytes);
  return btoa(String.fromCharCode(...bytes));
}
