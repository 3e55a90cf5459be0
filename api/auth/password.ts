import { hash, verify, type Algorithm, type Options } from "@node-rs/argon2";

/**
 * argon2id with the OWASP Password Storage Cheat Sheet's first configuration
 * (19 MiB, 2 passes, 1 lane). The PHC string records the parameters, so raising them
 * later still verifies old hashes.
 */
const ARGON2ID_OPTIONS: Options = {
  // The package declares its Algorithm enum as a const enum, which isolatedModules cannot read; 2 is Argon2id.
  algorithm: 2 as Algorithm,
  memoryCost: 19_456,
  timeCost: 2,
  parallelism: 1,
};

/** Hashes a password for storage (argon2id PHC string). */
export function hashPassword(password: string): Promise<string> {
  return hash(password, ARGON2ID_OPTIONS);
}

/** Whether `password` matches `storedHash`; false (not an error) for a malformed hash. */
export async function verifyPassword(storedHash: string, password: string): Promise<boolean> {
  try {
    return await verify(storedHash, password);
  } catch {
    return false;
  }
}

let dummyHash: Promise<string> | null = null;

/**
 * Spends the same time as a real check when there is no account for the address, so
 * sign-in does not reveal by its speed which addresses have accounts.
 */
export async function verifyAgainstNobody(password: string): Promise<false> {
  dummyHash ??= hashPassword("no account has this password, it only costs time");
  await verifyPassword(await dummyHash, password);
  return false;
}
