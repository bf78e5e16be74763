import type { EntityManager } from '@mikro-orm/postgresql';
import { shortDate, type IsoDate } from '@shared/domain/iso-date.js';
import { prepDatesOf, tripDatesOf, weekTitle } from '@shared/domain/week-board.js';
import type { PrepDayMailResultDto, SendPrepDayInput } from '@shared/schemas/prep-day-mail.schema.js';
import { datesOf, type Actor } from '../../http/authz.js';
import { Conflict, ValidationError } from '../../http/errors.js';
import { Membership } from '../auth/user.entity.js';
import { Outbox } from '../mail/outbox.entity.js';
import { Workspace } from '../workspaces/workspace.entity.js';
import { findWeek } from '../weeks/week-board.service.js';
import { prepDayMail } from '../mail/mail-templates.js';
import { appLink, mailKey, newBatchId, queueMail, requestBatchId, type MailQueue } from '../mail/mail.service.js';
import { plannedBakeRun } from '../bake-runs/bake-run-files.js';
import { PREP_DAY_BAKE_RUN_PDF, PREP_DAY_SHOPPING_PDF, type PrepDayPayload } from './prep-day-mail.js';


/** One e-mail of the papers: a member (papers in their measures, a link into Trayline) or an address without an account. */
interface Recipient {
  email: string;
  /** The member's name; null for an address without an account. */
  name: string | null;
  /** Whose measures the papers are in: the member's own, the sender's for an address without an account. */
  readerId: number;
  /** The per-recipient part of the idempotency key. */
  key: string;
}

/** The chosen kitchen assistants (every one when none are named) and the other addresses, each address once. */
async function recipientsOf(em: EntityManager, actor: Actor, input: SendPrepDayInput): Promise<Recipient[]> {
  const members = await em.find(Membership, { workspace: actor.workspaceId, role: 'assistant' }, { populate: ['user'], orderBy: { id: 'asc' } });
  const assistants = new Map(members.map((m) => [m.user.id, m.user.unwrap()]));
  const chosen = input.assistantIds ?? [...assistants.keys()];
  const errors: Record<string, string[]> = {};
  chosen.forEach((id, i) => {
    if (!assistants.has(id)) errors[`assistantIds.${i}`] = ['Not a kitchen assistant of this workspace'];
  });
  if (Object.keys(errors).length) throw new ValidationError(Object.values(errors)[0][0], errors);
  const out: Recipient[] = [];
  const seen = new Set<string>();
  for (const id of chosen) {
    const u = assistants.get(id)!;
    if (seen.has(u.email.toLowerCase())) continue;
    seen.add(u.email.toLowerCase());
    out.push({ email: u.email, name: u.name, readerId: id, key: `u${id}` });
  }
  for (const email of input.alsoTo ?? []) {
    if (seen.has(email)) continue;
    seen.add(email);
    out.push({ email, name: null, readerId: actor.userId, key: `e${email}` });
  }
  if (!out.length) {
    if (input.assistantIds || input.alsoTo) throw ValidationError.field('assistantIds', 'Choose at least one kitchen assistant, or give an e-mail address');
    throw new Conflict('No kitchen assistant in this workspace yet: invite one from Team, or give an e-mail address to send to');
  }
  return out;
}

/**
 * E-mails a prep day's shopping list and bake run (PDFs rendered when each mail leaves) to the chosen kitchen
 * assistants (every one by default) and any other addresses, one e-mail each, queued in one transaction. With a
 * requestId, sending the same request again (a retry, a double click) queues nothing new and answers who it went to.
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
  const recipients = await recipientsOf(em, actor, input);
  const note = input.note?.trim() || null;
  const batchId = input.requestId ? requestBatchId(`prep-day|${actor.workspaceId}|${week.id}|${input.requestId}`) : newBatchId();

  return em.transactional(async (tx) => {
    const answer = (queued: number) => ({
      queued,
      recipients: recipients.map(({ name, email }) => ({ name: name ?? email, email, account: name !== null })),
      repeated: queued === 0,
    });
    if ((await tx.count(Outbox, { workspace: actor.workspaceId, batchId })) > 0) return answer(0);
    const ws = await tx.findOneOrFail(Workspace, actor.workspaceId, { fields: ['name'] });
    // The list the papers print: the trip's in a week with two prep days, else the week's.
    const trip = tripDatesOf(week).includes(input.prepDate) ? `?for=${input.prepDate}` : '';
    const link = appLink(publicUrl, `/weeks/${week.id}/shopping${trip}`);
    for (const r of recipients) {
      const body = prepDayMail({
        businessName: ws.name,
        name: r.name,
        prepLabel: shortDate(input.prepDate, datesOf(actor)),
        weekName: weekTitle(week, datesOf(actor)),
        note,
        // Someone without an account could not open it.
        link: r.name === null ? undefined : link,
      });
      const payload: PrepDayPayload = { workspaceId: actor.workspaceId, weekId: week.id, prepDate: input.prepDate, userId: r.readerId };
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
        idempotencyKey: mailKey('pd', `${batchId}|${r.key}`),
      });
    }
    return answer(recipients.length);
  });
}
