import bcrypt from 'bcryptjs';

export function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(password, cost);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

const dummyHashes = new Map<number, Promise<string>>();

/**
 * Spend the same bcrypt time as a real check when there is no hash to compare against
 * (unknown e-mail, account without a password), so response time does not reveal which
 * e-mail addresses have accounts.
 */
export async function spendPasswordCheckTime(password: string, cost: number): Promise<false> {
  let dummy = dummyHashes.get(cost);
  if (!dummy) {
    dummy = bcrypt.hash('quietlayer-timing-equaliser', cost);
    dummyHashes.set(cost, dummy);
  }
  await bcrypt.compare(password, await dummy);
  return false;
}
