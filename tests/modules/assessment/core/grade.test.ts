import { bandFor, gradeAssessment, regulationHours, type Finding } from '@/modules/assessment/core/grade';
import { defaultRules } from '@/modules/assessment/core/grade-rules';
import { measurementsInput, type Measurements } from '@/modules/assessment/core/measurements';

const grade = (m: Measurements) => gradeAssessment(measurementsInput.parse(m));
const only = (m: Measurements, check: string): Finding => {
  const f = grade(m).findings.find((x) => x.check === check);
  if (!f) throw new Error(`no finding ${check}`);
  return f;
};
const tasks = (f: Finding) => f.work.map((w) => w.task);
// The A4 that sits `c` cents from 440 Hz, by the definition of the cent (A. J. Ellis, 1885).
const hzAtCents = (c: number) => 440 * 2 ** (c / 1200);
const crack = { lengthCm: 30, widestGapMm: 0.3, crossesRib: false, buzzes: false, hurtsTuning: false };

describe('key side play', () => {
  // common practice, no published source: 1-2 mm of side play is normal even on a new piano
  it.each([
    [0, 'sound'],
    [1.5, 'sound'],
    [2.0, 'sound'],
    [2.01, 'watch'],
    [6, 'watch'],
  ])('%f mm is %s', (mm, severity) => expect(only({ keySidePlayMm: mm }, 'keys.sidePlay').severity).toBe(severity));

  // common practice, no published source: a key that touches its neighbour means worn key bushings
  it('a key touching its neighbour needs rebushing, with easing the front rail pins as the cheaper fix', () => {
    const f = only({ keySidePlayMm: 1.0, keyTouchesNeighbour: true }, 'keys.sidePlay');
    expect(f.severity).toBe('needs_work');
    expect(tasks(f)).toEqual(['rebush_keys', 'ease_front_rail_pins']);
    expect(f.work[1].alternativeTo).toBe('rebush_keys');
    expect(f.mustDisclose).toBe(true);
  });
});

describe('key level', () => {
  // common practice, no published source: light regulation takes a couple of hours, a far-out action a couple of days
  it.each([
    [0.5, 'sound', undefined],
    [0.51, 'watch', 2],
    [1.5, 'watch', 2],
    [1.51, 'needs_work', 2],
    [2.25, 'needs_work', 9],
    [3.0, 'needs_work', 16],
    [8, 'needs_work', 16],
  ])('%f mm is %s with %p hours of regulation', (mm, severity, hours) => {
    const f = only({ keyLevelDeviationMm: mm }, 'keys.level');
    expect(f.severity).toBe(severity);
    expect(f.work[0]?.hours).toBe(hours);
  });
  it('rounds the hours between the limits to the half hour', () => {
    expect(regulationHours(2.0)).toBe(6.5);
  });
});

describe('hammers', () => {
  // common practice, no published source: shallow grooves are normal; grooves several mm deep mean the end of the hammer's life
  it.each([
    [0.5, 'sound', []],
    [1.0, 'sound', []],
    [1.01, 'needs_work', ['reshape_voice_hammers']],
    [2.99, 'needs_work', ['reshape_voice_hammers']],
    [3.0, 'serious', ['replace_hammers']],
    [5.5, 'serious', ['replace_hammers']],
  ])('grooves %f mm deep are %s', (mm, severity, work) => {
    const f = only({ hammerGrooveDepthMm: mm }, 'hammers.wear');
    expect(f.severity).toBe(severity);
    expect(tasks(f)).toEqual(work);
  });
  // common practice, no published source: chemically hardened felt or no felt left cannot be revoiced
  it.each([
    [{ hammerGrooveDepthMm: 0.5, hammerFelt: 'chemically_hardened' as const }],
    [{ hammerGrooveDepthMm: 0.5, hammerFeltLeft: 'none' as const }],
  ])('%j means replacing the hammers', (m) => {
    const f = only(m, 'hammers.wear');
    expect(f.severity).toBe('serious');
    expect(tasks(f)).toEqual(['replace_hammers']);
    expect(grade(m).referToTechnician).toBe(true);
  });
});

describe('strings', () => {
  // common practice, no published source: rust on steel and dark or green oxidation on copper are signs of age
  it.each([
    [{ steelCorrosion: 'light' as const }, 'strings.steel', 'sound'],
    [{ steelCorrosion: 'moderate' as const }, 'strings.steel', 'watch'],
    [{ steelCorrosion: 'heavy' as const }, 'strings.steel', 'needs_work'],
    [{ bassWinding: 'dull' as const }, 'strings.bass', 'sound'],
    [{ bassWinding: 'dark' as const }, 'strings.bass', 'watch'],
    [{ bassWinding: 'green' as const }, 'strings.bass', 'needs_work'],
    [{ brokenStrings: 2 }, 'strings.broken', 'needs_work'],
  ])('%j: %s is %s', (m, check, severity) => expect(only(m, check).severity).toBe(severity));

  it('asks for restringing where corrosion is heavy and names broken strings', () => {
    expect(tasks(only({ steelCorrosion: 'heavy' }, 'strings.steel'))).toEqual(['restring_section']);
    expect(tasks(only({ bassWinding: 'green' }, 'strings.bass'))).toEqual(['restring_section']);
    expect(only({ brokenStrings: 1 }, 'strings.broken').finding).toBe('1 broken string.');
  });
});

describe('soundboard cracks', () => {
  // common practice, no published source: a crack is serious when it crosses a rib, buzzes or hurts tuning stability
  it.each([
    [{}, 'watch'],
    [{ crossesRib: true }, 'serious'],
    [{ buzzes: true }, 'serious'],
    [{ hurtsTuning: true }, 'serious'],
  ])('a crack with %j is %s and is disclosed', (extra, severity) => {
    const f = only({ soundboardCracks: [{ ...crack, ...extra }] }, 'soundboard.crack.1');
    expect(f.severity).toBe(severity);
    expect(f.mustDisclose).toBe(true);
  });

  // ISO/IEC 7810: an ID-1 payment card is 0.76 mm thick; a gap that admits one is a wide crack
  it.each([
    [0.75, false],
    [0.76, true],
  ])('a gap of %f mm is wide: %p', (gap, wide) => {
    const f = only({ soundboardCracks: [{ ...crack, widestGapMm: gap }] }, 'soundboard.crack.1');
    expect(f.finding.includes('wide crack')).toBe(wide);
  });

  it('says plainly that a cosmetic crack lowers resale value', () => {
    expect(only({ soundboardCracks: [crack] }, 'soundboard.crack.1').finding).toBe(
      'Soundboard crack, 30 cm long, 0.3 mm at its widest: it does not cross a rib, buzz or affect tuning, so it is cosmetic, but it lowers resale value.',
    );
  });

  it('grades each crack and separated ribs on their own', () => {
    const g = grade({ soundboardCracks: [crack, { ...crack, buzzes: true }], ribsSeparated: true });
    expect(g.findings.map((f) => [f.check, f.severity])).toEqual([
      ['soundboard.crack.1', 'watch'],
      ['soundboard.crack.2', 'serious'],
      ['soundboard.ribs', 'needs_work'],
    ]);
  });
});

describe('tuning', () => {
  // ISO 16:1975 (A4 = 440 Hz) and the cent (A. J. Ellis, 1885); 15 cents flat before a pitch raise is from memory
  it.each([
    [0, 'sound', []],
    [-5, 'sound', []],
    [-6, 'watch', ['fine_tuning']],
    [-15, 'watch', ['fine_tuning']],
    [-15.01, 'needs_work', ['pitch_raise', 'fine_tuning']],
    [-60, 'needs_work', ['pitch_raise', 'fine_tuning']],
    [20, 'needs_work', ['fine_tuning']],
  ])('%f cents from standard pitch is %s', (c, severity, work) => {
    const g = grade({ a4Hz: hzAtCents(c) });
    const f = g.findings.find((x) => x.check === 'tuning.pitch')!;
    expect(f.severity).toBe(severity);
    expect(tasks(f)).toEqual(work);
    expect(g.centsFromStandard).toBeCloseTo(c, 6);
  });

  it('states the measured pitch in words', () => {
    // ISO 16:1975 and Ellis's cent: 437.2 Hz is 1200*log2(437.2/440) = -11.05 cents
    expect(only({ a4Hz: 437.2 }, 'tuning.pitch').finding).toBe('A4 measured at 437.2 Hz, 11 cents below standard pitch (440 Hz): a fine tuning brings it to pitch.');
  });

  // common practice, no published source: loose tuning pins will not hold a tuning
  it.each([
    ['firm', 'sound'],
    ['some_loose', 'watch'],
    ['loose', 'serious'],
  ] as const)('tuning pins %s are %s', (pins, severity) => expect(only({ tuningPins: pins }, 'tuning.pins').severity).toBe(severity));
});

describe('play test', () => {
  const good = { bassEvenness: 4, middleEvenness: 5, trebleEvenness: 4, dynamicRange: 4, overallImpression: 4 };

  // common practice, no published source: the play test outranks every visual check
  it.each([
    ['bassEvenness', 2],
    ['middleEvenness', 1],
    ['trebleEvenness', 2],
    ['overallImpression', 2],
  ])('%s at %i sets not recommended for retail, however clean the rest', (field, value) => {
    const g = grade({ ...good, [field]: value, keySidePlayMm: 1, hammerGrooveDepthMm: 0.5, steelCorrosion: 'none' });
    expect(g.notRecommendedForRetail).toBe(true);
  });

  it.each([
    ['bassEvenness', 3],
    ['overallImpression', 3],
    ['dynamicRange', 1],
  ])('%s at %i does not set it', (field, value) => {
    expect(grade({ ...good, [field]: value }).notRecommendedForRetail).toBe(false);
  });

  it('an even piano with a good range is sound', () => {
    const g = grade(good);
    expect(g.findings.map((f) => f.severity)).toEqual(['sound', 'sound']);
    expect(g.score).toBe(100);
  });

  it('names the notes that stand out', () => {
    expect(only({ notesStickingOut: [52, 40, 52] }, 'play.notes').finding).toBe('Notes that stand out from their neighbours: keys 40, 52.');
  });
});

describe('score, band and flags', () => {
  it('takes 3 per watch, 10 per needs work and 25 per serious, never below 0', () => {
    // 2 watch (side play, moderate corrosion), 1 needs work (grooves 2 mm), 1 serious (buzzing crack)
    const g = grade({ keySidePlayMm: 2.5, steelCorrosion: 'moderate', hammerGrooveDepthMm: 2, soundboardCracks: [{ ...crack, buzzes: true }] });
    expect(g.score).toBe(100 - 2 * 3 - 10 - 25);
    expect(g.band).toBe('fair');
    expect(g.referToTechnician).toBe(true);
    const wreck = grade({
      keyTouchesNeighbour: true,
      hammerGrooveDepthMm: 4,
      tuningPins: 'loose',
      soundboardCracks: [{ ...crack, crossesRib: true }, { ...crack, buzzes: true }],
      bassEvenness: 1,
    });
    expect(wreck.score).toBe(0);
    expect(wreck.band).toBe('poor');
  });

  it.each([
    [100, 'excellent'],
    [85, 'excellent'],
    [84, 'good'],
    [70, 'good'],
    [69, 'fair'],
    [50, 'fair'],
    [49, 'poor'],
    [0, 'poor'],
  ])('a score of %i is %s', (score, band) => expect(bandFor(score)).toBe(band));

  it('an empty inspection grades 100 with no findings and records the rules version', () => {
    expect(grade({})).toEqual({
      rulesVersion: defaultRules.version,
      findings: [],
      score: 100,
      band: 'excellent',
      referToTechnician: false,
      notRecommendedForRetail: false,
      centsFromStandard: null,
    });
  });

  it('follows changed shop rules', () => {
    const strict = { ...defaultRules, version: 'strict', keySidePlayNormalMm: 1.5 };
    const g = gradeAssessment({ keySidePlayMm: 1.8 }, strict);
    expect(g.findings[0].severity).toBe('watch');
    expect(g.rulesVersion).toBe('strict');
  });
});

describe('measurement input', () => {
  it.each([
    [{ keySidePlayMm: 10.5 }, 'keySidePlayMm'],
    [{ keySidePlayMm: -1 }, 'keySidePlayMm'],
    [{ keyLevelDeviationMm: 15.1 }, 'keyLevelDeviationMm'],
    [{ hammerGrooveDepthMm: 11 }, 'hammerGrooveDepthMm'],
    [{ stickingKeys: [0] }, 'stickingKeys.0'],
    [{ notesStickingOut: [89] }, 'notesStickingOut.0'],
    [{ bassEvenness: 6 }, 'bassEvenness'],
    [{ a4Hz: 1000 }, 'a4Hz'],
    [{ hammerFelt: 'crunchy' }, 'hammerFelt'],
    [{ soundboardCracks: [{ lengthCm: 10, widestGapMm: 12 }] }, 'soundboardCracks.0.widestGapMm'],
    [{ keySidePlayMm: '2' }, 'keySidePlayMm'],
  ])('refuses %j naming %s', (input, path) => {
    const r = measurementsInput.safeParse(input);
    expect(r.success).toBe(false);
    expect(r.error!.issues[0].path.join('.')).toBe(path);
  });

  it('refuses a field it does not know', () => {
    expect(measurementsInput.safeParse({ keySidePlay: 2 }).success).toBe(false);
  });
});
