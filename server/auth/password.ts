import argon2 from 'argon2';

// argon2id with the library's defaults (64 MiB, 3 passes): memory-hard, per OWASP's password storage guidance.
export function hashPassword(plain: string): Promise<string> {
  return argon2.hash(plain, { type: argon2.argon2id });
}

export async function verifyPassword(hash: string, plain: string): Promise<boolean> {
  try {
    return await argon2.verify(hash, plain);
  } catch {
    return false;
  }
}

// Verified against when the e-mail is unknown, so a missing account takes as long as a wrong password.
let dummyHash: Promise<string> | undefined;
export function dummyPasswordHash(): Promise<string> {
  dummyHash ??= hashPassword('not-a-real-password-used-for-timing-only');
  return dummyHash;
}
