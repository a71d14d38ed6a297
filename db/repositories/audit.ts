import type { Kysely } from 'kysely';
import type { Database } from '../schema';

export interface AuditEntry {
  organisationId: number;
  userId: number;
  sceneId?: number | null;
  action: string;
  detail?: Record<string, unknown>;
}

export function recordAudit(db: Kysely<Database>, e: AuditEntry) {
  return db
    .insertInto('audit_log')
    .values({
      organisation_id: e.organisationId,
      user_id: e.userId,
      scene_id: e.sceneId ?? null,
      action: e.action,
      detail: e.detail ? JSON.stringify(e.detail) : null,
      created_at: new Date().toISOString(),
    })
    .execute();
}

export function listSceneAudit(db: Kysely<Database>, organisationId: number, sceneId: number) {
  return db
    .selectFrom('audit_log')
    .innerJoin('users', 'users.id', 'audit_log.user_id')
    .select(['audit_log.id', 'audit_log.action', 'audit_log.detail', 'audit_log.created_at', 'users.name as user_name'])
    .where('audit_log.organisation_id', '=', organisationId)
    .where('audit_log.scene_id', '=', sceneId)
    .orderBy('audit_log.id', 'desc')
    .execute();
}
