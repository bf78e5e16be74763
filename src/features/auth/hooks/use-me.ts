import { useSuspenseQuery } from '@tanstack/react-query';
import type { MeDto } from '@shared/schemas/auth.schema';
import { meQuery } from '../api/auth.queries';

/** The signed-in person inside the app shell (the shell's loader guarantees one). */
export function useMe(): MeDto {
  const { data } = useSuspenseQuery(meQuery());
  if (!data) throw new Error('Not signed in');
  return data;
}
