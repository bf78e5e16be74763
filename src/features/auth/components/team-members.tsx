import { useQuery } from '@tanstack/react-query';
import type { MemberDto } from '@shared/schemas/auth.schema';
import { Button } from '@/components/ui/button';
import { QueryView, Skeleton } from '@/components/ui/states';
import { useRefusal } from '@/components/ui/refusal';
import { ActionList, ActionRow } from '@/components/ui/action-list';
import { ROLE_WORDS } from '@/lib/words';
import { dateWithYearLabel } from '@/lib/dates';
import { membersQuery } from '../api/auth.queries';
import { useChangeMemberRole, useRemoveMember } from '../api/use-auth-mutations';

const joined = dateWithYearLabel;

/** What ending someone's access does, asked before it happens. */
export function removeQuestion(m: Pick<MemberDto, 'name' | 'role'>, workspaceName: string): string {
  const back = m.role === 'client' ? 'Their client profile and plans stay; invite them from their profile to give access back.' : 'Invite them again to give access back.';
  return `Remove ${m.name}'s access to ${workspaceName}? They are signed out and can no longer open it. Their account and what they did (check marks, purchases) stay. ${back}`;
}

/** What a change of role does, asked before it happens. */
export function roleQuestion(m: Pick<MemberDto, 'name' | 'role'>): string {
  return m.role === 'coach'
    ? `Make ${m.name} a kitchen assistant? From their next click they see the kitchen pages only: no client's body measurements, targets or health notes.`
    : `Make ${m.name} a coach? They get everything you have: clients' profiles with health notes, planning, publishing, the team.`;
}

/** Everyone with access to the workspace: a coach or kitchen assistant can change role; anyone but you can be removed. */
export function TeamMembers({ workspaceName }: { workspaceName: string }) {
  const list = useQuery(membersQuery());
  const remove = useRemoveMember();
  const changeRole = useChangeMemberRole();
  const refusal = useRefusal();
  return (
    <QueryView
      query={list}
      // Never empty: the coach asking is on it.
      loading={<Skeleton className="h-20 w-full" />}
    >
      {(data) => (
        <div className="flex flex-col gap-3">
          <ActionList label="People with access">
            {data.map((m) => (
              <ActionRow
                key={m.id}
                title={m.name}
                aside={m.you && 'you'}
                detail={
                  <>
                    <span className="text-ink">{ROLE_WORDS[m.role]}</span>
                    {m.clientName && m.clientName !== m.name && <> · profile {m.clientName}</>} · <span className="break-all">{m.email}</span> · joined{' '}
                    <span className="num">{joined(m.joinedAt)}</span>
                  </>
                }
                actions={
                  !m.you && (
                    <>
                      {m.role !== 'client' && (
                        <Button
                          size="sm"
                          variant="ghost"
                          busy={changeRole.isPending && changeRole.variables?.id === m.id}
                          aria-label={m.role === 'coach' ? `Make ${m.name} a kitchen assistant` : `Make ${m.name} a coach`}
                          onClick={() => {
                            if (!window.confirm(roleQuestion(m))) return;
                            refusal.clear();
                            changeRole.mutate({ id: m.id, role: m.role === 'coach' ? 'assistant' : 'coach' }, { onError: refusal.say('Role not changed') });
                          }}
                        >
                          {m.role === 'coach' ? 'Make kitchen assistant' : 'Make coach'}
                        </Button>
                      )}
                      <Button
                        size="sm"
                        variant="ghost"
                        busy={remove.isPending && remove.variables === m.id}
                        aria-label={`Remove ${m.name}'s access`}
                        onClick={() => {
                          if (!window.confirm(removeQuestion(m, workspaceName))) return;
                          refusal.clear();
                          remove.mutate(m.id, { onError: refusal.say('Access not removed') });
                        }}
                      >
                        Remove access
                      </Button>
                    </>
                  )
                }
              />
            ))}
          </ActionList>
          {refusal.notice}
        </div>
      )}
    </QueryView>
  );
}
