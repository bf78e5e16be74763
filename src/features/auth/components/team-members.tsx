import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import type { MemberDto } from '@shared/schemas/auth.schema';
import { Button } from '@/components/ui/button';
import { Notice, QueryView, Skeleton } from '@/components/ui/states';
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
      // Never empty: the coach asking is on it.
      loading={<Skeleton className="h-20 w-full" />}
    >
      {(data) => (
        <div className="flex flex-col gap-3">
          <ul aria-label="People with access" className="flex flex-col">
            {data.map((m) => (
              <li key={m.id} className="flex flex-wrap items-center justify-between gap-x-4 gap-y-1 border-b border-line py-2">
                <div className="min-w-0">
                  <p className="font-bold">
                    {m.name}
                    {m.you && <span className="font-normal text-ink-soft"> (you)</span>}
                  </p>
                  <p className="text-sm text-ink-soft">
                    <span className="text-ink">{ROLE_WORDS[m.role]}</span>
                    {m.clientName && m.clientName !== m.name && <> · profile {m.clientName}</>} · <span className="break-all">{m.email}</span> · joined{' '}
                    <span className="num">{joined(m.joinedAt)}</span>
                  </p>
                </div>
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
              </li>
            ))}
          </ul>
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
