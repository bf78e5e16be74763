import { Link } from 'react-router-dom';
import type { IngredientDto, IngredientSort } from '@shared/schemas/ingredients.schema';
import { INGREDIENT_CATEGORY_LABELS } from '@shared/schemas/ingredients.schema';
import { paths } from '@/config/paths';
import { AllergenList, AtwaterFlag, fmt } from './ingredient-bits';

type SortField = 'name' | 'kcal' | 'proteinG' | 'fatG' | 'carbsG';

function SortHeader({
  field,
  label,
  sort,
  onSort,
  numeric = false,
}: {
  field: SortField;
  label: string;
  sort: IngredientSort;
  onSort: (s: IngredientSort) => void;
  numeric?: boolean;
}) {
  const active = sort === field || sort === `-${field}`;
  const desc = sort === `-${field}`;
  const next = (active && !desc ? `-${field}` : field) as IngredientSort;
  return (
    <th scope="col" aria-sort={active ? (desc ? 'descending' : 'ascending') : 'none'} className={numeric ? 'text-right' : ''}>
      <button
        type="button"
        onClick={() => onSort(next)}
        className="inline-flex min-h-9 items-center gap-1 rounded px-1 font-bold hover:bg-paper-deep"
      >
        {label}
        <span aria-hidden className="text-xs">{active ? (desc ? '▼' : '▲') : '↕'}</span>
        <span className="sr-only">{active ? (desc ? ', sorted high to low' : ', sorted low to high') : ', sort'}</span>
      </button>
    </th>
  );
}

/** The library table: per-100 g energy, net carbs (workspace rule), protein, fat, allergens, source, Atwater. */
export function IngredientTable({
  items,
  sort,
  onSort,
}: {
  items: IngredientDto[];
  sort: IngredientSort;
  onSort: (s: IngredientSort) => void;
}) {
  return (
    // `relative`: the screen-reader-only texts are absolutely placed and would otherwise widen the page on phones.
    <div className="relative overflow-x-auto">
      <table className="w-full min-w-[56rem] text-left text-sm">
        <caption className="sr-only">Ingredients, values per 100 g</caption>
        <thead>
          <tr className="border-b border-line-strong text-ink-soft">
            <SortHeader field="name" label="Name" sort={sort} onSort={onSort} />
            <SortHeader field="kcal" label="kcal" sort={sort} onSort={onSort} numeric />
            <th scope="col" className="text-right">Net carbs g</th>
            <SortHeader field="carbsG" label="Total carbs g" sort={sort} onSort={onSort} numeric />
            <SortHeader field="proteinG" label="Protein g" sort={sort} onSort={onSort} numeric />
            <SortHeader field="fatG" label="Fat g" sort={sort} onSort={onSort} numeric />
            <th scope="col">Allergens</th>
            <th scope="col">Source</th>
            <th scope="col">Energy check</th>
          </tr>
        </thead>
        <tbody>
          {items.map((i) => (
            <tr key={i.id} className="border-b border-line align-top">
              <td className="py-2 pr-2">
                <Link to={paths.ingredient(i.id)} className="font-bold underline decoration-line-strong underline-offset-2 hover:decoration-ink">
                  {i.name}
                </Link>
                <div className="text-xs text-ink-faint">
                  {INGREDIENT_CATEGORY_LABELS[i.category] ?? i.category} · {i.shared ? 'shared library' : 'your library'}
                </div>
              </td>
              <td className="num py-2 text-right">{fmt(i.per100g.kcal, 0)}</td>
              <td className="num py-2 text-right font-bold">{fmt(i.per100g.netCarbsG, 1)}</td>
              <td className="num py-2 text-right">{fmt(i.per100g.carbsG, 1)}</td>
              <td className="num py-2 text-right">{fmt(i.per100g.proteinG, 1)}</td>
              <td className="num py-2 text-right">{fmt(i.per100g.fatG, 1)}</td>
              <td className="py-2 pl-2">
                <AllergenList codes={i.allergens} />
              </td>
              <td className="max-w-[16rem] py-2 text-xs text-ink-soft">
                <span className="line-clamp-2" title={i.source}>{i.source}</span>
              </td>
              <td className="py-2">
                <AtwaterFlag check={i.atwater} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
