// Spreadsheet formula injection: a CSV cell that begins with = + - @ tab or carriage return may be
// run as a formula when the file is opened in a spreadsheet program. The export escapes such text
// cells the common way (OWASP's "CSV Injection" advice): a leading single quote, which spreadsheets
// read as "this is text". The import undoes exactly that escaping, so export → import gives back
// the original text.
//
// The rule, both ways:
// - Export: a cell that is a plain number is never escaped (a temperature of -3 or -2.5 must stay a
//   number, so it sorts and re-imports as one; a number is not a formula). Any other cell that
//   begins with a trigger character gets a leading quote. So does a cell that begins with a quote
//   followed by a trigger character or another quote, which the import would otherwise mistake
//   for an escaped cell.
// - Import: a cell that begins with a quote followed by a trigger character or another quote loses
//   that first quote, and nothing else changes. A quote followed by anything else is the text's own
//   ("'tis ripe", "'97 rye") and stays. In a third-party file, "'-3" therefore reads as -3 and
//   "'=A1" as the text "=A1", as a program escaping the same common way meant them; a cell
//   beginning with two quotes loses one (rare, and the price of a lossless round trip).
//
// Papa's own escapeFormulae is not used: it leaves a cell's own leading quote alone, so the import
// could not tell the text "'=x" from an escaped "=x", and the round trip would lose a quote.

/** A number as our export writes it and our import reads it (e.g. 20, -2.5, .5, 1e-7). */
export const PLAIN_NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** A cell a spreadsheet may run as a formula. */
const FORMULA_START = /^[=+\-@\t\r]/;
/** A cell as the export escapes it: the quote, then what made it need one. */
const ESCAPED = /^'[=+\-@\t\r']/;

/** The cell as the export writes it. */
export function escapeFormula(cell: string): string {
  const risky = FORMULA_START.test(cell) && !PLAIN_NUMBER.test(cell);
  return risky || ESCAPED.test(cell) ? `'${cell}` : cell;
}

/** The cell as the export had it before escapeFormula. */
export function unescapeFormula(cell: string): string {
  return ESCAPED.test(cell) ? cell.slice(1) : cell;
}
