/**
 * Where a rating row comes from, as in /work/shared/reference.md:
 * - `read`: read in a public copy of the source;
 * - `memory`: recalled, not yet checked against the primary text ("value from memory");
 * - `derived`: worked out from a formula that is itself sourced;
 * - `practice`: a fact of the trade with no published source ("common practice").
 */
export type SourceTag = 'read' | 'memory' | 'derived' | 'practice';

export interface RowSource {
  tag: SourceTag;
  /** The document (and table) the row is from. */
  ref: string;
}

export const src = (tag: SourceTag, ref: string): RowSource => ({ tag, ref });

const TAG_WORDS: Record<SourceTag, string> = {
  read: 'read',
  memory: 'value from memory',
  derived: 'derived',
  practice: 'common practice, no published source',
};

/** "ASTM A906 makers' WLL table (read)". */
export const describeSource = (s: RowSource) => `${s.ref} (${TAG_WORDS[s.tag]})`;
