import type { ColumnType, Generated, Insertable, JSONColumnType, Selectable, Updateable } from 'kysely';

export type Role = 'operator' | 'supervisor' | 'trainer' | 'admin';
export const ROLES: readonly Role[] = ['operator', 'supervisor', 'trainer', 'admin'] as const;

export type SceneStatus = 'draft' | 'submitted' | 'approved' | 'rejected' | 'archived';
export const SCENE_STATUSES: readonly SceneStatus[] = ['draft', 'submitted', 'approved', 'rejected', 'archived'] as const;

/** ISO-8601 text timestamps: SQLite has no date type, and text sorts correctly. */
type Timestamp = ColumnType<string, string | undefined, string>;

export interface OrganisationTable {
  id: Generated<number>;
  name: string;
  slug: string;
  created_at: Timestamp;
}

export interface UserTable {
  id: Generated<number>;
  organisation_id: number;
  email: string;
  name: string;
  password_hash: string;
  role: Role;
  /** 'imperial' (ft-in, lb) is the default; 'metric' is the user setting. */
  units: Generated<'imperial' | 'metric'>;
  active: Generated<number>;
  created_at: Timestamp;
}

export interface EquipmentProfileTable {
  id: Generated<number>;
  organisation_id: number;
  kind: string;
  name: string;
  unit_number: string | null;
  in_service: Generated<number>;
  /** Free-form JSON until the equipment library defines its schema. */
  spec: JSONColumnType<Record<string, unknown>>;
  version: Generated<number>;
  retired_at: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface SceneTable {
  id: Generated<number>;
  organisation_id: number;
  owner_id: number;
  title: string;
  status: Generated<SceneStatus>;
  document: JSONColumnType<Record<string, unknown>>;
  revision: Generated<number>;
  equipment_profile_id: number | null;
  equipment_profile_version: number | null;
  in_training_set: Generated<number>;
  created_at: Timestamp;
  updated_at: Timestamp;
  deleted_at: string | null;
}

export interface SceneRevisionTable {
  id: Generated<number>;
  scene_id: number;
  revision: number;
  document: JSONColumnType<Record<string, unknown>>;
  author_id: number;
  created_at: Timestamp;
}

export interface AuditLogTable {
  id: Generated<number>;
  organisation_id: number;
  user_id: number;
  scene_id: number | null;
  action: string;
  detail: JSONColumnType<Record<string, unknown>> | null;
  created_at: Timestamp;
}

export interface SceneUploadTable {
  id: Generated<number>;
  organisation_id: number;
  scene_id: number;
  /** Opaque key from lib/storage.ts; never a path. */
  storage_key: string;
  mime: 'image/png' | 'image/jpeg' | 'image/webp';
  bytes: number;
  width: number | null;
  height: number | null;
  uploader_id: number;
  created_at: Timestamp;
}

export interface Database {
  organisations: OrganisationTable;
  users: UserTable;
  equipment_profiles: EquipmentProfileTable;
  scenes: SceneTable;
  scene_revisions: SceneRevisionTable;
  audit_log: AuditLogTable;
  scene_uploads: SceneUploadTable;
}

export type Organisation = Selectable<OrganisationTable>;
export type UserRow = Selectable<UserTable>;
export type NewUser = Insertable<UserTable>;
export type UserUpdate = Updateable<UserTable>;
export type EquipmentProfileRow = Selectable<EquipmentProfileTable>;
export type NewEquipmentProfile = Insertable<EquipmentProfileTable>;
export type SceneRow = Selectable<SceneTable>;
export type NewScene = Insertable<SceneTable>;
export type SceneUpdate = Updateable<SceneTable>;
export type SceneRevisionRow = Selectable<SceneRevisionTable>;
export type AuditLogRow = Selectable<AuditLogTable>;
export type SceneUploadRow = Selectable<SceneUploadTable>;
export type NewSceneUpload = Insertable<SceneUploadTable>;
