/** Lines as one phrase for a list row: "3 × Butterfly milkweed, 2 × Wild bergamot". */
export function plantsLine(lines: readonly { commonName: string; count: number }[]): string {
  return lines.map((l) => `${l.count} × ${l.commonName}`).join(', ');
}
