/**
 * The domain's words: who a user is, where a scene stands, what a rigging item is. Plain data shared by the
 * database types, the validators, the server and the UI, so none of them has to reach into another for them.
 */

export type Role = 'operator' | 'supervisor' | 'trainer' | 'admin';
export const ROLES: readonly Role[] = ['operator', 'supervisor', 'trainer', 'admin'] as const;

/** A plan's place in the review lifecycle (lib/review/lifecycle says which moves are allowed). */
export const SCENE_STATUSES = ['draft', 'submitted', 'approved', 'returned', 'archived'] as const;
export type SceneStatus = (typeof SCENE_STATUSES)[number];

export type RiggingKind = 'round-sling' | 'web-sling' | 'wire-rope-sling' | 'chain' | 'shackle' | 'snatch-block' | 'hook' | 'recovery-strap';
export const RIGGING_KINDS: readonly RiggingKind[] = ['round-sling', 'web-sling', 'wire-rope-sling', 'chain', 'shackle', 'snatch-block', 'hook', 'recovery-strap'] as const;
export type RiggingStatus = 'in_service' | 'tagged_out' | 'retired';
export const RIGGING_STATUSES: readonly RiggingStatus[] = ['in_service', 'tagged_out', 'retired'] as const;

/** The signed-in user as every permission question sees them (read fresh from the database per request). */
export interface CurrentUser {
  id: number;
  organisationId: number;
  organisationName: string;
  role: Role;
  name: string;
  email: string;
  units: 'imperial' | 'metric';
}
