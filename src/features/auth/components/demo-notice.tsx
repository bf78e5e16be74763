import { useMe } from '../hooks/use-me';

/**
 * A one-line note shown in the seeded demo workspace, so invented people, plates and numbers are never taken for
 * real ones. Renders nothing in a real workspace.
 */
export function DemoNotice({ children }: { children: string }) {
  const me = useMe();
  if (!me.workspaceIsDemo) return null;
  return (
    <p className="no-print flex items-start gap-2 rounded-lg border border-dashed border-line-strong bg-paper-deep px-3 py-2 text-sm text-ink-soft" role="note">
      <span className="rounded bg-ink px-1.5 text-xs font-bold uppercase tracking-wide text-paper-card">Demo</span>
      <span>{children}</span>
    </p>
  );
}
