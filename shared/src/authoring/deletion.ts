/**
 * How long a deleted panel or image stays restorable before the server purges it. Studio and
 * server read this one number: the studio never offers Undo for longer than the server keeps the row.
 */
export const DELETION_GRACE_MS = 10 * 60_000;
