/**
 * The engine's version, stored with every server-computed result (a submission keeps the figures a
 * supervisor judged together with the engine that produced them). Bump it whenever a change alters any
 * figure the engine reports, or the shape of its result: the golden fixtures in tests/lift/fixtures
 * regenerating is the sign. 2026.12.2-b: checks became typed records (same figures, no sentences).
 * 2026.12.2-r: rigging per the standards (three-leg rule, alloy chain table, corrected choke factors,
 * hooks and snatch blocks as their own kinds); rigging facts gain rating sources and refusals.
 */
export const ENGINE_VERSION = '2026.12.2-r';
