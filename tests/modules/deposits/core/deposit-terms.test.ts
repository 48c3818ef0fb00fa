import { depositTerms } from '@/modules/deposits/core/deposit-terms';

describe('the deposit terms a buyer reads', () => {
  it('states the amount, the hold in days and what the deposit counts toward, from the figures given', () => {
    const terms = depositTerms({ amountMinor: 45000, currency: 'USD', holdDays: 14, basis: '10 % of the price' }, 'Larkspur Lane Pianos');
    expect(terms[0]).toMatch(/^The deposit is USD 450\.00 \(10 % of the price\)\./);
    expect(terms[1]).toBe('Once your payment arrives, Larkspur Lane Pianos takes the piano off the floor and holds it for you for 14 days.');
    expect(terms.join(' ')).toMatch(/counts toward the price/);
    expect(depositTerms({ amountMinor: 25000, currency: 'EUR', holdDays: 7, basis: null }, 'X')[0]).toMatch(/^The deposit is EUR 250\.00\. /);
  });
});
