import type { ColumnType, Generated, Insertable, JSONColumnType, Selectable, Updateable } from 'kysely';
import type { RiggingKind, RiggingStatus, Role, SceneStatus } from '@/lib/domain';

/** ISO-8601 UTC text timestamps on both databases (db/dialect.ts): SQLite has no date type, and text sorts correctly. */
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
  /** Raised to end every session of this user at once (sign-out, password change, deactivation). */
  session_version: Generated<number>;
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
  location: string | null;
  notes: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
  deleted_at: string | null;
  /** The status an archived scene had before; unarchiving restores it. */
  archived_from: SceneStatus | null;
}

/** The server's headline figures of one saved revision (lib/server/scene-figures.ts). */
export interface SceneFiguresTable {
  scene_id: number;
  revision: number;
  engine_version: string;
  /** Worst % of tipping over the swing. */
  percent_of_tipping: number | null;
  /** Highest pad ground pressure as % of the allowable. */
  percent_of_bearing: number | null;
  /** Least clearance to a truck part or obstacle, m (negative: the load would strike it). */
  least_clearance: number | null;
  /** Checks beyond the plan's limits. */
  beyond_count: number | null;
  /** Why there is nothing to compute (null when computed). */
  problem: string | null;
  computed_at: string;
}

export interface SceneRevisionTable {
  id: Generated<number>;
  scene_id: number;
  revision: number;
  /** JSON for kept revisions (text on SQLite, UTF-8 bytes in PostgreSQL's bytea); gzip bytes for autosaves (both read back by db/json-columns.ts). */
  document: JSONColumnType<Record<string, unknown>, string | Buffer, string | Buffer>;
  author_id: number;
  /** 1 for a submitted or approved revision: a full snapshot that thinning never removes. */
  kept: Generated<number>;
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

export interface EquipmentProfileVersionTable {
  id: Generated<number>;
  profile_id: number;
  organisation_id: number;
  version: number;
  name: string;
  unit_number: string | null;
  in_service: number;
  spec: JSONColumnType<Record<string, unknown>>;
  /** null for versions written by the seed or the backfill. */
  author_id: number | null;
  created_at: Timestamp;
}

export interface RiggingItemTable {
  id: Generated<number>;
  organisation_id: number;
  tag: string;
  kind: RiggingKind;
  size: string;
  /** metres; null where length does not apply (shackles, hooks). */
  length: number | null;
  /** Rated loads per hitch, kg; null where a hitch does not apply. */
  rating_vertical: number | null;
  rating_choker: number | null;
  rating_basket: number | null;
  /** 'entered' or the id of the built-in table the ratings came from. */
  rating_source: string;
  status: Generated<RiggingStatus>;
  /** Calendar dates, YYYY-MM-DD. */
  last_inspection: string | null;
  next_inspection_due: string | null;
  notes: Generated<string>;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface RiggingInspectionTable {
  id: Generated<number>;
  item_id: number;
  organisation_id: number;
  inspected_on: string;
  inspector_id: number;
  result: 'pass' | 'fail';
  notes: Generated<string>;
  next_due: string | null;
  created_at: Timestamp;
}

export type SubmissionState = 'pending' | 'approved' | 'returned' | 'withdrawn';

/** One submission of a revision for review, with the figures the server computed and the decision on it. */
export interface SceneSubmissionTable {
  id: Generated<number>;
  organisation_id: number;
  scene_id: number;
  revision: number;
  submitted_by: number;
  submitted_at: Timestamp;
  engine_version: string;
  figures: JSONColumnType<Record<string, unknown>>;
  checks: JSONColumnType<unknown[]>;
  state: Generated<SubmissionState>;
  decided_by: number | null;
  decided_at: string | null;
  note: string | null;
  conditions: string | null;
  reason: string | null;
}

export interface SceneCommentTable {
  id: Generated<number>;
  organisation_id: number;
  scene_id: number;
  author_id: number;
  parent_id: number | null;
  revision: number;
  /** Plain text as typed; escaped wherever it is shown. */
  body: string;
  anchor_x: number | null;
  anchor_y: number | null;
  anchor_object_id: string | null;
  resolved_at: string | null;
  resolved_by: number | null;
  created_at: Timestamp;
}

export interface NotificationTable {
  id: Generated<number>;
  organisation_id: number;
  user_id: number;
  scene_id: number | null;
  kind: string;
  message: string;
  link: string;
  read_at: string | null;
  created_at: Timestamp;
}

export interface MailOutboxTable {
  id: Generated<number>;
  organisation_id: number;
  to_user_id: number | null;
  to_address: string;
  subject: string;
  text_body: string;
  html_body: string;
  state: Generated<'pending' | 'sent' | 'failed'>;
  attempts: Generated<number>;
  next_attempt_at: Timestamp;
  last_error: string | null;
  message_id: string | null;
  sent_at: string | null;
  created_at: Timestamp;
}

/** A one-time password-reset link (migrations/2026-12-03T08-00_password-resets.ts). */
export interface PasswordResetTable {
  /** SHA-256 of the token, hex: the token itself is only in the e-mail. */
  token_hash: string;
  organisation_id: number;
  user_id: number;
  /** The admin who sent the link. */
  requested_by: number;
  created_at: string;
  expires_at: string;
  used_at: string | null;
}

/** Live scenes counted per organisation, owner, status and training flag (kept by triggers). */
export interface SceneCountsTable {
  organisation_id: number;
  owner_id: number;
  status: SceneStatus;
  in_training_set: number;
  n: number;
}

/** Wrong-password counts shared by every instance on PostgreSQL (rate-limiter-flexible's store columns). */
export interface SignInThrottleTable {
  /** "signin-account:<e-mail>" or "signin-address:<address>". */
  key: string;
  points: Generated<number>;
  /** When the window ends, ms since the epoch. */
  expire: number | null;
}

export interface ScenePlanDetailsTable {
  id: Generated<number>;
  organisation_id: number;
  scene_id: number;
  /** The scene revision these details were saved with. */
  revision: number;
  details: JSONColumnType<Record<string, unknown>>;
  author_id: number;
  created_at: Timestamp;
}

export interface LessonTable {
  id: Generated<number>;
  organisation_id: number;
  author_id: number;
  title: string;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface LessonStepTable {
  id: Generated<number>;
  lesson_id: number;
  /** 0-based order within the lesson. */
  position: number;
  scene_id: number;
  revision: number;
  notes: Generated<string>;
  question: string | null;
  answer: string | null;
}

export interface Database {
  organisations: OrganisationTable;
  users: UserTable;
  equipment_profiles: EquipmentProfileTable;
  scenes: SceneTable;
  scene_revisions: SceneRevisionTable;
  audit_log: AuditLogTable;
  scene_uploads: SceneUploadTable;
  equipment_profile_versions: EquipmentProfileVersionTable;
  rigging_items: RiggingItemTable;
  rigging_inspections: RiggingInspectionTable;
  scene_submissions: SceneSubmissionTable;
  scene_comments: SceneCommentTable;
  notifications: NotificationTable;
  mail_outbox: MailOutboxTable;
  scene_plan_details: ScenePlanDetailsTable;
  lessons: LessonTable;
  lesson_steps: LessonStepTable;
  scene_figures: SceneFiguresTable;
  password_resets: PasswordResetTable;
  sign_in_throttle: SignInThrottleTable;
  scene_counts: SceneCountsTable;
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
export type EquipmentProfileVersionRow = Selectable<EquipmentProfileVersionTable>;
export type NewEquipmentProfileVersion = Insertable<EquipmentProfileVersionTable>;
export type RiggingItemRow = Selectable<RiggingItemTable>;
export type NewRiggingItem = Insertable<RiggingItemTable>;
export type RiggingItemUpdate = Updateable<RiggingItemTable>;
export type RiggingInspectionRow = Selectable<RiggingInspectionTable>;
export type NewRiggingInspection = Insertable<RiggingInspectionTable>;
export type SceneSubmissionRow = Selectable<SceneSubmissionTable>;
export type SceneCommentRow = Selectable<SceneCommentTable>;
export type NotificationRow = Selectable<NotificationTable>;
export type MailOutboxRow = Selectable<MailOutboxTable>;
export type ScenePlanDetailsRow = Selectable<ScenePlanDetailsTable>;
export type LessonRow = Selectable<LessonTable>;
export type LessonStepRow = Selectable<LessonStepTable>;
