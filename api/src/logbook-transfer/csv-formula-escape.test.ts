import { describe, expect, it } from 'vitest';
import { escapeFormula, unescapeFormula } from './csv-formula-escape.js';

// The trigger characters are OWASP's "CSV Injection" list (= + - @ tab carriage return); the quote
// prefix is its recommended escape (common practice).
describe('escapeFormula / unescapeFormula', () => {
  it('prefixes a quote to text a spreadsheet could run as a formula', () => {
    expect(escapeFormula('=SUM(A1)')).toBe("'=SUM(A1)");
    expect(escapeFormula('+1 rye')).toBe("'+1 rye");
    expect(escapeFormula('-ish smell')).toBe("'-ish smell");
    expect(escapeFormula('@home')).toBe("'@home");
    expect(escapeFormula('\tindented')).toBe("'\tindented");
    expect(escapeFormula('\rreturn')).toBe("'\rreturn");
  });

  it('leaves plain numbers, negative ones included, and other text alone', () => {
    for (const cell of ['-3', '-2.5', '+4', '-.5', '-1e-7', '20', '', 'bubbles', 'a=b', ' -x', "'tis ripe"]) {
      expect(escapeFormula(cell)).toBe(cell);
    }
    expect(escapeFormula('-3 ')).toBe("'-3 ");
    expect(escapeFormula('-2+3')).toBe("'-2+3");
  });

  it("escapes a text's own leading quote only where the import would take it for an escape", () => {
    expect(escapeFormula("'=x")).toBe("''=x");
    expect(escapeFormula("''")).toBe("'''");
    expect(escapeFormula("'")).toBe("'");
  });

  it('round-trips every kind of cell', () => {
    const cells = [
      '=SUM(A1)',
      '-ish smell',
      '@home',
      '\tx',
      '-3',
      '-2.5',
      "'=x",
      "''",
      "'",
      "'tis",
      "'-3",
      'plain',
      '',
    ];
    for (const cell of cells) expect(unescapeFormula(escapeFormula(cell))).toBe(cell);
  });

  it('reads a quote in a third-party file as an escape only before a trigger or another quote', () => {
    expect(unescapeFormula("'-3")).toBe('-3');
    expect(unescapeFormula("'=A1")).toBe('=A1');
    expect(unescapeFormula("''x")).toBe("'x");
    expect(unescapeFormula("'tis ripe")).toBe("'tis ripe");
    expect(unescapeFormula("'97 rye")).toBe("'97 rye");
    expect(unescapeFormula(" '=x")).toBe(" '=x");
  });
});
