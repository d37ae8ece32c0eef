/** Compares two `major.minor.patch` versions (numerically; anything else sorts as text). */
export function compareVersions(a: string, b: string): number {
  const pa = a.split('.').map(Number);
  const pb = b.split('.').map(Number);
  if (pa.some(Number.isNaN) || pb.some(Number.isNaN)) return a.localeCompare(b);
  for (let i = 0; i < Math.max(pa.length, pb.length); i++) {
    const d = (pa[i] ?? 0) - (pb[i] ?? 0);
    if (d !== 0) return d;
  }
  return 0;
}

export const VERSION_PATTERN = /^\d+\.\d+\.\d+$/;

/** The next minor version after the highest one published (1.0.0 -> 1.1.0; 1.1.0 and 1.0.3 -> 1.2.0). */
export function nextVersion(published: readonly string[]): string {
  const valid = published.filter((v) => VERSION_PATTERN.test(v));
  if (valid.length === 0) return '1.0.0';
  const [major, minor] = [...valid].sort(compareVersions).at(-1)!.split('.').map(Number);
  return `${major}.${minor + 1}.0`;
}
