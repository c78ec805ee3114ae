/** 1234 → "1,234"; tables show counts with separators. */
export function countWords(n: number): string {
  return n.toLocaleString('en-US');
}
