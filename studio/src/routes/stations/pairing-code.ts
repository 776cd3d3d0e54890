/** Pairing codes use these characters only (no 0/O, 1/I/L, U/V), as the server makes them. */
const PAIRING_ALPHABET = /^[2-9A-HJKMNP-TW-Z]{6}$/;

/** What a technician typed, as the kiosk shows it: upper case, the spaces and dashes people add dropped. */
export const normalisePairingCode = (typed: string) => typed.toUpperCase().replace(/[\s-]/g, '');

/** Whether the typed text can be a pairing code at all, before asking the server. */
export const looksLikePairingCode = (typed: string) => PAIRING_ALPHABET.test(normalisePairingCode(typed));
