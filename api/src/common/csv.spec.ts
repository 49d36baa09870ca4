import { parse } from 'csv-parse/sync';
import { csvLine, csvLines } from './csv';

describe('csvLines (the one CSV writer)', () => {
  it('quotes commas, quotes and line breaks, a lone CR too (RFC 4180 §2)', () => {
    expect(csvLine(['a,b', 'say "hi"', 'two\nlines', 'cr\ronly', null])).toBe(
      '"a,b","say ""hi""","two\nlines","cr\ronly",\r\n',
    );
  });

  it('defuses text a spreadsheet would run as a formula (OWASP "CSV Injection")', () => {
    expect(csvLine(['=HYPERLINK("x")', '+1', '-2+3', '@SUM(A1)', '\tx', 'tablet-3'])).toBe(
      '"\'=HYPERLINK(""x"")",\'+1,\'-2+3,\'@SUM(A1),\'\tx,tablet-3\r\n',
    );
  });

  it('writes numbers as numbers, booleans as words, dates as ISO 8601, objects as JSON', () => {
    const line = csvLine([-5, 0.25, true, false, new Date(0), { a: 1 }]);
    expect(line).toBe('-5,0.25,true,false,1970-01-01T00:00:00.000Z,"{""a"":1}"\r\n');
  });

  it('reads back with csv-parse as the same cells (round trip)', () => {
    const rows = [
      ['id', 'note'],
      ['1', 'line one\r\nline two, with "quotes"'],
    ];
    expect(parse(csvLines(rows))).toEqual(rows);
  });
});
