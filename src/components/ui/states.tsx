import type { ReactNode } from 'react';
import { errorMessage } from '@/lib/problem';
import { useDocumentTitle } from '@/lib/use-document-title';
import { useOnline } from '@/lib/online';
import { momentLabel } from '@/lib/dates';
import { Button } from './button';

/** Placeholder blocks while data loads. */
export function Skeleton({ className = 'h-6 w-full', label = 'Loading' }: { className?: string; label?: string }) {
  return <div role="status" aria-label={label} className={`animate-pulse rounded-md bg-paper-deep ${className}`} />;
}

export function PageSkeleton() {
  return (
    <div className="flex flex-col gap-4" role="status" aria-label="Loading page">
      <div className="h-9 w-1/3 animate-pulse rounded-md bg-paper-deep" />
      <div className="h-24 w-full animate-pulse rounded-md bg-paper-deep" />
      <div className="h-24 w-full animate-pulse rounded-md bg-paper-deep" />
    </div>
  );
}

export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="flex flex-col items-start gap-3 rounded-tray border-2 border-dashed border-line-strong bg-paper-card p-6">
      <h2 className="text-xl">{title}</h2>
      {children && <div className="text-ink-soft">{children}</div>}
      {action}
    </div>
  );
}

export function ErrorState({ error, retry }: { error: unknown; retry?: () => void }) {
  return (
    <div role="alert" className="flex flex-col items-start gap-3 rounded-tray border border-signal bg-signal-50 p-5">
      <p className="flex items-center gap-2 font-bold text-signal-700">
        <span aria-hidden>⚠</span> Could not load this
      </p>
      <p className="text-ink-soft">{errorMessage(error)}</p>
      {retry && (
        <Button variant="secondary" onClick={retry}>
          Try again
        </Button>
      )}
    </div>
  );
}

type Tone = 'warn' | 'block' | 'info' | 'cold';
const tones: Record<Tone, { box: string; icon: string }> = {
  warn: { box: 'border-caution bg-caution-50 text-ink', icon: '⚠' },
  block: { box: 'border-signal bg-signal-50 text-ink', icon: '✖' },
  info: { box: 'border-line-strong bg-paper-card text-ink', icon: 'ℹ' },
  cold: { box: 'border-frost bg-frost-50 text-ink', icon: '❄' },
};

/** A message with an icon and words (never colour alone). */
export function Notice({ tone = 'info', title, children }: { tone?: Tone; title?: string; children?: ReactNode }) {
  return (
    <div className={`flex gap-3 rounded-lg border-l-4 p-3 ${tones[tone].box}`} role={tone === 'block' ? 'alert' : 'note'}>
      <span aria-hidden className="text-lg leading-6">
        {tones[tone].icon}
      </span>
      <div className="flex flex-col gap-1">
        {title && <p className="font-bold">{title}</p>}
        {children && <div className="text-sm text-ink-soft">{children}</div>}
      </div>
    </div>
  );
}

/** A check added to a page (not the page itself) that failed: says which, with "Check again". */
export function CheckFailed({ title, retry }: { title: string; retry: () => void }) {
  return (
    <Notice tone="warn" title={title}>
      <Button variant="secondary" onClick={retry}>
        Check again
      </Button>
    </Notice>
  );
}

/** A page's heading; its title is the browser tab's too, unless `tabTitle` names the tab otherwise. */
export function PageHeader({ title, children, lead, tabTitle }: { title: string; lead?: ReactNode; children?: ReactNode; tabTitle?: string }) {
  useDocumentTitle(tabTitle ?? title);
  return (
    <header className="flex flex-wrap items-end justify-between gap-3">
      <div>
        <h1 className="text-3xl">{title}</h1>
        {lead && <p className="mt-1 text-ink-soft">{lead}</p>}
      </div>
      {children && <div className="no-print flex flex-wrap gap-2">{children}</div>}
    </header>
  );
}

export function Card({ children, className = '' }: { children: ReactNode; className?: string }) {
  return <section className={`rounded-tray bg-paper-card p-5 shadow-tray ${className}`}>{children}</section>;
}

/** A progress bar for long work. */
export function Progress({ value, max, label }: { value: number; max: number; label: string }) {
  const pct = max > 0 ? Math.round((value / max) * 100) : 0;
  return (
    <div className="flex flex-col gap-1">
      <div className="flex justify-between text-sm">
        <span>{label}</span>
        <span className="num">
          {value} / {max}
        </span>
      </div>
      <div role="progressbar" aria-label={label} aria-valuenow={value} aria-valuemin={0} aria-valuemax={max} className="h-3 overflow-hidden rounded-full bg-paper-deep">
        <div className="h-full bg-herb transition-all" style={{ width: `${pct}%` }} />
      </div>
    </div>
  );
}

/** What QueryView needs of a TanStack Query result. */
interface QueryLike<T> {
  isPending: boolean;
  isError: boolean;
  error: unknown;
  data: T | undefined;
  refetch: () => unknown;
}

/**
 * The three states every read shows before its content: `loading` while pending (a page skeleton by default), the
 * error with a retry, and `empty` when `isEmpty` says the data has nothing to show; otherwise `children(data)`.
 */
export function QueryView<T>({
  query,
  loading = <PageSkeleton />,
  isEmpty,
  empty,
  children,
}: {
  query: QueryLike<T>;
  loading?: ReactNode;
  isEmpty?: (data: T) => boolean;
  empty?: ReactNode;
  children: (data: T) => ReactNode;
}) {
  if (query.isPending) return <>{loading}</>;
  if (query.isError || query.data === undefined) return <ErrorState error={query.error} retry={() => void query.refetch()} />;
  if (isEmpty?.(query.data)) return <>{empty}</>;
  return <>{children(query.data)}</>;
}

/**
 * A line said while the device has no network (src/lib/online.ts), in a live region so that a screen reader hears it
 * come and go (the region itself stays, empty, while online). `children`: what it means where it shows.
 */
export function OfflineLine({ children, className = '' }: { children: ReactNode; className?: string }) {
  const online = useOnline();
  return (
    <div role="status" className="no-print">
      {!online && (
        <p className={`flex gap-2 rounded-lg border-l-4 border-caution bg-caution-50 p-3 text-sm ${className}`}>
          <span aria-hidden>⚠</span>
          <span>
            <b>You are offline.</b> {children}
          </span>
        </p>
      )}
    </div>
  );
}

/**
 * Said above what a page shows from the copy kept on this device (src/lib/device-copy.ts) because the server could
 * not be asked: when it was saved, what that means (`children`), and "Try again" while the device is online (the
 * server is out of reach). Offline, the app's frame already says so.
 */
export function KeptCopyNotice({
  what,
  savedAt,
  online,
  retry,
  retrying = false,
  children,
}: {
  what: string;
  savedAt: number;
  online: boolean;
  retry: () => void;
  retrying?: boolean;
  children: ReactNode;
}) {
  return (
    <Notice tone="warn" title={online ? `Trayline cannot be reached: this is your ${what} as saved on this device` : `Your ${what} as saved on this device`}>
      <p>
        Saved {momentLabel(new Date(savedAt).toISOString())}. {children}
      </p>
      {online && (
        <p className="mt-2">
          <Button variant="secondary" busy={retrying} onClick={retry}>
            Try again
          </Button>
        </p>
      )}
    </Notice>
  );
}
