import { AREAS, gradeAssessment, inspectedAreas, provisionalRule, readinessReasons, regulationHours, type Finding } from '@/modules/assessment/core/grade';
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
    [0, 'fine'],
    [1.5, 'fine'],
    [2.0, 'fine'],
    [2.01, 'noted'],
    [6, 'noted'],
  ])('%f mm is %s', (mm, mark) => expect(only({ keySidePlayMm: mm }, 'keys.sidePlay').mark).toBe(mark));

  // common practice, no published source: a key that touches its neighbour means worn key bushings
  it('a key touching its neighbour needs rebushing, with easing the front rail pins as the cheaper fix', () => {
    const f = only({ keySidePlayMm: 1.0, keyTouchesNeighbour: true, keysTouchingNeighbour: [40] }, 'keys.sidePlay');
    expect(f.mark).toBe('work');
    expect(tasks(f)).toEqual(['rebush_keys', 'ease_front_rail_pins']);
    expect(f.work[1].alternativeTo).toBe('rebush_keys');
    expect(f.mustDisclose).toBe(true);
    expect(f.finding).toBe('Key 40 can be pushed sideways until it touches its neighbour: the key bushings are worn.');
  });

  it('names every key it happens on, in order', () => {
    expect(only({ keyTouchesNeighbour: true, keysTouchingNeighbour: [52, 12, 52] }, 'keys.sidePlay').finding).toBe('Keys 12, 52 can be pushed sideways until they touch their neighbours: the key bushings are worn.');
  });

  it.each([
    [{ keyTouchesNeighbour: true }, 'is needed: name the keys that touch a neighbour'],
    [{ keyTouchesNeighbour: true, keysTouchingNeighbour: [] }, 'is needed: name the keys that touch a neighbour'],
    [{ keyTouchesNeighbour: false, keysTouchingNeighbour: [3] }, 'is only for a key that touches its neighbour: answer that question yes first'],
    [{ keyTouchesNeighbour: true, keysTouchingNeighbour: [0] }, 'must be a key number from 1 to 88'],
    [{ keyTouchesNeighbour: true, keysTouchingNeighbour: [89] }, 'must be a key number from 1 to 88'],
    [{ keyTouchesNeighbour: true, keysTouchingNeighbour: [12.5] }, 'must be a whole key number'],
  ])('refuses %j: %s', (m, message) => {
    const r = measurementsInput.safeParse(m);
    expect(r.success).toBe(false);
    expect(r.error!.issues[0].path[0]).toBe('keysTouchingNeighbour');
    expect(r.error!.issues[0].message).toBe(message);
  });
});

describe('key level', () => {
  // common practice, no published source: light regulation takes a couple of hours, a far-out action a couple of days
  it.each([
    [0.5, 'fine', undefined],
    [0.51, 'noted', 2],
    [1.5, 'noted', 2],
    [1.51, 'work', 2],
    [2.25, 'work', 9],
    [3.0, 'work', 16],
    [8, 'work', 16],
  ])('%f mm is %s with %p hours of regulation', (mm, mark, hours) => {
    const f = only({ keyLevelDeviationMm: mm }, 'keys.level');
    expect(f.mark).toBe(mark);
    expect(f.work[0]?.hours).toBe(hours);
  });
  it('rounds the hours between the limits to the half hour', () => {
    expect(regulationHours(2.0)).toBe(6.5);
  });
});

describe('hammers', () => {
  // common practice, no published source: shallow grooves are normal; grooves several mm deep mean the end of the hammer's life
  it.each([
    [0.5, 'fine', []],
    [1.0, 'fine', []],
    [1.01, 'work', ['reshape_voice_hammers']],
    [2.99, 'work', ['reshape_voice_hammers']],
    [3.0, 'major', ['replace_hammers']],
    [5.5, 'major', ['replace_hammers']],
  ])('grooves %f mm deep are %s', (mm, mark, work) => {
    const f = only({ hammerGrooveDepthMm: mm }, 'hammers.wear');
    expect(f.mark).toBe(mark);
    expect(tasks(f)).toEqual(work);
  });
  // common practice, no published source: chemically hardened felt or no felt left cannot be revoiced
  it.each([
    [{ hammerGrooveDepthMm: 0.5, hammerFelt: 'chemically_hardened' as const }],
    [{ hammerGrooveDepthMm: 0.5, hammerFeltLeft: 'none' as const }],
  ])('%j means replacing the hammers', (m) => {
    const f = only(m, 'hammers.wear');
    expect(f.mark).toBe('major');
    expect(tasks(f)).toEqual(['replace_hammers']);
    expect(grade(m).referToTechnician).toBe(true);
  });
});

describe('strings', () => {
  // common practice, no published source: rust on steel and dark or green oxidation on copper are signs of age
  it.each([
    [{ steelCorrosion: 'light' as const }, 'strings.steel', 'fine'],
    [{ steelCorrosion: 'moderate' as const }, 'strings.steel', 'noted'],
    [{ steelCorrosion: 'heavy' as const }, 'strings.steel', 'work'],
    [{ bassWinding: 'dull' as const }, 'strings.bass', 'fine'],
    [{ bassWinding: 'dark' as const }, 'strings.bass', 'noted'],
    [{ bassWinding: 'green' as const }, 'strings.bass', 'work'],
    [{ brokenStrings: 2 }, 'strings.broken', 'work'],
  ])('%j: %s is %s', (m, check, mark) => expect(only(m, check).mark).toBe(mark));

  it('asks for restringing where corrosion is heavy and names broken strings', () => {
    expect(tasks(only({ steelCorrosion: 'heavy' }, 'strings.steel'))).toEqual(['restring_section']);
    expect(tasks(only({ bassWinding: 'green' }, 'strings.bass'))).toEqual(['restring_section']);
    expect(only({ brokenStrings: 1 }, 'strings.broken').finding).toBe('1 broken string.');
  });
});

describe('soundboard cracks', () => {
  // common practice, no published source: a crack is serious when it crosses a rib, buzzes or hurts tuning stability
  it.each([
    [{}, 'noted'],
    [{ crossesRib: true }, 'major'],
    [{ buzzes: true }, 'major'],
    [{ hurtsTuning: true }, 'major'],
  ])('a crack with %j is %s and is disclosed', (extra, mark) => {
    const f = only({ soundboardCracks: [{ ...crack, ...extra }] }, 'soundboard.crack.1');
    expect(f.mark).toBe(mark);
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
    expect(g.findings.map((f) => [f.check, f.mark])).toEqual([
      ['soundboard.crack.1', 'noted'],
      ['soundboard.crack.2', 'major'],
      ['soundboard.ribs', 'work'],
    ]);
  });
});

describe('tuning', () => {
  // ISO 16:1975 (A4 = 440 Hz) and the cent (A. J. Ellis, 1885); 15 cents flat before a pitch raise is from memory
  it.each([
    [0, 'fine', []],
    [-5, 'fine', []],
    [-6, 'noted', ['fine_tuning']],
    [-15, 'noted', ['fine_tuning']],
    [-15.01, 'work', ['pitch_raise', 'fine_tuning']],
    [-60, 'work', ['pitch_raise', 'fine_tuning']],
    [20, 'work', ['fine_tuning']],
  ])('%f cents from standard pitch is %s', (c, mark, work) => {
    const g = grade({ a4Hz: hzAtCents(c) });
    const f = g.findings.find((x) => x.check === 'tuning.pitch')!;
    expect(f.mark).toBe(mark);
    expect(tasks(f)).toEqual(work);
    expect(g.centsFromStandard).toBeCloseTo(c, 6);
  });

  it('states the measured pitch in words', () => {
    // ISO 16:1975 and Ellis's cent: 437.2 Hz is 1200*log2(437.2/440) = -11.05 cents
    expect(only({ a4Hz: 437.2 }, 'tuning.pitch').finding).toBe('A4 measured at 437.2 Hz, 11.1 cents below standard pitch (440 Hz): a fine tuning brings it to pitch.');
  });

  // common practice, no published source: loose tuning pins will not hold a tuning
  it.each([
    ['firm', 'fine'],
    ['some_loose', 'noted'],
    ['loose', 'major'],
  ] as const)('tuning pins %s are %s', (pins, mark) => expect(only({ tuningPins: pins }, 'tuning.pins').mark).toBe(mark));
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

  it('an even piano with a good range is fine', () => {
    const g = grade(good);
    expect(g.findings.map((f) => f.mark)).toEqual(['fine', 'fine']);
    expect(g.playTested).toBe(true);
  });

  it('names the notes that stand out', () => {
    expect(only({ notesStickingOut: [52, 40, 52] }, 'play.notes').finding).toBe('Notes that stand out from their neighbours: keys 40, 52.');
  });
});

// Every area measured, all of it in good order: the full grade a shop could put on the floor.
const clean: Measurements = {
  keySidePlayMm: 1.2,
  keyLevelDeviationMm: 0.3,
  hammerGrooveDepthMm: 0.6,
  steelCorrosion: 'none',
  bassWinding: 'bright',
  ribsSeparated: false,
  a4Hz: 440,
  tuningPins: 'firm',
  bassEvenness: 5,
  middleEvenness: 5,
  trebleEvenness: 4,
  dynamicRange: 5,
  overallImpression: 5,
};
const onlyAreas = (areas: string[]) =>
  Object.fromEntries(
    Object.entries({
      keys: { keySidePlayMm: 1.2 },
      hammers: { hammerGrooveDepthMm: 0.6 },
      strings: { steelCorrosion: 'none' },
      soundboard: { ribsSeparated: false },
      tuning: { a4Hz: 440 },
      play: { overallImpression: 5 },
    } as Record<string, Measurements>)
      .filter(([a]) => areas.includes(a))
      .flatMap(([, m]) => Object.entries(m)),
  ) as Measurements;

describe('areas not inspected', () => {
  it('an empty inspection inspects nothing, claims nothing and gives no verdict of quality', () => {
    expect(grade({})).toEqual({
      format: 2,
      rulesVersion: defaultRules.version,
      findings: [],
      inspectedAreas: [],
      minInspectedAreas: defaultRules.minInspectedAreas,
      provisional: true,
      playTested: false,
      readiness: 'unjudged',
      referToTechnician: false,
      notRecommendedForRetail: false,
      centsFromStandard: null,
    });
    expect(readinessReasons(grade({}))).toEqual(['Nothing has been inspected yet.']);
  });

  it.each([
    [{ keyTouchesNeighbour: false }, ['keys']],
    [{ keytopDamage: [] }, []],
    [{ hammerFeltLeft: 'ample' as const, brokenStrings: 0 }, ['hammers', 'strings']],
    [{ soundboardCracks: [] }, []],
    [{ notesStickingOut: [12] }, ['play']],
    [clean, [...AREAS]],
  ])('%j inspects %j', (m, areas) => expect(inspectedAreas(measurementsInput.parse(m))).toEqual(areas));

  it('every measurement given yields a finding, so an inspected area never reads as empty', () => {
    for (const [field, value] of Object.entries({ keyTouchesNeighbour: false, hammerFelt: 'firm', hammerFeltLeft: 'ample', brokenStrings: 0, ribsSeparated: false, tuningPins: 'firm', dynamicRange: 4 })) {
      const g = grade({ [field]: value } as Measurements);
      expect([field, g.inspectedAreas.length, g.findings.length]).toEqual([field, 1, 1]);
      expect(g.findings[0].mark).toBe('fine');
    }
  });
});

describe('provisional grade', () => {
  // shop default (TRADE.md "shop default"): a grade needs 5 of the 6 areas
  it.each([
    [[], true],
    [['keys', 'hammers', 'strings', 'soundboard'], true],
    [['keys', 'hammers', 'strings', 'soundboard', 'play'], false],
    [[...AREAS], false],
  ])('inspecting %j is provisional: %p', (areas, provisional) => {
    const g = grade(onlyAreas(areas as string[]));
    expect(g.inspectedAreas).toEqual(AREAS.filter((a) => (areas as string[]).includes(a)));
    expect(g.provisional).toBe(provisional);
  });

  it('follows the shop’s own rule, and states it', () => {
    const lenient = { ...defaultRules, version: 'lenient', minInspectedAreas: 2 };
    const g = gradeAssessment(onlyAreas(['keys', 'play']), lenient);
    expect(g.provisional).toBe(false);
    expect(g.minInspectedAreas).toBe(2);
    expect(provisionalRule(5)).toBe('A grade is provisional until at least 5 of the 6 areas are inspected (the shop’s rule).');
  });
});

describe('readiness verdict', () => {
  it.each([
    // common practice, no published source: the play test outranks every visual check
    ['a full clean grade with the play test', clean, 'floor', false],
    ['a clean grade without the play test', onlyAreas(['keys', 'hammers', 'strings', 'soundboard', 'tuning']), 'unjudged', false],
    ['a clean but provisional grade', onlyAreas(['keys', 'play']), 'unjudged', true],
    ['one finding calling for work', { ...clean, hammerGrooveDepthMm: 2 }, 'work_first', false],
    ['work found over a provisional grade', { hammerGrooveDepthMm: 2 }, 'work_first', true],
    ['a noted finding with no work', { ...clean, steelCorrosion: 'moderate' }, 'floor', false],
    ['a poor play test, however clean the rest', { ...clean, overallImpression: 2 }, 'wholesale', false],
  ] as [string, Measurements, string, boolean][])('%s', (_what, m, readiness, provisional) => {
    const g = grade(m);
    expect(g.readiness).toBe(readiness);
    expect(g.provisional).toBe(provisional);
  });

  it('says why in words', () => {
    expect(readinessReasons(grade(clean))).toEqual(['Every inspected area is fine or noted, with no work called for.']);
    expect(readinessReasons(grade({ hammerGrooveDepthMm: 2, keyLevelDeviationMm: 2 }))).toEqual([
      '2 findings call for work before it goes on the floor.',
      'Provisional: 2 of 6 areas inspected; the shop asks for 5.',
      'The play test has not been done: it outranks every visual check.',
    ]);
    expect(readinessReasons(grade({ ...clean, bassEvenness: 1 }))[0]).toBe('The play test found it plays poorly: not recommended for retail as it stands.');
  });

  it('refers to a technician when a finding is major work', () => {
    const g = grade({ keySidePlayMm: 2.5, steelCorrosion: 'moderate', hammerGrooveDepthMm: 2, soundboardCracks: [{ ...crack, buzzes: true }] });
    expect(g.findings.map((f) => f.mark)).toEqual(['noted', 'work', 'noted', 'major']);
    expect(g.referToTechnician).toBe(true);
  });

  it('follows changed shop rules', () => {
    const strict = { ...defaultRules, version: 'strict', keySidePlayNormalMm: 1.5 };
    const g = gradeAssessment({ keySidePlayMm: 1.8 }, strict);
    expect(g.findings[0].mark).toBe('noted');
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
