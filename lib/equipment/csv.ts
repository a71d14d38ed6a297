/**
 * Small CSV reader and writer (RFC 4180: commas, double-quoted fields, "" for a quote inside quotes,
 * CRLF or LF line ends). Also reads tab-separated text as pasted from a spreadsheet.
 */
export function parseDelimited(text: string, delimiter = ','): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  const src = text.replace(/^\uFEFF/, '');
  for (let i = 0; i < src.length; i++) {
    const ch = src[i];
    if (quoted) {
      if (ch === '"' && src[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"' && field === '') quoted = true;
    else if (ch === delimiter) {
      row.push(field);
      field = '';
    } else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && src[i + 1] === '\n') i++;
      row.push(field);
      rows.push(row);
      row = [];
      field = '';
    } else field += ch;
  }
  if (field !== '' || row.length > 0) {
    row.push(field);
    rows.push(row);
  }
  return rows.filter((r) => r.some((c) => c.trim() !== '')).map((r) => r.map(unneutralise));
}

const needsQuotes = /[",\r\n]/;
/** Text a spreadsheet would run as a formula (OWASP "CSV Injection": =, +, -, @, tab, carriage return). */
const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * One CSV cell. Text that a spreadsheet would take for a formula is neutralised as OWASP's CSV Injection
 * guidance says: a leading single quote, and the cell quoted. Numbers we write ourselves stay numbers.
 */
export function csvCell(v: string | number | null | undefined): string {
  if (v === null || v === undefined) return '';
  if (typeof v === 'number') return String(v);
  const s = FORMULA_START.test(v) ? `'${v}` : v;
  return needsQuotes.test(s) || s !== v ? `"${s.replace(/"/g, '""')}"` : s;
}

export function toCsv(rows: (string | number | null | undefined)[][]): string {
  return rows.map((r) => r.map(csvCell).join(',')).join('\r\n') + '\r\n';
}

/** Undoes csvCell's neutralising quote, so an exported file imports again unchanged. */
export function unneutralise(cell: string): string {
  return cell.length > 1 && cell[0] === "'" && FORMULA_START.test(cell.slice(1)) ? cell.slice(1) : cell;
}
