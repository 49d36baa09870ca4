import { describe, expect, it } from 'vitest';
import { thresholdDefaults, thresholdSources } from './profile.js';

describe('sources of the profile defaults shown to users', () => {
  const entries = Object.entries(thresholdSources);

  it('every default has a source', () => {
    expect(Object.keys(thresholdSources).sort()).toEqual(Object.keys(thresholdDefaults).sort());
  });

  it('each names a publication with its year, or says it is common practice', () => {
    for (const [key, source] of entries) {
      const published = /\b(19|20)\d\d\b/.test(source);
      const practice = /^Common practice/.test(source);
      expect([key, published || practice]).toEqual([key, true]);
    }
  });

  it('a guideline source names its part or section, and nothing says "from memory"', () => {
    for (const [key, source] of entries) {
      expect([key, /memory/i.test(source)]).toEqual([key, false]);
      // AHA 2020 guidelines are published in parts (adult: Part 3; paediatric: Part 4).
      if (/AHA 20\d\d (adult|paediatric) guideline/.test(source))
        expect([key, /Part \d/.test(source)]).toEqual([key, true]);
    }
  });

  it('the paediatric calcium default names the salt and strength', () => {
    expect(thresholdSources.paediatricCalciumChlorideMlPerKg).toMatch(/calcium chloride 10 %/);
  });
});
