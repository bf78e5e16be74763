import { useEffect, useRef, useState, type RefObject } from 'react';
import { dayLabel } from '@/lib/dates';

/**
 * The board's row of days, kept in sight while a long board (60 clients) goes by under it. The table's own header row
 * scrolls away with the page: the grid scrolls sideways inside its card, and a box that scrolls sideways cannot pin a
 * row to the window. This copy is pinned under the top of the window (under the phone's top bar) once that row has
 * gone above it, follows the grid's sideways scroll, takes each column's width from the table, and goes once the
 * board has gone too. The page keeps one scroll, so dragging a plate far down the board scrolls the window as before.
 * Hidden from screen readers, and from the pointer (a click goes to the board under it): the table's own header row
 * names every cell.
 */
export function PinnedDays({
  gridBox,
  table,
  days,
}: {
  gridBox: RefObject<HTMLDivElement | null>;
  table: RefObject<HTMLTableElement | null>;
  days: readonly string[];
}) {
  const pin = useRef<HTMLDivElement>(null);
  const copy = useRef<HTMLTableElement>(null);
  const corner = useRef<HTMLTableCellElement>(null);
  const [shown, setShown] = useState(false);
  const [widths, setWidths] = useState<{ table: number; cells: number[] } | null>(null);

  // Column widths as the table lays them out, again whenever it changes size (days shown, window, panel).
  useEffect(() => {
    const t = table.current;
    if (!t || typeof ResizeObserver === 'undefined') return;
    const measure = () => {
      const row = t.tHead?.rows[0];
      if (!row) return;
      setWidths({ table: t.offsetWidth, cells: [...row.cells].map((c) => c.getBoundingClientRect().width) });
    };
    const ro = new ResizeObserver(measure);
    ro.observe(t);
    measure();
    return () => ro.disconnect();
  }, [table, days.length]);

  // Shown while the table's header row is above the pin and some of the board is still below it.
  useEffect(() => {
    const box = gridBox.current;
    const t = table.current;
    if (!box || !t) return;
    let frame = 0;
    const check = () => {
      frame = 0;
      const head = t.tHead?.getBoundingClientRect();
      const at = pin.current?.getBoundingClientRect().top;
      if (!head || at === undefined) return;
      setShown(head.top < at && box.getBoundingClientRect().bottom > at + head.height * 2);
    };
    const later = () => {
      if (!frame) frame = requestAnimationFrame(check);
    };
    window.addEventListener('scroll', later, { passive: true });
    window.addEventListener('resize', later, { passive: true });
    // The board grows or shrinks without a scroll too (a client found, a cell's panel opened).
    const ro = typeof ResizeObserver === 'undefined' ? null : new ResizeObserver(later);
    ro?.observe(box);
    check();
    return () => {
      window.removeEventListener('scroll', later);
      window.removeEventListener('resize', later);
      ro?.disconnect();
      if (frame) cancelAnimationFrame(frame);
    };
  }, [gridBox, table]);

  // While it shows, what the keyboard focuses on the page stops below it, not under it (WCAG 2.2, 2.4.11); the
  // stylesheet's own padding (the phone's top bar) comes back when it goes.
  useEffect(() => {
    const root = document.documentElement;
    const row = copy.current;
    if (!shown || !row || !pin.current) return;
    root.style.scrollPaddingTop = `${pin.current.getBoundingClientRect().top + row.getBoundingClientRect().height + 8}px`;
    return () => {
      root.style.scrollPaddingTop = '';
    };
  }, [shown, widths]);

  // Follows the grid sideways; the Client corner stays put, as the table's own does.
  useEffect(() => {
    const box = gridBox.current;
    if (!box) return;
    // The table's corner is pinned at the box's edge once the scroll has taken up the table's spacing before it
    // (read once here, not on every scroll: this runs again whenever the copy is drawn anew).
    const spacing = copy.current ? parseFloat(getComputedStyle(copy.current).borderSpacing) || 0 : 0;
    const follow = () => {
      if (copy.current) copy.current.style.transform = `translateX(${-box.scrollLeft}px)`;
      if (corner.current) corner.current.style.transform = `translateX(${Math.max(0, box.scrollLeft - spacing)}px)`;
    };
    box.addEventListener('scroll', follow, { passive: true });
    follow();
    return () => box.removeEventListener('scroll', follow);
  }, [gridBox, shown, widths]);

  return (
    <div ref={pin} className="no-print pointer-events-none sticky top-[57px] z-20 h-0 md:top-0" aria-hidden="true" data-testid="pinned-days">
      {shown && widths && (
        <div className="overflow-hidden rounded-b-lg border-x border-b border-line bg-paper-card shadow-tray">
          <table ref={copy} className="table-fixed border-separate border-spacing-1" style={{ width: widths.table }}>
            <thead>
              <tr>
                <th ref={corner} className="relative z-10 bg-paper-card px-1 text-left text-sm ring-4 ring-paper-card" style={{ width: widths.cells[0] }}>
                  Client
                </th>
                {days.map((d, i) => (
                  <th key={d} className="text-left text-sm font-bold" style={{ width: widths.cells[i + 1] }}>
                    {dayLabel(d)}
                  </th>
                ))}
              </tr>
            </thead>
          </table>
        </div>
      )}
    </div>
  );
}
