/** Phrase helpers every label table and reason uses, so lists and capitals read alike everywhere. */

/** ["a", "b", "c"] → "a, b and c" (or "a, b or c"); one word stays as it is; none gives "". */
export function joinWords(words: readonly string[], conjunction: 'and' | 'or' = 'and'): string {
  if (words.length <= 1) return words.join('');
  return `${words.slice(0, -1).join(', ')} ${conjunction} ${words[words.length - 1]}`;
}

/** "full sun or shade" → "Full sun or shade": a phrase from a table used as a heading or option. */
export function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/**
 * The words for several enum values in the enum's own order (not the record's), joined:
 * `wordsInOrder(['shade', 'full'], SUN_LEVELS, SUN_WORDS, 'or')` → "full sun or shade".
 */
export function wordsInOrder<T extends string>(
  values: readonly T[],
  order: readonly T[],
  words: Record<T, string>,
  conjunction: 'and' | 'or' = 'and',
): string {
  return joinWords(
    order.filter((v) => values.includes(v)).map((v) => words[v]),
    conjunction,
  );
}

/** A word table with each entry capitalised, for options and table cells: { full: "Full sun", … }. */
export function capitaliseAll<T extends string>(words: Record<T, string>): Record<T, string> {
  const out = {} as Record<T, string>;
  for (const key of Object.keys(words) as T[]) out[key] = capitalise(words[key]);
  return out;
}
