/** Password hashing with argon2id (@node-rs/argon2, library defaults). */
import { hash, verify } from '@node-rs/argon2';

export { PASSWORD_MIN_LENGTH } from './password-rules';

export function hashPassword(password: string): Promise<string> {
  return hash(password);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

/** A hash of a random string, verified against when the account does not exist, so timing tells nothing. */
let dummyHash: Promise<string> | undefined;
export function dummyPasswordHash(): Promise<string> {
  dummyHash ??= hash(`no-such-account-${Math.random()}`);
  return dummyHash;
}
