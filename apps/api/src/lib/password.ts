import { hash, verify } from '@node-rs/argon2';

/** @node-rs/argon2's Algorithm.Argon2id (a const enum, so spelled out here). */
const ARGON2ID = 2;

/**
 * argon2id at OWASP Password Storage Cheat Sheet's first recommended setting:
 * m = 19 MiB (19456 KiB), t = 2 iterations, p = 1.
 */
export const PASSWORD_HASH_PARAMS = {
  algorithm: ARGON2ID,
  memoryCost: 19456,
  timeCost: 2,
  parallelism: 1,
} as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, PASSWORD_HASH_PARAMS);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

/** A real hash to verify against when no account matches, so timing does not reveal accounts. */
let decoy: Promise<string> | undefined;
export async function verifyAgainstDecoy(password: string): Promise<false> {
  decoy ??= hashPassword('decoy-password-not-used');
  await verifyPassword(await decoy, password);
  return false;
}
