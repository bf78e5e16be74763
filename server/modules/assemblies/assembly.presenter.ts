import Decimal from 'decimal.js';
import { toNutrientNumbers } from '@shared/domain/nutrition.js';
import type { AssemblyDto } from '@shared/schemas/assemblies.schema.js';
import { addOnGrams, itemsOf, plateFacts, type PlateContext, type PlateLike } from './plate-facts.js';

export function presentAssembly(a: PlateLike, ctx: PlateContext): AssemblyDto {
  const facts = plateFacts(a, ctx);
  const items = itemsOf(a);
  return {
    id: a.id,
    name: a.name,
    description: a.description ?? '',
    trays: items
      .filter((i) => i.tray)
      .map((i) => {
        const t = ctx.trays.get(i.tray!.id);
        return {
          trayId: i.tray!.id,
          trayName: t?.name ?? 'Unknown tray',
          portions: new Decimal(i.portions ?? 1).toNumber(),
          fridgeDays: t?.fridgeDays ?? 0,
          freezerWeeks: t?.freezerWeeks ?? 0,
          reheatSteps: t?.reheatSteps ?? [],
        };
      }),
    addOns: items
      .filter((i) => i.ingredient)
      .map((i) => {
        const grams = addOnGrams(i, ctx);
        return {
          ingredientId: i.ingredient!.id,
          ingredientName: ctx.ingredients.get(i.ingredient!.id)?.name ?? 'Unknown ingredient',
          amountText: i.amountText,
          unit: i.unit,
          note: i.note ?? '',
          grams: grams ? grams.toDecimalPlaces(1).toNumber() : null,
        };
      }),
    assemblySteps: a.assemblySteps ?? [],
    reheatSteps: a.reheatSteps ?? [],
    nutrition: toNutrientNumbers(facts.vector),
    macros: facts.macros,
    complete: facts.complete,
    allergens: facts.allergens,
    archived: a.archived ?? false,
    version: a.version,
    updatedAt: a.updatedAt.toISOString(),
  };
}
