import { describe, expect, it } from 'vitest';
import { hashPassword, PASSWORD_HASH_PARAMS, verifyPassword } from './password';

describe('password hashing', () => {
  // Source: OWASP Password Storage Cheat Sheet, Argon2id: m=19456 (19 MiB), t=2, p=1.
  it('when configured, then it uses argon2id at OWASP’s recommended minimum', () => {
    expect(PASSWORD_HASH_PARAMS).toMatchObject({ memoryCost: 19456, timeCost: 2, parallelism: 1 });
  });

  it('when a password is hashed, then the PHC string says argon2id v19 with those parameters', async () => {
    const phc = await hashPassword('keybed-demo');
    // PHC string format of the argon2 reference implementation (RFC 9106 defines the algorithm).
    expect(phc).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$[A-Za-z0-9+/]+\$[A-Za-z0-9+/]+$/);
    expect(phc).not.toContain('keybed-demo');
  });

  it('when verifying, then only the right password passes and a broken hash is simply false', async () => {
    const phc = await hashPassword('correct horse');
    expect(await verifyPassword(phc, 'correct horse')).toBe(true);
    expect(await verifyPassword(phc, 'Correct horse')).toBe(false);
    expect(await verifyPassword('not-a-hash', 'correct horse')).toBe(false);
  });

  it('when the same password is hashed twice, then the salts differ', async () => {
    expect(await hashPassword('same')).not.toBe(await hashPassword('same'));
  });
});
