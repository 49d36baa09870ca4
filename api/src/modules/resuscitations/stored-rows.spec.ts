import { decodeSamples } from './stored-rows';

/** Chunks are stored as little-endian float32 (IEEE 754 single precision). */
describe('decodeSamples', () => {
  const values = [0, 35.5, -2.25, 149.75, 1e-3];
  const bytes = () => {
    const b = Buffer.alloc(values.length * 4);
    values.forEach((v, i) => b.writeFloatLE(v, i * 4));
    return b;
  };

  it('reads every value back as float32', () => {
    expect(Array.from(decodeSamples(bytes(), values.length))).toEqual(
      values.map((v) => Math.fround(v)),
    );
  });

  it('reads a buffer that starts at an odd offset of its memory (as pg hands them out)', () => {
    const shifted = Buffer.concat([Buffer.from([7]), bytes()]).subarray(1);
    expect(shifted.byteOffset % 4).not.toBe(0);
    expect(Array.from(decodeSamples(shifted, values.length))).toEqual(
      values.map((v) => Math.fround(v)),
    );
  });

  it('stops at the stored count, and at the last whole value of a short buffer', () => {
    expect(Array.from(decodeSamples(bytes(), 2))).toEqual([0, 35.5]);
    expect(decodeSamples(bytes().subarray(0, 9), 5)).toHaveLength(2);
  });

  it('returns its own copy (the row buffer may be reused)', () => {
    const b = bytes();
    const out = decodeSamples(b, values.length);
    b.fill(0);
    expect(out[1]).toBe(35.5);
  });
});
