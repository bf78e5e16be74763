import { useEffect, useId, useRef, useState, type KeyboardEvent } from 'react';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { IngredientDto, IngredientListDto } from '@shared/schemas/ingredients.schema';
import { UNIT_OPTIONS } from '@shared/domain/units';
import { api, qs } from '@/lib/api-client';

/** The combobox's search of the library (GET /api/ingredients?q=), first 10 matches. */
export const ingredientSearchQuery = (q: string) =>
  queryOptions({
    queryKey: ['ingredient-search', q] as const,
    queryFn: () => api.get<IngredientListDto>(`/ingredients${qs({ q, pageSize: 10 })}`),
    staleTime: 60_000,
    placeholderData: keepPreviousData,
  });

export interface PickedIngredient {
  id: number;
  name: string;
  pieceNames: string[];
  hasDensity: boolean;
}

/**
 * The units a line of this ingredient can be typed in: its pieces, then mass, then volume when it has a density
 * (every standard unit while the ingredient is not known yet); a current unit outside them stays first.
 */
export function unitChoices(facts: PickedIngredient | null | undefined, current?: string): { code: string; label: string }[] {
  const std = UNIT_OPTIONS.filter((u) => u.kind !== 'volume' || !facts || facts.hasDensity).map((u) => ({ code: u.code, label: u.label }));
  const pieces = (facts?.pieceNames ?? []).map((p) => ({ code: p, label: `${p} (piece)` }));
  const all = [...pieces, ...std];
  if (current && !all.some((u) => u.code === current)) all.unshift({ code: current, label: current });
  return all;
}

/**
 * The unit a line takes when its ingredient is picked: its piece (a large egg first) when the line still has the
 * default grams and the ingredient is counted in pieces; otherwise the unit stays, so a typed amount keeps its meaning.
 */
export function unitAfterPick(ing: PickedIngredient, current: string): string {
  if (current === 'g' && ing.pieceNames.length) return ing.pieceNames.includes('large') ? 'large' : ing.pieceNames[0]!;
  return current;
}

export function pickedFrom(dto: IngredientDto): PickedIngredient {
  return { id: dto.id, name: dto.name, pieceNames: Object.keys(dto.pieceWeights), hasDensity: dto.densityGPerMl !== null };
}

function useDebounced<T>(value: T, ms: number): T {
  const [v, setV] = useState(value);
  useEffect(() => {
    const t = setTimeout(() => setV(value), ms);
    return () => clearTimeout(t);
  }, [value, ms]);
  return v;
}

interface Props {
  label: string;
  value: { id: number; name: string } | null;
  onPick: (ing: PickedIngredient) => void;
  error?: string;
  /** Hide the visible label (the line's row shows it once); the input keeps its accessible name. */
  hideLabel?: boolean;
}

/**
 * Ingredient search as an ARIA 1.2 combobox: type to search the library, ArrowDown/ArrowUp move, Enter picks,
 * Escape closes; the list is announced through aria-activedescendant.
 */
export function IngredientCombobox({ label, value, onPick, error, hideLabel }: Props) {
  const id = useId();
  const listId = `${id}-list`;
  const errId = `${id}-err`;
  const [text, setText] = useState(value?.name ?? '');
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(0);
  const inputRef = useRef<HTMLInputElement>(null);
  const q = useDebounced(text.trim(), 200);
  const search = useQuery({ ...ingredientSearchQuery(q), enabled: open && q.length >= 1 });
  const items = search.data?.items ?? [];

  // Closed, the box shows the chosen ingredient's name (again after a pick, a reset or an Escape).
  const [synced, setSynced] = useState({ name: value?.name, open });
  if (synced.name !== value?.name || synced.open !== open) {
    setSynced({ name: value?.name, open });
    if (!open) setText(value?.name ?? '');
  }

  const pick = (dto: IngredientDto) => {
    onPick(pickedFrom(dto));
    setText(dto.name);
    setOpen(false);
  };

  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key === 'ArrowDown') {
      e.preventDefault();
      setOpen(true);
      setActive((a) => Math.min(a + 1, Math.max(items.length - 1, 0)));
    } else if (e.key === 'ArrowUp') {
      e.preventDefault();
      setActive((a) => Math.max(a - 1, 0));
    } else if (e.key === 'Enter') {
      if (open && items[active]) {
        e.preventDefault();
        pick(items[active]);
      }
    } else if (e.key === 'Escape') {
      if (open) {
        e.preventDefault();
        setOpen(false);
        setText(value?.name ?? '');
      }
    }
  };

  const showList = open && q.length >= 1;
  return (
    <div className="relative flex flex-col gap-1">
      <label htmlFor={id} className={hideLabel ? 'sr-only' : 'text-sm font-bold text-ink'}>
        {label}
      </label>
      <input
        ref={inputRef}
        id={id}
        role="combobox"
        aria-expanded={showList}
        aria-controls={listId}
        aria-autocomplete="list"
        aria-activedescendant={showList && items[active] ? `${listId}-${items[active].id}` : undefined}
        aria-invalid={!!error}
        aria-describedby={error ? errId : undefined}
        autoComplete="off"
        placeholder="Search ingredients"
        className="min-h-11 w-full rounded-lg border border-line-strong bg-paper-card px-3 py-2 text-ink aria-[invalid=true]:border-signal"
        value={text}
        onChange={(e) => {
          setText(e.target.value);
          setOpen(true);
          setActive(0);
        }}
        onFocus={() => text && setOpen(true)}
        onBlur={() => setTimeout(() => setOpen(false), 150)}
        onKeyDown={onKeyDown}
      />
      <ul
        id={listId}
        role="listbox"
        aria-label={`${label}: matches`}
        hidden={!showList}
        className="absolute left-0 right-0 top-full z-20 mt-1 max-h-72 overflow-auto rounded-lg border border-line-strong bg-paper-card shadow-tray"
      >
        {search.isFetching && items.length === 0 && <li className="px-3 py-2 text-sm text-ink-faint">Searching…</li>}
        {!search.isFetching && items.length === 0 && <li className="px-3 py-2 text-sm text-ink-faint">No ingredient matches “{q}”.</li>}
        {items.map((dto, i) => (
          <li
            key={dto.id}
            id={`${listId}-${dto.id}`}
            role="option"
            aria-selected={i === active}
            className={`cursor-pointer px-3 py-2 ${i === active ? 'bg-ink text-paper-card' : 'text-ink hover:bg-paper-deep'}`}
            onMouseDown={(e) => {
              e.preventDefault();
              pick(dto);
            }}
            onMouseEnter={() => setActive(i)}
          >
            <span className="font-bold">{dto.name}</span>
            <span className="num ml-2 text-sm opacity-80">
              {dto.per100g.kcal} kcal · {dto.per100g.netCarbsG} g net carbs /100 g
              {dto.shared ? '' : ' · mine'}
            </span>
          </li>
        ))}
      </ul>
      {error && (
        <p id={errId} role="alert" className="text-sm font-bold text-signal">
          <span aria-hidden>⚠</span> {error}
        </p>
      )}
    </div>
  );
}
