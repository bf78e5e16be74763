import type { ReactNode } from 'react';
import { Button } from './button';

/**
 * Previous / next buttons around "Page n of m" for a paged list. `back` and `forward` name the buttons (a newest-first
 * list says "Newer" / "Older"); `children` follow the buttons (e.g. "Updating…").
 */
export function Pager({
  page,
  pages,
  onPage,
  label,
  summary,
  back = 'Previous',
  forward = 'Next',
  children,
}: {
  page: number;
  pages: number;
  onPage: (page: number) => void;
  /** The navigation landmark's name, e.g. "Outbox pages". */
  label: string;
  /** Words after "Page n of m", e.g. "· 168 ingredients". */
  summary?: ReactNode;
  back?: string;
  forward?: string;
  children?: ReactNode;
}) {
  return (
    <nav aria-label={label} className="mt-4 flex flex-wrap items-center gap-3">
      <Button variant="secondary" size="sm" disabled={page <= 1} onClick={() => onPage(page - 1)}>
        {back}
      </Button>
      <span className="num text-sm" aria-live="polite">
        Page {page} of {pages}
        {summary}
      </span>
      <Button variant="secondary" size="sm" disabled={page >= pages} onClick={() => onPage(page + 1)}>
        {forward}
      </Button>
      {children}
    </nav>
  );
}
