import { hash, verify } from "@node-rs/argon2";

// argon2id with the OWASP Password Storage Cheat Sheet's first option (m=19 MiB, t=2, p=1).
const OPTIONS = { memoryCost: 19_456, timeCost: 2, parallelism: 1 } as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, OPTIONS);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    // A malformed stored hash is a failed sign-in, never a crash of the sign-in route.
    return false;
  }
}
