import { describe, expect, it } from 'vitest';
import { csvField, formulaCellProblem, startsLikeFormula } from './csv-cell.js';

// OWASP "CSV Injection": = + - @ (and tab, carriage return) at the start of a cell make spreadsheet
// programs run it as a formula; RFC 4180 for the quoting.
describe('CSV cells', () => {
  it.each(['=1+1', '+SUM(A1)', '-2+3', '@SUM(1)', '\t=1', '\r=1'])('treats %j as a formula', (text) => {
    expect(startsLikeFormula(text)).toBe(true);
    expect(csvField(text).replace(/^"/, '')).toMatch(/^'/);
    expect(formulaCellProblem(text)).toMatch(/formula/);
  });

  it.each(['-3.5', '+4', '12', 'Asclepias tuberosa', 'butterfly milkweed; pleurisy root', ''])(
    'leaves %j alone',
    (text) => {
      expect(startsLikeFormula(text)).toBe(false);
      expect(formulaCellProblem(text)).toBeNull();
    },
  );

  it('quotes commas, quotes and line breaks (RFC 4180) after neutralising', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a, "b"')).toBe('"a, ""b"""');
    expect(csvField('=HYPERLINK("x")')).toBe(`"'=HYPERLINK(""x"")"`);
    expect(csvField(null)).toBe('');
    expect(csvField(-2)).toBe('-2');
  });
});
