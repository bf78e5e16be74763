import { useEffect, useState } from 'react';
import { QueryClientProvider } from '@tanstack/react-query';
import { RouterProvider } from 'react-router-dom';
import { Toaster } from 'sonner';
import { createQueryClient } from '@/lib/query-client';
import { onUnauthorized } from '@/lib/api-client';
import { authKeys } from '@/features/auth/api/auth.keys';
import { followDateOrder } from '@/features/auth/api/auth.queries';
import { paths } from '@/config/paths';
import { followUnauthorized, SessionGate } from '@/features/auth/components/session-ended';
import { createRouter } from './router';
import { followKeptPerson } from './offline';
import { followNetwork } from '@/lib/online';

/** The sign-in page, then back to where the router is. */
function signInPath(router: ReturnType<typeof createRouter>) {
  const here = router.state.location;
  return `${paths.signIn}?next=${encodeURIComponent(here.pathname + here.search + here.hash)}`;
}

export function AppProviders() {
  const [queryClient] = useState(() => {
    followNetwork();
    const qc = createQueryClient();
    followDateOrder(qc);
    followKeptPerson(qc);
    return qc;
  });
  const [router] = useState(() => createRouter(queryClient));
  useEffect(
    () =>
      // A 401 anywhere: under a signed-in page, the "Signed out" dialog (the page and its typing stay); with nobody
      // signed in, the sign-in page.
      onUnauthorized(
        followUnauthorized(queryClient, () => {
          queryClient.setQueryData(authKeys.me(), null);
          if (router.state.location.pathname !== paths.signIn) void router.navigate(signInPath(router));
        }),
      ),
    [queryClient, router],
  );
  return (
    <QueryClientProvider client={queryClient}>
      {/* Someone else signing in: a fresh load of the sign-in page, to their own start (this page may not be theirs);
          the browser asks first if typing would go. */}
      <SessionGate signInElsewhere={() => window.location.assign(paths.signIn)}>
        <RouterProvider router={router} />
      </SessionGate>
      <Toaster position="top-center" richColors closeButton />
    </QueryClientProvider>
  );
}
