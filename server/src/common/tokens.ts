import { createHash, randomBytes } from 'node:crypto';

/** A link or session token: 256 random bits, URL-safe. */
export const newToken = (): string => randomBytes(32).toString('base64url');

/** What we store instead of a token: a database leak must not hand out working links. */
export const hashToken = (token: string): string => createHash('sha256').update(token).digest('hex');
