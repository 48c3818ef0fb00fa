import { gradeAssessment } from '@/modules/assessment/core/grade';
import { buildDisclosure, canonicalJson, DEFAULT_WARRANTY, type DisclosureInput } from '@/modules/disclosure/core/disclosure';

import { buildMeasurements } from '../../../support/builders';

function input(over: Partial<DisclosureInput> = {}): DisclosureInput {
  const measurements = buildMeasurements();
  return {
    piano: { stockNumber: 'FW-0100', maker: 'Almsbury', model: 'Parlour 118', serialNumber: 'AL-1', year: 1981, yearIsEstimate: true, yearFrom: 1978, yearTo: 1984, kind: 'upright', sizeCm: 118, finish: 'satin walnut', caseCondition: 'worn', caseNotes: 'A ring mark on the lid.' },
    askingPriceMinor: 349500,
    currency: 'USD',
    assessment: { kind: 'intake', measurements, grade: gradeAssessment(measurements), submittedAt: '2026-11-28T10:00:00.000Z' },
    workDone: [{ task: 'reshape_voice_hammers', title: 'Reshape and voice hammers' }],
    photos: [{ id: 7, area: 'soundboard', caption: 'Crack near the treble bridge' }],
    texts: { dealerName: 'Larkspur Lane Pianos', warranty: DEFAULT_WARRANTY },
    ...over,
  };
}

describe('buildDisclosure', () => {
  it('names a cosmetic soundboard crack and worn hammers, and the work done', () => {
    const c = buildDisclosure(input());
    const soundboard = c.areas.find((a) => a.area === 'soundboard')!;
    expect(soundboard.condition).toBe('Worth knowing');
    expect(soundboard.findings[0].text).toMatch(/does not cross a rib, buzz or affect tuning, so it is cosmetic, but it lowers resale value/);
    expect(soundboard.photoIds).toEqual([7]);
    const hammers = c.areas.find((a) => a.area === 'hammers')!;
    expect(hammers.condition).toBe('Needs attention');
    expect(hammers.findings[0].text).toMatch(/2.2 mm deep/);
    expect(hammers.workDone).toEqual(['Reshape and voice hammers']);
    expect(c.areas.find((a) => a.area === 'case')!.findings[0].text).toBe('The case and finish show wear: marks and scratches from years of use. A ring mark on the lid.');
  });

  it('says whether a crack crosses a rib, buzzes or affects tuning, and whether it is wide', () => {
    const m = buildMeasurements({ soundboardCracks: [{ lengthCm: 40, widestGapMm: 0.9, crossesRib: true, buzzes: false, hurtsTuning: false }] });
    const c = buildDisclosure(input({ assessment: { kind: 'post_workshop', measurements: m, grade: gradeAssessment(m), submittedAt: '2026-11-30T10:00:00.000Z' } }));
    const text = c.areas.find((a) => a.area === 'soundboard')!.findings[0].text;
    expect(text).toMatch(/it crosses a rib/);
    expect(text).toMatch(/a wide crack/);
    expect(c.assessedAfterWorkshop).toBe(true);
  });

  // ISO 16:1975 and the cent (Ellis, 1885): 437.2 Hz is 11 cents below A4 = 440 Hz
  it('states the measured pitch in cents from standard pitch, with the date', () => {
    expect(buildDisclosure(input()).pitch).toEqual({ a4Hz: 437.2, cents: -11.1, text: 'A4 measured at 437.2 Hz, 11 cents below standard pitch, on 2026-11-28.' });
  });

  it('carries the notices a buyer is owed', () => {
    const titles = buildDisclosure(input()).notices.map((n) => n.title);
    expect(titles).toEqual(['Tuning after delivery', 'Moving a piano', 'Your own inspection', 'About this document']);
  });
});

describe('canonicalJson', () => {
  it('orders keys so equal content gives equal text', () => {
    expect(canonicalJson({ b: 1, a: { d: [1, { f: 2, e: 1 }], c: null } })).toBe('{"a":{"c":null,"d":[1,{"e":1,"f":2}]},"b":1}');
    expect(canonicalJson({ x: 1, y: 2 })).toBe(canonicalJson({ y: 2, x: 1 }));
  });
});
