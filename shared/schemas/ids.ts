/**
 * The largest id or version PostgreSQL's `integer` holds (2^31 − 1). Ids and versions in requests are checked against
 * it, so a number past it is a 400 naming its field instead of a database range error.
 */
export const PG_INT_MAX = 2_147_483_647;
export const TOO_LARGE = { message: 'Too large for an id or a version: no such record' } as const;
