import argon2 from 'argon2';

/** argon2id with the library's defaults (OWASP-recommended parameters as of the library's release). */
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

/** A real hash of nothing, verified when the e-mail is unknown so both paths take the same time. */
let dummy: Promise<string> | undefined;
export function dummyHash(): Promise<string> {
  dummy ??= hashPassword('no account has this password ' + Math.random());
  return dummy;
}
