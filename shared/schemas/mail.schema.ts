import { z } from 'zod';
import { PG_INT_MAX, TOO_LARGE } from './ids';

export const MAIL_KINDS = ['invitation', 'password-reset', 'password-changed', 'week-plan', 'shopping-list', 'bake-run', 'prep-day', 'cooling-record', 'cooling-missed'] as const;
export type MailKind = (typeof MAIL_KINDS)[number];

export const OUTBOX_STATUSES = ['queued', 'sending', 'sent', 'failed', 'retrying'] as const;
export type OutboxStatus = (typeof OUTBOX_STATUSES)[number];

const id = z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE);

export const outboxListQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
  status: z.enum(OUTBOX_STATUSES).optional(),
  kind: z.enum(MAIL_KINDS).optional(),
  /** The delivery log of one client. */
  clientId: id.optional(),
  batchId: z.uuid().optional(),
});
export type OutboxListQuery = z.infer<typeof outboxListQuerySchema>;

export const outboxIdParamsSchema = z.object({ id });
export const devMailIdParamsSchema = z.object({ id });
export const devMailAttachmentParamsSchema = z.object({ id, index: z.coerce.number().int().min(0) });
export const devMailListQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});

export interface OutboxItemDto {
  id: number;
  kind: MailKind;
  to: string;
  subject: string;
  status: OutboxStatus;
  attempts: number;
  lastError: string | null;
  clientId: number | null;
  weekId: number | null;
  batchId: string | null;
  note: string | null;
  /** Names of the PDFs the job renders at send time. */
  attachments: string[];
  createdAt: string;
  sentAt: string | null;
}

export type OutboxCounts = Record<OutboxStatus, number>;

export interface OutboxBatchDto {
  batchId: string;
  total: number;
  sent: number;
  failed: number;
  /** queued + sending + retrying */
  pending: number;
  createdAt: string;
}

export interface OutboxPageDto {
  items: OutboxItemDto[];
  total: number;
  page: number;
  pageSize: number;
  /** Counts by status over the whole (filtered) outbox, not just this page. */
  counts: OutboxCounts;
  /** The most recent batches (a send to many clients), newest first, for progress bars. */
  batches: OutboxBatchDto[];
  /** Whether the dev mail page (what the local catcher caught) is on. */
  devMailView?: boolean;
}

export interface CaughtMailSummaryDto {
  id: number;
  receivedAt: string;
  messageId: string | null;
  from: string;
  to: string;
  subject: string;
  attachments: { index: number; filename: string; contentType: string; size: number }[];
}

export interface CaughtMailDto extends CaughtMailSummaryDto {
  text: string | null;
  html: string | null;
}

export interface CaughtMailPageDto {
  items: CaughtMailSummaryDto[];
  total: number;
  page: number;
  pageSize: number;
}
