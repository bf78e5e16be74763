import type { EntityManager } from '@mikro-orm/postgresql';
import type { MemberDto, Role } from '@shared/schemas/auth.schema.js';
import type { Actor } from '../../http/authz.js';
import { Conflict, NotFound } from '../../http/errors.js';

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
    .sort((a, b) => (ROLE_ORDER[a.role] ?? 9) - (ROLE_ORDER[b.role] ?? 9) || a.name.localeCompare(b.name) || a.id - b.id);
}

/**
 * Ends someone's access to the workspace (a kitchen assistant who left, a client who stopped): their membership goes,
 * and with it every page and API answer of this workspace from their next request on (each request reads the
 * membership with the session). When they belong to no other workspace, their sessions end too. Their account,
 * and what they did (check marks, purchases, sent mail), stay. A coach's access cannot be removed here.
 */
export async function removeMember(em: EntityManager, actor: Actor, id: number): Promise<void> {
  await em.transactional(async (tx) => {
    const conn = tx.getConnection();
    const ctx = tx.getTransactionContext();
    const [row] = await conn.execute<{ user_id: number; role: string }[]>(
      'select user_id, role from membership where id = ? and workspace_id = ? for update',
      [id, actor.workspaceId],
      'all',
      ctx,
    );
    if (!row) throw new NotFound('Member');
    if (row.role === 'coach') throw new Conflict("A coach's access cannot be removed from the Team page");
    await conn.execute('delete from membership where id = ?', [id], 'run', ctx);
    const [left] = await conn.execute<{ n: number }[]>('select count(*)::int as n from membership where user_id = ?', [row.user_id], 'all', ctx);
    if (left.n === 0) {
      await conn.execute(
        `delete from session where (sess->'passport'->>'user') = ?`,
        [String(row.user_id)],
        'run',
        ctx,
      );
    }
  });
}
