/**
 * The exact median: the middle value of an odd count, the mean of the two middle values of an
 * even one; null for no values. Sorting a copy keeps the caller's array as it was.
 */
export function median(values: readonly number[]): number | null {
  if (!values.length) return null;
  const sorted = [...values].sort((a, b) => a - b);
  const middle = sorted.length >> 1;
  return sorted.length % 2 ? sorted[middle]! : (sorted[middle - 1]! + sorted[middle]!) / 2;
}
