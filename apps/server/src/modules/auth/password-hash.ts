import argon2 from 'argon2';

// OWASP password storage cheat sheet [S]: argon2id, m = 19 MiB, t = 2, p = 1 as the minimum configuration.
const ARGON2_OPTIONS = { type: argon2.argon2id, memoryCost: 19456, timeCost: 2, parallelism: 1 } as const;

/**
 * Hashes a password with argon2id.
 * @param password - the plain password
 * @returns the encoded hash (algorithm, parameters and salt included)
 * @example
 * user.passwordHash = await passwordHash('correct horse battery');
 */
export function passwordHash(password: string): Promise<string> {
  return argon2.hash(password, ARGON2_OPTIONS);
}

let dummyHash: Promise<string> | undefined;

/**
 * Checks a password against a stored hash. With no hash (unknown user or Google-only account) it
 * still spends the same work on a dummy hash, so response time does not reveal which e-mails exist.
 * @param hash - stored hash, or null
 * @param password - the attempt
 * @returns true when it matches
 * @example
 * if (!(await passwordMatches(user?.passwordHash ?? null, attempt))) throw new InvalidCredentialsError();
 */
export async function passwordMatches(hash: string | null, password: string): Promise<boolean> {
  if (!hash) {
    dummyHash ??= passwordHash('demandscape-timing-equaliser');
    await argon2.verify(await dummyHash, password);
    return false;
  }
  return argon2.verify(hash, password);
}
