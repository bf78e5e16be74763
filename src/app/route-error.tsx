import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { ErrorState } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useDocumentTitle } from '@/lib/use-document-title';

/** Per-route error boundary: a section's failure stays in that section. */
export function RouteError() {
  const error = useRouteError();
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFoundPage />;
  return (
    <div className="mx-auto max-w-2xl p-6">
      <ErrorState error={error} retry={() => window.location.reload()} />
    </div>
  );
}

export function NotFoundPage() {
  useDocumentTitle('Page not found');
  return (
    <div className="mx-auto flex max-w-xl flex-col gap-4 p-8">
      <h1 className="text-3xl">Nothing on this tray</h1>
      <p className="text-ink-soft">The page you asked for does not exist, or it is not yours to see.</p>
      <Link to={paths.home} className="font-bold underline">
        Back to the start
      </Link>
    </div>
  );
}
