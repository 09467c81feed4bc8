import { z } from 'zod';

export const Id = z.uuid({ error: 'Must be a valid id' });
export const IdParams = z.object({ id: Id });

export const Email = z
  .string({ error: 'E-mail is required' })
  .trim()
  .toLowerCase()
  .max(254, { error: 'E-mail is too long' })
  .pipe(z.email({ error: 'Enter a valid e-mail address' }));

/**
 * Password rule: at least 8 characters (NIST SP 800-63B §5.1.1.2 minimum for user-chosen secrets),
 * at most 256 so hashing cost stays bounded. No composition rules, as 800-63B advises.
 */
export const Password = z
  .string({ error: 'Password is required' })
  .min(8, { error: 'Use at least 8 characters' })
  .max(256, { error: 'Use at most 256 characters' });

export const PersonName = z
  .string({ error: 'Name is required' })
  .trim()
  .min(1, { error: 'Name is required' })
  .max(120, { error: 'Name is too long' });

/** Opaque single-use tokens from e-mailed links: 32 random bytes as base64url (43 characters). */
export const LinkToken = z.string().regex(/^[A-Za-z0-9_-]{32,128}$/, { error: 'This link is not valid' });
