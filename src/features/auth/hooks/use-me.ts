import { useSuspenseQuery } from '@tanstack/react-query';
import type { MeDto } from '@shared/schemas/auth.schema';
import { meQuery } from '../api/auth.queries';
import { useSessionEnded } from '../components/session-ended';

/**
 * The signed-in person inside the app shell (the shell's loader guarantees one). When their session ends under an
 * open page, the page keeps showing (with what was typed) under the "Signed out" dialog: it is still theirs.
 */
export function useMe(): MeDto {
  const { data } = useSuspenseQuery(meQuery());
  const ended = useSessionEnded();
  const me = data ?? ended;
  if (!me) throw new Error('Not signed in');
  return me;
}
