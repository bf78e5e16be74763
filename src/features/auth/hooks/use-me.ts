import { useSuspenseQuery } from '@tanstack/react-query';
import type { MeDto } from '@shared/schemas/auth.schema';
import { meQuery } from '../api/auth.queries';
import { useSessionEnded } from '../components/session-ended';

/**
 * The signed-in person inside the app shell (the shell's loader guarantees one). When their session ends under an
 * open page, the page keeps showing (with what was typed) under the "Signed out" dialog: it is still theirs.
 */
export function useMe(): MeDto {
  const me = useSignedInOrLeaving();
  if (!me) throw new Error('Not signed in');
  return me;
}

/**
 * As useMe, or null for the moment between signing out (or being found signed out with nobody's page open) and the
 * sign-in page showing: the app's frame draws nothing of the signed-in area meanwhile, rather than an error.
 */
export function useSignedInOrLeaving(): MeDto | null {
  const { data } = useSuspenseQuery(meQuery());
  const ended = useSessionEnded();
  return data ?? ended;
}
