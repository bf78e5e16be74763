import { z } from 'zod';
import type { OutboxItemDto } from './mail.schema';
import { PG_INT_MAX, TOO_LARGE } from './ids';
import { isoDate } from './weeks.schema';

/** Sending a published prep week to clients (e-mail with the week-plan PDF) and the delivery log. */

const id = z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE);

export const weekSendParams = z.object({ weekId: id });
export const weekClientPlanParams = z.object({ weekId: id, clientId: id });
export const clientDeliveriesParams = z.object({ clientId: id });


export const NOTE_MAX = 1000;

export const sendWeekSchema = z.object({
  /** Omitted: every client on the published board that has an e-mail. */
  clientIds: z.array(z.number().int().positive().max(PG_INT_MAX, TOO_LARGE)).min(1).max(500).optional(),
  /** The coach's personal note, in the e-mail and on the PDF. */
  note: z.string().trim().max(NOTE_MAX, { message: `At most ${NOTE_MAX} characters` }).optional(),
  /**
   * One id per press of "Send" (a UUID the page makes): the same request sent again (a retry, a double click)
   * answers the same batch and queues nothing new.
   */
  requestId: z.uuid().optional(),
  /**
   * The coach's today (their device's date): sent mid-week, the e-mail says how many of the plates holding an
   * allergen on the client's list are still ahead.
   */
  today: isoDate.optional(),
});
export type SendWeekInput = z.input<typeof sendWeekSchema>;

export const SKIP_REASONS = ['no-email', 'not-on-board', 'unknown-client'] as const;
export type SkipReason = (typeof SKIP_REASONS)[number];

export const SKIP_REASON_TEXT: Record<SkipReason, string> = {
  'no-email': 'No e-mail address on the client profile',
  'not-on-board': 'No plates for this client in the published week',
  'unknown-client': 'Not a client of this workspace',
};

export interface SendWeekResultDto {
  batchId: string;
  /** E-mails in the batch for this request (one per client). */
  queued: number;
  /** The week's published version the e-mails carry. */
  publicationVersion: number;
  skipped: { clientId: number; name: string | null; reason: SkipReason }[];
  /** True when this answered an earlier identical request (nothing new was queued). */
  repeated: boolean;
}

export interface DeliveryLogDto {
  clientId: number;
  items: (OutboxItemDto & { weekName: string | null })[];
}

export const deliveriesQuerySchema = z.object({ limit: z.coerce.number().int().min(1).max(200).default(50) });
