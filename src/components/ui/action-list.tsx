import type { ReactNode } from 'react';

/** A list of things, each with a line of detail and its own buttons on the right (the team, the devices signed in). */
export function ActionList({ label, children }: { label: string; children: ReactNode }) {
  return (
    <ul aria-label={label} className="flex flex-col">
      {children}
    </ul>
  );
}

/** One thing of an `ActionList`: its name (with `aside` in brackets), its `detail` line, and its `actions`. */
export function ActionRow({ title, aside, detail, actions }: { title: ReactNode; aside?: ReactNode; detail: ReactNode; actions?: ReactNode }) {
  return (
    <li className="flex flex-wrap items-center justify-between gap-x-4 gap-y-1 border-b border-line py-2">
      <div className="min-w-0">
        <p className="font-bold">
          {title}
          {aside && <span className="font-normal text-ink-soft"> ({aside})</span>}
        </p>
        <p className="text-sm text-ink-soft">{detail}</p>
      </div>
      {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
    </li>
  );
}
