import type { Check } from '@/lib/lift';
import type { SceneStatus } from '@/lib/domain';
import type { SceneDocument } from '@/lib/scene/schema';
import type { TruckProfileInput } from '@/lib/scene/truck/from-spec';
import type { PlanFigures } from './figures';

/**
 * What the review page gets from the server (lib/server/review-page), as plain data: the revision on review,
 * its stored figures and checks, the last reviewed revision to compare with, the comment threads, and what
 * the viewer may do.
 */

/** A comment as GET /api/scenes/{id}/comments answers it. */
export interface CommentView {
  id: number;
  sceneId: number;
  parentId: number | null;
  revision: number;
  authorId: number;
  authorName: string;
  authorRole: string;
  body: string;
  anchor: { x: number; y: number } | { objectId: string } | null;
  resolved: boolean;
  resolvedAt: string | null;
  resolvedByName: string | null;
  createdAt: string;
}
export interface ThreadView extends CommentView {
  replies: CommentView[];
}

export interface SubmissionView {
  id: number;
  revision: number;
  state: 'pending' | 'approved' | 'returned' | 'withdrawn';
  submittedByName: string;
  submittedAt: string;
  engineVersion: string;
  decidedByName: string | null;
  decidedAt: string | null;
  note: string | null;
  conditions: string | null;
  reason: string | null;
}

export interface ReviewPageData {
  scene: { id: number; title: string; status: SceneStatus; revision: number; ownerId: number; ownerName: string };
  /** The revision on the page: the one awaiting a decision, else the last one submitted, else the latest. */
  revision: number;
  document: SceneDocument;
  /** The submission of that revision (null: never submitted). */
  submission: SubmissionView | null;
  /** The server's figures and checks for it: stored with the submission, or computed now when never submitted. */
  figures: PlanFigures | null;
  checks: Check[];
  problem: string | null;
  /** The last decided submission before it ("what changed since the last review"). */
  previous: { submission: SubmissionView; document: SceneDocument; figures: PlanFigures } | null;
  history: SubmissionView[];
  threads: ThreadView[];
  profiles: TruckProfileInput[];
  /** Why this user may not approve or return, or null when they may (and the plan awaits a decision). */
  decisionRefusal: string | null;
  mayComment: boolean;
}


/** What the editor shows of the review: the status strip, the comment pins and list, and what the viewer may do. */
export interface EditorReviewData {
  status: SceneStatus;
  /** The plan's operator: submit, withdraw, start a new revision. */
  mayManage: boolean;
  mayComment: boolean;
  /** A supervisor or admin of the organisation (links to the review page). */
  reviewer: boolean;
  threads: ThreadView[];
  /** The newest decided submission: who returned or approved which revision, with the note and conditions. */
  lastDecision: { state: 'approved' | 'returned'; revision: number; byName: string | null; at: string | null; note: string | null; conditions: string | null } | null;
}
