import type { AdvisorPhase, AdvisorResult } from '@/lib/advisor/types';

export type AdvisorWorkerReply =
  | { type: 'progress'; phase: AdvisorPhase; fraction: number }
  | { type: 'done'; result: AdvisorResult }
  | { type: 'error'; message: string };
