import { z } from 'zod';

/**
 * 254 characters at most: SMTP's path limit of 256 octets less its angle brackets (RFC 5321 §4.5.3.1.3, the figure
 * RFC 3696's errata 1690 settled on).
 */
export const EMAIL_MAX = 254;
const TOO_LONG = `Use at most ${EMAIL_MAX} characters`;
const NOT_AN_ADDRESS = 'Enter a valid e-mail address';
const address = z.email();

const typed = () => z.string().trim().toLowerCase().max(EMAIL_MAX, { message: TOO_LONG });

/** An e-mail address as people type it: trimmed, lower-cased, at most EMAIL_MAX characters. */
export const emailAddress = typed().pipe(z.email({ message: NOT_AN_ADDRESS }));

/**
 * An e-mail address that may be left out: '', null or absent are null. One string check (not a union with ''), so a
 * wrong address is answered with what is wrong with it rather than a union's "Invalid input".
 */
export const optionalEmailAddress = typed()
  .refine((v) => v === '' || address.safeParse(v).success, { message: NOT_AN_ADDRESS })
  .nullable()
  .optional()
  .transform((v) => (v ? v : null));
