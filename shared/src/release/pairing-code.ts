/**
 * Pairing codes, defined once for the server that makes them, the kiosk that shows them and the
 * studio that takes them typed. No 0/O, 1/I/L or U/V pairs: a code read off a screen across a
 * gallery is typed right.
 */
export const PAIRING_ALPHABET = '23456789ABCDEFGHJKMNPQRSTWXYZ';
export const PAIRING_CODE_LENGTH = 6;

/** What a technician typed, as the kiosk shows it: upper case, the spaces and dashes people add dropped. */
export const normalisePairingCode = (typed: string) => typed.toUpperCase().replace(/[\s-]/g, '');

/** Whether the typed text can be a pairing code at all, before asking the server. */
export const looksLikePairingCode = (typed: string) => {
  const code = normalisePairingCode(typed);
  return code.length === PAIRING_CODE_LENGTH && [...code].every((character) => PAIRING_ALPHABET.includes(character));
};
