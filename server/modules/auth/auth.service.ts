import { randomUUID } from 'node:crypto';
import { toDateOrder } from '@shared/domain/iso-date.js';
import { toClockStyle } from '@shared/domain/clock.js';
import { canonicalTimeZone } from '@shared/domain/time-zone.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import { clockOf, datesOf, type Actor } from '../../http/authz.js';
import { preparedRows } from '../../db/prepared.js';
import { BadCredentials, Conflict, NotFound, ValidationError } from '../../http/errors.js';
import type {
  AcceptInvitationInput,
  ChangePasswordInput,
  CreateInvitationInput,
  InviteClientsResultDto,
  InviteSkipReason,
  MeDto,
  MyWorkspaceDto,
  PasswordChangedDto,
  RegisterInput,
  Role,
  UpdatePreferencesInput,
} from '@shared/schemas/auth.schema.js';
import { Workspace } from '../workspaces/workspace.entity.js';
import { loadClients } from '../clients/client.service.js';
import { Invitation, Membership, PasswordReset, User, type IUser } from './user.entity.js';
import { Client } from '../clients/client.entity.js';
import { LockMode } from '@mikro-orm/core';
import { burnVerify, hashPassword, verifyPassword } from './passwords.js';
import { hashToken, newToken } from './tokens.js';
import { endSessions } from './devices.js';
import { appLink, queueMail, RESET_QUEUE, type MailQueue, type ResetJobData } from '../mail/mail.service.js';
import { Outbox } from '../mail/outbox.entity.js';
import { invitationMail, passwordChangedMail, passwordResetMail } from '../mail/mail-templates.js';
import { toTempScale } from '@shared/domain/temperature.js';

const INVITATION_DAYS = 14;
const PASSWORD_RESET_MINUTES = 60;

/**
 * The actor of a user: the membership of the workspace the session chose (someone who works for two coaches picks
 * one), else of the one they chose last (a new sign-in), else their first, decides workspace and role; a workspace
 * they have left since falls through to the next. Every authenticated request needs it, so it is one plain SQL join
 * read straight into the Actor (no entities hydrated into the identity map); the session store reads it in the same
 * query as the session (session-store.ts).
 */
export const ACTOR_SQL = (userIdExpr: string, workspaceIdExpr = 'null::int') =>
  `select u.id as user_id, u.email, u.name, u.unit_system, u.temp_unit, m.role, m.workspace_id, m.client_id, ns.version::text as nutrition_version, w.date_order, w.clock
     from membership m join app_user u on u.id = m.user_id join workspace w on w.id = m.workspace_id left join nutrition_stamp ns on ns.workspace_id = m.workspace_id
    where m.user_id = ${userIdExpr}
    order by coalesce(m.workspace_id = ${workspaceIdExpr}, false) desc, coalesce(m.workspace_id = u.last_workspace_id, false) desc, m.id asc
    limit 1`;

export interface ActorRow {
  user_id: number;
  email: string;
  name: string;
  unit_system: string;
  temp_unit: string;
  role: string;
  workspace_id: number;
  client_id: number | null;
  nutrition_version: string | null;
  date_order: string;
  clock: string;
}

export function actorFromRow(m: ActorRow): Actor {
  return {
    userId: Number(m.user_id),
    email: m.email,
    name: m.name,
    unitSystem: m.unit_system === 'metric' ? 'metric' : 'us',
    tempScale: toTempScale(m.temp_unit),
    role: m.role as Role,
    workspaceId: Number(m.workspace_id),
    clientId: m.client_id == null ? null : Number(m.client_id),
    nutritionVersion: m.nutrition_version ?? null,
    dateOrder: toDateOrder(m.date_order),
    clock: toClockStyle(m.clock),
  };
}

export async function loadActor(em: EntityManager, userId: number, workspaceId?: number | null): Promise<Actor | null> {
  if (!Number.isSafeInteger(userId)) return null;
  const chosen = workspaceId != null && Number.isSafeInteger(workspaceId) ? workspaceId : null;
  const rows = await em.getConnection().execute<ActorRow[]>(ACTOR_SQL('?', '?::int'), [userId, chosen], 'all', em.getTransactionContext());
  return rows[0] ? actorFromRow(rows[0]) : null;
}

/** Every workspace the person belongs to, by name, with their role there and which one this session works in. */
export async function listMyWorkspaces(em: EntityManager, actor: Actor): Promise<MyWorkspaceDto[]> {
  const rows = await em.getConnection().execute<{ workspace_id: number; name: string; role: string; is_demo: boolean }[]>(
    `select m.workspace_id, w.name, m.role, w.is_demo from membership m join workspace w on w.id = m.workspace_id
      where m.user_id = ? order by w.name asc, m.workspace_id asc`,
    [actor.userId],
    'all',
    em.getTransactionContext(),
  );
  return rows.map((r) => ({
    workspaceId: Number(r.workspace_id),
    name: r.name,
    role: r.role as Role,
    isDemo: r.is_demo,
    current: Number(r.workspace_id) === actor.workspaceId,
  }));
}

/**
 * The actor in another of the person's workspaces, remembered as their last choice (their next sign-in works there);
 * a workspace they do not belong to is a 400 naming the field, and nothing is remembered.
 */
export async function actorIn(em: EntityManager, actor: Actor, workspaceId: number): Promise<Actor> {
  const next = await loadActor(em, actor.userId, workspaceId);
  if (!next || next.workspaceId !== workspaceId) throw ValidationError.field('workspaceId', 'You are not a member of that workspace');
  await em.getConnection().execute('update app_user set last_workspace_id = ? where id = ?', [workspaceId, actor.userId], 'run', em.getTransactionContext());
  return next;
}

/**
 * The signed-in person and their workspace: one prepared statement (every page load of the app asks for it).
 * `staysSignedIn` is the session's own (kept signed in at sign-in, or until the browser closes).
 */
export async function me(em: EntityManager, actor: Actor, staysSignedIn: boolean): Promise<MeDto> {
  const [row] = await preparedRows<{
    id: number;
    email: string;
    name: string;
    unitSystem: string;
    tempUnit: string;
    workspaceName: string;
    workspaceIsDemo: boolean;
    timeZone: string | null;
  }>(
    em,
    'trayline_me',
    `select u.id, u.email, u.name, u.unit_system as "unitSystem", u.temp_unit as "tempUnit", w.name as "workspaceName", w.is_demo as "workspaceIsDemo",
            w.time_zone as "timeZone"
       from app_user u, workspace w where u.id = $1 and w.id = $2`,
    [actor.userId, actor.workspaceId],
  );
  if (!row) throw new NotFound('User');
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    role: actor.role,
    workspaceId: actor.workspaceId,
    workspaceName: row.workspaceName,
    workspaceIsDemo: row.workspaceIsDemo,
    clientId: actor.clientId,
    unitSystem: row.unitSystem as MeDto['unitSystem'],
    tempUnit: row.tempUnit as MeDto['tempUnit'],
    // Read with the session (the actor statement), like the role.
    dateOrder: datesOf(actor),
    clock: clockOf(actor),
    timeZone: row.timeZone ?? null,
    staysSignedIn,
  };
}

/** Checks e-mail and password; the same answer for an unknown e-mail and a wrong password. */
export async function checkCredentials(em: EntityManager, email: string, password: string): Promise<number> {
  const user = await em.findOne(User, { email });
  if (!user) {
    await burnVerify(password);
    throw new BadCredentials();
  }
  if (!(await verifyPassword(user.passwordHash, password))) throw new BadCredentials();
  return user.id;
}

export async function register(em: EntityManager, input: RegisterInput): Promise<number> {
  const passwordHash = await hashPassword(input.password);
  return em.transactional(async (tx) => {
    if (await tx.count(User, { email: input.email })) {
      throw new ValidationError('An account with this e-mail already exists', {
        email: ['An account with this e-mail already exists; sign in instead'],
      });
    }
    const ws = tx.create(Workspace, { name: input.businessName, ...(input.dateOrder ? { dateOrder: input.dateOrder } : {}),
      ...(input.clock ? { clock: input.clock } : {}),
      timeZone: input.timeZone ? canonicalTimeZone(input.timeZone) : null,
    });
    const user = tx.create(User, { email: input.email, name: input.name, passwordHash });
    tx.create(Membership, { user, workspace: ws, role: 'coach' });
    await tx.flush();
    return user.id;
  });
}

export async function createInvitation(
  em: EntityManager,
  actor: Actor,
  input: CreateInvitationInput,
  publicUrl: string,
  mail: MailQueue,
) {
  if (input.clientId !== undefined) {
    // The client profile must be one of this workspace's (another workspace's id reads as unknown).
    if (input.role !== 'client') throw ValidationError.field('clientId', 'Only a client invitation links a client profile');
    const [client] = await loadClients(em, actor.workspaceId, [input.clientId]);
    if (!client) throw ValidationError.field('clientId', 'No such client in your workspace');
    if (client.archivedAt) throw ValidationError.field('clientId', `${client.name} is archived: restore them before inviting them`);
  }
  const existing = await em.findOne(Membership, { workspace: actor.workspaceId, user: { email: input.email } });
  if (existing) {
    throw new ValidationError('Already a member', { email: ['This person is already a member of your workspace'] });
  }
  // The invitation and its e-mail (outbox row + send job) are committed together or not at all.
  return em.transactional(async (tx) => {
    const ws = await tx.findOneOrFail(Workspace, actor.workspaceId);
    return queueInvitation(tx, actor, ws.name, { email: input.email, role: input.role, clientId: input.clientId ?? null }, publicUrl, mail);
  });
}

/** One invitation and its e-mail, in the caller's transaction. */
async function queueInvitation(
  tx: EntityManager,
  actor: Actor,
  workspaceName: string,
  to: { email: string; role: CreateInvitationInput['role']; clientId: number | null },
  publicUrl: string,
  mail: MailQueue,
  batchId?: string,
) {
  const { token, hash } = newToken();
  const link = appLink(publicUrl, `/invite/${token}`);
  const invitation = tx.create(Invitation, {
    workspace: actor.workspaceId,
    email: to.email,
    role: to.role,
    clientId: to.clientId,
    tokenHash: hash,
    expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000),
    invitedBy: actor.userId,
  });
  // Written with its e-mail's outbox row (queueMail flushes both): one round trip per invitation, not two.
  const body = invitationMail({ workspaceName, inviterName: actor.name, role: to.role, link, days: INVITATION_DAYS });
  await queueMail(tx, mail, { workspaceId: actor.workspaceId, kind: 'invitation', to: to.email, ...body, clientId: to.clientId, batchId });
  return { invitation, link };
}

/**
 * Invites client profiles at once, each at the e-mail on their profile (after an import, say). In one transaction,
 * with the profiles locked, so two presses at once send one invitation each: a client who is archived, has no
 * e-mail, has joined, has an invitation still open, or whose e-mail is already a member's is skipped and said why.
 * An id that is not one of the workspace's clients is a 400 naming `clientIds` (nothing sent).
 */
export async function inviteClients(em: EntityManager, actor: Actor, clientIds: number[], publicUrl: string, mail: MailQueue): Promise<InviteClientsResultDto> {
  const ids = [...new Set(clientIds)];
  return em.transactional(async (tx) => {
    const clients = await tx.find(Client, { id: { $in: ids }, workspace: actor.workspaceId }, { lockMode: LockMode.PESSIMISTIC_WRITE, orderBy: { name: 'asc', id: 'asc' } });
    if (clients.length !== ids.length) {
      const known = new Set(clients.map((c) => c.id));
      throw ValidationError.field('clientIds', `No such client in your workspace: ${ids.filter((id) => !known.has(id)).join(', ')}`);
    }
    // One after another: a transaction is one connection.
    const joined = await tx.find(Membership, { workspace: actor.workspaceId, clientId: { $in: ids } });
    const open = await tx.find(Invitation, { workspace: actor.workspaceId, clientId: { $in: ids }, acceptedAt: null, expiresAt: { $gt: new Date() } });
    const emails = clients.flatMap((c) => (c.email ? [c.email] : []));
    const members = await tx.find(Membership, { workspace: actor.workspaceId, user: { email: { $in: emails } } }, { populate: ['user'] });
    const joinedIds = new Set(joined.map((m) => m.clientId));
    const invitedIds = new Set(open.map((i) => i.clientId));
    const memberEmails = new Set(members.map((m) => m.user.unwrap().email.toLowerCase()));
    const result: InviteClientsResultDto = { invited: [], skipped: [], batchId: null };
    const ws = await tx.findOneOrFail(Workspace, actor.workspaceId);
    for (const c of clients) {
      const reason: InviteSkipReason | null = c.archivedAt
        ? 'archived'
        : !c.email
          ? 'no-email'
          : joinedIds.has(c.id)
            ? 'joined'
            : invitedIds.has(c.id)
              ? 'invited'
              : memberEmails.has(c.email.toLowerCase())
                ? 'member'
                : null;
      if (reason) {
        result.skipped.push({ clientId: c.id, name: c.name, reason });
        continue;
      }
      result.batchId ??= randomUUID();
      await queueInvitation(tx, actor, ws.name, { email: c.email!, role: 'client', clientId: c.id }, publicUrl, mail, result.batchId);
      result.invited.push({ clientId: c.id, name: c.name, email: c.email! });
    }
    return result;
  });
}

export async function listInvitations(em: EntityManager, actor: Actor) {
  return em.find(Invitation, { workspace: actor.workspaceId }, { orderBy: { id: 'desc' } });
}

export async function revokeInvitation(em: EntityManager, actor: Actor, id: number) {
  const inv = await em.findOne(Invitation, { id, workspace: actor.workspaceId });
  if (!inv) throw new NotFound('Invitation');
  if (inv.acceptedAt) throw new Conflict('This invitation was already accepted');
  await em.removeAndFlush(inv);
}

async function openInvitation(em: EntityManager, token: string) {
  const inv = await em.findOne(Invitation, { tokenHash: hashToken(token) }, { populate: ['workspace'] });
  if (!inv || inv.acceptedAt || inv.expiresAt.getTime() < Date.now()) {
    throw new NotFound('Invitation (it may have expired or been used)');
  }
  return inv;
}

export async function peekInvitation(em: EntityManager, token: string) {
  const inv = await openInvitation(em, token);
  return { email: inv.email, role: inv.role as Role, workspaceName: inv.workspace.unwrap().name };
}

/** Joins the invitation's workspace (a new account, or an existing one with its password): the user and that workspace. */
export async function acceptInvitation(em: EntityManager, token: string, input: AcceptInvitationInput): Promise<{ userId: number; workspaceId: number }> {
  return em.transactional(async (tx) => {
    const inv = await openInvitation(tx, token);
    let user: IUser | null = await tx.findOne(User, { email: inv.email });
    if (user) {
      // An existing account joins with its own password.
      if (!(await verifyPassword(user.passwordHash, input.password))) {
        throw new ValidationError('Wrong password', {
          password: ['This e-mail already has an account: enter its password to join'],
        });
      }
    } else {
      user = tx.create(User, { email: inv.email, name: input.name, passwordHash: await hashPassword(input.password) });
    }
    tx.create(Membership, { user, workspace: inv.workspace, role: inv.role, clientId: inv.clientId ?? null });
    // Their next sign-in works in the workspace they just joined (they choose another from the menu).
    user.lastWorkspaceId = inv.workspace.id;
    inv.acceptedAt = new Date();
    await tx.flush();
    return { userId: user.id, workspaceId: inv.workspace.id };
  });
}

/**
 * A new password, and every other device signed in as this person signed out in the same transaction (OWASP ASVS
 * 4.0.3 V3.3.3, cited from memory: after a password change the other sessions can end; here they always do). How
 * many were.
 */
export async function changePassword(
  em: EntityManager,
  actor: Actor,
  input: ChangePasswordInput,
  current: { sid: string; device: string | null },
  notify: PasswordNotice,
): Promise<PasswordChangedDto> {
  const user = await em.findOneOrFail(User, actor.userId);
  if (!(await verifyPassword(user.passwordHash, input.currentPassword))) {
    throw new ValidationError('Wrong password', { currentPassword: ['Your current password is not right'] });
  }
  const passwordHash = await hashPassword(input.newPassword);
  return em.transactional(async (tx) => {
    const again = await tx.findOneOrFail(User, actor.userId);
    again.passwordHash = passwordHash;
    await tx.flush();
    const otherDevicesSignedOut = await endSessions(tx, actor.userId, current.sid);
    await queuePasswordChanged(tx, notify, again.email, { device: current.device, how: 'settings', signedOut: otherDevicesSignedOut });
    return { otherDevicesSignedOut };
  });
}

/** Where the "password changed" e-mail goes out from: the mail queue and the app's public address for its link. */
export interface PasswordNotice {
  mail: MailQueue;
  publicUrl: string;
}

/**
 * Tells the account's owner by e-mail that its password changed (OWASP ASVS 4.0.3 V2.5.5, cited from memory: the user is notified when
 * an authentication factor changes), in the transaction of the change: no mail for a change rolled back.
 */
async function queuePasswordChanged(
  tx: EntityManager,
  notify: PasswordNotice,
  email: string,
  what: { device: string | null; how: 'settings' | 'reset'; signedOut: number | 'all' },
): Promise<void> {
  await queueMail(tx, notify.mail, {
    workspaceId: null,
    kind: 'password-changed',
    to: email,
    idempotencyKey: `password-changed:${randomUUID()}`,
    ...passwordChangedMail({ email, ...what, forgotLink: appLink(notify.publicUrl, '/forgot-password') }),
  });
}

export async function updatePreferences(em: EntityManager, actor: Actor, input: UpdatePreferencesInput) {
  const user = await em.findOneOrFail(User, actor.userId);
  if (input.unitSystem) user.unitSystem = input.unitSystem;
  if (input.tempUnit) user.tempUnit = input.tempUnit;
  await em.flush();
}

/**
 * Password reset, step 1 (the request): queues `{ email }` for the mail worker and nothing else, whatever the e-mail,
 * so neither the answer nor its timing tells whether the e-mail has an account (the worker does the lookup).
 */
export async function requestPasswordReset(email: string, mail: MailQueue): Promise<void> {
  const data: ResetJobData = { email };
  const id = await mail.boss.send(RESET_QUEUE, data, mail.jobOptions);
  if (!id) throw new Error(`The ${RESET_QUEUE} queue does not exist: start pg-boss (startMail) before asking for resets`);
}

/**
 * Password reset, step 1 (the worker's job): for a known e-mail, a one-time token (stored hashed, valid 60 minutes)
 * and an e-mail with the link; an unknown e-mail gets nothing. The outbox row has no workspace: no coach sees reset
 * mail (its link would let them take over the account). Idempotent per job: a retried job whose e-mail was already
 * queued does nothing.
 */
export async function issuePasswordReset(em: EntityManager, email: string, publicUrl: string, mail: MailQueue, jobId: string): Promise<void> {
  const user = await em.findOne(User, { email });
  if (!user) return;
  const idempotencyKey = `password-reset:${jobId}`;
  await em.transactional(async (tx) => {
    if (await tx.findOne(Outbox, { idempotencyKey }, { fields: ['id'] })) return;
    const { token, hash } = newToken();
    tx.create(PasswordReset, {
      user: user.id,
      tokenHash: hash,
      expiresAt: new Date(Date.now() + PASSWORD_RESET_MINUTES * 60_000),
    });
    await tx.flush();
    const link = appLink(publicUrl, `/reset-password/${token}`);
    await queueMail(tx, mail, {
      workspaceId: null,
      kind: 'password-reset',
      to: user.email,
      idempotencyKey,
      ...passwordResetMail({ link, minutes: PASSWORD_RESET_MINUTES }),
    });
  });
}

/**
 * Password reset, step 2: a valid, unused, unexpired token sets the new password, uses up every open reset of
 * the account and ends the account's sessions (whoever was signed in must sign in again).
 */
export async function confirmPasswordReset(em: EntityManager, token: string, newPassword: string, notify: PasswordNotice): Promise<void> {
  const passwordHash = await hashPassword(newPassword);
  await em.transactional(async (tx) => {
    const reset = await tx.findOne(PasswordReset, { tokenHash: hashToken(token) });
    if (!reset || reset.usedAt || reset.expiresAt.getTime() < Date.now()) {
      throw new ValidationError('This reset link has expired or was already used', {
        token: ['This reset link has expired or was already used; ask for a new one'],
      });
    }
    const user = await tx.findOneOrFail(User, reset.user.id);
    user.passwordHash = passwordHash;
    const now = new Date();
    const open = await tx.find(PasswordReset, { user: user.id, usedAt: null });
    for (const r of open) r.usedAt = now;
    await tx.flush();
    await endSessions(tx, user.id);
    await queuePasswordChanged(tx, notify, user.email, { device: null, how: 'reset', signedOut: 'all' });
  });
}
