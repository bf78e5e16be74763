import { useEffect, useState } from 'react';
import type { ShoppingAisleDto, ShoppingItemDto, ShoppingListDto } from '@shared/schemas/shopping.schema';
import { pendingTicks, useSetCheck } from '../api/use-shopping-mutations';
import { localHhmm, timeLabel } from '@/lib/dates';
import { money } from '@/lib/money';


export function buyText(item: ShoppingItemDto): string {
  if (item.toBuy <= 0) return 'From the pantry';
  if (item.purchase) return `${item.purchase.packages} × ${item.purchase.label}`;
  return item.toBuyText;
}

function ItemRow({ item, onToggle }: { item: ShoppingItemDto; onToggle: (checked: boolean) => void }) {
  // The tap shows at once: the cached list takes the mark only after any list read in flight is cancelled, and a
  // controlled checkbox would spring back meanwhile. Any new mark for this item (optimistic, saved or rolled back)
  // replaces the tap.
  const [tapped, setTapped] = useState<boolean | null>(null);
  const [shownCheck, setShownCheck] = useState(item.check);
  if (shownCheck !== item.check) {
    setShownCheck(item.check);
    setTapped(null);
  }
  const checked = tapped ?? item.check.checked;
  const covered = item.toBuy <= 0;
  return (
    <li className="break-inside-avoid">
      <label
        className={`flex min-h-14 cursor-pointer items-start gap-3 rounded-lg border px-3 py-3 print:min-h-0 print:border-0 print:py-1 ${
          checked ? 'border-line bg-paper-deep text-ink-faint' : 'border-line-strong bg-paper-card'
        }`}
      >
        <input
          type="checkbox"
          className="mt-1 h-6 w-6 shrink-0 accent-herb print:hidden"
          checked={checked}
          onChange={(e) => {
            setTapped(e.target.checked);
            onToggle(e.target.checked);
          }}
        />
        <span aria-hidden className="hidden print:inline">
          ☐
        </span>
        {/* On paper an item takes one line where it fits (name, what to buy, the need), so a list fills fewer pages. */}
        <span className="flex min-w-0 flex-1 flex-col print:flex-row print:flex-wrap print:items-baseline print:gap-x-3">
          <span className={`font-bold ${checked ? 'line-through' : ''}`}>{item.name}</span>
          <span className={`num text-lg print:text-base ${checked ? 'line-through' : ''} ${covered ? 'text-herb-700' : ''}`}>{buyText(item)}</span>
          <span className="num text-sm text-ink-soft">
            need {item.neededText}
            {item.fromPantry > 0 && ` · pantry covers ${item.fromPantry === item.needed ? 'all' : 'part'}`}
            {item.purchase && item.purchase.packages > 0 && item.purchase.spare > 0 && ` · ${item.purchase.spareText} spare`}
          </span>
          {checked && item.check.checkedBy && (
            <span className="text-xs text-ink-faint print:hidden">
              ✓ {item.check.checkedBy}
              {item.check.checkedAt && ` at ${timeLabel(localHhmm(new Date(item.check.checkedAt)))}`}
            </span>
          )}
        </span>
        <span className="num shrink-0 text-right text-sm">{item.costCents !== null && item.costCents > 0 ? money(item.costCents) : ''}</span>
      </label>
    </li>
  );
}

/** One aisle: unchecked items first (in name order), checked ones sink to the bottom struck through. */
function AisleGroup({ aisle, onToggle }: { aisle: ShoppingAisleDto; onToggle: (item: ShoppingItemDto, checked: boolean) => void }) {
  const ordered = [...aisle.items.filter((i) => !i.check.checked), ...aisle.items.filter((i) => i.check.checked)];
  const left = aisle.items.filter((i) => !i.check.checked).length;
  return (
    // On paper an aisle may run on to the next page (an item never splits, a heading never ends a page).
    <section aria-labelledby={`aisle-${aisle.aisle}`}>
      <h2 id={`aisle-${aisle.aisle}`} className="mb-2 flex break-after-avoid items-baseline justify-between text-xl">
        {aisle.label}
        <span className="num font-sans text-sm text-ink-faint print:hidden">{left ? `${left} left` : 'done'}</span>
      </h2>
      <ul className="flex flex-col gap-2 print:gap-0">
        {ordered.map((item) => (
          <ItemRow key={item.ingredientId} item={item} onToggle={(c) => onToggle(item, c)} />
        ))}
      </ul>
    </section>
  );
}

export function ShoppingList({ list, weekId }: { list: ShoppingListDto; weekId: number }) {
  const setCheck = useSetCheck(weekId, list.prepDate);
  const { mutate } = setCheck;
  // Ticks made on this device that the server has not had yet (the page was closed without a network): sent now
  // (or, still offline, as soon as the network is back). Setting a mark is idempotent: one sent twice is harmless.
  useEffect(() => {
    for (const t of pendingTicks(weekId, list.prepDate)) mutate(t);
  }, [weekId, list.prepDate, mutate]);
  const toggle = (item: ShoppingItemDto, checked: boolean) => setCheck.mutate({ ingredientId: item.ingredientId, checked });
  return (
    <div className="flex flex-col gap-6 print:gap-3">
      {list.aisles.map((a) => (
        <AisleGroup key={a.aisle} aisle={a} onToggle={toggle} />
      ))}
    </div>
  );
}
