import fc from 'fast-check';
import { aResuscitation } from './factories';
import { startTestApp, type TestApp } from './test-app';

const good = [
  '# unit=mmHg',
  'time,co2,event',
  '2026-03-04T10:00:00.000Z,1.5,',
  '2026-03-04T10:00:00.020Z,20.1,',
  '2026-03-04T10:00:00.040Z,30.4,shock',
];

/** Malformed files: each must be refused with a 4xx whose message names the problem. */
const cases: [string, string | Buffer, number, RegExp][] = [
  [
    'bad header',
    'timestamp,value\n2026-03-04T10:00:00Z,12\n',
    400,
    /line 1: header: needs columns "time" and "co2"/,
  ],
  [
    'text in co2',
    [...good.slice(0, 3), '2026-03-04T10:00:00.020Z,high,'].join('\n'),
    400,
    /line 4: co2: "high" is not a number/,
  ],
  [
    'time going backwards',
    [...good.slice(0, 4), '2026-03-04T10:00:00.010Z,3,'].join('\n'),
    400,
    /line 5: time: goes backwards/,
  ],
  [
    'unknown unit',
    ['# unit=ppm', ...good.slice(1)].join('\n'),
    400,
    /line 1: unit: unknown unit "ppm"/,
  ],
  [
    'unknown unit in a column',
    'time,co2,unit\n2026-03-04T10:00:00Z,4,torr\n',
    400,
    /line 2: unit: unknown unit "torr"/,
  ],
  ['no unit at all', good.slice(1).join('\n'), 400, /unit: give a "unit" column/],
  ['empty (header only)', '# unit=mmHg\ntime,co2\n', 400, /no data rows/],
  ['blank lines only', '\n\n\n', 400, /header: no header row/],
  ['0-byte', Buffer.alloc(0), 400, /empty \(0 bytes\)/],
  [
    'wrong encoding (Latin-1)',
    Buffer.from('# unit=mmHg\ntime,co2,event\n2026-03-04T10:00:00Z,4,d\xe9fib\n', 'latin1'),
    400,
    /line 3: encoding: not valid UTF-8/,
  ],
  ['wrong encoding (UTF-16)', Buffer.from('\ufefftime,co2\n', 'utf16le'), 400, /encoding/],
  [
    'starting in year 0000',
    ['# unit=mmHg', 'time,co2', '0000-01-01T00:00:00Z,4', '0000-01-01T00:00:01Z,5'].join('\n'),
    400,
    /line 3: time: "0000-01-01T00:00:00Z" is outside the years 1900 to 2199/,
  ],
  [
    'seconds from a start in year 9999',
    ['# unit=mmHg', '# start=9999-01-01T00:00:00Z', 'time,co2', '0,4'].join('\n'),
    400,
    /line 2: start: time: .* outside the years/,
  ],
  [
    'time without offset',
    ['# unit=mmHg', 'time,co2', '2026-03-04 10:00:00,4'].join('\n'),
    400,
    /line 3: time: .* not an ISO-8601 time with offset/,
  ],
  [
    'seconds without start',
    ['# unit=mmHg', 'time,co2', '0,4', '0.02,5'].join('\n'),
    400,
    /line 3: time: seconds need a "# start=/,
  ],
  [
    'rate too low to be a capnogram',
    [
      '# unit=kPa',
      'time,co2',
      '2026-03-04T10:00:00Z,4',
      '2026-03-04T10:00:01Z,4.1',
      '2026-03-04T10:00:02Z,4.2',
    ].join('\n'),
    400,
    /line 4: time: rows are 1000 ms apart/,
  ],
  [
    'implausible value',
    [...good.slice(0, 3), '2026-03-04T10:00:00.020Z,999,'].join('\n'),
    400,
    /line 4: co2: 999 mmHg is outside/,
  ],
  [
    'unclosed quote',
    [...good.slice(0, 3), '2026-03-04T10:00:00.020Z,"4,'].join('\n'),
    400,
    /csv: /,
  ],
];

describe('monitor file import: malformed files', () => {
  let t: TestApp;
  let id: string;
  let token: string;
  const upload = (body: string | Buffer) =>
    t
      .http()
      .post(`/api/resuscitations/${id}/imports`)
      .set('Authorization', `Bearer ${token}`)
      .attach('file', Buffer.isBuffer(body) ? body : Buffer.from(body, 'utf8'), 'monitor.csv');
  const nothingStored = async () => {
    for (const table of ['imports', 'waveformChunks', 'etco2Samples']) {
      const [{ n }] = await t.db(table).where({ resuscitationId: id }).count({ n: '*' });
      expect(`${table} ${n}`).toBe(`${table} 0`);
    }
  };

  beforeAll(async () => {
    t = await startTestApp();
    token = await t.tokenFor('recorder');
    const rec = aResuscitation();
    await t.http().post('/api/resuscitations').set('Authorization', `Bearer ${token}`).send(rec);
    id = rec.id as string;
  });
  afterAll(() => t.close());

  it.each(cases)(
    '%s → 4xx naming the problem, nothing stored',
    async (_name, body, status, message) => {
      const res = await upload(body);
      expect(res.status).toBe(status);
      expect(res.body.message).toMatch(message);
      await nothingStored();
    },
  );

  it('lists the first 20 errors by line number', async () => {
    const lines = ['# unit=mmHg', 'time,co2'];
    for (let i = 0; i < 40; i++)
      lines.push(`2026-03-04T10:00:${String(i).padStart(2, '0')}Z,x${i}`);
    const res = await upload(lines.join('\n'));
    expect(res.status).toBe(400);
    expect(res.body.details).toHaveLength(20);
    expect(res.body.details.map((d: { path: string }) => d.path).slice(0, 3)).toEqual([
      'line 3',
      'line 4',
      'line 5',
    ]);
    await nothingStored();
  });

  it('refuses a 60 MB file with 413 naming the 50 MB limit', async () => {
    const big = Buffer.alloc(60 * 1024 * 1024, '2026-03-04T10:00:00Z,4\n');
    const res = await upload(big);
    expect(res.status).toBe(413);
    expect(res.body.message).toMatch(/50 MB/);
    await nothingStored();
  });

  it('never answers 5xx to generated bad files (fuzz)', async () => {
    const cell = fc.oneof(
      fc.constantFrom(
        '',
        'shock',
        'NaN',
        '-1e309',
        '2026-03-04T10:00:00Z',
        '12.5',
        '"',
        '#',
        'kPa',
        '%',
        'mmHg',
      ),
      fc.string({ maxLength: 12 }),
      fc.double().map(String),
    );
    const line = fc.array(cell, { minLength: 0, maxLength: 5 }).map((cells) => cells.join(','));
    const file = fc
      .tuple(
        fc.constantFrom('', '# unit=mmHg\n', '# start=2026-03-04T10:00:00Z\n# unit=%\n'),
        fc.constantFrom('time,co2,event\n', 'time,co2,unit\n', 'co2,time\n', ''),
        fc.array(line, { maxLength: 30 }),
      )
      .map(([pre, header, rows]) => pre + header + rows.join('\n'));
    await fc.assert(
      fc.asyncProperty(file, async (body) => {
        const res = await upload(body);
        expect(res.status).toBeLessThan(500);
        if (res.status >= 400) expect(res.body.message.length).toBeGreaterThan(5);
      }),
      { numRuns: 30 },
    );
  });
});
