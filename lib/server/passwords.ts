// Passwords are stored as Argon2id hashes (RFC 9106), with the library's defaults for memory and time cost.
import { hash, verify } from "@node-rs/argon2";

export function hashPassword(password: string): Promise<string> {
  return hash(password);
}

// A real hash of a throw-away password: checking against it when the e-mail is unknown makes a
// miss take as long as a wrong password, so timing does not tell which accounts exist.
const DUMMY_HASH = "$argon2id$v=19$m=19456,t=2,p=1$7kPKQId6DT2VppLUhMyZPw$5AkFYF7ycIjRFi7mBfhP8HkV78KLbnE9UG4N4Sj8wYg";

export async function verifyPassword(passwordHash: string | null, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash ?? DUMMY_HASH, password);
  } catch {
    return false;
  }
}
