import { centsAmount, centsOffset, FROM_STANDARD, roundCents, signedCents } from '@/modules/tone/core/pitch';

// One decimal, rounded half away from zero; English plurals by CLDR's rule for English ("1 cent", "1.5 cents", "0.8 cents").
describe('cents in words', () => {
  it.each([
    [1, '1 cent', '1 cent sharp', '+1.0'],
    [0.95, '1 cent', '1 cent sharp', '+1.0'],
    [1.04, '1 cent', '1 cent sharp', '+1.0'],
    [-0.96, '1 cent', '1 cent flat', '−1.0'],
    [0.8, '0.8 cents', '0.8 cents sharp', '+0.8'],
    [-0.8, '0.8 cents', '0.8 cents flat', '−0.8'],
    [1.5, '1.5 cents', '1.5 cents sharp', '+1.5'],
    [2, '2 cents', '2 cents sharp', '+2.0'],
    [12.449, '12.4 cents', '12.4 cents sharp', '+12.4'],
    [-12.45, '12.5 cents', '12.5 cents flat', '−12.5'],
    [0.05, '0.1 cents', '0.1 cents sharp', '+0.1'],
    [0.04, '0 cents', 'at pitch', '0.0'],
    [-0.04, '0 cents', 'at pitch', '0.0'],
    [100, '100 cents', '100 cents sharp', '+100.0'],
  ])('%f cents: "%s", "%s", %s', (c, amount, offset, signed) => {
    expect(centsAmount(c)).toBe(amount);
    expect(centsOffset(c)).toBe(offset);
    expect(signedCents(c)).toBe(signed);
  });

  it('says the same amount in every wording, so a page and its summary never disagree', () => {
    for (const c of [-30.04, -11.0527, -1.04, -0.8, 0.8, 0.96, 3.25]) {
      const amount = centsAmount(c);
      expect(centsOffset(c)).toBe(`${amount} ${c < 0 ? 'flat' : 'sharp'}`);
      expect(centsOffset(c, FROM_STANDARD)).toBe(`${amount} ${c < 0 ? 'below' : 'above'} standard pitch`);
      expect(Math.abs(Number(signedCents(c).replace('−', '-')))).toBe(Math.abs(roundCents(c)));
    }
    expect(centsOffset(0.01, FROM_STANDARD)).toBe('at standard pitch');
    expect(Object.is(roundCents(-0.01), -0)).toBe(false);
  });
});
