import { z } from 'zod';
import { dateSchema, type Page, type PersonRef } from './common.js';

export const outboxStates = ['pending', 'sending', 'sent', 'failed'] as const;
export type OutboxState = (typeof outboxStates)[number];

export const outboxQuerySchema = z.object({
  state: z.enum(outboxStates).optional(),
  page: z.coerce.number().int().min(1).optional(),
});
export type OutboxQuery = z.infer<typeof outboxQuerySchema>;

/** One mail of the outbox, as the desk chief's page shows it (no body: it may hold links). */
export interface OutboxMessageView {
  id: string;
  kind: string;
  to: string;
  subject: string;
  state: OutboxState;
  attempts: number;
  lastError: string | null;
  nextAttemptAt: string;
  sentAt: string | null;
  createdAt: string;
}

export interface OutboxPage extends Page<OutboxMessageView> {
  counts: Record<OutboxState, number>;
}

export const AUDIT_PAGE_SIZE = 50;

export const auditQuerySchema = z.object({
  action: z.string().trim().max(64).optional(),
  entityType: z.string().trim().max(64).optional(),
  actor: z.uuid().optional(),
  claim: z.uuid().optional(),
  from: dateSchema.optional(),
  to: dateSchema.optional(),
  page: z.coerce.number().int().min(1).optional(),
});
export type AuditQuery = z.infer<typeof auditQuerySchema>;

export interface AuditEventView {
  id: string;
  at: string;
  actor: PersonRef | null;
  action: string;
  entityType: string;
  entityId: string;
  claimId: string | null;
  summary: Record<string, unknown>;
}
