import { gradeAssessment } from '@/modules/assessment/core/grade';
import { estimateReconditioning } from '@/modules/shop/core/estimate';
import { formatMoney, roundMinor, toMinor } from '@/modules/shop/core/money';
import { demoRateCard, rateCardInput, type RateCard } from '@/modules/shop/core/rate-card';

// A fixed card for the arithmetic: $80.00 an hour.
const card: RateCard = { ...demoRateCard, version: 'test', hourlyRateMinor: 8000 };

describe('money', () => {
  // ISO 4217: USD, CAD and EUR have 2 minor-unit digits, JPY has 0
  it.each([
    [95.5, 'USD', 9550],
    [1.005, 'EUR', 101],
    [1999, 'JPY', 1999],
    [12.34, 'CAD', 1234],
  ] as const)('%f %s is %i minor units', (major, currency, minor) => expect(toMinor(major, currency)).toBe(minor));

  it.each([
    [0.5, 1],
    [1.5, 2],
    [2.4, 2],
    [-0.5, -1],
  ])('rounds %f half away from zero to %i', (v, r) => expect(roundMinor(v)).toBe(r));

  // ISO 4217 minor units decide the decimals shown
  it('formats by the currency’s minor units', () => {
    expect(formatMoney(123456, 'USD')).toBe('USD 1,234.56');
    expect(formatMoney(123456, 'JPY')).toBe('JPY 123,456');
  });
});

describe('estimateReconditioning', () => {
  it('prices each task once, hours x rate + parts, in minor units, with its lines', () => {
    const grade = gradeAssessment({ keyLevelDeviationMm: 2.0, hammerGrooveDepthMm: 2, brokenStrings: 3, a4Hz: 430 });
    const e = estimateReconditioning(grade.findings, card);
    expect(e.lines.map((l) => [l.task, l.hours, l.quantity, l.labourMinor, l.partsMinor, l.totalMinor])).toEqual([
      // key level 2.0 mm: 6.5 h sized by the grade; 6.5 x 8000 = 52000
      ['regulation', 6.5, 1, 52000, 0, 52000],
      ['reshape_voice_hammers', 4, 1, 32000, 1500, 33500],
      // 3 strings at 0.5 h and 1800 each
      ['replace_broken_strings', 1.5, 3, 12000, 5400, 17400],
      ['pitch_raise', 1.5, 1, 12000, 0, 12000],
      ['fine_tuning', 1.5, 1, 12000, 0, 12000],
    ]);
    expect(e.totalHours).toBe(15);
    expect(e.labourMinor).toBe(120000);
    expect(e.partsMinor).toBe(6900);
    expect(e.totalMinor).toBe(126900);
    expect(e.currency).toBe('USD');
  });

  it('does a task asked for twice once, with the larger hours', () => {
    // regulation from the key level (16 h at 3 mm) and from a poor play test (2 h on the card)
    const grade = gradeAssessment({ keyLevelDeviationMm: 3, bassEvenness: 2 });
    const e = estimateReconditioning(grade.findings, card);
    const regulation = e.lines.filter((l) => l.task === 'regulation');
    expect(regulation).toHaveLength(1);
    expect(regulation[0].hours).toBe(16);
    expect(regulation[0].because).toEqual(['keys.level', 'play.tone']);
  });

  it('shows the cheaper partial fix as an option, not in the total', () => {
    const grade = gradeAssessment({ keyTouchesNeighbour: true });
    const e = estimateReconditioning(grade.findings, card);
    expect(e.lines.map((l) => l.task)).toEqual(['rebush_keys']);
    expect(e.options.map((l) => [l.task, l.alternativeTo, l.totalMinor])).toEqual([['ease_front_rail_pins', 'rebush_keys', 12000]]);
    expect(e.totalMinor).toBe(8 * 8000 + 6500);
  });

  it('rounds fractional labour per line, half away from zero', () => {
    const odd: RateCard = { ...card, hourlyRateMinor: 3333 };
    const grade = gradeAssessment({ keyLevelDeviationMm: 1.0 }); // light regulation: 2 h
    const half = { ...grade.findings[0], work: [{ task: 'regulation' as const, hours: 0.25 }] };
    const e = estimateReconditioning([half], odd);
    // 0.25 x 3333 = 833.25 -> 833
    expect(e.lines[0].labourMinor).toBe(833);
    const e2 = estimateReconditioning([{ ...half, work: [{ task: 'regulation' as const, hours: 1.5 }] }], { ...card, hourlyRateMinor: 3333 });
    // 1.5 x 3333 = 4999.5 -> 5000
    expect(e2.lines[0].labourMinor).toBe(5000);
  });

  it('works in a currency without minor units', () => {
    const yen: RateCard = { ...card, currency: 'JPY', hourlyRateMinor: 9000 };
    const e = estimateReconditioning(gradeAssessment({ hammerGrooveDepthMm: 3.5 }).findings, yen);
    expect(e.totalMinor).toBe(12 * 9000 + yen.tasks.replace_hammers.partsMinor);
    expect(formatMoney(e.totalMinor, 'JPY')).toBe(`JPY ${(108000 + 68000).toLocaleString('en-US')}`);
  });

  it('an inspection with nothing to do estimates zero', () => {
    const e = estimateReconditioning(gradeAssessment({ keySidePlayMm: 1 }).findings, card);
    expect(e.lines).toEqual([]);
    expect(e.totalMinor).toBe(0);
  });
});

describe('rateCardInput', () => {
  it('accepts the demo card and refuses a fractional minor unit or an unknown task', () => {
    const { version: _v, ...body } = demoRateCard;
    expect(rateCardInput.safeParse(body).success).toBe(true);
    const frac = rateCardInput.safeParse({ ...body, hourlyRateMinor: 95.5 });
    expect(frac.error!.issues[0].path).toEqual(['hourlyRateMinor']);
    const extra = rateCardInput.safeParse({ ...body, tasks: { ...body.tasks, polishing: { hours: 1, partsMinor: 0 } } });
    expect(extra.success).toBe(false);
  });
});
