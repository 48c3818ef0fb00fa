import { saleInput, salesTaxMinor, saleTotals } from '@/modules/deposits/core/sale';

// ISO 4217: USD has 2 minor-unit digits (cents), JPY none (whole yen).
describe('saleTotals', () => {
  it.each([
    // 8.25 % of 3,495.00 is 288.3375 -> 288.34; 3,783.34 less the deposit 349.50
    ['USD', 349500, 8.25, 34950, 0, { taxMinor: 28834, totalMinor: 378334, balanceMinor: 343384, owedToBuyerMinor: 0 }],
    // the same with a trade-in allowance of 1,200.00
    ['USD', 349500, 8.25, 34950, 120000, { taxMinor: 28834, totalMinor: 378334, balanceMinor: 223384, owedToBuyerMinor: 0 }],
    // 7.25 % of 10.00 is 0.725: half a cent, rounded away from zero to 0.73
    ['USD', 1000, 7.25, 0, 0, { taxMinor: 73, totalMinor: 1073, balanceMinor: 1073, owedToBuyerMinor: 0 }],
    // 8.875 % of 1,999.99 is 177.4991125 -> 177.50
    ['USD', 199999, 8.875, 0, 0, { taxMinor: 17750, totalMinor: 217749, balanceMinor: 217749, owedToBuyerMinor: 0 }],
    // deposit and allowance exactly cover the total: nothing left, nothing owed
    ['USD', 100000, 5, 5000, 100000, { taxMinor: 5000, totalMinor: 105000, balanceMinor: 0, owedToBuyerMinor: 0 }],
    // they exceed it: the balance stays at zero and the 150.00 over is owed to the buyer
    ['USD', 100000, 0, 25000, 90000, { taxMinor: 0, totalMinor: 100000, balanceMinor: 0, owedToBuyerMinor: 15000 }],
    // 10 % of 450,000 yen; deposit 45,000 and allowance 100,000 yen
    ['JPY', 450000, 10, 45000, 100000, { taxMinor: 45000, totalMinor: 495000, balanceMinor: 350000, owedToBuyerMinor: 0 }],
    // 10 % of 12,345 yen is 1,234.5 -> 1,235 yen (whole yen, half away from zero)
    ['JPY', 12345, 10, 0, 0, { taxMinor: 1235, totalMinor: 13580, balanceMinor: 13580, owedToBuyerMinor: 0 }],
    // 8 % of 123,456 yen is 9,876.48 -> 9,876 yen
    ['JPY', 123456, 8, 20000, 0, { taxMinor: 9876, totalMinor: 133332, balanceMinor: 113332, owedToBuyerMinor: 0 }],
    // allowance above the total: 20,000 yen owed back
    ['JPY', 300000, 10, 50000, 300000, { taxMinor: 30000, totalMinor: 330000, balanceMinor: 0, owedToBuyerMinor: 20000 }],
  ] as const)('%s %i at %p %%, deposit %i, allowance %i', (currency, agreedPriceMinor, salesTaxPct, depositMinor, tradeInAllowanceMinor, expected) => {
    const t = saleTotals({ agreedPriceMinor, currency, salesTaxPct, depositMinor, tradeInAllowanceMinor });
    expect(t).toEqual({ agreedPriceMinor, currency, salesTaxPct, depositMinor, tradeInAllowanceMinor, ...expected });
    // the lines always add up
    expect(t.totalMinor - t.depositMinor - t.tradeInAllowanceMinor).toBe(t.balanceMinor - t.owedToBuyerMinor);
  });

  it.each([
    ['agreedPriceMinor', 10.5],
    ['depositMinor', -1],
    ['tradeInAllowanceMinor', Number.NaN],
  ] as const)('refuses %s of %p', (key, value) => {
    expect(() => saleTotals({ agreedPriceMinor: 1000, currency: 'USD', salesTaxPct: 5, depositMinor: 0, tradeInAllowanceMinor: 0, [key]: value })).toThrow(RangeError);
  });
});

describe('salesTaxMinor', () => {
  it('rounds in whole numbers: 0.5 % of 1.01 is 0.00505 -> 0.01, and 1.5 % of 0.33 is 0.00495 -> 0.00', () => {
    expect(salesTaxMinor(101, 0.5)).toBe(1);
    expect(salesTaxMinor(33, 1.5)).toBe(0);
  });
  it('refuses a negative rate', () => expect(() => salesTaxMinor(1000, -1)).toThrow(RangeError));
});

describe('saleInput', () => {
  const buyer = { name: 'Ada Quell', email: 'Ada@Example.test' };
  it('takes the buyer like a seller and the trade-in with its allowance', () => {
    expect(saleInput.parse({ buyer, agreedPriceMinor: 349500, tradeIn: { piano: { maker: 'Almsbury', kind: 'upright' }, allowanceMinor: 60000 } })).toEqual({
      buyer: { name: 'Ada Quell', email: 'ada@example.test' },
      agreedPriceMinor: 349500,
      tradeIn: { piano: { maker: 'Almsbury', kind: 'upright', yearIsEstimate: false }, allowanceMinor: 60000 },
    });
  });
  it.each([
    [{ buyer, agreedPriceMinor: 0 }, ['agreedPriceMinor'], 'more than zero'],
    [{ buyer, agreedPriceMinor: 100, salesTaxPct: 31 }, ['salesTaxPct'], '0-30 %'],
    [{ buyer: { name: '' }, agreedPriceMinor: 100 }, ['buyer', 'name'], 'is required'],
    [{ buyer, agreedPriceMinor: 100, tradeIn: { piano: { maker: 'Almsbury', kind: 'upright' }, allowanceMinor: -5 } }, ['tradeIn', 'allowanceMinor'], 'cannot be negative'],
    [{ buyer, agreedPriceMinor: 100.5 }, ['agreedPriceMinor'], 'whole number'],
  ])('refuses %j', (raw, path, message) => {
    const r = saleInput.safeParse(raw);
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]).toMatchObject({ path, message: expect.stringContaining(message) });
  });
});
