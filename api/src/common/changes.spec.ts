import { changesOf } from './changes';

describe('changesOf', () => {
  it('lists each changed field as from → to and leaves out unchanged or unnamed ones', () => {
    const before = { name: 'Ana', role: 'lead', active: true, siteIds: ['a', 'b'] };
    expect(
      changesOf(before, { name: 'Ana', role: 'quality', active: undefined, siteIds: ['b', 'a'] }),
    ).toEqual({ role: { from: 'lead', to: 'quality' } });
    expect(changesOf(before, { active: false, siteIds: ['a'] })).toEqual({
      active: { from: true, to: false },
      siteIds: { from: ['a', 'b'], to: ['a'] },
    });
  });

  it('reads a missing old value as null', () => {
    expect(changesOf<{ clock?: string }>({}, { clock: '24h' })).toEqual({
      clock: { from: null, to: '24h' },
    });
  });
});
