import { describeSize, pianoInput, stockNumber } from '@/modules/pianos/core/piano';

describe('stockNumber', () => {
  it.each([
    [1, 'FW-0001'],
    [42, 'FW-0042'],
    [9999, 'FW-9999'],
    [10000, 'FW-10000'],
  ])('%i is %s', (n, expected) => expect(stockNumber(n)).toBe(expected));
});

describe('pianoInput', () => {
  it('accepts a minimal piano and defaults the estimate flag', () => {
    expect(pianoInput.parse({ maker: ' Almsbury ', kind: 'upright' })).toEqual({ maker: 'Almsbury', kind: 'upright', yearIsEstimate: false });
  });
  it.each([
    [{ maker: 'X', kind: 'upright', sizeCm: 49 }, 'sizeCm'],
    [{ maker: 'X', kind: 'upright', sizeCm: 401 }, 'sizeCm'],
    [{ maker: 'X', kind: 'upright', year: 2101 }, 'year'],
    [{ maker: 'X', kind: 'upright', year: 1900.5 }, 'year'],
    [{ maker: 'X', kind: 'harpsichord' }, 'kind'],
  ])('refuses %j at %s', (input, field) => {
    const result = pianoInput.safeParse(input);
    expect(result.success).toBe(false);
    expect(result.error!.issues[0].path).toEqual([field]);
  });
});

describe('describeSize', () => {
  it('says height for an upright and length for a grand', () => {
    expect(describeSize('upright', 121)).toBe('upright, 121 cm tall');
    expect(describeSize('grand', 172)).toBe('grand, 172 cm long');
    expect(describeSize('grand', null)).toBe('grand');
  });
});
