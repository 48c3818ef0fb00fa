import { equilibriumMoistureContent, fahrenheit, readClimate } from '@/modules/shop/core/climate';

describe('equilibriumMoistureContent', () => {
  // USDA Forest Products Laboratory, Wood Handbook, ch. 4: 140 deg F and 55 % RH give 8.4 % (tabulated 8.0 %)
  it('matches the Wood Handbook check value', () => {
    expect(equilibriumMoistureContent(140, 55)).toBeCloseTo(8.4, 1);
  });
  // from memory: about 8-9 % at room temperature and 45-50 % RH
  it('gives about 8.5 % at 70 deg F and 45 % RH', () => {
    expect(equilibriumMoistureContent(70, 45)).toBeCloseTo(8.5, 1);
  });
  it('rises with humidity', () => {
    expect(equilibriumMoistureContent(70, 30)).toBeLessThan(equilibriumMoistureContent(70, 60));
  });
  it.each([-1, 100, 120])('refuses %p % RH', (rh) => expect(() => equilibriumMoistureContent(70, rh)).toThrow(RangeError));
});

describe('readClimate', () => {
  it('converts Celsius: 60 deg C is 140 deg F', () => {
    expect(fahrenheit(60)).toBe(140);
    expect(readClimate(60, 55).emcPct).toBeCloseTo(8.4, 1);
  });
  // from memory: pianos keep best at about 40-50 % relative humidity
  it.each([
    [39, /Dry air/],
    [40, null],
    [50, null],
    [51, /Damp air/],
  ])('at %i %% RH warns %p', (rh, warning) => {
    const w = readClimate(21, rh).warning;
    if (warning) expect(w).toMatch(warning);
    else expect(w).toBeNull();
  });
});
