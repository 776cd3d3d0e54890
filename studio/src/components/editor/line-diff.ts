export type DiffLine = { kind: 'same' | 'theirs' | 'yours'; text: string };

/**
 * A line-by-line comparison of two versions of a panel's text (longest common subsequence), so a
 * curator facing a save conflict sees which lines the other person changed and which they did.
 */
export function lineDiff(theirs: string, yours: string): DiffLine[] {
  const a = theirs ? theirs.split('\n') : [];
  const b = yours ? yours.split('\n') : [];
  const common: number[][] = Array.from({ length: a.length + 1 }, () => new Array<number>(b.length + 1).fill(0));
  for (let i = a.length - 1; i >= 0; i--) {
    for (let j = b.length - 1; j >= 0; j--) {
      common[i]![j] = a[i] === b[j] ? common[i + 1]![j + 1]! + 1 : Math.max(common[i + 1]![j]!, common[i]![j + 1]!);
    }
  }
  const lines: DiffLine[] = [];
  let i = 0;
  let j = 0;
  while (i < a.length || j < b.length) {
    if (i < a.length && j < b.length && a[i] === b[j]) {
      lines.push({ kind: 'same', text: a[i]! });
      i++;
      j++;
    } else if (j < b.length && (i === a.length || common[i]![j + 1]! >= common[i + 1]![j]!)) {
      lines.push({ kind: 'yours', text: b[j]! });
      j++;
    } else {
      lines.push({ kind: 'theirs', text: a[i]! });
      i++;
    }
  }
  return lines;
}
