/** Shared by the server (which makes the links) and the admin page (which says how long they last). */

/**
 * How long an e-mailed reset link works. An admin sends it, often to someone out on a job, so it lasts a
 * working day rather than minutes; it still works only once, and a newer link replaces it.
 */
export const RESET_LINK_HOURS = 24;

/** The page a reset link opens. The token is in the query, the page checks it on the server. */
export const resetLinkPath = (token: string) => `/reset-password?token=${token}`;
