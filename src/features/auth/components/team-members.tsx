import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import type { MemberDto } from '@shared/schemas/auth.schema';
import { Button } from '@/components/ui/button';
import { EmptyState, Notice, QueryView, Skeleton } from '@/components/ui/states';
import { errorMessage } from '@/lib/problem';
import { ROLE_WORDS } from '@/lib/words';
import { membersQuery } from '../api/auth.queries';
import { useRemoveMember } from '../api/use-auth-mutations';

const joined = (iso: string) => new Date(iso).toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });

/** What ending someone's access does, asked before it happens. */
export function removeQuestion(m: Pick<MemberDto, 'name' | 'role'>, workspaceName: string): string {
  const back = m.role === 'client' ? 'Their client profile and plans stay; invite them from their profile to give access back.' : 'Invite them again to give access back.';
  return `Remove ${m.name}'s access to ${workspaceName}? They are signed out and can no longer open it. Their account and what they did (check marks, purchases) stay. ${back}`;
}

/** Everyone with access to the workspace, and "Remove access" for anyone but a coach. */
export function TeamMembers({ workspaceName }: { workspaceName: string }) {
  const list = useQuery(membersQuery());
  const remove = useRemoveMember();
  const [error, setError] = useState<string | null>(null);
  return (
    <QueryView
      query={list}
      loading={<Skeleton className="h-20 w-full" />}
      isEmpty={(data) => data.length === 0}
      empty={<EmptyState title="No one yet">Invite your kitchen assistant below.</EmptyState>}
    >
      {(data) => (
        <div className="flex flex-col gap-3">
          <div className="overflow-x-auto">
            <table className="w-full text-left">
              <thead>
                <tr className="border-b border-line text-sm text-ink-faint">
                  <th className="py-2">Name</th>
                  <th>E-mail</th>
                  <th>Role</th>
                  <th>Joined</th>
                  <th><span className="sr-only">Actions</span></th>
                </tr>
              </thead>
              <tbody>
                {data.map((m) => (
                  <tr key={m.id} className="border-b border-line">
                    <td className="py-2 font-bold">
                      {m.name}
                      {m.you && <span className="font-normal text-ink-soft"> (you)</span>}
                    </td>
                    <td className="break-all">{m.email}</td>
                    <td>
                      {ROLE_WORDS[m.role]}
                      {m.clientName && m.clientName !== m.name && <span className="text-ink-soft"> · profile {m.clientName}</span>}
                    </td>
                    <td className="num">{joined(m.joinedAt)}</td>
                    <td className="text-right">
                      {m.role !== 'coach' && (
                        <Button
                          size="sm"
                          variant="ghost"
                          busy={remove.isPending && remove.variables === m.id}
                          aria-label={`Remove ${m.name}'s access`}
                          onClick={() => {
                            if (!window.confirm(removeQuestion(m, workspaceName))) return;
                            setError(null);
                            remove.mutate(m.id, { onError: (e) => setError(errorMessage(e)) });
                          }}
                        >
                          Remove access
                        </Button>
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {error && (
            <Notice tone="block" title="Access not removed">
              {error}
            </Notice>
          )}
        </div>
      )}
    </QueryView>
  );
}
