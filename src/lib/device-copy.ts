import type { MeDto } from '@shared/schemas/auth.schema';

/**
 * Answers of the server kept on this device (localStorage), so that pages open without a network: a client's plan,
 * the shopping list in a store with no signal. Each answer is kept with the person it belongs to; the app forgets
 * them all as soon as the signed-in person is someone else or nobody, or signed in without "Keep me signed in"
 * (src/app/offline.ts). Kept KEEP_DAYS at most.
 */
const PREFIX = 'trayline.kept.';
const PERSON = `${PREFIX}person`;
const ANSWER = `${PREFIX}answer.`;
/** Raised whenever the shape of a kept answer (or of MeDto) changes: what an older build kept is then not read. */
const VERSION = 1;
export const KEEP_DAYS = 14;
const DAY_MS = 86_400_000;

interface KeptPerson {
  version: number;
  me: MeDto;
  savedAt: number;
}
interface KeptAnswer<T> {
  version: number;
  personId: number;
  workspaceId: number;
  savedAt: number;
  data: T;
}

function storage(): Storage | null {
  try {
    return typeof window === 'undefined' ? null : window.localStorage;
  } catch {
    return null; // storage refused (a browser setting): nothing is kept, nothing breaks
  }
}

function read<T>(key: string): T | null {
  try {
    const text = storage()?.getItem(key);
    return text ? (JSON.parse(text) as T) : null;
  } catch {
    return null;
  }
}

function write(key: string, value: unknown): void {
  try {
    storage()?.setItem(key, JSON.stringify(value));
  } catch {
    // Full or refused: the page works as before, only not offline.
  }
}

const fresh = (savedAt: unknown, now: number) => typeof savedAt === 'number' && now - savedAt <= KEEP_DAYS * DAY_MS && savedAt <= now + DAY_MS;

/**
 * Keeps the server's answer `name` for `me` (the person too: offline, they are taken as signed in). Nothing is kept
 * for a person signed in without "Keep me signed in" (a shared computer).
 */
export function keepAnswer<T>(name: string, me: MeDto, data: T, savedAt = Date.now()): void {
  if (me.staysSignedIn === false) return;
  write(PERSON, { version: VERSION, me, savedAt } satisfies KeptPerson);
  write(`${ANSWER}${name}`, { version: VERSION, personId: me.id, workspaceId: me.workspaceId, savedAt, data } satisfies KeptAnswer<T>);
}

/**
 * Keeps `data` as `name` for the person whose answers are kept here (what the device did on top of a kept answer,
 * such as shopping ticks not yet sent); with nobody's kept, nothing is kept.
 */
export function keepForKeptPerson<T>(name: string, data: T, savedAt = Date.now()): void {
  const me = keptPerson(savedAt);
  if (me) write(`${ANSWER}${name}`, { version: VERSION, personId: me.id, workspaceId: me.workspaceId, savedAt, data } satisfies KeptAnswer<T>);
}

/** The kept answer `name` of this person in this workspace, if there is one of this build's shape, fresh enough. */
export function keptAnswer<T>(name: string, me: Pick<MeDto, 'id' | 'workspaceId'>, now = Date.now()): { data: T; savedAt: number } | null {
  const kept = read<KeptAnswer<T>>(`${ANSWER}${name}`);
  if (!kept || kept.version !== VERSION || !fresh(kept.savedAt, now)) return null;
  if (kept.personId !== me.id || kept.workspaceId !== me.workspaceId) return null;
  return { data: kept.data, savedAt: kept.savedAt };
}

/** The person whose answers are kept here, while the newest of them is fresh enough. */
export function keptPerson(now = Date.now()): MeDto | null {
  const kept = read<KeptPerson>(PERSON);
  if (!kept || kept.version !== VERSION || !kept.me || !fresh(kept.savedAt, now)) return null;
  return kept.me;
}

/** The names of the kept answers that start with `prefix`. */
export function keptNames(prefix: string): string[] {
  const s = storage();
  if (!s) return [];
  const names: string[] = [];
  for (let i = 0; i < s.length; i++) {
    const key = s.key(i);
    if (key?.startsWith(`${ANSWER}${prefix}`)) names.push(key.slice(ANSWER.length));
  }
  return names;
}

export function forgetAnswer(name: string): void {
  try {
    storage()?.removeItem(`${ANSWER}${name}`);
  } catch {
    // nothing to do
  }
}

/** Forgets everything kept on this device. */
export function forgetKept(): void {
  const s = storage();
  if (!s) return;
  try {
    const keys: string[] = [];
    for (let i = 0; i < s.length; i++) {
      const key = s.key(i);
      if (key?.startsWith(PREFIX)) keys.push(key);
    }
    for (const key of keys) s.removeItem(key);
  } catch {
    // nothing to do
  }
}
