import { useId } from 'react';
import { useMutation, useQuery } from '@tanstack/react-query';
import type { MeDto } from '@shared/schemas/auth.schema';
import { api } from '@/lib/api-client';
import { errorMessage } from '@/lib/problem';
import { ROLE_WORDS } from '@/lib/words';
import { myWorkspacesQuery } from '../api/auth.queries';

/**
 * The workspace this session works in: its name, or, for someone who belongs to several (an assistant working for
 * two coaches), a choice between them. Choosing reloads the app at its home page, so nothing of the other
 * workspace stays on screen or in the cache.
 */
export function WorkspaceSwitch({ current, reload = () => window.location.assign('/') }: { current: string; reload?: () => void }) {
  const id = useId();
  const list = useQuery(myWorkspacesQuery());
  const choose = useMutation({ mutationFn: (workspaceId: number) => api.put<MeDto>('/auth/workspace', { workspaceId }), onSuccess: reload });
  const all = list.data ?? [];
  if (all.length < 2) return <p className="px-2 text-xs text-ink-faint">{current}</p>;
  const chosen = all.find((w) => w.current)?.workspaceId ?? '';
  return (
    <div className="flex flex-col gap-1 px-2">
      <label htmlFor={id} className="text-xs font-bold text-ink-soft">
        Workspace
      </label>
      <select
        id={id}
        className="min-h-11 rounded-lg border border-line-strong bg-paper-card px-2 text-sm md:min-h-9"
        value={chosen}
        disabled={choose.isPending}
        onChange={(e) => choose.mutate(Number(e.target.value))}
      >
        {all.map((w) => (
          <option key={w.workspaceId} value={w.workspaceId}>
            {w.name} ({ROLE_WORDS[w.role].toLowerCase()})
          </option>
        ))}
      </select>
      {choose.isError && (
        <p role="alert" className="text-xs font-bold text-signal">
          {errorMessage(choose.error)}
        </p>
      )}
    </div>
  );
}
