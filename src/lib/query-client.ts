import { MutationCache, QueryClient } from '@tanstack/react-query';
import { toast } from 'sonner';
import { ApiError, errorMessage, wasShown } from './problem';

/**
 * Mutation failures with field errors are copied onto the form by the caller (meta.form = true); a failure the page
 * shows itself (errorMessage, applyServerErrors or markShown in the call's own onError) is not repeated; anything
 * else becomes a toast here, once.
 */
export function createQueryClient() {
  const client: QueryClient = new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: (count, err) => !(err instanceof ApiError && err.status >= 400 && err.status < 500) && count < 2,
        refetchOnWindowFocus: true,
      },
    },
    mutationCache: new MutationCache({
      onError: (err, _vars, _ctx, mutation) => {
        if (err instanceof ApiError && err.status === 401) return;
        if (mutation.meta?.form && err instanceof ApiError && err.status === 400 && err.problem.errors) return;
        if (mutation.meta?.silent) return;
        // The call's own onError runs after this one, in the same task (TanStack Query settles the mutation, then
        // notifies its observer synchronously): by the next task the page has said whether it shows the error.
        setTimeout(() => {
          if (!wasShown(err)) toast.error(errorMessage(err));
        }, 0);
      },
      // A saved change can move numbers that other pages show from their own reads (a tray's amounts move its plates'
      // macros, the week board's cells and checks, the shopping list; a client's allergens the board's warnings):
      // every read in the cache is marked stale, so the next page that shows one reads it again, not 30 s later.
      // Nothing is read again now (the page on screen refreshes what it shows through its own mutation's callbacks);
      // a calculation that stores nothing (meta.readOnly) leaves the cache as it is.
      onSuccess: (_data, _vars, _ctx, mutation) => {
        if (mutation.meta?.readOnly) return;
        void client.invalidateQueries({ refetchType: 'none' });
      },
    }),
  });
  return client;
}

declare module '@tanstack/react-query' {
  interface Register {
    /** form: field errors go onto the form; silent: the page shows every failure; readOnly: computes, stores nothing. */
    mutationMeta: { form?: boolean; silent?: boolean; readOnly?: boolean };
  }
}
