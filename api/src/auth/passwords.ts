import bcrypt from 'bcryptjs';

const COST = 10;
// Compared against when the address is unknown, so a miss takes as long as a wrong password.
const DECOY_HASH = bcrypt.hashSync('kelvindex-decoy-password', COST);

export const MIN_PASSWORD_LENGTH = 10;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, COST);
}

export function checkPassword(password: string, hash: string | null | undefined): Promise<boolean> {
  return bcrypt.compare(password, hash ?? DECOY_HASH).then((ok) => ok && !!hash);
}
