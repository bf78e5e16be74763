import Papa from 'papaparse';
import Decimal from 'decimal.js';
import type { ImportProblem } from '@shared/schemas/csv-import.js';
import { HttpError } from '../http/errors.js';

/**
 * What every CSV import shares: reading the upload as text, the delimiter, rows with the file line each starts on,
 * the header's checks, cells as written, and the all-or-nothing refusal with its row-level report.
 */

export class ImportRejected extends HttpError {
  constructor(public readonly report: ImportProblem[]) {
    const msg = `The file was not imported: ${report.length} problem${report.length === 1 ? '' : 's'} (nothing was saved)`;
    super(400, 'import_rejected', msg, { errors: { file: [msg] }, report });
  }
}

/** Reads the upload as UTF-8 text; refuses binary content. */
export function csvText(buffer: Buffer): string {
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(buffer);
  } catch {
    throw new HttpError(415, 'unsupported_media_type', 'The file is not UTF-8 text: save it as "CSV UTF-8" and try again');
  }
  if (text.includes('\u0000')) throw new HttpError(415, 'unsupported_media_type', 'The file is not a CSV text file');
  return text.replace(/^\uFEFF/, '');
}

export interface CsvRow {
  line: number;
  cells: string[];
}

/**
 * The delimiter of the file, read off its header line (column names hold none): a comma, a semicolon (what a
 * spreadsheet writes where the comma is the decimal mark) or a tab. Papa Parse's own guess weighs the data lines too
 * and takes the decimal commas of a short semicolon file ("44,0;4,6") for delimiters.
 */
export function headerDelimiter(text: string): string {
  const header = /^[^\r\n]*/.exec(text)![0];
  const count = (d: string) => header.split(d).length - 1;
  return [';', '\t'].reduce((best, d) => (count(d) > count(best) ? d : best), ',');
}

/** Rows with the file line each starts on (quoted cells may span lines). */
function parseRows(text: string): { rows: CsvRow[]; problems: ImportProblem[] } {
  const rows: CsvRow[] = [];
  const problems: ImportProblem[] = [];
  let lastCursor = 0;
  let line = 1;
  Papa.parse<string[]>(text, {
    delimiter: headerDelimiter(text),
    skipEmptyLines: false,
    step: (res) => {
      const start = lastCursor;
      lastCursor = res.meta.cursor;
      const cells = res.data;
      for (const err of res.errors) problems.push({ line, column: 'row', reason: err.message });
      if (!(cells.length === 1 && cells[0].trim() === '')) rows.push({ line, cells });
      line += (text.slice(start, lastCursor).match(/\r\n|\r|\n/g) ?? []).length;
    },
  });
  return { rows, problems };
}

/** A data row of the file: its line and its cells by (lower-case) column name. */
export interface CsvRecord {
  line: number;
  cells: Record<string, string>;
}

/**
 * The file's rows checked against its header: unknown, repeated and missing columns, no data, too many rows, a
 * row with more or fewer cells than the header. `records` are the rows that can be read (none while the header
 * has problems); `report` lists every problem found so far.
 */
export function readCsv(
  text: string,
  opts: { columns: readonly string[]; required: readonly string[]; maxRows: number; nouns: string },
): { records: CsvRecord[]; report: ImportProblem[] } {
  const { rows, problems: report } = parseRows(text);
  if (!rows.length) return { records: [], report: [{ line: 1, column: 'row', reason: 'The file is empty' }] };
  const header = rows[0].cells.map((h) => h.trim().toLowerCase());
  const known = new Set(opts.columns);
  header.forEach((h) => {
    if (!known.has(h)) report.push({ line: rows[0].line, column: h || '(blank)', reason: `Unknown column; use: ${opts.columns.join(', ')}` });
  });
  header.forEach((h, i) => {
    if (header.indexOf(h) !== i) report.push({ line: rows[0].line, column: h, reason: 'This column appears twice' });
  });
  for (const col of opts.required) {
    if (!header.includes(col)) report.push({ line: rows[0].line, column: col, reason: 'Required column is missing' });
  }
  const data = rows.slice(1);
  if (!data.length) report.push({ line: rows[0].line + 1, column: 'row', reason: `The file has a header but no ${opts.nouns}` });
  if (data.length > opts.maxRows) {
    report.push({ line: data[opts.maxRows].line, column: 'row', reason: `At most ${opts.maxRows} ${opts.nouns} per file` });
  }
  if (report.length) return { records: [], report };
  const records: CsvRecord[] = [];
  for (const { line, cells } of data) {
    if (cells.length !== header.length) {
      report.push({ line, column: 'row', reason: `Has ${cells.length} cells; the header has ${header.length}` });
      continue;
    }
    records.push({ line, cells: Object.fromEntries(header.map((h, i) => [h, cells[i] ?? ''])) });
  }
  return { records, report };
}

/** A list in one cell: "milk; eggs", "milk | eggs" or "milk, eggs". */
export function splitList(cell: string): string[] {
  return cell
    .split(/[;|,]/)
    .map((s) => s.trim())
    .filter(Boolean);
}

/**
 * A cell as written, without the quote the export puts before a cell a spreadsheet would run as a formula (OWASP CSV
 * injection): "'=Sweet drops" reads back as "=Sweet drops", so a file exported and imported again names the same rows.
 */
export const unescapeFormula = (cell: string): string => (/^'[=+\-@\t\r]/.test(cell) ? cell.slice(1) : cell);

/** A record's cell, trimmed and unescaped ('' when the column is absent). */
export const cellOf = (rec: Record<string, string>, column: string): string => unescapeFormula((rec[column] ?? '').trim());

/** The same problem said once. */
export function dedupe(problems: ImportProblem[]): ImportProblem[] {
  const keys = new Set<string>();
  return problems.filter((p) => {
    const k = `${p.line}|${p.column}|${p.reason}`;
    if (keys.has(k)) return false;
    keys.add(k);
    return true;
  });
}

/** A stored decimal as an export writes it: "0.9500" → "0.95", none → "". */
export const plainDecimal = (v: string | number | null | undefined): string => (v === null || v === undefined ? '' : new Decimal(v).toString());
