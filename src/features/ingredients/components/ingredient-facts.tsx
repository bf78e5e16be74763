import type { IngredientDto } from '@shared/schemas/ingredients.schema';
import { INGREDIENT_CATEGORY_LABELS, STORE_AISLE_LABELS } from '@shared/schemas/ingredients.schema';
import { NET_CARB_RULES } from '@shared/domain/nutrition';
import { Card } from '@/components/ui/states';
import { money } from '@/lib/money';
import { AllergenList, AtwaterFlag, fmt } from './ingredient-bits';

function Row({ label, value, unit }: { label: string; value: number; unit: string }) {
  return (
    <tr className="border-b border-line">
      <th scope="row" className="py-1 text-left font-normal">{label}</th>
      <td className="num py-1 text-right">{fmt(value, 2)} {unit}</td>
    </tr>
  );
}

/** Read-only facts of an ingredient (shared rows, and the assistant's view). */
export function IngredientFacts({ ingredient: i }: { ingredient: IngredientDto }) {
  const rule = NET_CARB_RULES.find((r) => r.kind === i.netCarbRule);
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <Card>
        <h2 className="mb-3 text-xl">Per 100 g</h2>
        <table className="w-full text-sm">
          <tbody>
            <Row label="Energy" value={i.per100g.kcal} unit="kcal" />
            <Row label="Fat" value={i.per100g.fatG} unit="g" />
            <Row label="  Saturated fat" value={i.per100g.satFatG} unit="g" />
            <Row label="Protein" value={i.per100g.proteinG} unit="g" />
            <Row label="Total carbohydrate" value={i.per100g.carbsG} unit="g" />
            <Row label="  Dietary fiber" value={i.per100g.fiberG} unit="g" />
            <Row label="  Total sugars" value={i.per100g.sugarsG} unit="g" />
            <Row label="  Erythritol" value={i.per100g.erythritolG} unit="g" />
            <Row label="  Allulose" value={i.per100g.alluloseG} unit="g" />
            <Row label="  Other sugar alcohols" value={i.per100g.otherPolyolsG} unit="g" />
            <Row label="Net carbs" value={i.per100g.netCarbsG} unit="g" />
            <Row label="Sodium" value={i.per100g.sodiumMg} unit="mg" />
          </tbody>
        </table>
        <p className="mt-2 text-xs text-ink-faint">Net carbs by your workspace rule: {rule?.formula ?? i.netCarbRule}.</p>
        <p className="mt-2">
          <AtwaterFlag check={i.atwater} long />
        </p>
      </Card>
      <Card>
        <h2 className="mb-3 text-xl">About it</h2>
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-2 text-sm">
          <dt className="font-bold">Category</dt>
          <dd>{INGREDIENT_CATEGORY_LABELS[i.category] ?? i.category}</dd>
          <dt className="font-bold">Allergens</dt>
          <dd><AllergenList codes={i.allergens} /></dd>
          <dt className="font-bold">Density</dt>
          <dd>
            {i.densityGPerMl === null ? 'unknown (measure by weight)' : <span className="num">{fmt(i.densityGPerMl, 3)} g/mL</span>}
            {i.densitySource && <span className="block text-xs text-ink-faint">{i.densitySource}</span>}
          </dd>
          <dt className="font-bold">Pieces</dt>
          <dd>
            {Object.keys(i.pieceWeights).length === 0
              ? 'none'
              : Object.entries(i.pieceWeights).map(([n, g]) => `${n} ${fmt(g, 1)} g`).join(' · ')}
          </dd>
          <dt className="font-bold">Package</dt>
          <dd>
            {i.purchase ? i.purchase.label : '—'}
            {i.priceCents !== null && <span className="num"> · {money(i.priceCents)}</span>}
          </dd>
          <dt className="font-bold">Aisle</dt>
          <dd>{i.aisle ? STORE_AISLE_LABELS[i.aisle] : '—'}</dd>
          <dt className="font-bold">Source</dt>
          <dd>{i.source}</dd>
          {i.note && (
            <>
              <dt className="font-bold">Note</dt>
              <dd>{i.note}</dd>
            </>
          )}
        </dl>
      </Card>
    </div>
  );
}
