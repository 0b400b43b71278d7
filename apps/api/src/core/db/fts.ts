/**
 * Turns what a user typed into an FTS5 query: every word must appear as a word prefix.
 * Only letters and digits pass, so `%`, `_`, quotes and FTS operators are plain text,
 * never wildcards or syntax. Returns null when nothing searchable is left.
 */
export function ftsPrefixQuery(text: string): string | null {
  const words = text.toLowerCase().match(/[\p{L}\p{N}]+/gu);
  if (!words) return null;
  return words.map((w) => `"${w}"*`).join(' ');
}
