import fc from 'fast-check';

/**
 * Hostile values for the input fuzz test: what a broken tablet, a careless script or an
 * attacker sends. JSON cannot carry NaN or Infinity, so numbers beyond float64 are sent as
 * raw JSON text (`1e400` parses to Infinity) through `Raw`.
 */
export class Raw {
  constructor(readonly text: string) {}
}

function nested(depth: number, leaf: unknown, asArray: boolean): unknown {
  let v = leaf;
  for (let i = 0; i < depth; i += 1) v = asArray ? [v] : { v };
  return v;
}

export const hostileStrings: string[] = [
  '\u0000',
  'a\u0000b',
  '\ud800',
  'x\udfffy',
  '\udc00\ud800',
  '',
  ' ',
  '0000-01-01T00:00:00Z',
  '0000-01-01',
  '9999-12-31T23:59:59Z',
  '9999-12-31',
  '+275760-09-13T00:00:00Z',
  '-000001-01-01T00:00:00Z',
  '1899-12-31T23:59:59Z',
  '2026-02-30T10:00:00Z',
  '2026-03-04T25:61:00Z',
  '2026-03-04T10:00:00+99:00',
  'NaN',
  'Infinity',
  '-Infinity',
  '-1',
  '-0',
  '2147483648',
  '-2147483649',
  '9007199254740993',
  '1e39',
  '1e400',
  '123456789012345678901234567890',
  '0x10',
  '00000000-0000-0000-0000-000000000000',
  'ffffffff-ffff-ffff-ffff-ffffffffffff',
  '__proto__',
  'constructor',
  '../../../etc/passwd',
  "'; drop table resuscitations; --",
  '%00',
  '%',
  '\u202e\u0301',
  '😀'.repeat(50),
  '=HYPERLINK("http://x.test","y")',
  'x'.repeat(300),
  'y'.repeat(1_500_000),
];

export const hostileNumbers: number[] = [
  0,
  -0,
  -1,
  -50,
  0.0001,
  2 ** 31 - 1,
  2 ** 31,
  -(2 ** 31) - 1,
  2 ** 32,
  2 ** 53,
  2 ** 53 + 2,
  -(2 ** 53) - 2,
  1e39,
  -1e39,
  Number.MAX_VALUE,
  Number.MIN_VALUE,
  1e-320,
  10_000,
  0.1 + 0.2,
];

const rawNumbers = ['1e400', '-1e400', '1e39', '123456789012345678901234567890', '-0.0'];

/** Any hostile JSON value: strings, numbers, wrong types, deep nesting, huge arrays. */
export const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 5, arbitrary: fc.constantFrom(...hostileStrings) },
  { weight: 4, arbitrary: fc.constantFrom(...hostileNumbers) },
  { weight: 1, arbitrary: fc.constantFrom(...rawNumbers).map((t) => new Raw(t)) },
  {
    weight: 2,
    arbitrary: fc.constantFrom<unknown>(null, true, false, [], {}, [null], { a: null }, [[[]]]),
  },
  { weight: 1, arbitrary: fc.boolean().map((asArray) => nested(25, 1, asArray)) },
  // Written as text: building 10,000 levels as objects would overflow the test's own stack.
  {
    weight: 1,
    arbitrary: fc.constantFrom(
      new Raw(`${'['.repeat(10_000)}1${']'.repeat(10_000)}`),
      new Raw(`${'{"v":'.repeat(10_000)}1${'}'.repeat(10_000)}`),
    ),
  },
  { weight: 1, arbitrary: fc.constantFrom(Array.from({ length: 6000 }, (_, i) => i)) },
  {
    weight: 1,
    arbitrary: fc.constantFrom<unknown>(JSON.parse('{"__proto__":{"admin":true}}'), {
      constructor: 1,
    }),
  },
);

/** A hostile value for a path or query parameter (always text). */
export const hostileParam: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom(...hostileStrings.filter((s) => s.length < 1000)),
  fc.constantFrom(...hostileNumbers).map(String),
);

/** JSON text of a value, with `Raw` leaves written as they are. */
export function toJsonText(value: unknown): string {
  const raws: string[] = [];
  const text = JSON.stringify(value, (_key, v: unknown) => {
    if (v instanceof Raw) {
      raws.push(v.text);
      return `__RAW_${raws.length - 1}__`;
    }
    return v;
  });
  return (text ?? 'null').replace(/"__RAW_(\d+)__"/g, (_, i: string) => raws[Number(i)]);
}

type Path = (string | number)[];

/** Every place in a JSON value a hostile value can go (the root included). */
export function pathsOf(value: unknown, prefix: Path = []): Path[] {
  const here: Path[] = [prefix];
  if (Array.isArray(value))
    return here.concat(value.slice(0, 5).flatMap((v, i) => pathsOf(v, [...prefix, i])));
  if (value && typeof value === 'object')
    return here.concat(
      Object.entries(value).flatMap(([k, v]) => pathsOf(v, [...prefix, k])),
      [[...prefix, 'unexpected']],
    );
  return here;
}

/** A copy of `value` with the value at `path` replaced (or added). */
export function replaceAt(value: unknown, path: Path, replacement: unknown): unknown {
  if (path.length === 0) return replacement;
  const [head, ...rest] = path;
  if (Array.isArray(value)) {
    const copy = [...value];
    copy[Number(head)] = replaceAt(copy[Number(head)], rest, replacement);
    return copy;
  }
  const obj = value && typeof value === 'object' ? (value as Record<string, unknown>) : {};
  return { ...obj, [head]: replaceAt(obj[head], rest, replacement) };
}

/** A valid body with one or two of its places replaced by hostile values. */
export function hostileBody(valid: unknown): fc.Arbitrary<unknown> {
  const paths = pathsOf(valid);
  const mutation = fc.tuple(fc.constantFrom(...paths), hostileValue);
  return fc
    .array(mutation, { minLength: 1, maxLength: 2 })
    .map((ms) => ms.reduce<unknown>((body, [path, v]) => replaceAt(body, path, v), valid));
}
