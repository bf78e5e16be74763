import { useEffect, useState } from 'react';
import { QueryClientProvider } from '@tanstack/react-query';
import { RouterProvider } from 'react-router-dom';
import { Toaster } from 'sonner';
import { createQueryClient } from '@/lib/query-client';
import { onUnauthorized } from '@/lib/api-client';
import { authKeys } from '@/features/auth/api/auth.keys';
import { followDateOrder } from '@/features/auth/api/auth.queries';
import { paths } from '@/config/paths';
import { createRouter } from './router';

export function AppProviders() {
  const [queryClient] = useState(() => {
    const qc = createQueryClient();
    followDateOrder(qc);
    return qc;
  });
  const [router] = useState(() => createRouter(queryClient));
  useEffect(
    () =>
      // A 401 anywhere: forget the session and go to sign-in, then come back here.
      onUnauthorized(() => {
        queryClient.setQueryData(authKeys.me(), null);
        const here = router.state.location;
        if (here.pathname !== paths.signIn) {
          const next = encodeURIComponent(here.pathname + here.search + here.hash);
          void router.navigate(`${paths.signIn}?next=${next}`);
        }
      }),
    [queryClient, router],
  );
  return (
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
      <Toaster position="top-center" richColors closeButton />
    </QueryClientProvider>
  );
}
