import { balanceDue, defaultDepositRules, depositAmount } from '@/modules/deposits/core/deposit';

describe('depositAmount (shop default: 10 %, at least 250.00)', () => {
  it.each([
    // 10 % of 3,495.00 is 349.50
    [349500, 'USD', 34950],
    // 10 % of 1,999.00 is 199.90, below the minimum: 250.00
    [199900, 'USD', 25000],
    // 10 % of 2,500.05 is 250.005: half a cent, rounded away from zero
    [250005, 'EUR', 25001],
    // a price under the minimum takes the whole price
    [12000, 'CAD', 12000],
  ] as const)('%i minor units of %s -> %i', (price, currency, deposit) => expect(depositAmount(price, currency)).toBe(deposit));

  // ISO 4217: JPY has no minor unit, so the minimum 250 is 250 yen and amounts are whole yen
  it.each([
    [450005, 45001],
    [1000, 250],
  ])('in JPY, %i yen -> %i yen', (price, deposit) => expect(depositAmount(price, 'JPY')).toBe(deposit));

  it('follows changed rules', () => {
    expect(depositAmount(349500, 'USD', { ...defaultDepositRules, percent: 20, minimumMajor: 500 })).toBe(69900);
  });

  it.each([0, -5, 10.5])('refuses a price of %p', (price) => expect(() => depositAmount(price, 'USD')).toThrow(RangeError));
});

describe('balanceDue', () => {
  it('is price + tax - deposit, with the tax rounded once', () => {
    // 8.25 % of 3,495.00 is 288.3375 -> 288.34
    expect(balanceDue(349500, 34950, 'USD', { ...defaultDepositRules, salesTaxPct: 8.25 })).toEqual({
      priceMinor: 349500,
      taxMinor: 28834,
      totalMinor: 378334,
      depositMinor: 34950,
      balanceMinor: 343384,
      currency: 'USD',
      salesTaxPct: 8.25,
    });
  });

  it('works in yen and without tax', () => {
    // 10 % of 450,000 yen is 45,000 yen
    expect(balanceDue(450000, 45000, 'JPY', { ...defaultDepositRules, salesTaxPct: 10 }).balanceMinor).toBe(450000);
    expect(balanceDue(450000, 45000, 'JPY').balanceMinor).toBe(405000);
  });
});
