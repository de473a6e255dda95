import 'server-only';
import { hash, verify } from '@node-rs/argon2';

// Argon2id with the OWASP Password Storage Cheat Sheet's first listed parameter set (m = 19 MiB, t = 2, p = 1).
const ARGON2ID = { memoryCost: 19456, timeCost: 2, parallelism: 1, outputLen: 32 } as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, ARGON2ID);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

/** A hash of a password nobody knows, verified against when the e-mail is unknown so timing does not reveal accounts. */
let decoyHash: Promise<string> | undefined;
export function decoyPasswordHash(): Promise<string> {
  decoyHash ??= hashPassword('sillmark-decoy-password-never-used');
  return decoyHash;
}
