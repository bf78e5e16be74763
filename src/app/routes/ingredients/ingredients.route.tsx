import { useEffect } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import {
  INGREDIENT_CATEGORIES,
  INGREDIENT_CATEGORY_LABELS,
  INGREDIENT_SORTS,
  NET_CARB_HELP,
  type IngredientCategoryCode,
  type IngredientListParams,
  type IngredientSort,
} from '@shared/schemas/ingredients.schema';
import { NET_CARB_RULES } from '@shared/domain/nutrition';
import { useMe } from '@/features/auth/hooks/use-me';
import { ingredientListQuery } from '@/features/ingredients/api/ingredients.queries';
import { IngredientTable } from '@/features/ingredients/components/ingredient-table';
import { IngredientImport } from '@/features/ingredients/components/ingredient-import';
import { Button } from '@/components/ui/button';
import { Pager } from '@/components/ui/pager';
import { SelectField, TextField } from '@/components/ui/field';
import { Card, EmptyState, Notice, PageHeader, QueryView, Skeleton } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useFollowedText } from '@/lib/use-followed-text';

const PAGE_SIZE = 25;
type Scope = 'all' | 'mine' | 'shared';

function useFilters() {
  const [params, setParams] = useSearchParams();
  const sortParam = params.get('sort') as IngredientSort | null;
  const filters: IngredientListParams = {
    q: params.get('q') ?? '',
    category: (INGREDIENT_CATEGORIES as readonly string[]).includes(params.get('category') ?? '')
      ? (params.get('category') as IngredientCategoryCode)
      : undefined,
    scope: (['all', 'mine', 'shared'].includes(params.get('scope') ?? '') ? params.get('scope') : 'all') as Scope,
    page: Math.max(1, Number(params.get('page')) || 1),
    pageSize: PAGE_SIZE,
    sort: sortParam && INGREDIENT_SORTS.includes(sortParam) ? sortParam : 'name',
  };
  const update = (patch: Partial<Record<'q' | 'category' | 'scope' | 'page' | 'sort', string>>) => {
    const next = new URLSearchParams(params);
    for (const [k, v] of Object.entries(patch)) {
      if (v === undefined || v === '' || (k === 'page' && v === '1')) next.delete(k);
      else next.set(k, v);
    }
    // A new search, filter or order starts on page 1.
    if (!('page' in patch)) next.delete('page');
    setParams(next, { replace: true });
  };
  return { filters, update };
}

export function Component() {
  const me = useMe();
  const isCoach = me.role === 'coach';
  const { filters, update } = useFilters();
  // The address's search shown in the box: it follows a new address (the menu's "Ingredients" link, Back) unless typed.
  const [search, setSearch] = useFollowedText(filters.q);
  useEffect(() => {
    const t = setTimeout(() => {
      if (search !== filters.q) update({ q: search });
    }, 250);
    return () => clearTimeout(t);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [search]);
  const list = useQuery(ingredientListQuery(filters));
  const pages = list.data ? Math.max(1, Math.ceil(list.data.total / PAGE_SIZE)) : 1;
  const rule = NET_CARB_RULES.find((r) => r.kind === list.data?.netCarbRule);
  const filtered = !!(filters.q || filters.category || filters.scope !== 'all');

  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Ingredients"
        lead="Values per 100 g. The shared library is read-only; your own ingredients are yours to change."
      >
        {isCoach && (
          <Link to={paths.ingredientNew} className="inline-flex min-h-11 items-center rounded-lg bg-ink px-4 font-bold text-paper-card hover:bg-ink-soft">
            New ingredient
          </Link>
        )}
      </PageHeader>

      <Card>
        <form role="search" className="grid gap-3 sm:grid-cols-[2fr_1fr_1fr]" onSubmit={(e) => e.preventDefault()}>
          <TextField label="Search by name" type="search" value={search} onChange={(e) => setSearch(e.target.value)} placeholder="e.g. cream cheese" />
          <SelectField label="Category" value={filters.category ?? ''} onChange={(e) => update({ category: e.target.value })}>
            <option value="">All categories</option>
            {INGREDIENT_CATEGORIES.map((c) => (
              <option key={c} value={c}>{INGREDIENT_CATEGORY_LABELS[c]}</option>
            ))}
          </SelectField>
          <SelectField label="Library" value={filters.scope} onChange={(e) => update({ scope: e.target.value })}>
            <option value="all">Shared and yours</option>
            <option value="mine">Yours only</option>
            <option value="shared">Shared only</option>
          </SelectField>
        </form>
        {rule && (
          <p className="mt-3 text-sm text-ink-soft">
            Net carbs: {rule.formula}.{' '}
            {isCoach ? (
              <Link to={paths.settings} className="font-bold underline">Change the rule in Settings</Link>
            ) : (
              <span title={NET_CARB_HELP}>Set by the coach.</span>
            )}
          </p>
        )}
      </Card>

      <Card>
        <QueryView
          query={list}
          loading={
            <div className="flex flex-col gap-2" role="status" aria-label="Loading ingredients">
              {Array.from({ length: 8 }, (_, i) => (
                <Skeleton key={i} className="h-8 w-full" label="" />
              ))}
            </div>
          }
          isEmpty={(data) => data.items.length === 0}
          empty={
            <EmptyState
              title={filtered ? 'No ingredient matches' : 'No ingredients yet'}
              action={
                filtered ? (
                  <Button variant="secondary" onClick={() => { setSearch(''); update({ q: '', category: '', scope: '' }); }}>
                    Clear the search
                  </Button>
                ) : undefined
              }
            >
              {filtered ? 'Try another name or category.' : isCoach ? 'Add your own ingredient or import a CSV below.' : 'Your coach has not added any yet.'}
            </EmptyState>
          }
        >
          {(data) => (
            <>
              <IngredientTable items={data.items} sort={filters.sort} onSort={(s) => update({ sort: s === 'name' ? '' : s })} />
              <Pager label="Pages" page={filters.page} pages={pages} onPage={(p) => update({ page: String(p) })} summary={` · ${data.total} ingredients`}>
                {list.isFetching && <span className="text-sm text-ink-faint">Updating…</span>}
              </Pager>
            </>
          )}
        </QueryView>
      </Card>

      {isCoach && (
        <Card>
          <h2 className="mb-3 text-xl">Import from a CSV file</h2>
          <IngredientImport />
          <h2 className="mb-2 mt-6 text-xl">Keep a copy</h2>
          <p className="text-sm text-ink-soft">
            Your own ingredients (not the shared library) as a CSV in the same columns: to keep, to change in a
            spreadsheet (prices, say) and import again with “Update the ones already in my library” ticked, or to import
            into another workspace.{' '}
            <a href="/api/ingredients.csv" download className="font-bold underline">
              Download my ingredients (CSV)
            </a>
          </p>
        </Card>
      )}
      {!isCoach && <Notice tone="info">Only the coach can add or change ingredients.</Notice>}
    </div>
  );
}
