import { z } from 'zod';

/**
 * The largest id or version PostgreSQL's `integer` holds (2^31 − 1). Ids and versions in requests are checked against
 * it, so a number past it is a 400 naming its field instead of a database range error.
 */
export const PG_INT_MAX = 2_147_483_647;
export const TOO_LARGE = { message: 'Too large for an id or a version: no such record' } as const;

const VERSION_NEEDED = { message: 'Send the version you started from (the record’s "version", a whole number from 1)' } as const;

/**
 * The version an edit started from (optimistic locking): an older one is a 409 with the current record; a missing
 * or malformed one is a 400 naming `version`.
 */
export const editVersion = z.number(VERSION_NEEDED).int(VERSION_NEEDED).min(1, VERSION_NEEDED).max(PG_INT_MAX, TOO_LARGE);

/** `editVersion` sent as text (a form post, a query string): coerced to a number first. */
export const editVersionText = z.coerce.number(VERSION_NEEDED).int(VERSION_NEEDED).min(1, VERSION_NEEDED).max(PG_INT_MAX, TOO_LARGE);
