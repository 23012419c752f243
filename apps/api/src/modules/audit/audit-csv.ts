/**
 * CSV of audit events. Cells that a spreadsheet would read as a formula (starting with =, +, −,
 * @, tab or carriage return) get a leading apostrophe (OWASP, "CSV Injection").
 */
export function neutralizeCell(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

function quote(value: string): string {
  return /[",\n\r]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

export function toCsv(header: string[], rows: (string | number | null)[][]): string {
  const line = (cells: (string | number | null)[]) =>
    cells.map((c) => quote(neutralizeCell(c === null ? "" : String(c)))).join(",");
  return [line(header), ...rows.map(line)].join("\r\n") + "\r\n";
}
