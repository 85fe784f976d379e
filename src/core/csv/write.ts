// CSV writer. Source: IETF, RFC 4180 "Common Format and MIME Type for CSV Files" (2005), §2.
// Formula-injection defence: Source: OWASP, "CSV Injection" community page (accessed from memory),
// recommendation: prefix cells starting with = + - @ TAB CR with a single quote, and quote every field
// that contains the separator or a double quote.

/**
 * A decimal written with a fixed number of decimals, e.g. money in its currency's minor unit ("26.20", "150",
 * "1.250"); `text` is a plain decimal number (optional "-", digits, optional "." and digits), written as a number.
 */
export interface FixedCell {
  fixed: string;
}

/** A cell: text is escaped and neutralised; a finite number is written as a number; null/undefined = empty. */
export type CsvCell = string | number | FixedCell | null | undefined;

/** Whole minor units as a decimal with `digits` decimals, exactly (no floating point): 2620, 2 -> "26.20". */
export function fixedCell(minor: number, digits: number): FixedCell {
  const whole = Math.round(minor);
  const abs = String(Math.abs(whole)).padStart(digits + 1, '0');
  const text = digits === 0 ? abs : `${abs.slice(0, -digits)}.${abs.slice(-digits)}`;
  return { fixed: whole < 0 ? `-${text}` : text };
}

export interface CsvWriteOptions {
  /** Start with a UTF-8 byte order mark (U+FEFF) so spreadsheets read the file as UTF-8. Default false. */
  bom?: boolean;
  /** Prefix text cells starting with = + - @ TAB CR with "'" (OWASP). Default true. */
  neutralise?: boolean;
  /** Field separator; "," per RFC 4180, ";" for spreadsheets set to a decimal comma. Default ",". */
  delimiter?: ',' | ';' | '\t';
  /** Write number cells with a decimal comma (1,25), for ";" files read by decimal-comma spreadsheets. */
  decimalComma?: boolean;
}

export const BOM = '\uFEFF';

/** First characters a spreadsheet may read as the start of a formula (OWASP list). */
export const FORMULA_TRIGGERS = ['=', '+', '-', '@', '\t', '\r'] as const;

function startsWithTrigger(text: string): boolean {
  const rest = text.replace(/^'+/, '');
  return rest.length > 0 && (FORMULA_TRIGGERS as readonly string[]).includes(rest[0]);
}

/**
 * "'=1+2" for "=1+2"; other text unchanged. Numbers are never passed here: -5 stays a number.
 * Text that already starts with quotes before a trigger ("'=x") gets one more quote ("''=x") so that
 * unneutraliseText gives back exactly what was written.
 */
export function neutraliseText(text: string): string {
  return startsWithTrigger(text) ? `'${text}` : text;
}

/** Undo neutraliseText (used by the importer): drop one leading "'" when quotes then a trigger follow. */
export function unneutraliseText(text: string): string {
  return text.startsWith("'") && startsWithTrigger(text) ? text.slice(1) : text;
}

function field(cell: CsvCell, delimiter: string, neutralise: boolean, decimalComma: boolean): string {
  if (cell === null || cell === undefined) return '';
  if (typeof cell === 'number' || typeof cell === 'object') {
    if (typeof cell === 'number' && !Number.isFinite(cell)) return '';
    const plain = typeof cell === 'number' ? String(cell) : cell.fixed;
    const n = decimalComma ? plain.replace('.', ',') : plain;
    return n.includes(delimiter) ? `"${n}"` : n;
  }
  const text = neutralise ? neutraliseText(cell) : cell;
  // RFC 4180 §2.6: fields containing line breaks, double quotes or the separator are enclosed in quotes;
  // §2.7: a double quote inside is escaped by doubling it.
  if (text.includes('"') || text.includes(delimiter) || text.includes('\n') || text.includes('\r')) {
    return `"${text.replace(/"/g, '""')}"`;
  }
  return text;
}

/**
 * Rows to CSV text. RFC 4180 §2.1: every record ends with CRLF (including the last, which §2.2 allows).
 * A record that is a single empty field is written as `""` so it is not read back as a blank line.
 */
export function writeCsv(rows: readonly (readonly CsvCell[])[], options: CsvWriteOptions = {}): string {
  const delimiter = options.delimiter ?? ',';
  const neutralise = options.neutralise ?? true;
  const decimalComma = options.decimalComma ?? false;
  const body = rows
    .map((row) => {
      const line = row.map((c) => field(c, delimiter, neutralise, decimalComma)).join(delimiter);
      return line === '' && row.length === 1 ? '""' : line;
    })
    .map((line) => `${line}\r\n`)
    .join('');
  return (options.bom ? BOM : '') + body;
}
