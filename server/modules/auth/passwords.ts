import { hash, verify } from '@node-rs/argon2';

// argon2id with the library's recommended memory/time costs (OWASP Password Storage Cheat Sheet lists argon2id first).
const OPTIONS = { algorithm: 2 /* Algorithm.Argon2id (a const enum) */, memoryCost: 19456, timeCost: 2, parallelism: 1 } as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, OPTIONS);
}

export async function verifyPassword(hashed: string, password: string): Promise<boolean> {
  try {
    return await verify(hashed, password);
  } catch {
    return false;
  }
}

// Used when the e-mail is unknown, so a wrong e-mail costs as much time as a wrong password.
let dummy: Promise<string> | null = null;
export async function burnVerify(password: string): Promise<void> {
  dummy ??= hashPassword('trayline-timing-equaliser');
  await verifyPassword(await dummy, password);
}
