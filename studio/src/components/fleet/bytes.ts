/** "412 MB", in the studio language: storage at a glance, in decimal units as browsers report quotas. */
export function bytesText(bytes: number, language: string): string {
  const [unit, size] = bytes >= 1e9 ? ['gigabyte', 1e9] : bytes >= 1e6 ? ['megabyte', 1e6] : ['kilobyte', 1e3];
  return new Intl.NumberFormat(language, { style: 'unit', unit, maximumFractionDigits: 1 }).format(bytes / size);
}
