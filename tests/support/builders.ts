import type { Measurements } from '@/modules/assessment/core/measurements';

// Invented intakes for tests: a fair upright with a cosmetic crack and worn hammers.
export function buildMeasurements(over: Partial<Measurements> = {}): Measurements {
  return {
    keySidePlayMm: 1.6,
    keyTouchesNeighbour: false,
    keyLevelDeviationMm: 1.2,
    hammerGrooveDepthMm: 2.2,
    hammerFelt: 'firm',
    hammerFeltLeft: 'ample',
    steelCorrosion: 'light',
    bassWinding: 'dull',
    brokenStrings: 0,
    soundboardCracks: [{ lengthCm: 24, widestGapMm: 0.4, crossesRib: false, buzzes: false, hurtsTuning: false }],
    ribsSeparated: false,
    a4Hz: 437.2,
    tuningPins: 'firm',
    bassEvenness: 4,
    middleEvenness: 4,
    trebleEvenness: 3,
    dynamicRange: 4,
    overallImpression: 4,
    ...over,
  };
}

// Each built intake is a piano of its own: the same serial twice is the same piano taken in again.
let serial = 777000;

export function buildIntake(over: Record<string, unknown> = {}) {
  serial += 1;
  return {
    seller: { name: 'Rosalind Vantongeren', phone: '+1 555 0100', email: 'rosalind@example.test', address: '12 Quince Row, Millbrook' },
    acquisition: 'trade_in',
    receivedOn: '2026-11-28',
    inspectedAt: 'customer_home',
    piano: { maker: 'Almsbury', model: 'Parlour 118', serialNumber: `AL-${serial}`, kind: 'upright', sizeCm: 118, finish: 'satin walnut', yearFrom: 1978, yearTo: 1984, caseCondition: 'good' },
    notes: 'Seller wants it gone before the holidays.',
    measurements: buildMeasurements(),
    photoIds: [],
    ...over,
  };
}
