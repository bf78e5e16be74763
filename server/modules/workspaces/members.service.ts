import type { EntityManager } from '@mikro-orm/postgresql';
import type { MemberDto, Role } from '@shared/schemas/auth.schema.js';
import { compareNames } from '@shared/domain/words.js';
import type { Actor } from '../../http/authz.js';
import { Conflict, NotFound, ValidationError } from '../../http/errors.js';
import { endSessions } from '../auth/devices.js';

interface MemberRow {
  id: number;
  user_id: number;
  name: string;
  email: string;
  role: string;
  client_id: number | null;
  client_name: string | null;
  created_at: Date;
}

const ROLE_ORDER: Record<string, number> = { coach: 0, assistant: 1, client: 2 };

/** Everyone with access to the actor's workspace: the coach, then kitchen assistants, then clients, each by name. */
export async function listMembers(em: EntityManager, actor: Actor): Promise<MemberDto[]> {
  const rows = await em.getConnection().execute<MemberRow[]>(
    `select m.id, m.user_id, u.name, u.email, m.role, m.client_id, c.name as client_name, m.created_at
       from membership m join app_user u on u.id = m.user_id
       left join client c on c.id = m.client_id and c.workspace_id = m.workspace_id
      where m.workspace_id = ?`,
    [actor.workspaceId],
  );
  return rows
    .map((r) => ({
      id: Number(r.id),
      userId: Number(r.user_id),
      name: r.name,
      email: r.email,
      role: r.role as Role,
      clientId: r.client_id == null ? null : Number(r.client_id),
      clientName: r.client_name ?? null,
      joinedAt: new Date(r.created_at).toISOString(),
      you: Number(r.user_id) === actor.userId,
    }))
    .sort((a, b) => (ROLE_ORDER[a.role] ?? 9) - (ROLE_ORDER[b.role] ?? 9) || compareNames(a.name, b.name) || a.id - b.id);
}

/** The member row of this workspace, locked for the change (404 outside the workspace). */
async function lockMember(conn: ReturnType<EntityManager['getConnection']>, ctx: unknown, workspaceId: number, id: number) {
  const [row] = await conn.execute<{ user_id: number; role: string }[]>(
    'select user_id, role from membership where id = ? and workspace_id = ? for update',
    [id, workspaceId],
    'all',
    ctx as never,
  );
  if (!row) throw new NotFound('Member');
  return { userId: Number(row.user_id), role: row.role as Role };
}

/** How many coaches the workspace has, their rows locked (two coaches demoting each other at once cannot both pass). */
async function lockedCoachCount(conn: ReturnType<EntityManager['getConnection']>, ctx: unknown, workspaceId: number): Promise<number> {
  const rows = await conn.execute<{ id: number }[]>(
    `select id from membership where workspace_id = ? and role = 'coach' order by id for update`,
    [workspaceId],
    'all',
    ctx as never,
  );
  return rows.length;
}

/**
 * Makes a team member a coach or a kitchen assistant. The change applies from their next request (each request reads
 * the membership with the session). A client's access stays tied to their profile; the workspace keeps a coach.
 */
export async function changeMemberRole(em: EntityManager, actor: Actor, id: number, role: 'coach' | 'assistant'): Promise<MemberDto> {
  await em.transactional(async (tx) => {
    const conn = tx.getConnection();
    const ctx = tx.getTransactionContext();
    const coaches = await lockedCoachCount(conn, ctx, actor.workspaceId);
    const row = await lockMember(conn, ctx, actor.workspaceId, id);
    if (row.role === 'client') throw ValidationError.field('role', "A client's access is tied to their client profile: invite them again with another e-mail as a coach or kitchen assistant");
    if (row.role === role) return;
    if (row.role === 'coach' && coaches <= 1) throw new Conflict('The workspace needs a coach: make someone else a coach first');
    await conn.execute('update membership set role = ? where id = ?', [role, id], 'run', ctx);
  });
  const member = (await listMembers(em, actor)).find((m) => m.id === id);
  if (!member) throw new NotFound('Member');
  return member;
}

/**
 * Ends someone's access to the workspace (a kitchen assistant who left, a client who stopped): their membership goes,
 * and with it every page and API answer of this workspace from their next request on (each request reads the
 * membership with the session). When they belong to no other workspace, their sessions end too. Their account,
 * and what they did (check marks, purchases, sent mail), stay. A coach removes another coach, never themselves (so
 * the workspace always keeps one).
 */
export async function removeMember(em: EntityManager, actor: Actor, id: number): Promise<void> {
  await em.transactional(async (tx) => {
    const conn = tx.getConnection();
    const ctx = tx.getTransactionContext();
    const row = await lockMember(conn, ctx, actor.workspaceId, id);
    if (row.userId === actor.userId) throw new Conflict('You cannot remove your own access: another coach of the workspace can');
    await conn.execute('delete from membership where id = ?', [id], 'run', ctx);
    const [left] = await conn.execute<{ n: number }[]>('select count(*)::int as n from membership where user_id = ?', [row.userId], 'all', ctx);
    if (left.n === 0) await endSessions(tx, row.userId);
  });
}
