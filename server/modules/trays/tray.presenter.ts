import Decimal from 'decimal.js';
import { findBakeRule, type BakeRuleCategory } from '@shared/domain/bake-rules-defaults.js';
import { REHEAT_MIN_C, REHEAT_MIN_F } from '@shared/domain/eat-by.js';
import { panOf, portionsOf, type StoredCutPlan, type StoredPan } from '@shared/domain/tray-plan.js';
import type { Pan } from '@shared/domain/scaling.js';
import type { PanDto, PanLining, TrayDto, TrayPhotoDto, TraySummaryDto } from '@shared/schemas/trays.schema.js';
import type { ITray, ITrayLine, ITrayPhoto } from './tray.entity.js';
import { gramsOfLine, trayAllergens, trayNutrition, type TrayIngredient } from './tray-nutrition.js';
import type { NetCarbRule } from '@shared/domain/nutrition.js';

export const REHEAT_SOURCE = 'FDA Food Code 3-403.11';

export function storedPanOf(tray: ITray): StoredPan {
  return {
    code: tray.panCode as StoredPan['code'],
    length: tray.panLength ?? null,
    width: tray.panWidth ?? null,
    unit: (tray.panUnit as 'in' | 'cm') ?? 'in',
  };
}

export function cutPlanOf(tray: Pick<ITray, 'cutKind' | 'cutPieces' | 'cutRows' | 'cutColumns'>): StoredCutPlan {
  return tray.cutKind === 'pieces'
    ? { kind: 'pieces', pieces: tray.cutPieces ?? 1 }
    : { kind: 'grid', rows: tray.cutRows ?? 1, columns: tray.cutColumns ?? 1 };
}

export function presentPan(pan: Pan): PanDto {
  return { code: pan.code, label: pan.label, length: pan.length.toNumber(), width: pan.width.toNumber(), unit: pan.unit };
}

export function presentPhoto(trayId: number, photo: ITrayPhoto | null | undefined): TrayPhotoDto | null {
  if (!photo) return null;
  const v = photo.version;
  return {
    url: `/api/trays/${trayId}/photo?v=${v}`,
    thumbnailUrl: `/api/trays/${trayId}/thumbnail?v=${v}`,
    width: photo.width,
    height: photo.height,
    contentType: photo.contentType,
  };
}

export function linesOf(tray: ITray): ITrayLine[] {
  return [...tray.lines.getItems()].sort((a, b) => a.position - b.position);
}

export function nutritionLines(tray: ITray) {
  return linesOf(tray).map((l) => ({ ingredientId: l.ingredient.id, amount: l.amount, unit: l.unit }));
}

export function presentTray(
  tray: ITray,
  ingredients: Map<number, TrayIngredient>,
  photo: ITrayPhoto | null | undefined,
): TrayDto {
  const lines = linesOf(tray);
  const category = tray.bakeCategory as BakeRuleCategory;
  const cutPlan = cutPlanOf(tray);
  return {
    id: tray.id,
    name: tray.name,
    description: tray.description,
    lines: lines.map((l) => {
      const ing = ingredients.get(l.ingredient.id);
      const grams = gramsOfLine({ ingredientId: l.ingredient.id, amount: l.amount, unit: l.unit }, ing);
      return {
        id: l.id,
        position: l.position,
        ingredientId: l.ingredient.id,
        ingredientName: ing?.name ?? 'Unknown ingredient',
        amountText: l.amountText,
        unit: l.unit,
        note: l.note,
        grams: grams === null ? null : grams.toDecimalPlaces(2, Decimal.ROUND_HALF_UP).toNumber(),
      };
    }),
    pan: presentPan(panOf(storedPanOf(tray))),
    panLining: tray.panLining as PanLining,
    bake: {
      category,
      categoryLabel: findBakeRule(category)?.label ?? category,
      tempF: tray.bakeTempF,
      minMinutes: tray.bakeMinMinutes,
      maxMinutes: tray.bakeMaxMinutes,
    },
    yieldFactor: Number(tray.yieldFactor),
    cutPlan,
    portions: portionsOf(cutPlan),
    storage: { fridgeDays: tray.fridgeDays, freezerWeeks: tray.freezerWeeks },
    reheatSteps: tray.reheatSteps ?? [],
    reheat: { minF: REHEAT_MIN_F, minC: REHEAT_MIN_C, source: REHEAT_SOURCE },
    allergens: trayAllergens(nutritionLines(tray), ingredients),
    tags: tray.tags ?? [],
    photo: presentPhoto(tray.id, photo),
    isDemo: tray.isDemo,
    archived: tray.archived,
    version: tray.version,
    createdAt: tray.createdAt.toISOString(),
    updatedAt: tray.updatedAt.toISOString(),
  };
}

export function presentSummary(
  tray: ITray,
  ingredients: Map<number, TrayIngredient>,
  photo: ITrayPhoto | null | undefined,
  rule: NetCarbRule,
): TraySummaryDto {
  const cutPlan = cutPlanOf(tray);
  const portions = portionsOf(cutPlan);
  const lines = nutritionLines(tray);
  const exact = trayNutrition(lines, ingredients, { portions, yieldFactor: tray.yieldFactor, rule });
  const r = (d: Decimal) => d.toDecimalPlaces(2, Decimal.ROUND_HALF_UP).toNumber();
  return {
    id: tray.id,
    name: tray.name,
    tags: tray.tags ?? [],
    allergens: trayAllergens(lines, ingredients),
    portions,
    cutPlan,
    pan: presentPan(panOf(storedPanOf(tray))),
    photo: presentPhoto(tray.id, photo),
    perPortion: exact
      ? {
          kcal: r(exact.perPortion.kcal),
          fatG: r(exact.perPortion.fatG),
          proteinG: r(exact.perPortion.proteinG),
          carbsG: r(exact.perPortion.carbsG),
          fiberG: r(exact.perPortion.fiberG),
          netCarbsG: r(exact.perPortion.netCarbsG),
          massG: r(exact.perPortion.massG),
        }
      : null,
    archived: tray.archived,
    isDemo: tray.isDemo,
    version: tray.version,
  };
}
