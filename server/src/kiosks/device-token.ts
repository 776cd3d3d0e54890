import { newToken } from '../common/tokens.js';

/** Device tokens carry a prefix so every guard can tell a kiosk's credential from a person's at a glance. */
const PREFIX = 'mpk_';

export const newDeviceToken = (): string => `${PREFIX}${newToken()}`;

export const isDeviceToken = (token: string): boolean => token.startsWith(PREFIX);

/** The bearer token of a request, if it sent one. */
function bearerOf(authorization: string | undefined): string | null {
  const [scheme, token] = (authorization ?? '').split(' ');
  return scheme === 'Bearer' && token ? token : null;
}

/** What a request's Authorization header carries, as every kiosk route reads it. */
export type Credential = { kind: 'none' } | { kind: 'person' } | { kind: 'device'; token: string };

/** The one reading of a request's credential for the kiosk routes, the early manifest poll included. */
export function credentialOf(authorization: string | undefined): Credential {
  const token = bearerOf(authorization);
  if (token === null) return { kind: 'none' };
  return isDeviceToken(token) ? { kind: 'device', token } : { kind: 'person' };
}
