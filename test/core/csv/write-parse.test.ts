// Writer and parser against RFC 4180 (IETF, 2005, §2) examples and the OWASP CSV-injection advice,
// plus a seeded property round trip.
import fc from 'fast-check';
import { propertyOptions } from '../../helpers/property';
import { describe, expect, it } from 'vitest';
import { guessDelimiter, parseCsv } from '../../../src/core/csv/parse';
import { fixedCell, neutraliseText, unneutraliseText, writeCsv } from '../../../src/core/csv/write';

describe('writeCsv (RFC 4180 §2)', () => {
  it('ends every record with CRLF (§2.1) and quotes commas, quotes and line breaks (§2.6, §2.7)', () => {
    expect(writeCsv([['a', 'b'], ['c', 'd']])).toBe('a,b\r\nc,d\r\n');
    expect(writeCsv([['1,5 kΩ', 'say "hi"', 'two\nlines', 'cr\rhere']])).toBe(
      '"1,5 kΩ","say ""hi""","two\nlines","cr\rhere"\r\n',
    );
  });
  it('writes a BOM only when asked; a lone empty field as ""', () => {
    expect(writeCsv([['x']], { bom: true })).toBe('\uFEFFx\r\n');
    expect(writeCsv([[''], ['x']])).toBe('""\r\nx\r\n');
  });
  it('neutralises formula triggers in text (OWASP) but leaves numbers numeric', () => {
    expect(writeCsv([['=1+2', '+1', '-x', '@SUM(A1)', '\tTAB', 'safe', -5, 1.25, null]])).toBe(
      "'=1+2,'+1,'-x,'@SUM(A1),'\tTAB,safe,-5,1.25,\r\n",
    );
    // A trigger cell that also needs quoting: quote added around the prefixed text.
    expect(writeCsv([['=HYPERLINK("x")']])).toBe(`"'=HYPERLINK(""x"")"\r\n`);
    expect(writeCsv([['\rX']])).toBe(`"'\rX"\r\n`);
    expect(writeCsv([['=1']], { neutralise: false })).toBe('=1\r\n');
  });
  it('semicolon files with decimal comma numbers', () => {
    expect(writeCsv([['a;b', 1.25, -5]], { delimiter: ';', decimalComma: true })).toBe('"a;b";1,25;-5\r\n');
  });
  it('neutralise / unneutralise are inverse on text', () => {
    for (const t of ['=x', '+', '-3', '@a', "'=already", "''+x", "'", "'plain", 'plain', ''])
      expect(unneutraliseText(neutraliseText(t))).toBe(t);
  });
});

describe('parseCsv (RFC 4180 §2)', () => {
  it('quoted fields, doubled quotes, embedded CRLF and LF, BOM, missing final line break (§2.2)', () => {
    const r = parseCsv('\uFEFFa,"b,1","say ""hi""","x\r\ny"\r\n"",z\nlast,row');
    expect(r.hadBom).toBe(true);
    expect(r.errors).toEqual([]);
    expect(r.records).toEqual([['a', 'b,1', 'say "hi"', 'x\r\ny'], ['', 'z'], ['last', 'row']]);
  });
  it('no phantom record after the final CRLF; empty fields kept', () => {
    expect(parseCsv('a,,\r\n').records).toEqual([['a', '', '']]);
    expect(parseCsv('').records).toEqual([]);
    expect(parseCsv('a\r\n\r\nb\r\n').records).toEqual([['a'], [''], ['b']]);
  });
  it('reports an unclosed quote and text after a closing quote, with line numbers', () => {
    const r = parseCsv('h\r\n"ok"x\r\n"open\r\nmore');
    expect(r.errors.map((e) => [e.record, e.line])).toEqual([[2, 2], [3, 3]]);
    expect(r.records[1]).toEqual(['okx']);
    expect(r.records[2]).toEqual(['open\r\nmore']);
  });
  it('keeps a stray quote inside an unquoted field (spreadsheet habit, deviation from §2.5)', () => {
    expect(parseCsv('6" coax,1').records).toEqual([['6" coax', '1']]);
  });
  it('guesses the separator from the first line', () => {
    expect(guessDelimiter('a;b;"c,d"\r\n1,2,3')).toBe(';');
    expect(guessDelimiter('a,b;c')).toBe(',');
    expect(guessDelimiter('a\tb\tc')).toBe('\t');
  });
});

describe('round trip (fast-check, seeded)', () => {
  const cell = fc.string({
    unit: fc.constantFrom('a', 'Ω', 'µ', 'ü', ',', ';', '"', '\r', '\n', ' ', '=', '-', '@', "'", '1'),
  });
  const table = fc.array(fc.array(cell, { minLength: 1, maxLength: 5 }), { minLength: 1, maxLength: 6 });
  it('parse(write(rows)) returns the rows, for both separators, with and without BOM', () => {
    fc.assert(
      fc.property(table, fc.constantFrom(',', ';') as fc.Arbitrary<',' | ';'>, fc.boolean(), (rows, delimiter, bom) => {
        const r = parseCsv(writeCsv(rows, { delimiter, bom, neutralise: false }), delimiter);
        expect(r.errors).toEqual([]);
        expect(r.records).toEqual(rows);
      }),
      propertyOptions(4180, 400),
    );
  });
  it('with neutralisation, unneutralising the parsed text gives the original back', () => {
    fc.assert(
      fc.property(table, (rows) => {
        const r = parseCsv(writeCsv(rows));
        expect(r.records.map((row) => row.map(unneutraliseText))).toEqual(rows);
        // And no written field starts with a trigger, quoted or not (OWASP).
        for (const row of r.records) for (const c of row) expect('=+-@\t\r'.includes(c[0] ?? 'x')).toBe(false);
      }),
      propertyOptions(4181, 400),
    );
  });
});

// Money cells keep the currency's own decimals (ISO 4217 minor units: 2 for USD/EUR, 0 for JPY, 3 for KWD), built
// from whole minor units without floating point; with ";" files the decimal comma is used.
describe('fixed-decimal money cells', () => {
  it('writes whole minor units with the given decimals, exactly', () => {
    const cells = [
      fixedCell(2620, 2),
      fixedCell(8900, 2),
      fixedCell(5, 2),
      fixedCell(150, 0),
      fixedCell(1250, 3),
      fixedCell(-120, 2),
      fixedCell(0, 2),
    ];
    expect(writeCsv([cells])).toBe('26.20,89.00,0.05,150,1.250,-1.20,0.00\r\n');
    expect(writeCsv([[fixedCell(2620, 2), 'x']], { delimiter: ';', decimalComma: true })).toBe('26,20;x\r\n');
    // a comma-separated file with a decimal comma quotes the cell
    expect(writeCsv([[fixedCell(2620, 2)]], { decimalComma: true })).toBe('"26,20"\r\n');
  });
});
