import { recordCsvHeader, recordCsvLine } from './trends.csv';

describe('trends records CSV', () => {
  it('neutralises a unit or site name a spreadsheet would run as a formula (OWASP "CSV Injection")', () => {
    const line = recordCsvLine({
      resuscitationId: 'r1',
      siteName: '@Kestrel',
      unitName: '=HYPERLINK("http://x")',
      compressionFraction: 0.8,
      findingCounts: { 'etco2-low': 2 },
    });
    const cells = line.split(',');
    expect(cells[1]).toBe("'@Kestrel");
    expect(cells[2]).toBe('"\'=HYPERLINK(""http://x"")"');
    expect(line).toContain(',80,'); // compression fraction 0.8 written in percent
    expect(recordCsvHeader().split(',').length).toBe(cells.length);
  });
});
