/** Lower-case, no accents, letters and digits only, single spaces: "Échinacea  Purpurea" → "echinacea purpurea". */
export function normaliseName(text: string): string {
  return text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, ' ')
    .trim();
}

/** The distinct trigrams of a normalised text, each word padded so starts and ends count. */
export function trigrams(normalised: string): string[] {
  const out = new Set<string>();
  for (const word of normalised.split(' ')) {
    if (!word) continue;
    const padded = `  ${word} `;
    for (let i = 0; i + 3 <= padded.length; i++) out.add(padded.slice(i, i + 3));
  }
  return [...out];
}
