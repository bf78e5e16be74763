import { z } from 'zod';
import { isIsoDate } from '../domain/iso-date';

export const PREP_NOTE_MAX = 1000;

/** E-mailing a prep day's shopping list and bake run to the workspace's kitchen assistants. */
export const sendPrepDaySchema = z.object({
  prepDate: z.string().refine(isIsoDate, { message: 'Give the prep date as YYYY-MM-DD' }),
  note: z.string().trim().max(PREP_NOTE_MAX, { message: `At most ${PREP_NOTE_MAX} characters` }).optional(),
  /** One id per press of "Send" (a UUID the page makes): the same request sent again queues nothing new. */
  requestId: z.uuid({ message: 'requestId must be a UUID' }).optional(),
});
export type SendPrepDayInput = z.input<typeof sendPrepDaySchema>;

export interface PrepDayMailResultDto {
  /** E-mails queued by this request (0 when it repeats an earlier one). */
  queued: number;
  recipients: { name: string; email: string }[];
  repeated: boolean;
}
