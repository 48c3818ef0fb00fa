import type { ToneNote } from '@/modules/tone/core/analyse';
import { keyboardChartLayout } from '@/modules/tone/core/chart-layout';
import { disclosureTone, keyboardReport, modifiedZScores, playTestFill, registerOf } from '@/modules/tone/core/keyboard-report';
import { keyFrequency } from '@/modules/tone/core/pitch';

// A note as the analysis gives it, `cents` from its key and at `levelDb`.
const note = (key: number, c = 0, levelDb = -20, startS = key): ToneNote => ({ key, cents: c, levelDb, startS, frequencyHz: keyFrequency(key) * 2 ** (c / 1200) });
// A small, fixed jitter so even notes are not identical (within +-1 cent and +-0.5 dB).
const jitter = (key: number) => ((key * 37) % 11) / 10 - 0.5;
const evenRun = (keys: number[], change: (key: number) => Partial<{ cents: number; levelDb: number }> = () => ({})) =>
  keys.map((k) => note(k, change(k).cents ?? 2 * jitter(k), change(k).levelDb ?? -20 + jitter(k)));
const keys = Array.from({ length: 40 }, (_, i) => 20 + i);

describe('notes that stand out', () => {
  it('flags one key 30 cents sharp and one 8 dB loud among even neighbours, and nothing else', () => {
    const report = keyboardReport(evenRun(keys, (k) => (k === 33 ? { cents: 30 } : k === 45 ? { levelDb: -12 } : {})));
    expect(report.standOut.map((s) => [s.key, s.measure, s.direction])).toEqual([
      [33, 'pitch', 'sharp'],
      [45, 'level', 'louder'],
    ]);
    // from memory: Iglewicz and Hoaglin's modified z-score, |M| > 3.5 marks an outlier
    expect(report.standOut.every((s) => Math.abs(s.zScore) > 3.5)).toBe(true);
    expect(report.standOut[0].difference).toBeGreaterThan(28);
    expect(report.standOutRule).toContain('modified z-score above 3.5');
  });

  it('flags nothing on an even keyboard, nor a difference under 5 cents or 3 dB however rare', () => {
    expect(keyboardReport(evenRun(keys)).standOut).toEqual([]);
    expect(keyboardReport(evenRun(keys, (k) => (k === 30 ? { cents: 4 } : k === 40 ? { levelDb: -17.5 } : {}))).standOut).toEqual([]);
  });

  it('flags nothing with fewer than five keys', () => {
    expect(keyboardReport([note(40), note(41, 40), note(42), note(43)]).standOut).toEqual([]);
  });

  it('follows the level across the keyboard: a treble that gets quieter key by key is not flagged', () => {
    expect(keyboardReport(evenRun(keys, (k) => ({ levelDb: -10 - (k - 20) * 0.5 }))).standOut).toEqual([]);
  });

  // from memory: M = 0.6745 (x - median) / MAD (Iglewicz and Hoaglin, 1993)
  it('computes the modified z-score', () => {
    const z = modifiedZScores([1, 2, 3, 4, 100], 0);
    // median 3, MAD = median(|x - 3|) = median(2, 1, 0, 1, 97) = 1
    expect(z[4]).toBeCloseTo(0.6745 * 97, 9);
    expect(z[2]).toBe(0);
  });
});

describe('pitch raise', () => {
  // from memory: a piano more than about 15-20 cents flat gets a pitch raise before fine tuning (shop default 15)
  it.each([
    [-25, 15, true],
    [-15, 15, false],
    [-15.5, 15, true],
    [-25, 30, false],
    [10, 15, false],
  ])('%f cents flat overall with a %i-cent rule: raise %p', (c, threshold, needed) => {
    const report = keyboardReport(evenRun(keys, () => ({ cents: c })), { pitchRaiseCents: threshold });
    expect(report.pitch.overallCents).toBeCloseTo(c, 9);
    expect(report.pitch.pitchRaiseNeeded).toBe(needed);
  });

  it('takes the A4 from key 49 when it was played, otherwise from the overall offset', () => {
    const withA4 = keyboardReport([note(40, -10), note(49, -30), note(52, -10)]);
    expect(withA4.pitch.a4From).toBe('key49');
    // A. J. Ellis, 1885: 30 cents below 440 Hz is 440 * 2^(-30/1200) = 432.44 Hz
    expect(withA4.pitch.a4Hz).toBeCloseTo(432.44, 2);
    const without = keyboardReport([note(40, -10), note(52, -10)]);
    expect(without.pitch.a4From).toBe('overall');
    expect(without.pitch.a4Hz).toBeCloseTo(440 * 2 ** (-10 / 1200), 9);
    expect(keyboardReport([]).pitch).toMatchObject({ overallCents: null, a4Hz: null, pitchRaiseNeeded: false });
  });
});

describe('registers', () => {
  it('splits the keyboard A0-B2, C3-B4, C5-C8', () => {
    expect([1, 27, 28, 51, 52, 88].map(registerOf)).toEqual(['bass', 'bass', 'middle', 'middle', 'treble', 'treble']);
  });

  it('gives each register its level against the middle, and an evenness from its spread', () => {
    const all = Array.from({ length: 88 }, (_, i) => i + 1);
    // bass 6 dB quieter; treble uneven: alternate keys 4 dB apart
    const report = keyboardReport(evenRun(all, (k) => (k <= 27 ? { levelDb: -26 } : k >= 52 ? { levelDb: k % 2 ? -18 : -22 } : { levelDb: -20 })));
    const [bass, middle, treble] = report.registers;
    expect(bass.relativeToMiddleDb).toBeCloseTo(-6, 9);
    expect(middle.relativeToMiddleDb).toBe(0);
    expect(bass.keys).toBe(27);
    // common practice, no published source: the shop's spread bands (1.5 / 3 / 4.5 / 6 dB)
    expect(middle.evenness).toBe(5);
    expect(treble.levelSpreadDb!).toBeGreaterThan(1.5);
    expect(treble.evenness).toBeLessThan(5);
    expect(playTestFill(report)).toMatchObject({ bassEvenness: 5, middleEvenness: 5, trebleEvenness: treble.evenness });
  });

  it('gives no evenness for a register with fewer than three keys heard', () => {
    expect(keyboardReport([note(1), note(2), note(40), note(41), note(42), note(43)]).registers[0].evenness).toBeNull();
  });
});

describe('what other screens take from a report', () => {
  it('fills the play test with the A4 to one decimal, the evenness and the notes that stand out', () => {
    const report = keyboardReport(evenRun(keys.filter((k) => k !== 49), (k) => (k === 33 ? { cents: 30 } : {})).concat(note(49, -2)));
    const fill = playTestFill(report);
    // A. J. Ellis, 1885: 2 cents below 440 Hz is 439.49 Hz
    expect(fill.a4Hz).toBe(439.5);
    expect(fill.notesStickingOut).toEqual([33]);
  });

  it('gives a disclosure the day measured, the pitch and cents per key', () => {
    const report = keyboardReport([note(40, -10), note(49, -20), note(52, -10)]);
    expect(disclosureTone('2026-12-03T14:05:00.000Z', report)).toEqual({
      measuredOn: '2026-12-03',
      a4Hz: report.pitch.a4Hz,
      overallCents: -10,
      pitchRaiseNeeded: false,
      keys: [
        { key: 40, name: 'C4', cents: -10 },
        { key: 49, name: 'A4', cents: -20 },
        { key: 52, name: 'C5', cents: -10 },
      ],
    });
    expect(() => disclosureTone('yesterday', report)).toThrow(RangeError);
  });

  it('lays out the chart: keys left to right, the range widening to fit, far values clipped at the edge', () => {
    const narrow = keyboardChartLayout([{ key: 1, cents: 10 }, { key: 88, cents: -15 }], 880, 200);
    expect(narrow.rangeCents).toBe(20);
    expect(narrow.marks[0].x).toBeLessThan(narrow.marks[1].x);
    expect(narrow.marks[0].y).toBeLessThan(narrow.zeroY);
    const wide = keyboardChartLayout([{ key: 40, cents: -180 }, { key: 41, cents: 40 }], 880, 200);
    expect(wide.rangeCents).toBe(100);
    expect(wide.marks[0]).toMatchObject({ clipped: 'below', y: wide.bottom });
    expect(wide.octaves.map((o) => o.label)).toEqual(['C1', 'C2', 'C3', 'C4', 'C5', 'C6', 'C7', 'C8']);
  });
});
