import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { analysisOutputSchema } from '@upstroke/contracts';
import { at, compressionEvents, ev, record } from './testing/records.js';

const ROOT = resolve(__dirname, '../../..');
const dir = mkdtempSync(join(tmpdir(), 'capno-cli-'));

/** Runs `npm run analyze -- <file>` from the repository root, as users do. */
function analyzeFile(content: string | null) {
  const file = join(dir, `in-${Math.random().toString(36).slice(2)}.json`);
  if (content !== null) writeFileSync(file, content);
  return spawnSync('npm', ['run', '-s', 'analyze', '--', file], { cwd: ROOT, encoding: 'utf8' });
}

const UUID = '6f1c2a4e-3b5d-4c7e-8f90-1a2b3c4d5e6f';
const good = record(
  [
    ev('arrest', 0, {}, UUID),
    ...compressionEvents(5, 200, [[100, 115]]),
    ev('shock', 112, { energyJ: 200 }),
  ],
  {
    etco2: [{ at: at(60), value: 1.9, unit: 'kPa', source: 'manual' }],
    waveform: {
      startAt: at(0),
      sampleRateHz: 10,
      unit: 'mmHg',
      values: Array.from({ length: 2000 }, (_, i) => (i % 60 < 40 && i % 60 > 8 ? 30 : 0)),
    },
  },
);

describe('npm run analyze', () => {
  it('valid input: exit 0 and schema-valid JSON on stdout', () => {
    const r = analyzeFile(JSON.stringify(good));
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    const out = analysisOutputSchema.parse(JSON.parse(r.stdout));
    expect(out.breaths.length).toBeGreaterThan(20);
    expect(out.measures.pauses[0].context).toBe('pre-shock');
  });

  const bad = (mutate: (x: Record<string, unknown> & typeof good) => void) => {
    const x = structuredClone(good) as Record<string, unknown> & typeof good;
    mutate(x);
    return JSON.stringify(x);
  };
  it.each([
    ['missing field', bad((x) => delete (x as Record<string, unknown>).arrestAt), /^arrestAt: /],
    [
      'wrong unit',
      bad((x) => ((x.waveform as { unit: string }).unit = 'Torr')),
      /^waveform\.unit: /,
    ],
    [
      'bad event time',
      bad((x) => ((x.events[3] as { at: string }).at = 'yesterday')),
      /^events\[3\]\.at: /,
    ],
    [
      'non-monotonic time',
      bad((x) => (x.events[3].at = at(1000))),
      /^events\[4\]\.at: .*backwards/,
    ],
    [
      'NaN',
      JSON.stringify(good).replace('"values":[0,', '"values":[NaN,'),
      /^waveform\.values\[0\]: not a finite number/,
    ],
    ['invalid JSON', '{"arrestAt": ', /invalid JSON/],
    ['unreadable file', null, /cannot read file/],
    [
      'bad replacement',
      bad((x) =>
        x.events.push(
          ev('correction', 300, {
            supersedes: UUID,
            replacement: { kind: 'shock', data: { energyJ: -1 }, at: at(5) },
          }),
        ),
      ),
      /^events\[\d+\]\.data\.replacement\.data\.energyJ: /,
    ],
  ])('%s: exit 2 with a one-line message naming the field', (_name, content, pattern) => {
    const r = analyzeFile(content);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trimEnd().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(pattern);
  });
});
