import { hash, verify } from "@node-rs/argon2";

// argon2id with the OWASP Password Storage Cheat Sheet's minimum parameters
// (m = 19 MiB, t = 2, p = 1); about 28 ms per hash on this class of machine (STACK.md).
const ARGON2_OPTIONS = { memoryCost: 19_456, timeCost: 2, parallelism: 1, outputLen: 32 } as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, ARGON2_OPTIONS);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    // A malformed stored hash must read as "wrong password", never as a server error.
    return false;
  }
}

let dummyHash: Promise<string> | undefined;

/**
 * Spends the same time as a real password check, for sign-ins to addresses that have no
 * account, so response times do not reveal which e-mail addresses are registered.
 */
export async function verifyDummyPassword(password: string): Promise<false> {
  dummyHash ??= hashPassword("satura-timing-equaliser");
  await verifyPassword(await dummyHash, password);
  return false;
}
