import { newToken } from '../common/tokens.js';

/** Device tokens carry a prefix so every guard can tell a kiosk's credential from a person's at a glance. */
const PREFIX = 'mpk_';

export const newDeviceToken = (): string => `${PREFIX}${newToken()}`;

export const isDeviceToken = (token: string): boolean => token.startsWith(PREFIX);

/** The bearer token of a request, if it sent one. */
export function bearerOf(authorization: string | undefined): string | null {
  const [scheme, token] = (authorization ?? '').split(' ');
  return scheme === 'Bearer' && token ? token : null;
}
