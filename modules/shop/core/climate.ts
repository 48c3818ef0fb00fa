// Workshop climate: the wood's equilibrium moisture content from temperature and relative humidity.

export const fahrenheit = (celsius: number) => celsius * 1.8 + 32;

/**
 * Equilibrium moisture content of wood, percent, by the Hailwood-Horrobin equation with the
 * coefficients of the USDA Wood Handbook, ch. 4 (T in deg F, h = RH / 100).
 */
export function equilibriumMoistureContent(tempF: number, relativeHumidityPct: number): number {
  if (relativeHumidityPct < 0 || relativeHumidityPct >= 100) throw new RangeError('relative humidity must be from 0 to under 100 %');
  const T = tempF;
  const h = relativeHumidityPct / 100;
  const W = 330 + 0.452 * T + 0.00415 * T * T;
  const K = 0.791 + 4.63e-4 * T - 8.44e-7 * T * T;
  const K1 = 6.34 + 7.75e-4 * T - 9.35e-5 * T * T;
  const K2 = 1.09 + 2.84e-2 * T - 9.04e-5 * T * T;
  const Kh = K * h;
  return (1800 / W) * (Kh / (1 - Kh) + (K1 * Kh + 2 * K1 * K2 * Kh * Kh) / (1 + K1 * Kh + K1 * K2 * Kh * Kh));
}

// Pianos keep best at about 40-50 % relative humidity (from memory; a shop default).
export const HUMIDITY_BAND = { low: 40, high: 50 };

export interface ClimateReading {
  emcPct: number;
  warning: string | null;
}

export function readClimate(tempC: number, relativeHumidityPct: number, band = HUMIDITY_BAND): ClimateReading {
  const emcPct = equilibriumMoistureContent(fahrenheit(tempC), relativeHumidityPct);
  let warning: string | null = null;
  if (relativeHumidityPct < band.low) warning = `Dry air (${relativeHumidityPct} % RH, below ${band.low} %): soundboards crack and tuning pins loosen. Humidify the workshop.`;
  else if (relativeHumidityPct > band.high) warning = `Damp air (${relativeHumidityPct} % RH, above ${band.high} %): wood swells, keys and action parts stick and strings rust. Dehumidify the workshop.`;
  return { emcPct, warning };
}
