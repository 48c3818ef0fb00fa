import { AREAS, gradeAssessment } from '@/modules/assessment/core/grade';
import type { Measurements } from '@/modules/assessment/core/measurements';
import { conditionReport } from '@/modules/shop/core/condition-report';
import { demoRateCard, type RateCard } from '@/modules/shop/core/rate-card';

// A fixed card for the arithmetic: $80.00 an hour; the task hours and parts are the demo card's.
const card: RateCard = { ...demoRateCard, version: 'test', hourlyRateMinor: 8000 };
const report = (m: Measurements) => conditionReport(gradeAssessment(m), card);
const area = (m: Measurements, a: string) => report(m).areas.find((x) => x.area === a)!;

describe('conditionReport', () => {
  it('an empty inspection: every area not inspected, no work, no verdict of quality', () => {
    const r = report({});
    expect(r.areas.map((a) => [a.area, a.inspected, a.mark])).toEqual(AREAS.map((a) => [a, false, 'unseen']));
    expect(r).toMatchObject({ readiness: 'unjudged', provisional: true, inspectedCount: 0, areaCount: 6, workHours: 0, workMinor: 0 });
    expect(r.reasons).toEqual(['Nothing has been inspected yet.']);
  });

  it('gives each area its worst mark, its findings and the work it needs in hours and money', () => {
    const keys = area({ keySidePlayMm: 1.5, keyLevelDeviationMm: 2.0, keytopDamage: ['yellowed'] }, 'keys');
    expect(keys.findings.map((f) => [f.check, f.mark])).toEqual([
      ['keys.sidePlay', 'fine'],
      ['keys.level', 'work'],
      ['keys.keytops', 'noted'],
    ]);
    expect(keys.mark).toBe('work');
    // key level 2.0 mm: 6.5 h of regulation sized by the grade; 6.5 x 8000 = 52000
    expect(keys.lines.map((l) => [l.task, l.hours, l.totalMinor])).toEqual([['regulation', 6.5, 52000]]);
    expect([keys.hours, keys.workMinor]).toEqual([6.5, 52000]);
  });

  it('counts a task asked for by two areas once, under the first, and says so in the other', () => {
    // regulation from the key level and from a poor play test
    const r = report({ keyLevelDeviationMm: 3, bassEvenness: 2 });
    const keys = r.areas.find((a) => a.area === 'keys')!;
    const play = r.areas.find((a) => a.area === 'play')!;
    expect(keys.lines.map((l) => l.task)).toEqual(['regulation']);
    expect(play.lines.map((l) => l.task)).toEqual(['voicing']);
    expect(play.countedElsewhere).toEqual([{ task: 'regulation', label: 'Regulation', countedIn: 'keys' }]);
    // 16 h regulation (3 mm) + 2 h voicing on the card, at 8000 an hour; no parts
    expect(r.workHours).toBe(18);
    expect(r.workMinor).toBe(18 * 8000);
    expect(r.areas.reduce((s, a) => s + a.workMinor, 0)).toBe(r.workMinor);
    expect(r.readiness).toBe('wholesale');
  });

  it('leaves the cheaper partial fix out of the money', () => {
    const r = report({ keyTouchesNeighbour: true, keysTouchingNeighbour: [30] });
    // rebushing: 8 h on the card and USD 65.00 of parts
    expect(r.workMinor).toBe(8 * 8000 + 6500);
    expect(r.estimate.options.map((o) => o.task)).toEqual(['ease_front_rail_pins']);
  });

  it('a full clean inspection is ready for the floor with no work money', () => {
    const r = report({
      keySidePlayMm: 1,
      hammerGrooveDepthMm: 0.5,
      steelCorrosion: 'none',
      ribsSeparated: false,
      a4Hz: 440,
      overallImpression: 5,
      bassEvenness: 5,
    });
    expect(r.readiness).toBe('floor');
    expect(r.provisional).toBe(false);
    expect(r.areas.every((a) => a.mark === 'fine')).toBe(true);
    expect(r.workMinor).toBe(0);
  });
});
