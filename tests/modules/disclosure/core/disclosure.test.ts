import { gradeAssessment } from '@/modules/assessment/core/grade';
import type { MeasureField } from '@/modules/assessment/core/grade';
import type { Measurements } from '@/modules/assessment/core/measurements';
import { areaSections, buildDisclosure, canonicalJson, DEFAULT_WARRANTY, notDoneSummary, publishBlockers, type DisclosureInput } from '@/modules/disclosure/core/disclosure';

import { buildMeasurements } from '../../../support/builders';

const intakeAt = '2026-11-28T10:00:00.000Z';
const afterAt = '2026-12-02T15:00:00.000Z';

function input(over: Partial<DisclosureInput> = {}): DisclosureInput {
  const measurements = buildMeasurements();
  return {
    piano: { stockNumber: 'FW-0100', maker: 'Almsbury', model: 'Parlour 118', serialNumber: 'AL-1', year: 1981, yearIsEstimate: true, yearFrom: 1978, yearTo: 1984, kind: 'upright', sizeCm: 118, finish: 'satin walnut', caseCondition: 'worn', caseNotes: 'A ring mark on the lid.' },
    askingPriceMinor: 349500,
    currency: 'USD',
    intake: { measurements, grade: gradeAssessment(measurements), submittedAt: intakeAt },
    after: null,
    workDone: [],
    soldAsItStands: false,
    photos: [{ id: 7, area: 'soundboard', caption: 'Crack near the treble bridge' }],
    texts: { dealerName: 'Larkspur Lane Pianos', warranty: DEFAULT_WARRANTY },
    timeZone: 'UTC',
    tone: null,
    ...over,
  };
}

/** The re-measurements after the work, over the intake's, graded as the server grades them. */
function after(fields: Partial<Measurements>, base = buildMeasurements()): DisclosureInput['after'] {
  const measurements = { ...base, ...fields };
  return { measurements, grade: gradeAssessment(measurements), submittedAt: afterAt, remeasured: Object.keys(fields) as MeasureField[] };
}

const reshape = { task: 'reshape_voice_hammers', title: 'Reshape and voice hammers', because: ['hammers.wear'] };
const areaOf = (c: ReturnType<typeof buildDisclosure>, a: string) => c.areas.find((x) => x.area === a)!;

describe('buildDisclosure', () => {
  it('lists every area, found at intake, with the mark and words of how each stands', () => {
    const c = buildDisclosure(input());
    expect(c.format).toBe(2);
    expect(c.areas.map((a) => a.area)).toEqual(['keys', 'hammers', 'strings', 'soundboard', 'tuning', 'play', 'case']);
    const soundboard = areaOf(c, 'soundboard');
    expect([soundboard.mark, soundboard.condition]).toEqual(['noted', 'Noted']);
    expect(soundboard.found[0].text).toMatch(/does not cross a rib, buzz or affect tuning, so it is cosmetic, but it lowers resale value/);
    expect(soundboard.photoIds).toEqual([7]);
    const hammers = areaOf(c, 'hammers');
    expect([hammers.mark, hammers.condition, hammers.foundBeforeWork]).toEqual(['work', 'Needs work', false]);
    expect(hammers.found[0].text).toMatch(/2.2 mm deep/);
    expect(hammers.notDone).toEqual(['Reshape and voice hammers']);
    expect(areaOf(c, 'case').found[0].text).toBe('The case and finish show wear: marks and scratches from years of use. A ring mark on the lid.');
    expect(c.inspectedOn).toBe('2026-11-28');
    expect(c.measuredAfterOn).toBeNull();
  });

  it('says an area nobody measured is not inspected, and never calls it fine', () => {
    const m = { keySidePlayMm: 1.2, a4Hz: 440 } as Measurements;
    const c = buildDisclosure(input({ intake: { measurements: m, grade: gradeAssessment(m), submittedAt: intakeAt }, piano: { ...input().piano, caseCondition: null, caseNotes: null } }));
    expect(c.areas.map((a) => [a.area, a.mark, a.condition])).toEqual([
      ['keys', 'fine', 'Fine'],
      ['hammers', 'unseen', 'Not inspected'],
      ['strings', 'unseen', 'Not inspected'],
      ['soundboard', 'unseen', 'Not inspected'],
      ['tuning', 'fine', 'Fine'],
      ['play', 'unseen', 'Not inspected'],
      ['case', 'unseen', 'Not inspected'],
    ]);
  });

  it('shows work done without a re-measurement as found before the work, never as still true beside it', () => {
    const c = buildDisclosure(input({ workDone: [reshape] }));
    const hammers = areaOf(c, 'hammers');
    expect(hammers.workDone).toEqual(['Reshape and voice hammers']);
    expect(hammers.foundBeforeWork).toBe(true);
    expect(hammers.measuredAfter).toEqual([]);
    expect(hammers.notMeasuredAgain).toEqual(['hammer wear', 'hammer felt']);
    expect([hammers.mark, hammers.condition]).toEqual(['unseen', 'Not measured after the work']);
    expect(hammers.notDone).toEqual([]);
  });

  it('puts what was measured again after the work apart from what was found at intake', () => {
    const c = buildDisclosure(input({ workDone: [reshape], after: after({ hammerGrooveDepthMm: 0.6, hammerFelt: 'firm', hammerFeltLeft: 'ample' }) }));
    const hammers = areaOf(c, 'hammers');
    expect(hammers.found.map((f) => f.mark)).toEqual(['work', 'fine']);
    expect(hammers.measuredAfter).toEqual([
      { mark: 'fine', text: 'Hammer string grooves are shallow (0.6 mm), as is normal.' },
      { mark: 'fine', text: 'Hammer felt: the felt is firm; ample felt is left to shape.' },
    ]);
    expect(hammers.notMeasuredAgain).toEqual([]);
    expect([hammers.mark, hammers.condition]).toEqual(['fine', 'Fine']);
    expect(c.measuredAfterOn).toBe('2026-12-02');
    // An area the work did not touch keeps its intake findings as they stand.
    expect(areaOf(c, 'soundboard').mark).toBe('noted');
  });

  it('names the checks of a worked area that were not measured again', () => {
    const c = buildDisclosure(input({ workDone: [reshape], after: after({ hammerGrooveDepthMm: 0.6 }) }));
    const hammers = areaOf(c, 'hammers');
    expect(hammers.measuredAfter.map((f) => f.text)).toEqual(['Hammer string grooves are shallow (0.6 mm), as is normal.']);
    expect(hammers.notMeasuredAgain).toEqual(['hammer felt']);
    expect([hammers.mark, hammers.condition]).toEqual(['fine', 'Fine where measured again']);
  });

  it('a piano sold as it stands says plainly what was not done', () => {
    const c = buildDisclosure(input({ soldAsItStands: true }));
    expect(c.soldAsItStands).toBe(true);
    // the buildMeasurements intake calls for a light regulation, hammer reshaping, a fine tuning and voicing, in area order
    expect(c.notDone).toEqual(['Regulation', 'Reshape and voice hammers', 'Fine tuning', 'Voicing']);
    expect(c.areas.every((a) => !a.workDone.length)).toBe(true);
  });

  it('keeps work of no one area apart', () => {
    const c = buildDisclosure(input({ workDone: [{ task: 'custom', title: 'Cleaned the action', because: [] }] }));
    expect(c.otherWorkDone).toEqual(['Cleaned the action']);
  });

  // ISO 16:1975 and the cent (Ellis, 1885): 437.2 Hz is 1200 log2(437.2/440) = -11.05 cents from A4 = 440 Hz
  it('states the measured pitch in cents from standard pitch, and when it was measured', () => {
    expect(buildDisclosure(input()).pitch).toEqual({ a4Hz: 437.2, cents: -11.1, text: 'A4 measured at 437.2 Hz, 11.1 cents below standard pitch.', measuredOn: '2026-11-28', when: 'intake' });
    const tuned = { task: 'fine_tuning', title: 'Fine tuning', because: ['tuning.pitch'] };
    expect(buildDisclosure(input({ workDone: [tuned] })).pitch).toMatchObject({ a4Hz: 437.2, when: 'before_work' });
    expect(buildDisclosure(input({ workDone: [tuned], after: after({ a4Hz: 440 }) })).pitch).toMatchObject({ a4Hz: 440, cents: 0, text: 'A4 measured at 440.0 Hz, at standard pitch.', measuredOn: '2026-12-02', when: 'after_work' });
  });

  it('carries the notices a buyer is owed, and no advice meant for the dealer', () => {
    const c = buildDisclosure(input());
    expect(c.notices.map((n) => n.title)).toEqual(['Tuning after delivery', 'Moving a piano', 'Your own inspection']);
    const words = JSON.stringify(c);
    expect(words).not.toMatch(/template|adapt|legal advice/i);
  });

  it('gives the days of the shop, not of UTC: an intake late in the evening is the next day east of Greenwich', () => {
    const late = { ...input().intake, submittedAt: '2026-11-28T23:30:00.000Z' };
    expect(buildDisclosure(input({ intake: late, timeZone: 'UTC' })).inspectedOn).toBe('2026-11-28');
    // IANA time zone database: Berlin is UTC+1 in November
    expect(buildDisclosure(input({ intake: late, timeZone: 'Europe/Berlin' })).inspectedOn).toBe('2026-11-29');
    expect(buildDisclosure(input({ intake: late, timeZone: 'Europe/Berlin' })).pitch?.measuredOn).toBe('2026-11-29');
  });

  it('puts a workshop photo\'s caption in the buyer\'s words, without the workshop\'s item number', () => {
    const c = buildDisclosure(input({ photos: [{ id: 9, area: 'hammers', caption: 'After work (item 4, Reshape and voice hammers): felt shaped and voiced' }, { id: 10, area: 'keys', caption: 'Keys from above' }] }));
    expect(c.photos.map((p) => p.caption)).toEqual(['After the work (reshape and voice hammers): felt shaped and voiced', 'Keys from above']);
    expect(JSON.stringify(c)).not.toContain('item 4');
  });

  it('takes the play test from the newest recording: the shop\'s day, and whether it came after the work', () => {
    const tone = { measuredOn: '2026-12-02', a4Hz: 439.1, overallCents: -3.6, pitchRaiseNeeded: false, keys: [{ key: 40, name: 'C4', cents: -3.2 }, { key: 49, name: 'A4', cents: -3.6 }] };
    const tuned = { task: 'fine_tuning', title: 'Fine tuning', because: ['tuning.pitch'] };
    expect(buildDisclosure(input()).tone).toBeNull();
    expect(buildDisclosure(input({ tone: { recordedAt: '2026-11-28T09:00:00.000Z', tone } })).tone).toEqual({ ...tone, measuredOn: '2026-11-28', when: 'intake' });
    expect(buildDisclosure(input({ workDone: [tuned], tone: { recordedAt: '2026-11-28T09:00:00.000Z', tone } })).tone?.when).toBe('before_work');
    expect(buildDisclosure(input({ workDone: [tuned], after: after({ a4Hz: 440 }), tone: { recordedAt: '2026-12-02T16:00:00.000Z', tone } })).tone?.when).toBe('after_work');
    // IANA: Tokyo is UTC+9, so 16:00 UTC is the next morning there
    expect(buildDisclosure(input({ timeZone: 'Asia/Tokyo', tone: { recordedAt: '2026-12-02T16:00:00.000Z', tone } })).tone?.measuredOn).toBe('2026-12-03');
  });
});

describe('areaSections', () => {
  const day = (d: string) => `day ${d}`;

  it('reads in the order things happened: found at intake, before the work; the work; measured after; what was not measured again', () => {
    const c = buildDisclosure(input({ workDone: [reshape], after: after({ hammerGrooveDepthMm: 0.6 }) }));
    const sections = areaSections(areaOf(c, 'hammers'), c, day);
    expect(sections.map((s) => [s.kind, s.title])).toEqual([
      ['found', 'Found at intake on day 2026-11-28, before the work'],
      ['work', 'Work done in our workshop'],
      ['after', 'Measured after the work on day 2026-12-02'],
      ['unmeasured', 'Not measured again after the work'],
    ]);
    expect(sections[1].items).toEqual([{ mark: 'done', text: 'Reshape and voice hammers' }]);
    expect(sections[3].items).toEqual([{ mark: null, text: 'Hammer felt' }]);
  });

  it('says an area was not inspected rather than leaving it empty, and lists work not done', () => {
    const m = { keySidePlayMm: 1.2, hammerGrooveDepthMm: 2 } as Measurements;
    const c = buildDisclosure(input({ intake: { measurements: m, grade: gradeAssessment(m), submittedAt: intakeAt } }));
    expect(areaSections(areaOf(c, 'strings'), c, day)).toEqual([{ kind: 'found', title: 'At intake on day 2026-11-28', items: [{ mark: 'unseen', text: 'Nothing in this area was measured or looked at.' }] }]);
    expect(areaSections(areaOf(c, 'hammers'), c, day).at(-1)).toEqual({ kind: 'not_done', title: 'Recommended and not done', items: [{ mark: null, text: 'Reshape and voice hammers' }] });
  });
});

describe('notDoneSummary', () => {
  it('tells the buyer up front what was not done, and plainly when it is sold as it stands', () => {
    expect(notDoneSummary(buildDisclosure(input({ soldAsItStands: true })))).toEqual({
      title: 'Sold as it stands',
      text: 'This piano has not been reconditioned in our workshop. Our inspection called for this work, which was not done: Regulation; Reshape and voice hammers; Fine tuning; Voicing.',
    });
    const clean = { keySidePlayMm: 1.2, a4Hz: 440 } as Measurements;
    expect(notDoneSummary(buildDisclosure(input({ intake: { measurements: clean, grade: gradeAssessment(clean), submittedAt: intakeAt } })))).toBeNull();
  });
});

describe('publishBlockers', () => {
  const full = buildMeasurements();
  it.each([
    ['a full grade with the play test', full, 0],
    ['a provisional grade', { keySidePlayMm: 1.2, overallImpression: 4 } as Measurements, 1],
    ['a grade without the play test', { ...full, bassEvenness: null, middleEvenness: null, trebleEvenness: null, dynamicRange: null, overallImpression: null }, 1],
    ['an empty grade', {} as Measurements, 2],
  ])('%s gives its count of reasons not to publish', (_what, m, n) => expect(publishBlockers(gradeAssessment(m))).toHaveLength(n));

  it('says why in words', () => {
    expect(publishBlockers(gradeAssessment({}))).toEqual([
      'The grade is provisional: 0 of 6 areas are inspected and the shop asks for 5. Correct the assessment with the missing areas first.',
      'The play test is missing, and a disclosure needs it: add it by correcting the assessment, or as a re-measurement in the workshop.',
    ]);
  });
});

describe('canonicalJson', () => {
  it('orders keys so equal content gives equal text', () => {
    expect(canonicalJson({ b: 1, a: { d: [1, { f: 2, e: 1 }], c: null } })).toBe('{"a":{"c":null,"d":[1,{"e":1,"f":2}]},"b":1}');
    expect(canonicalJson({ x: 1, y: 2 })).toBe(canonicalJson({ y: 2, x: 1 }));
  });
});
