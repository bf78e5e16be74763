import { z } from 'zod';
import { emailAddress } from './email';
import { isIsoDate } from '../domain/iso-date';
import { PG_INT_MAX, TOO_LARGE } from './ids';

export const PREP_NOTE_MAX = 1000;
export const PREP_ALSO_TO_MAX = 5;

/** E-mailing a prep day's shopping list and bake run to the workspace's kitchen assistants (all, or those chosen) and other addresses. */
export const sendPrepDaySchema = z.object({
  prepDate: z.string().refine(isIsoDate, { message: 'Give the prep date as YYYY-MM-DD' }),
  note: z.string().trim().max(PREP_NOTE_MAX, { message: `At most ${PREP_NOTE_MAX} characters` }).optional(),
  /** The kitchen assistants (user ids) to send to; absent: every assistant of the workspace. */
  assistantIds: z.array(z.number().int().positive().max(PG_INT_MAX, TOO_LARGE)).max(50).optional(),
  /**
   * Addresses without an account (a kitchen's shared inbox): their papers are in the sender's measures and their
   * e-mail has no link into Trayline.
   */
  alsoTo: z
    .array(emailAddress)
    .max(PREP_ALSO_TO_MAX, { message: `At most ${PREP_ALSO_TO_MAX} addresses` })
    .optional(),
  /** One id per press of "Send" (a UUID the page makes): the same request sent again queues nothing new. */
  requestId: z.uuid({ message: 'requestId must be a UUID' }).optional(),
});
export type SendPrepDayInput = z.input<typeof sendPrepDaySchema>;

export interface PrepDayMailResultDto {
  /** E-mails queued by this request (0 when it repeats an earlier one). */
  queued: number;
  /** Who it went to; `account` is false for an address without an account (its name is the address). */
  recipients: { name: string; email: string; account: boolean }[];
  repeated: boolean;
}
