import { csvCell } from './audit-csv';

describe('csvCell', () => {
  it('quotes commas, quotes and line breaks (RFC 4180 §2)', () => {
    expect(csvCell('a,b')).toBe('"a,b"');
    expect(csvCell('say "hi"')).toBe('"say ""hi"""');
    expect(csvCell('two\nlines')).toBe('"two\nlines"');
    expect(csvCell(null)).toBe('');
  });

  it('defuses values a spreadsheet would run as formulas (OWASP CSV injection)', () => {
    expect(csvCell('=HYPERLINK("x")')).toBe('"\'=HYPERLINK(""x"")"');
    expect(csvCell('+1')).toBe("'+1");
    expect(csvCell('tablet-3')).toBe('tablet-3');
  });

  it('writes objects as JSON', () => {
    expect(csvCell({ a: 1 })).toBe('"{""a"":1}"');
  });
});
