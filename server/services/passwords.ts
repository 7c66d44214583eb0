import argon2 from 'argon2';

/**
 * argon2id at OWASP Password Storage Cheat Sheet strength or above
 * (minimum listed there: m = 19 MiB, t = 2, p = 1).
 */
export const hashOptions = {
  type: argon2.argon2id,
  memoryCost: 19 * 1024, // KiB
  timeCost: 2,
  parallelism: 1,
} as const;

export const hashPassword = (password: string) => argon2.hash(password, hashOptions);

export async function verifyPassword(hash: string | null, password: string): Promise<boolean> {
  if (!hash) return false;
  try {
    return await argon2.verify(hash, password);
  } catch {
    return false;
  }
}

// A fixed hash to verify against when the e-mail is unknown, so a miss costs the same time as a hit.
let decoy: Promise<string> | undefined;
export const decoyHash = () => (decoy ??= hashPassword('gridkeep-decoy-password'));
