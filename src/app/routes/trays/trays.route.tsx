import { useQuery } from '@tanstack/react-query';
import { Link, useSearchParams } from 'react-router-dom';
import { MAJOR_ALLERGENS, type AllergenCode } from '@shared/domain/allergens';
import type { ListTraysQuery } from '@shared/schemas/trays.schema';
import { traysQuery } from '@/features/trays/api/trays.queries';
import { TrayCard } from '@/features/trays/components/tray-card';
import { useMe } from '@/features/auth/hooks/use-me';
import { SelectField, TextField } from '@/components/ui/field';
import { EmptyState, PageHeader, QueryView, Skeleton } from '@/components/ui/states';
import { paths } from '@/config/paths';

/** The base-tray library: cards with photo, macros per portion and tags; filters kept in the address. */
export function Component() {
  const me = useMe();
  const [params, setParams] = useSearchParams();
  const filters: ListTraysQuery = {
    q: params.get('q') || undefined,
    freeOf: params.get('freeOf') ? [params.get('freeOf') as AllergenCode] : undefined,
    maxNetCarbs: params.get('maxNetCarbs') || undefined,
    archived: (params.get('archived') as 'true' | 'false' | 'all') || 'false',
    tag: params.get('tag') || undefined,
  };
  const list = useQuery(traysQuery(filters));
  const set = (key: string, value: string) => {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    setParams(next, { replace: true });
  };
  const filtered = !!(filters.q || filters.freeOf || filters.maxNetCarbs || filters.tag || filters.archived !== 'false');
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Base trays" lead="Recipes baked on one pan and cut into portions.">
        {me.role === 'coach' && (
          <Link to={paths.trayNew} className="inline-flex min-h-11 items-center rounded-lg bg-ink px-4 font-bold text-paper-card hover:bg-ink-soft">
            New base tray
          </Link>
        )}
      </PageHeader>
      <form role="search" aria-label="Filter base trays" className="no-print grid grid-cols-2 gap-3 sm:grid-cols-5" onSubmit={(e) => e.preventDefault()}>
        <TextField label="Search" className="col-span-2 sm:col-span-1" defaultValue={filters.q ?? ''} onChange={(e) => set('q', e.target.value)} />
        <SelectField label="Free of" value={params.get('freeOf') ?? ''} onChange={(e) => set('freeOf', e.target.value)}>
          <option value="">Any allergens</option>
          {MAJOR_ALLERGENS.map((a) => (
            <option key={a.code} value={a.code}>
              {a.label}
            </option>
          ))}
        </SelectField>
        <TextField
          label="Net carbs ≤ (g/portion)"
          inputMode="decimal"
          defaultValue={params.get('maxNetCarbs') ?? ''}
          onChange={(e) => set('maxNetCarbs', e.target.value.trim())}
        />
        <TextField label="Tag" defaultValue={filters.tag ?? ''} onChange={(e) => set('tag', e.target.value.trim().toLowerCase())} />
        <SelectField label="Show" value={filters.archived as string} onChange={(e) => set('archived', e.target.value === 'false' ? '' : e.target.value)}>
          <option value="false">Active trays</option>
          <option value="true">Archived trays</option>
          <option value="all">All trays</option>
        </SelectField>
      </form>
      <QueryView
        query={list}
        loading={
          <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
            {[0, 1, 2].map((i) => (
              <Skeleton key={i} className="h-72 w-full" label="Loading base trays" />
            ))}
          </div>
        }
        isEmpty={(data) => data.length === 0}
        empty={
          filtered ? (
            <EmptyState title="No base tray matches these filters">Clear a filter to see more.</EmptyState>
          ) : (
            <EmptyState
              title={me.role === 'client' ? 'Nothing planned for you yet' : 'No base trays yet'}
              action={
                me.role === 'coach' ? (
                  <Link to={paths.trayNew} className="inline-flex min-h-11 items-center rounded-lg bg-ink px-4 font-bold text-paper-card">
                    Write the first base tray
                  </Link>
                ) : undefined
              }
            >
              {me.role === 'client'
                ? 'Your coach’s base trays appear here once they are in your plan.'
                : 'A base tray is one recipe on one pan, cut into equal portions.'}
            </EmptyState>
          )
        }
      >
        {(data) => (
          <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3" aria-label="Base trays">
            {data.map((t) => (
              <TrayCard key={t.id} tray={t} />
            ))}
          </ul>
        )}
      </QueryView>
    </div>
  );
}
