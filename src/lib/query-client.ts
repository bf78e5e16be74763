import { MutationCache, QueryClient } from '@tanstack/react-query';
import { toast } from 'sonner';
import { ApiError, errorMessage, wasShown } from './problem';

/**
 * Mutation failures with field errors are copied onto the form by the caller (meta.form = true); a failure the page
 * shows itself (errorMessage, applyServerErrors or markShown in the call's own onError) is not repeated; anything
 * else becomes a toast here, once.
 */
export function createQueryClient() {
  return new QueryClient({
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
    }),
  });
}

declare module '@tanstack/react-query' {
  interface Register {
    mutationMeta: { form?: boolean; silent?: boolean };
  }
}
