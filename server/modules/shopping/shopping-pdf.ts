import type { EntityManager } from '@mikro-orm/postgresql';
import type { ShoppingList } from '@shared/domain/shopping.js';
import { datesOf, measureOf, type Actor } from '../../http/authz.js';
import { renderShoppingListPdf } from '../pdf/shopping-list.pdf.js';
import { Workspace } from '../workspaces/workspace.entity.js';
import { aisleLabel } from './shopping.presenter.js';
import { baseAmountText } from './shopping-ingredient.js';
import { shortDate } from '@shared/domain/iso-date.js';
import { weekShoppingExport } from './shopping-week.service.js';

/** The week's list as a PDF through the shared renderer (aisle codes shown as the store aisle's name). */
export async function shoppingPdf(em: EntityManager, actor: Actor, weekId: number, prepDate?: string) {
  const { week, computed } = await weekShoppingExport(em, actor, weekId, prepDate);
  const ws = await em.findOneOrFail(Workspace, actor.workspaceId, { fields: ['name'] });
  const list: ShoppingList = {
    ...computed.list,
    aisles: computed.list.aisles.map((a) => ({ ...a, aisle: aisleLabel(a.aisle) })),
  };
  const order = datesOf(actor);
  return renderShoppingListPdf(list, {
    businessName: ws.name,
    title: prepDate ? `Shopping list for prep ${shortDate(prepDate, order)}, week of ${shortDate(week.startDate, order)}` : `Shopping list, week of ${shortDate(week.startDate, order)}`,
    filename: `shopping-list-${prepDate ? `prep-${prepDate}` : week.startDate}.pdf`,
    amountText: (item, value) => baseAmountText(value, computed.ingredients.get(Number(item.ingredientId))!, measureOf(actor)),
  });
}
