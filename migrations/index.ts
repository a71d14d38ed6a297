import type { Migration } from 'kysely';
import * as foundation from './2026-12-01T00-00_foundation';
import * as sceneUploads from './2026-12-01T22-45_scene-uploads';
import * as equipmentLibrary from './2026-12-01T23-00_equipment-library';
import * as signInHardening from './2026-12-02T10-00_sign-in-hardening';
import * as reviewDesk from './2026-12-02T11-00_review-desk';
import * as planDetails from './2026-12-02T12-00_plan-details';
import * as lessons from './2026-12-02T13-00_lessons';
import * as sceneList from './2026-12-02T14-00_scene-list';
import * as revisionStorage from './2026-12-02T14-30_revision-storage';
import * as sceneActions from './2026-12-02T16-00_scene-actions';
import * as passwordResets from './2026-12-03T08-00_password-resets';
import * as sceneCountIndex from './2026-12-03T11-30_scene-count-index';
import * as signInThrottle from './2026-12-03T14-00_sign-in-throttle';
import * as sceneCounts from './2026-12-03T14-30_scene-counts';

/**
 * Every migration, by name, in order. A static list (not a folder scan) so the same migrations run under
 * tsx, vitest and the Next server alike. Add new migrations here with a date-prefixed name.
 */
export const migrations: Record<string, Migration> = {
  '2026-12-01T00-00_foundation': foundation,
  '2026-12-01T22-45_scene-uploads': sceneUploads,
  '2026-12-01T23-00_equipment-library': equipmentLibrary,
  '2026-12-02T10-00_sign-in-hardening': signInHardening,
  '2026-12-02T11-00_review-desk': reviewDesk,
  '2026-12-02T12-00_plan-details': planDetails,
  '2026-12-02T13-00_lessons': lessons,
  '2026-12-02T14-00_scene-list': sceneList,
  '2026-12-02T14-30_revision-storage': revisionStorage,
  '2026-12-02T16-00_scene-actions': sceneActions,
  '2026-12-03T08-00_password-resets': passwordResets,
  '2026-12-03T11-30_scene-count-index': sceneCountIndex,
  '2026-12-03T14-00_sign-in-throttle': signInThrottle,
  '2026-12-03T14-30_scene-counts': sceneCounts,
};
