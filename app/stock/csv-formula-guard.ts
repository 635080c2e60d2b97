/**
 * Keeps text in a CSV file from running as a spreadsheet formula ("CSV
 * injection"). Spreadsheet programs treat a cell that starts with =, +, -, @,
 * a tab or a carriage return as a formula; a leading apostrophe makes them
 * show it as text. Only text cells are guarded: numbers written as numbers,
 * negative ones too, stay numbers. Pure: no I/O.
 */

const formulaStart = /^[=+\-@\t\r]/;

/** The text with a leading apostrophe when a spreadsheet would read it as a formula. */
export function neutraliseFormula(text: string): string {
  return formulaStart.test(text) ? `'${text}` : text;
}

/** A CSV cell as written: text is guarded, numbers, booleans and empty cells pass unchanged. */
export function guardCell<Cell extends string | number | boolean | null>(
  cell: Cell,
): Cell {
  return (typeof cell === "string" ? neutraliseFormula(cell) : cell) as Cell;
}
