import type { ReactNode } from 'react';
import { TrayMark } from '@/app/layout/app-shell';
import { useDocumentTitle } from '@/lib/use-document-title';
import { OfflineLine } from '@/components/ui/states';

export function AuthLayout({ title, children, lead }: { title: string; lead?: ReactNode; children: ReactNode }) {
  useDocumentTitle(title);
  return (
    <main className="flex min-h-screen items-start justify-center px-4 py-10 md:items-center">
      <div className="w-full max-w-md">
        <div className="mb-6 flex items-center gap-2 font-display text-3xl">
          <TrayMark className="h-9 w-9" /> Trayline
        </div>
        <OfflineLine className="mb-4">Signing in waits until you are back online.</OfflineLine>
        <section className="rounded-tray bg-paper-card p-6 shadow-tray">
          <h1 className="mb-1 text-2xl">{title}</h1>
          {lead && <p className="mb-4 text-ink-soft">{lead}</p>}
          {children}
        </section>
      </div>
    </main>
  );
}
