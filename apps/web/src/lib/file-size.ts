const UNITS = ['bytes', 'KB', 'MB', 'GB', 'TB'];

/** "812 KB", "3.4 GB": powers of 1024, one decimal under 10 of a unit. */
export function fileSize(bytes: number): string {
  let v = bytes;
  let u = 0;
  while (v >= 1024 && u < UNITS.length - 1) {
    v /= 1024;
    u++;
  }
  if (u === 0) return `${v} bytes`;
  return `${v < 10 ? v.toFixed(1) : Math.round(v)} ${UNITS[u]}`;
}
