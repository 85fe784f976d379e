// CSV parser. Source: IETF, RFC 4180 "Common Format and MIME Type for CSV Files" (2005), §2 and the
// ABNF grammar there. Deliberate deviations (what spreadsheets write): LF or lone CR also end a record;
// a double quote inside an unquoted field is kept literally; a leading UTF-8 BOM is dropped.

export interface CsvParseError {
  /** 1-based record number (the header is record 1). */
  record: number;
  /** 1-based physical line where the problem is. */
  line: number;
  message: string;
}

export interface CsvParseResult {
  records: string[][];
  errors: CsvParseError[];
  /** The text started with a byte order mark. */
  hadBom: boolean;
}

/** Parse CSV text into records of fields. Never throws; problems come back in `errors`. */
export function parseCsv(text: string, delimiter: string = ','): CsvParseResult {
  const hadBom = text.startsWith('\uFEFF');
  const s = hadBom ? text.slice(1) : text;
  const records: string[][] = [];
  const errors: CsvParseError[] = [];
  let record: string[] = [];
  let fieldText = '';
  let line = 1;
  let i = 0;
  let atFieldStart = true;

  const endField = () => {
    record.push(fieldText);
    fieldText = '';
    atFieldStart = true;
  };
  const endRecord = () => {
    endField();
    records.push(record);
    record = [];
  };

  while (i < s.length) {
    const ch = s[i];
    if (atFieldStart && ch === '"') {
      // RFC 4180 §2.5-2.7: quoted field; "" inside is one quote; may contain separators and line breaks.
      const startLine = line;
      i++;
      let closed = false;
      while (i < s.length) {
        const q = s[i];
        if (q === '"') {
          if (s[i + 1] === '"') {
            fieldText += '"';
            i += 2;
            continue;
          }
          i++;
          closed = true;
          break;
        }
        if (q === '\n' || (q === '\r' && s[i + 1] !== '\n')) line++;
        fieldText += q;
        i++;
      }
      atFieldStart = false;
      if (!closed) {
        errors.push({
          record: records.length + 1,
          line: startLine,
          message: 'A quoted field is never closed; the rest of the file was read into it.',
        });
        break;
      }
      if (i < s.length && s[i] !== delimiter && s[i] !== '\r' && s[i] !== '\n') {
        errors.push({
          record: records.length + 1,
          line,
          message: 'Text follows a closing quote; it was kept as part of the field.',
        });
      }
      continue;
    }
    if (ch === delimiter) {
      endField();
      i++;
    } else if (ch === '\r' || ch === '\n') {
      endRecord();
      i += ch === '\r' && s[i + 1] === '\n' ? 2 : 1;
      line++;
    } else {
      fieldText += ch;
      atFieldStart = false;
      i++;
    }
  }
  // RFC 4180 §2.2: the last record may or may not end with a line break; no empty record after it.
  if (!atFieldStart || fieldText !== '' || record.length > 0) endRecord();
  return { records, errors, hadBom };
}

/**
 * Separator used by the first line: the most frequent of "," ";" TAB outside quotes; "," on a tie.
 * Spreadsheets set to a decimal comma write ";".
 */
export function guessDelimiter(text: string): ',' | ';' | '\t' {
  const counts = { ',': 0, ';': 0, '\t': 0 };
  let quoted = false;
  for (const ch of text.replace(/^\uFEFF/, '')) {
    if (ch === '"') quoted = !quoted;
    else if (!quoted && (ch === '\n' || ch === '\r')) break;
    else if (!quoted && ch in counts) counts[ch as keyof typeof counts]++;
  }
  if (counts[';'] > counts[','] && counts[';'] >= counts['\t']) return ';';
  if (counts['\t'] > counts[','] && counts['\t'] > counts[';']) return '\t';
  return ',';
}
