/**
 * The engine's version, stored with every server-computed result (a submission keeps the figures a
 * supervisor judged together with the engine that produced them). Bump it whenever a change alters any
 * figure the engine reports: the golden fixtures in tests/lift/fixtures regenerating is the sign.
 */
export const ENGINE_VERSION = '2026.12.2';
