import type { CurrentUser, Role, SceneStatus } from '@/lib/domain';

/**
 * Every "may this user do this" answer, for route handlers, pages and the UI's enabled states. Pure: a user
 * and a resource in, yes or no out. Organisation scoping is the queries' job (another organisation's
 * resource is not found, so it answers 404 and leaks nothing); these rules decide between the rest.
 */
export type Who = Pick<CurrentUser, 'id' | 'role'>;

/** Which roles may start each kind of action at all; the route wrapper checks these before any look-up. */
export const ROLES_FOR = {
  /** Operators plan lifts: they create scenes and edit their own. */
  createScene: ['operator'],
  editScene: ['operator'],
  /** An operator deletes their own scene; an admin may delete any in the organisation but edits none. */
  deleteScene: ['operator', 'admin'],
  /** Archiving follows deleting: the owning operator, or an admin for any scene. */
  archiveScene: ['operator', 'admin'],
  /** Only an admin brings back a deleted scene (within the restore window) and sees the deleted ones. */
  restoreScene: ['admin'],
  /** Trainers pick the scenes that go into the training set. */
  markTraining: ['trainer'],
  /** Admins keep the truck profiles. */
  manageEquipment: ['admin'],
  /** Operators and admins manage rigging and record inspections; everyone in the organisation reads. */
  manageRigging: ['operator', 'admin'],
  /** Trainers and admins build and edit lessons; everyone in the organisation reads them. */
  writeLessons: ['trainer', 'admin'],
  manageUsers: ['admin'],
} as const satisfies Record<string, readonly Role[]>;

export type Action = keyof typeof ROLES_FOR;

/** The roles allowed an action, for `route({ roles })`. */
export const rolesFor = (action: Action): readonly Role[] => ROLES_FOR[action];

/** True when the user's role allows the action (ownership aside). */
export const may = (user: Pick<Who, 'role'>, action: Action): boolean => (ROLES_FOR[action] as readonly Role[]).includes(user.role);

export interface SceneRef {
  ownerId: number;
  status: SceneStatus;
}

/** Supervisors, trainers and admins read every scene of their organisation; operators their own and approved ones. */
export const mayReadAllScenes = (user: Pick<Who, 'role'>): boolean => user.role !== 'operator';

export const mayReadScene = (user: Who, scene: SceneRef): boolean => mayReadAllScenes(user) || scene.ownerId === user.id || scene.status === 'approved';

/** Only the owning operator edits a scene (its document, plan details, background image). */
export const mayEditScene = (user: Who, scene: Pick<SceneRef, 'ownerId'>): boolean => may(user, 'editScene') && scene.ownerId === user.id;

export const mayDeleteScene = (user: Who, scene: Pick<SceneRef, 'ownerId'>): boolean => user.role === 'admin' || mayEditScene(user, scene);

/** Archive and unarchive: as delete (the owning operator, or an admin). */
export const mayArchiveScene = mayDeleteScene;
