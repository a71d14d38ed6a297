import { z } from 'zod';

/**
 * Runs in the browser before any of the app's own modules (Next's client instrumentation hook).
 *
 * zod 4 compiles fast object parsers with `new Function` when it may. To find out, it tries `Function('')`
 * once, catches the error and falls back to its plain parser. Our page CSP has no 'unsafe-eval' (see
 * lib/security/content-security-policy.ts), so the probe always fails, but Chromium still reports the
 * attempt as a `script-src` violation on every page that parses with zod (seen on the sign-in page).
 * `jitless` skips the probe and goes straight to the plain parser, which is what zod ran under this
 * policy anyway: no change in behaviour, and the policy stays without 'unsafe-eval'. The flag lives on
 * globalThis (zod's global config), so it holds for every chunk's copy of zod.
 */
z.config({ jitless: true });
