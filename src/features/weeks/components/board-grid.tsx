import { Fragment, memo, useCallback, useEffect, useMemo, useRef, useState } from 'react';
import {
  DndContext,
  KeyboardSensor,
  PointerSensor,
  useDraggable,
  useSensor,
  useSensors,
  type Announcements,
  type DragEndEvent,
  type DragMoveEvent,
} from '@dnd-kit/core';
import { allergenLabel } from '@shared/domain/allergens';
import type { AssemblyDto } from '@shared/schemas/assemblies.schema';
import type { BoardCellDto, BoardDayDto, BoardDto, CellInput } from '@shared/schemas/weeks.schema';
import type { WordedWarning } from '@shared/domain/week-check';
import { cellEatBy } from '@shared/domain/week-board';
import { Button } from '@/components/ui/button';
import { CheckField, SelectField, TextField } from '@/components/ui/field';
import { counted, filterByText } from '@/lib/words';
import { dayLabel, localToday } from '@/lib/dates';
import { FILTER_FROM, ListFilter } from '@/components/ui/list-filter';
import { PinnedDays } from './pinned-days';

/** A phone-sized screen (Tailwind's sm breakpoint, 640 px): the board starts on one day there. */
function narrowScreen(): boolean {
  return typeof window !== 'undefined' && typeof window.matchMedia === 'function' && window.matchMedia('(max-width: 639px)').matches;
}

/** The day a phone starts on: today when the board has it, else the board's first. */
function startDay(days: readonly string[]): string {
  const today = localToday();
  return days.includes(today) ? today : days[0];
}

export const cellId = (clientId: number, date: string, slot: string) => `cell|${clientId}|${date}|${slot}`;

/** Where a cell is, in words: the start of its accessible name, and what the live line says while a plate is over it. */
const cellWhere = (clientName: string, date: string, slot: string) => `${clientName}, ${dayLabel(date)}, ${slot}`;

function PaletteItem({ id, name, detail }: { id: number; name: string; detail: string }) {
  const { attributes, listeners, setNodeRef, transform, isDragging } = useDraggable({ id: `plate|${id}` });
  // The list item stays a plain <li>; the draggable (role="button" from dnd-kit) sits inside it.
  // touch-none: on a touch screen the browser would take the finger's move for a scroll and cancel the drag.
  return (
    <li>
      <div
        ref={setNodeRef}
        {...listeners}
        {...attributes}
        aria-roledescription="Plate you can drag onto the board"
        style={transform ? { transform: `translate3d(${transform.x}px, ${transform.y}px, 0)` } : undefined}
        className={`cursor-grab touch-none rounded-lg border border-line-strong bg-paper-card px-3 py-2 shadow-tray focus:outline-2 focus:outline-ink ${isDragging ? 'relative z-30 opacity-80' : ''}`}
      >
        <p className="font-bold">{name}</p>
        <p className="num text-xs text-ink-faint">{detail}</p>
      </div>
    </li>
  );
}

interface CellProps {
  id: string;
  cell: BoardCellDto | undefined;
  plateName: string | undefined;
  kcal: number | undefined;
  flags: WordedWarning[];
  selected: boolean;
  /** A plate is being dragged over this cell. */
  isOver: boolean;
  onSelect: (id: string) => void;
  /** Where the cell is (client, day, slot), for its accessible name. */
  where: string;
  /**
   * The meal slot's name, shown small above the plate when the week has more than one slot. Drawn by CSS from
   * data-slot (no element of its own: a 60-client board has 840 cells, and each element costs layout and paint).
   */
  slot?: string;
}

function Cell({ id, slot, cell, plateName, kcal, flags, selected, isOver, onSelect, where }: CellProps) {
  const blocked = flags.some((f) => f.severity === 'block');
  return (
    <button
      type="button"
      data-cell-id={id}
      data-slot={slot}
      onClick={() => onSelect(id)}
      aria-pressed={selected}
      aria-label={`${where}: ${cell ? (plateName ?? 'Plate') : 'empty'}${flags.length ? `, ${counted(flags.length, 'problem')}` : ''}`}
      className={`flex min-h-14 w-full flex-col items-start rounded-md border px-2 py-1 text-left text-xs ${
        slot ? 'before:text-[10px] before:uppercase before:text-ink-faint before:content-[attr(data-slot)]' : ''
      } ${
        isOver ? 'border-herb bg-herb-50' : blocked ? 'border-signal bg-signal-50' : flags.length ? 'border-caution bg-caution-50' : 'border-line bg-paper-card'
      } ${selected ? 'outline-2 outline-ink' : ''}`}
    >
      {cell ? (
        <>
          <span className="font-bold leading-tight">{plateName ?? 'Plate'}</span>
          <span className="num text-ink-faint">{kcal !== undefined ? `${Math.round(kcal)} kcal` : ''}</span>
          {cell.storage === 'frozen' && <span className="text-frost-700">❄ frozen</span>}
          {flags.length > 0 && (
            <span className={blocked ? 'font-bold text-signal-700' : 'text-caution-700'}>
              {blocked ? '✖' : '⚠'} {flags.length}
            </span>
          )}
        </>
      ) : (
        <span className="text-ink-faint">Empty</span>
      )}
    </button>
  );
}

type BoardClient = BoardDto['clients'][number];

interface ClientRowProps {
  client: BoardClient;
  days: string[];
  slots: string[];
  plates: Map<number, AssemblyDto>;
  /** This client's cells, day by day and slot by slot (undefined where empty). */
  cells: (BoardCellDto | undefined)[];
  /** This client's day checks, day by day. */
  checks: (BoardDayDto | undefined)[];
  /** The selected cell when it is in this row. */
  selected: string | null;
  /** The cell a plate is dragged over, when it is in this row. */
  over: string | null;
  onSelect: (id: string) => void;
}

/** Same props, element by element for the row's cells and checks (they keep their identity when unchanged). */
function sameRow(a: ClientRowProps, b: ClientRowProps): boolean {
  const sameItems = <T,>(x: readonly T[], y: readonly T[]) => x.length === y.length && x.every((v, i) => v === y[i]);
  return (
    a.client === b.client &&
    a.days === b.days &&
    a.slots === b.slots &&
    a.plates === b.plates &&
    a.selected === b.selected &&
    a.over === b.over &&
    a.onSelect === b.onSelect &&
    sameItems(a.cells, b.cells) &&
    sameItems(a.checks, b.checks)
  );
}

/**
 * One client's week on the board. Memoized: an edit gives a new board, but unchanged cells and day checks keep their
 * identity (the query cache shares equal parts), so only the rows whose cells or checks changed render again.
 */
const ClientRow = memo(function ClientRow({ client, days, slots, plates, cells, checks, selected, over, onSelect }: ClientRowProps) {
  return (
    <tr>
      <th scope="row" className="sticky left-0 z-10 w-36 min-w-36 border-r border-line bg-paper-card px-1 pr-2 text-left align-top text-sm">
        <span className="font-bold">{client.name}</span>
        {client.archived && (
          <span className="block text-xs text-ink-faint" title="Archived: on this week because they have plates on it">
            (archived)
          </span>
        )}
        <span className="num block text-xs text-ink-faint">
          ×{client.householdMultiplier} · {client.targets.targetKcal} kcal · ≤{client.targets.netCarbCapG} g
        </span>
        {client.allergens.length > 0 && <span className="block text-xs text-signal-700">⚠ {client.allergens.map(allergenLabel).join(', ')}</span>}
      </th>
      {days.map((date, d) => {
        const day = checks[d];
        return (
          <td key={date} className="min-w-28 align-top">
            <div className="flex flex-col gap-1">
              {slots.map((slot, k) => {
                const id = cellId(client.id, date, slot);
                const cell = cells[d * slots.length + k];
                const plate = cell ? plates.get(cell.assemblyId) : undefined;
                // A plate archived since it was planned stays on its cell, marked (no new cell can take it).
                const flags = (day?.warnings ?? []).filter((w) => 'slot' in w && w.slot === slot);
                return (
                  <Cell key={slot} id={id} slot={slots.length > 1 ? slot : undefined} cell={cell} plateName={plate && (plate.archived ? `${plate.name} (archived)` : plate.name)} kcal={plate?.macros.kcal} flags={flags} selected={selected === id} isOver={over === id} onSelect={onSelect} where={cellWhere(client.name, date, slot)} />
                );
              })}
              {day && (
                <p className="num text-[11px] leading-tight text-ink-soft" title="Day totals against the planned share of the client's targets">
                  {Math.round(day.totals.kcal)}/{client.targets.targetKcal} kcal · {day.totals.netCarbsG}/{client.targets.netCarbCapG} g net · {day.totals.proteinG}/
                  {client.targets.proteinG} g P
                  {day.warnings.some((w) => !('slot' in w)) && (
                    <span className="block font-bold text-caution-700">⚠ {day.warnings.filter((w) => !('slot' in w)).map((w) => w.kind.replace(/-/g, ' ')).join(', ')}</span>
                  )}
                </p>
              )}
            </div>
          </td>
        );
      })}
    </tr>
  );
}, sameRow);

export interface CellEdit {
  cells: CellInput[];
  label: string;
}

interface Props {
  board: BoardDto;
  busy: boolean;
  onEdit: (edit: CellEdit) => void;
  /** Only the clients with something flagged, when the page controls it (the week's problem list links to it). */
  onlyFlagged?: boolean;
  onOnlyFlagged?: (on: boolean) => void;
}

/** The week board: clients × days (× meal slots). Drag a plate onto a cell, or select a cell and pick a plate. */
export function BoardGrid({ board, busy, onEdit, onlyFlagged: flaggedProp, onOnlyFlagged }: Props) {
  const sensors = useSensors(useSensor(PointerSensor, { activationConstraint: { distance: 5 } }), useSensor(KeyboardSensor));
  const [selected, setSelected] = useState<string | null>(null);
  const [findPlate, setFindPlate] = useState('');
  // One day at a time or the whole week; a phone starts on one day (seven columns do not fit it), today's when on the board.
  const [startsNarrow] = useState(narrowScreen);
  const [shownDay, setShownDay] = useState<string | null>(() => (startsNarrow ? startDay(board.days) : null));
  const days = useMemo(() => (shownDay && board.days.includes(shownDay) ? [shownDay] : board.days), [shownDay, board.days]);
  // Archived plates stay on the cells that plan them but are not offered for new ones.
  const offered = useMemo(() => board.plates.filter((p) => !p.archived), [board.plates]);
  const palette = filterByText(offered, findPlate, (p) => [p.name, ...p.allergens.map(allergenLabel)]);
  const onSelect = useCallback((id: string) => setSelected((s) => (s === id ? null : id)), []);
  const plates = useMemo(() => new Map(board.plates.map((p) => [p.id, p])), [board.plates]);
  const cells = useMemo(() => new Map(board.cells.map((c) => [cellId(c.clientId, c.date, c.slot), c])), [board.cells]);
  const checks = useMemo(() => new Map(board.checks.map((c) => [`${c.clientId}|${c.date}`, c])), [board.checks]);
  // A long board (60 clients) is read a client at a time, or only where something needs fixing.
  const [findClient, setFindClient] = useState('');
  const [ownFlagged, setOwnFlagged] = useState(false);
  const onlyFlagged = flaggedProp ?? ownFlagged;
  const setOnlyFlagged = onOnlyFlagged ?? setOwnFlagged;
  const flagged = useMemo(() => new Set(board.checks.filter((c) => c.warnings.length > 0).map((c) => c.clientId)), [board.checks]);
  // The client whose cell is open stays while it is open: fixing its last warning does not take the row (and the
  // keyboard in its panel) away; it goes when the cell is closed.
  const openClient = selected ? Number(selected.split('|')[1]) : null;
  const rows = useMemo(() => {
    const some = onlyFlagged ? board.clients.filter((c) => flagged.has(c.id) || c.id === openClient) : board.clients;
    return filterByText(some, findClient, (c) => [c.name]);
  }, [board.clients, flagged, onlyFlagged, findClient, openClient]);

  const place = (clientId: number, date: string, slot: string, assemblyId: number | null, extra: Partial<CellInput> = {}) => {
    const old = cells.get(cellId(clientId, date, slot));
    onEdit({
      label: assemblyId ? `${plates.get(assemblyId)?.name ?? 'Plate'} on ${dayLabel(date)}` : `Empty ${dayLabel(date)}`,
      cells: [
        {
          clientId,
          date,
          slot,
          assemblyId,
          storage: extra.storage ?? (old?.assemblyId === assemblyId ? old?.storage : 'fridge') ?? 'fridge',
          prepDate: extra.prepDate !== undefined ? extra.prepDate : old?.assemblyId === assemblyId ? old?.prepDate : null,
          allergenOverrides: extra.allergenOverrides ?? (old?.assemblyId === assemblyId ? old?.allergenOverrides : []) ?? [],
        },
      ],
    });
  };

  // The cell under the drag, found from where it is on screen (no droppable per cell: registering 840 of them cost
  // more than drawing the board). A pointer drag aims with the pointer; a keyboard drag with the plate's centre.
  const [over, setOver] = useState<string | null>(null);
  const pointer = useRef<{ x: number; y: number } | null>(null);
  useEffect(() => {
    const track = (ev: PointerEvent) => {
      pointer.current = { x: ev.clientX, y: ev.clientY };
    };
    window.addEventListener('pointermove', track, { capture: true, passive: true });
    return () => window.removeEventListener('pointermove', track, { capture: true });
  }, []);
  const cellUnder = (e: DragMoveEvent | DragEndEvent): string | null => {
    let x: number, y: number;
    if (typeof PointerEvent !== 'undefined' && e.activatorEvent instanceof PointerEvent && pointer.current) {
      ({ x, y } = pointer.current);
    } else {
      const r = e.active.rect.current.translated;
      if (!r) return null;
      x = r.left + r.width / 2;
      y = r.top + r.height / 2;
    }
    for (const el of document.elementsFromPoint(x, y)) {
      const id = el.closest('[data-cell-id]')?.getAttribute('data-cell-id');
      if (id) return id;
    }
    return null;
  };
  // A move reported after the drop (the last arrow key's, late) must not bring the "Over …" line back.
  const dragging = useRef(false);
  const onDragMove = (e: DragMoveEvent) => {
    if (!dragging.current) return;
    const id = cellUnder(e);
    setOver((prev) => (prev === id ? prev : id));
  };
  const onDragEnd = (e: DragEndEvent) => {
    dragging.current = false;
    const id = cellUnder(e);
    setOver(null);
    if (!id) return;
    const [, plateId] = String(e.active.id).split('|');
    const [, clientId, date, slot] = id.split('|');
    place(Number(clientId), date, slot, Number(plateId));
  };
  const overWhere = useMemo(() => {
    if (!over) return null;
    const [, clientId, date, slot] = over.split('|');
    const client = board.clients.find((c) => c.id === Number(clientId));
    return client ? cellWhere(client.name, date, slot) : null;
  }, [over, board.clients]);
  // What a screen reader hears, in plate names and cell words (dnd-kit's defaults say internal ids). While moving,
  // the live line above names the cell under the plate.
  const lastWhere = useRef<string | null>(null);
  useEffect(() => {
    lastWhere.current = overWhere;
  }, [overWhere]);
  const plateOf = (activeId: string | number) => plates.get(Number(String(activeId).split('|')[1]))?.name ?? 'The plate';
  const announcements: Announcements = {
    onDragStart: ({ active }) => `Picked up ${plateOf(active.id)}. The arrow keys move it, Space drops it, Escape puts it back.`,
    onDragOver: () => undefined,
    onDragEnd: ({ active }) => (lastWhere.current ? `${plateOf(active.id)} dropped on ${lastWhere.current}.` : `${plateOf(active.id)} dropped outside the board.`),
    onDragCancel: ({ active }) => `${plateOf(active.id)} put back.`,
  };

  const sel = selected ? selected.split('|') : null;
  const selCell = selected ? cells.get(selected) : undefined;
  const selClient = sel ? board.clients.find((c) => c.id === Number(sel[1])) : undefined;
  const selFlags = sel ? (checks.get(`${sel[1]}|${sel[2]}`)?.warnings ?? []).filter((w) => !('slot' in w) || w.slot === sel[3]) : [];
  const selPlate = selCell ? plates.get(selCell.assemblyId) : undefined;
  const selEat = selCell && selPlate ? { portions: cellEatBy(selCell, selPlate.trays, board.prepDates) } : undefined;

  // The selected cell's details open in a row right under its client (on a long board the end of the grid is far
  // away), as wide as the visible part of the grid and pinned to its left edge while the grid scrolls sideways.
  const gridBox = useRef<HTMLDivElement>(null);
  const gridTable = useRef<HTMLTableElement>(null);
  const [panelWidth, setPanelWidth] = useState<number | null>(null);
  useEffect(() => {
    const el = gridBox.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    const ro = new ResizeObserver(() => setPanelWidth(Math.max(0, el.clientWidth - 12)));
    ro.observe(el);
    return () => ro.disconnect();
  }, []);
  const panel =
    sel && selClient ? (
      <section
        aria-label="Selected cell"
        className="sticky left-0 my-1 rounded-tray border border-line-strong bg-paper-card p-4 shadow-tray"
        style={panelWidth ? { width: panelWidth } : undefined}
      >
        <div className="mb-2 flex items-start justify-between gap-2">
          <h3 className="font-bold">
            {selClient.name} · {dayLabel(sel[2])} · {sel[3]}
          </h3>
          <Button size="sm" variant="ghost" onClick={() => setSelected(null)}>
            Close <span className="sr-only">the selected cell</span>
          </Button>
        </div>
        <div className="grid gap-3 sm:grid-cols-3">
          <SelectField label="Plate" value={selCell?.assemblyId ?? ''} disabled={busy} onChange={(e) => place(selClient.id, sel[2], sel[3], e.target.value ? Number(e.target.value) : null)}>
            <option value="">Empty</option>
            {board.plates
              .filter((p) => !p.archived || p.id === selCell?.assemblyId)
              .map((p) => (
                <option key={p.id} value={p.id}>
                  {p.name}
                  {p.archived ? ' (archived)' : ''}
                </option>
              ))}
          </SelectField>
          {selCell && (
            <>
              <SelectField label="Storage" value={selCell.storage} disabled={busy} onChange={(e) => place(selClient.id, sel[2], sel[3], selCell.assemblyId, { storage: e.target.value as 'fridge' | 'frozen' })}>
                <option value="fridge">Fridge</option>
                <option value="frozen">Freeze on prep day, thaw the evening before</option>
              </SelectField>
              <SelectField
                label="Portions from"
                value={selCell.prepDate ?? ''}
                disabled={busy}
                onChange={(e) => place(selClient.id, sel[2], sel[3], selCell.assemblyId, { prepDate: e.target.value || null })}
              >
                <option value="">Latest prep day before (default)</option>
                {board.prepDates.map((d) => (
                  <option key={d} value={d}>
                    Prep day {dayLabel(d)}
                  </option>
                ))}
              </SelectField>
            </>
          )}
        </div>
        {selEat && (
          <ul className="mt-3 flex flex-col gap-1 text-sm">
            {selEat.portions.map((p, i) => (
              <li key={i} className="text-frost-700">
                ❄ Prepped {dayLabel(p.prepDate)}, eat by <span className="num">{dayLabel(p.eatBy)}</span>
                {p.status !== 'ok' && <strong className="text-signal-700"> — {p.status.replace(/-/g, ' ')}</strong>}
                {p.remedies.map((r, j) => (
                  <span key={j} className="ml-2">
                    <Button
                      size="sm"
                      variant="secondary"
                      disabled={busy}
                      onClick={() =>
                        r.kind === 'freeze-and-thaw'
                          ? place(selClient.id, sel[2], sel[3], selCell!.assemblyId, { storage: 'frozen' })
                          : place(selClient.id, sel[2], sel[3], selCell!.assemblyId, { prepDate: r.prepDate })
                      }
                    >
                      {r.kind === 'freeze-and-thaw' ? `Freeze on prep day, thaw on the evening of ${dayLabel(r.thawReminderOn)}` : `Take it from prep day ${dayLabel(r.prepDate)}`}
                    </Button>
                  </span>
                ))}
              </li>
            ))}
          </ul>
        )}
        {selFlags.length > 0 && (
          <ul className="mt-3 flex flex-col gap-1 text-sm" aria-label="Problems of this cell">
            {selFlags.map((w, i) => (
              <li key={i} className={w.severity === 'block' ? 'font-bold text-signal-700' : 'text-caution-700'}>
                {w.severity === 'block' ? '✖' : '⚠'} {w.message}
              </li>
            ))}
          </ul>
        )}
        {selCell && selCell.allergenOverrides.length > 0 && (
          <p className="mt-2 text-sm">Allergen override: {selCell.allergenOverrides.map((o) => `${allergenLabel(o.allergen)} (${o.reason})`).join('; ')}</p>
        )}
      </section>
    ) : null;

  return (
    <DndContext
      sensors={sensors}
      accessibility={{ announcements }}
      onDragStart={() => (dragging.current = true)}
      onDragMove={onDragMove}
      onDragEnd={onDragEnd}
      onDragCancel={() => {
        dragging.current = false;
        setOver(null);
      }}
    >
      <p className="sr-only" aria-live="polite">
        {overWhere ? `Over ${overWhere}` : ''}
      </p>
      <div className="flex flex-col gap-4 2xl:flex-row">
        <aside className="2xl:w-56 2xl:shrink-0" aria-label="Plates">
          {/* Folded on a phone, where a cell is filled by tapping it and picking a plate (the board stays in reach). */}
          <details open={!startsNarrow}>
            <summary className="mb-2 cursor-pointer">
              <h2 className="inline text-lg font-bold">Plates</h2> <span className="text-sm text-ink-faint">({offered.length})</span>
            </summary>
            <p className="mb-2 text-xs text-ink-faint">Drag onto a cell (or focus, press Space, move with the arrow keys, Space to drop), or select a cell and pick one.</p>
            {offered.length >= FILTER_FROM && (
              <ListFilter label="Find a plate" placeholder="name or allergen" value={findPlate} onChange={setFindPlate} shown={palette.length} total={offered.length} className="mb-2" />
            )}
            <ul className="grid gap-2 sm:grid-cols-2 lg:grid-cols-3 2xl:flex 2xl:flex-col">
              {palette.map((p) => (
                <PaletteItem key={p.id} id={p.id} name={p.name} detail={`${Math.round(p.macros.kcal)} kcal · ${p.macros.netCarbsG} g net · ${p.macros.proteinG} g P`} />
              ))}
            </ul>
          </details>
        </aside>
        <div className="flex min-w-0 flex-1 flex-col gap-2">
          <SelectField
            label="Days shown"
            value={days.length === 1 ? days[0] : ''}
            onChange={(e) => {
              setShownDay(e.target.value || null);
              setSelected(null);
            }}
            className="sm:max-w-xs"
          >
            <option value="">The whole week</option>
            {board.days.map((d) => (
              <option key={d} value={d}>
                {dayLabel(d, true)} only
              </option>
            ))}
          </SelectField>
          {(board.clients.length > FILTER_FROM || flagged.size > 0) && (
            <div className="flex flex-wrap items-end gap-x-6 gap-y-1">
              {board.clients.length > FILTER_FROM && (
                <ListFilter label="Find a client" placeholder="name" value={findClient} onChange={setFindClient} shown={rows.length} total={board.clients.length} />
              )}
              {flagged.size > 0 && (
                <CheckField
                  data-only-flagged=""
                  label={`Only clients with something flagged (${flagged.size} of ${board.clients.length})`}
                  checked={onlyFlagged}
                  onChange={(e) => setOnlyFlagged(e.target.checked)}
                />
              )}
            </div>
          )}
          <PinnedDays gridBox={gridBox} table={gridTable} days={days} />
          {/* The grid scrolls sideways inside its card; the client column stays put. Focusable so arrow keys scroll it. */}
          <div
            ref={gridBox}
            role="region"
            aria-label="Week board, scrolls sideways"
            tabIndex={0}
            className="min-w-0 flex-1 overflow-x-auto rounded-lg border border-line bg-paper-card pb-1"
          >
            <table ref={gridTable} className={`w-full border-separate border-spacing-1 ${days.length > 1 ? 'min-w-[60rem]' : ''}`}>
              <caption className="caption-top px-1 pt-1 text-left text-xs text-ink-faint">
                Targets under each name and each day's totals count the board's meals ({board.slots.join(', ')}): the client's share of the day for them.
              </caption>
              <thead>
                <tr>
                  <th className="sticky left-0 z-20 bg-paper-card px-1 text-left text-sm">Client</th>
                  {days.map((d) => (
                    <th key={d} className="text-left text-sm font-bold">
                      {dayLabel(d)}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {rows.length === 0 && (
                  <tr>
                    <td colSpan={days.length + 1} className="p-3 text-ink-soft">
                      No client on this board {findClient.trim() ? `matches “${findClient.trim()}”` : 'has anything flagged'}.{' '}
                      <button
                        type="button"
                        className="min-h-11 font-bold underline"
                        onClick={() => {
                          setFindClient('');
                          setOnlyFlagged(false);
                        }}
                      >
                        Show every client
                      </button>
                    </td>
                  </tr>
                )}
                {rows.map((client) => (
                  <Fragment key={client.id}>
                    <ClientRow
                      client={client}
                      days={days}
                      slots={board.slots}
                      plates={plates}
                      cells={days.flatMap((date) => board.slots.map((slot) => cells.get(cellId(client.id, date, slot))))}
                      checks={days.map((date) => checks.get(`${client.id}|${date}`))}
                      selected={selected?.startsWith(`cell|${client.id}|`) ? selected : null}
                      over={over?.startsWith(`cell|${client.id}|`) ? over : null}
                      onSelect={onSelect}
                    />
                    {panel && selClient?.id === client.id && (
                      <tr>
                        <td colSpan={days.length + 1} className="p-0">
                          {panel}
                        </td>
                      </tr>
                    )}
                  </Fragment>
                ))}
              </tbody>
            </table>
          </div>
        </div>
      </div>

    </DndContext>
  );
}

/** Asks the coach for a reason when a plate contains one of the client's allergens. */
export function AllergenOverridePrompt({ message, busy, onConfirm, onCancel }: { message: string; busy: boolean; onConfirm: (reason: string) => void; onCancel: () => void }) {
  const [reason, setReason] = useState('');
  return (
    <div role="alertdialog" aria-label="Allergen conflict" className="flex flex-col gap-3 rounded-tray border-2 border-signal bg-signal-50 p-4">
      <p className="font-bold">✖ {message}</p>
      <TextField label="Reason to override (kept with the plan)" value={reason} onChange={(e) => setReason(e.target.value)} />
      <div className="flex gap-2">
        <Button variant="danger" disabled={reason.trim().length < 3} busy={busy} onClick={() => onConfirm(reason.trim())}>
          Override with this reason
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </div>
  );
}
