/** The panel ids with one panel moved to a new index (clamped to the ends of the story). */
export function movedTo(ids: readonly number[], id: number, index: number): number[] {
  const from = ids.indexOf(id);
  if (from === -1) return [...ids];
  const to = Math.max(0, Math.min(ids.length - 1, index));
  const next = ids.filter((other) => other !== id);
  next.splice(to, 0, id);
  return next;
}
