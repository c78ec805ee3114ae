/** A sentence pattern and how to say it in another language from its captured parts. */
export type SentenceRule = [RegExp, (...groups: string[]) => string | undefined];

/**
 * One sentence in another language from a table: a fixed twin first, else the first pattern that
 * matches says it from its parts (its answer, undefined included, is final); undefined when neither.
 */
export function sentenceTable(
  fixed: Readonly<Record<string, string>>,
  rules: readonly SentenceRule[],
): (sentence: string) => string | undefined {
  return (sentence) => {
    const twin = fixed[sentence];
    if (twin !== undefined) return twin;
    for (const [pattern, say] of rules) {
      const m = pattern.exec(sentence);
      if (m) return say(...m.slice(1));
    }
    return undefined;
  };
}
