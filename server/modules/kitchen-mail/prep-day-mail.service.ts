import type { EntityManager } from '@mikro-orm/postgresql';
import { shortDate, type IsoDate } from '@shared/domain/iso-date.js';
import { prepDatesOf, tripDatesOf, weekTitle } from '@shared/domain/week-board.js';
import type { PrepDayMailResultDto, SendPrepDayInput } from '@shared/schemas/prep-day-mail.schema.js';
import type { Actor } from '../../http/authz.js';
import { Conflict, ValidationError } from '../../http/errors.js';
import { Membership } from '../auth/user.entity.js';
import { Outbox } from '../mail/outbox.entity.js';
import { Workspace } from '../workspaces/workspace.entity.js';
import { findWeek } from '../weeks/week-board.service.js';
import { prepDayMail } from '../mail/mail-templates.js';
import { mailKey, newBatchId, queueMail, requestBatchId, type MailQueue } from '../mail/mail.service.js';
import { plannedBakeRun } from '../bake-runs/bake-run-files.js';
import { PREP_DAY_BAKE_RUN_PDF, PREP_DAY_SHOPPING_PDF, type PrepDayPayload } from './prep-day-mail.js';


/**
 * E-mails a prep day's shopping list and bake run (PDFs rendered when each mail leaves) to every kitchen assistant
 * of the workspace, one e-mail each, queued in one transaction. With a requestId, sending the same request again
 * (a retry, a double click) queues nothing new and answers who it went to.
 */
export async function sendPrepDay(
  em: EntityManager,
  actor: Actor,
  weekId: number,
  input: SendPrepDayInput & { prepDate: IsoDate },
  queue: MailQueue,
  publicUrl: string,
): Promise<PrepDayMailResultDto> {
  const week = await findWeek(em, actor, weekId);
  const prepDates = prepDatesOf(week);
  if (!prepDates.includes(input.prepDate)) {
    throw ValidationError.field('prepDate', `Not a prep day of this week (${prepDates.join(' or ')})`);
  }
  // Papers that cannot be made would fail at send time: say why now (no trays counted, no ovens).
  await plannedBakeRun(em, actor, week.id, input.prepDate);
  const members = await em.find(Membership, { workspace: actor.workspaceId, role: 'assistant' }, { populate: ['user'], orderBy: { id: 'asc' } });
  const recipients = members.map((m) => ({ userId: m.user.id, name: m.user.unwrap().name, email: m.user.unwrap().email }));
  if (!recipients.length) throw new Conflict('No kitchen assistant in this workspace yet: invite one from Team first');
  const note = input.note?.trim() || null;
  const batchId = input.requestId ? requestBatchId(`prep-day|${actor.workspaceId}|${week.id}|${input.requestId}`) : newBatchId();

  return em.transactional(async (tx) => {
    const answer = (queued: number) => ({ queued, recipients: recipients.map(({ name, email }) => ({ name, email })), repeated: queued === 0 });
    if ((await tx.count(Outbox, { workspace: actor.workspaceId, batchId })) > 0) return answer(0);
    const ws = await tx.findOneOrFail(Workspace, actor.workspaceId, { fields: ['name'] });
    // The list the papers print: the trip's in a week with two prep days, else the week's.
    const trip = tripDatesOf(week).includes(input.prepDate) ? `?for=${input.prepDate}` : '';
    const link = `${publicUrl.replace(/\/$/, '')}/weeks/${week.id}/shopping${trip}`;
    for (const r of recipients) {
      const body = prepDayMail({ businessName: ws.name, name: r.name, prepLabel: shortDate(input.prepDate), weekName: weekTitle(week), note, link });
      const payload: PrepDayPayload = { workspaceId: actor.workspaceId, weekId: week.id, prepDate: input.prepDate, userId: r.userId };
      const spec = payload as unknown as Record<string, unknown>;
      await queueMail(tx, queue, {
        workspaceId: actor.workspaceId,
        kind: 'prep-day',
        to: r.email,
        subject: body.subject,
        text: body.text,
        html: body.html,
        weekId: week.id,
        batchId,
        note,
        attachments: [
          { pdf: PREP_DAY_SHOPPING_PDF, payload: spec },
          { pdf: PREP_DAY_BAKE_RUN_PDF, payload: spec },
        ],
        idempotencyKey: mailKey('pd', `${batchId}|${r.userId}`),
      });
    }
    return answer(recipients.length);
  });
}
