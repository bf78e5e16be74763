import type { EntityManager } from '@mikro-orm/postgresql';
import type { DeliveryLogDto, SendWeekResultDto, SkipReason } from '@shared/schemas/week-mail.schema.js';
import { datesOf, type Actor } from '../../http/authz.js';
import { Conflict, NotFound } from '../../http/errors.js';
import { appLink, mailKey, newBatchId, queueMail, requestBatchId, type MailQueue } from '../mail/mail.service.js';
import { weekPlanMail } from '../mail/mail-templates.js';
import { Outbox } from '../mail/outbox.entity.js';
import { presentOutbox } from '../mail/outbox.service.js';
import { compareIsoDates, dayHeading, longDate, toDateOrder } from '@shared/domain/iso-date.js';
import { compareNames } from '@shared/domain/words.js';
import { Client } from '../clients/client.entity.js';
import { findClient } from '../clients/client.service.js';
import { Workspace } from '../workspaces/workspace.entity.js';
import { Week, WeekPublication } from './week.entity.js';
import { findWeek } from './week-board.service.js';
import { myWeek, withYourList } from './week-publish.service.js';
import { renderPublishedPlan, THAW_REMINDERS_ICS, WEEK_PLAN_PDF, type WeekPlanPayload } from './week-mail.js';
import { thawTasks } from '@shared/domain/eat-by.js';
import { weekTitle } from '@shared/domain/week-board.js';

/** Seconds in which the same send (same week version, note and clients) without a requestId counts as a repeat. */
export const REPEAT_WINDOW_SECONDS = 15;

/** A UUID-shaped id derived from the request (same workspace, week and requestId → same batch). */
export function batchIdFor(workspaceId: number, weekId: number, requestId: string): string {
  return requestBatchId(`week-send|${workspaceId}|${weekId}|${requestId}`);
}

/** One e-mail per (week, publication version, client, batch): queueing it twice queues nothing. */
export function deliveryKey(weekId: number, version: number, clientId: number, batchId: string): string {
  return mailKey('wp', `${weekId}|${version}|${clientId}|${batchId}`);
}

interface Recipient {
  clientId: number;
  name: string;
  email: string;
}

/** A batch for the same week version, note and clients queued in the last few seconds (a double click). */
async function recentSameBatch(em: EntityManager, workspaceId: number, weekId: number, version: number, note: string | null, clientIds: number[]) {
  const rows = await em.getConnection().execute<{ batch_id: string; ids: number[] }[]>(
    `select batch_id, array_agg(client_id order by client_id) as ids from outbox
      where workspace_id = ? and week_id = ? and kind = 'week-plan' and batch_id is not null
        and created_at > now() - (? * interval '1 second')
        and coalesce(note, '') = ? and (attachments -> 0 -> 'payload' ->> 'publicationVersion')::int = ?
      group by batch_id order by max(id) desc`,
    [workspaceId, weekId, REPEAT_WINDOW_SECONDS, note ?? '', version],
    'all',
    em.getTransactionContext(),
  );
  const want = [...clientIds].sort((a, b) => a - b).join(',');
  return rows.find((r) => [...r.ids].map(Number).sort((a, b) => a - b).join(',') === want)?.batch_id ?? null;
}

/**
 * Queues the week's published plan to each chosen client (all on the published board when `clientIds` is
 * missing), in one transaction: an outbox row + send job per client with an e-mail. Only a published week can
 * be sent (409). The same `requestId`, or the same send repeated within a few seconds, answers the same batch.
 */
export async function sendWeek(
  em: EntityManager,
  queue: MailQueue,
  actor: Actor,
  weekId: number,
  input: { clientIds?: number[]; note?: string; requestId?: string; today?: string },
  opts: { publicUrl: string },
): Promise<SendWeekResultDto> {
  const week = await findWeek(em, actor, weekId);
  if (!week.publishedVersion) throw new Conflict('Publish the week before sending it: clients receive the published plan');
  const version = week.publishedVersion;
  const note = input.note?.trim() ? input.note.trim() : null;

  return em.transactional(async (tx) => {
    // One send of a week at a time: the repeat check below then sees the batch the other request committed.
    await tx.getConnection().execute('select pg_advisory_xact_lock(?, ?)', [7301, week.id], 'all', tx.getTransactionContext());
    const pub = await tx.findOneOrFail(WeekPublication, { week: week.id, number: version });
    const onBoard = new Set(Object.entries(pub.snapshot.clients).filter(([, c]) => c.days.length > 0).map(([id]) => Number(id)));
    const wanted = input.clientIds ? [...new Set(input.clientIds)] : [...onBoard];
    const clients = wanted.length ? await tx.find(Client, { workspace: actor.workspaceId, id: { $in: wanted } }, { orderBy: { name: 'asc', id: 'asc' } }) : [];
    const byId = new Map(clients.map((c) => [c.id, c]));
    const skipped: SendWeekResultDto['skipped'] = [];
    const recipients: Recipient[] = [];
    for (const id of wanted) {
      const c = byId.get(id);
      const skip = (reason: SkipReason) => skipped.push({ clientId: id, name: c?.name ?? null, reason });
      if (!c) skip('unknown-client');
      else if (!onBoard.has(id)) skip('not-on-board');
      else if (!c.email?.trim()) skip('no-email');
      else recipients.push({ clientId: id, name: c.name, email: c.email.trim() });
    }
    recipients.sort((a, b) => compareNames(a.name, b.name) || a.clientId - b.clientId);

    const ids = recipients.map((r) => r.clientId);
    const earlier = input.requestId ? null : ids.length ? await recentSameBatch(tx, actor.workspaceId, week.id, version, note, ids) : null;
    const batchId = input.requestId ? batchIdFor(actor.workspaceId, week.id, input.requestId) : (earlier ?? newBatchId());
    const existing = await tx.count(Outbox, { workspace: actor.workspaceId, batchId });
    if (existing > 0 || earlier) {
      return { batchId, queued: existing, publicationVersion: version, skipped, repeated: true };
    }

    const ws = await tx.findOneOrFail(Workspace, actor.workspaceId);
    const order = toDateOrder(ws.dateOrder);
    const weekLabel = longDate(pub.snapshot.startDate, order);
    const link = appLink(opts.publicUrl, '/my-plates');
    const today = input.today;
    for (const r of recipients) {
      const days = pub.snapshot.clients[String(r.clientId)]?.days ?? [];
      // A frozen plate in this client's plan: their thaw reminders go along as a calendar file.
      const thaw = thawTasks(days).length > 0;
      // Plates holding an allergen on the client's list (allowed by the coach, or put on the list since): the PDF says which.
      const onList = withYourList(days, byId.get(r.clientId)?.allergens ?? []).flatMap((d) =>
        d.plates.filter((p) => p.onYourList?.length).map(() => d.date),
      );
      // Sent once the week has begun: how many of those plates are still ahead of the coach's today.
      const allergenPlatesAhead =
        today && onList.some((date) => compareIsoDates(date, today) < 0)
          ? { count: onList.filter((date) => compareIsoDates(date, today) >= 0).length, day: dayHeading(today, order) }
          : undefined;
      const body = weekPlanMail({
        businessName: ws.name,
        clientName: r.name,
        weekLabel,
        note,
        link,
        thawReminders: thaw,
        allergenPlates: onList.length,
        allergenPlatesAhead,
      });
      const payload: WeekPlanPayload = { weekId: week.id, clientId: r.clientId, publicationVersion: version, note };
      const spec = payload as unknown as Record<string, unknown>;
      await queueMail(tx, queue, {
        workspaceId: actor.workspaceId,
        kind: 'week-plan',
        to: r.email,
        subject: body.subject,
        text: body.text,
        html: body.html,
        clientId: r.clientId,
        weekId: week.id,
        batchId,
        note,
        // The plan first (a repeated send is recognised by it), then the thaw reminders when a plate is frozen.
        attachments: [
          { pdf: WEEK_PLAN_PDF, payload: spec },
          ...(thaw ? [{ pdf: THAW_REMINDERS_ICS, payload: spec }] : []),
        ],
        idempotencyKey: deliveryKey(week.id, version, r.clientId, batchId),
      });
    }
    return { batchId, queued: recipients.length, publicationVersion: version, skipped, repeated: false };
  });
}

/** The coach's delivery log of one client: their e-mails, newest first, with the week's name. */
export async function clientDeliveries(em: EntityManager, actor: Actor, clientId: number, limit: number): Promise<DeliveryLogDto> {
  const client = await findClient(em, actor, clientId);
  const rows = await em.find(Outbox, { workspace: actor.workspaceId, clientId: client.id }, { orderBy: { id: 'desc' }, limit });
  const weekIds = [...new Set(rows.map((r) => r.weekId).filter((w): w is number => w != null))];
  const weeks = weekIds.length ? await em.find(Week, { id: { $in: weekIds }, workspace: actor.workspaceId }, { fields: ['id', 'name', 'startDate'] }) : [];
  const names = new Map(weeks.map((w) => [w.id, weekTitle(w, datesOf(actor))]));
  return {
    clientId: client.id,
    items: rows.map((r) => ({ ...presentOutbox(r), weekName: r.weekId != null ? (names.get(r.weekId) ?? null) : null })),
  };
}

/** The coach downloads one client's plan as published (the PDF the e-mail carries). */
export async function coachPlanPdf(em: EntityManager, actor: Actor, weekId: number, clientId: number) {
  const week = await findWeek(em, actor, weekId);
  if (!week.publishedVersion) throw new Conflict('The week is not published yet: the PDF shows the published plan');
  const client = await findClient(em, actor, clientId);
  return renderPublishedPlan(em, { weekId: week.id, clientId: client.id, publicationVersion: week.publishedVersion }, actor.workspaceId);
}

/** A client downloads their own current published week (the one "my plates" shows). */
export async function myPlanPdf(em: EntityManager, actor: Actor, today?: string) {
  if (actor.clientId === null) throw new NotFound('Published week');
  const mine = await myWeek(em, actor, today);
  if (!mine || !mine.days.length) throw new NotFound('Published week');
  return renderPublishedPlan(em, { weekId: mine.weekId, clientId: actor.clientId, publicationVersion: mine.publishedVersion }, actor.workspaceId);
}
