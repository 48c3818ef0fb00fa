import { YIN } from 'pitchfinder/lib/detectors/yin';

import { analyseRecording } from '@/modules/tone/core/analyse';
import { cents, keyFrequency } from '@/modules/tone/core/pitch';
import { SAMPLE_RATE, concat, keyHz, partialHz, pianoPartials, run, silence, sine, tone, whiteNoise } from '@/tests/support/tone-signals';

// Every tone here is made in the test, so its true frequency is known exactly.
const padded = (x: Float32Array) => concat(silence(0.25), x, silence(0.25));
const only = (x: Float32Array, sampleRate = SAMPLE_RATE) => {
  const { notes } = analyseRecording(x, sampleRate);
  expect(notes).toHaveLength(1);
  return notes[0];
};

describe('sines at known offsets', () => {
  // The stated tolerance for a clean tone: 0.05 cents.
  it.each([
    [1, -0.5],
    [1, 0.5],
    [16, -0.5],
    [40, 0.5],
    [49, -0.5],
    [49, 0.5],
    [64, -0.5],
    [76, 0.5],
    [88, -0.5],
    [88, 0.5],
  ])('key %i at %f cents is read at its key within 0.05 cents', (key, offset) => {
    const note = only(padded(sine(keyHz(key, offset), 1.2)));
    expect(note.key).toBe(key);
    // A. J. Ellis, 1885: cents = 1200 log2(f / f_ref), against f(n) = 440 * 2^((n - 49) / 12) (ISO 16 pitch)
    expect(Math.abs(note.cents - offset)).toBeLessThan(0.05);
    expect(Math.abs(cents(note.frequencyHz, keyHz(key, offset)))).toBeLessThan(0.05);
  });

  it('reads the same at 48 kHz', () => {
    const note = only(concat(silence(0.25, 48000), sine(keyHz(28, 0.5), 1.2, 0.5, 48000), silence(0.25, 48000)), 48000);
    expect(note.key).toBe(28);
    expect(Math.abs(note.cents - 0.5)).toBeLessThan(0.05);
  });

  it('gives the level as RMS in dB: a sine of amplitude 0.5 is 20 log10(0.5 / sqrt 2) = -9.03 dB, within 0.2 dB (its 5 ms attack)', () => {
    // definition of RMS: a sine of peak A has RMS A / sqrt(2)
    expect(Math.abs(only(padded(sine(440, 1.2, 0.5))).levelDb - 20 * Math.log10(0.5 / Math.SQRT2))).toBeLessThan(0.2);
  });
});

describe('piano-like tones', () => {
  const B = 3e-4;
  it.each([16, 28, 40, 49, 61, 73])('key %i with 16 partials stretched by B = 3e-4 is read within 1 cent of its fundamental', (key) => {
    // f_k = k f0 sqrt(1 + B k^2): the stiff-string partial series (Fletcher, 1964; from memory)
    const f0 = keyFrequency(key);
    const fundamental = partialHz(f0, B, 1);
    const note = only(padded(tone({ f0, inharmonicity: B, partials: pianoPartials(16), durationS: 1.5, decayS: 1.2 })));
    expect(note.key).toBe(key);
    expect(Math.abs(cents(note.frequencyHz, fundamental))).toBeLessThan(1);
  });

  it.each([1, 4, 8, 13])('low key %i whose fundamental is 20 dB below its second partial is read at its key, not an octave up', (key) => {
    // 20 dB is an amplitude ratio of 10 (20 log10 of the ratio)
    const partials = [0.1, 1, 0.7, 0.5, 0.4, 0.3, 0.25, 0.2, 0.15, 0.1];
    const note = only(padded(tone({ f0: keyFrequency(key), inharmonicity: 2e-4, partials, durationS: 1.5, decayS: 1.5 })));
    expect(note.key).toBe(key);
  });

  it('a low note with no fundamental at all is still read at its key', () => {
    const note = only(padded(tone({ f0: keyFrequency(6), inharmonicity: 2e-4, partials: [0, 1, 0.8, 0.6, 0.5, 0.4, 0.3, 0.2], durationS: 1.5, decayS: 1.5 })));
    expect(note.key).toBe(6);
  });
});

describe('quiet input', () => {
  it('a tone of amplitude 0.02 is read correctly', () => {
    const note = only(padded(sine(keyHz(33, 0.3), 1.2, 0.02)));
    expect(note.key).toBe(33);
    expect(Math.abs(note.cents - 0.3)).toBeLessThan(0.05);
  });

  it('why each frame is normalised: the YIN of pitchfinder 2.3.4 reads a quiet bass frame far off as it is', () => {
    const frame = tone({ f0: keyFrequency(8), partials: pianoPartials(8), durationS: 0.2, amplitude: 0.02 }).slice(0, 4097);
    const raw = YIN({ sampleRate: SAMPLE_RATE, threshold: 0.15 })(frame);
    // common practice, no published source: more than an octave away from the 41.2 Hz it holds
    expect(raw == null || Math.abs(cents(raw, keyFrequency(8))) > 1200).toBe(true);
    expect(only(padded(tone({ f0: keyFrequency(8), partials: pianoPartials(8), durationS: 1.2, amplitude: 0.02 }))).key).toBe(8);
  });
});

describe('no note where there is none', () => {
  it('silence gives no note', () => expect(analyseRecording(silence(3), SAMPLE_RATE).notes).toEqual([]));
  it.each([0.3, 0.01])('white noise of amplitude %f gives no note', (amplitude) => expect(analyseRecording(whiteNoise(3, amplitude, 11), SAMPLE_RATE).notes).toEqual([]));
  it('noise bursts with silence between them give no note', () => {
    expect(analyseRecording(concat(silence(0.3), whiteNoise(0.5, 0.3, 2), silence(0.3), whiteNoise(0.5, 0.1, 3), silence(0.3)), SAMPLE_RATE).notes).toEqual([]);
  });
  it('refuses a sample rate no recording has', () => expect(() => analyseRecording(silence(1), 100)).toThrow(RangeError));
});

describe('one result per note', () => {
  it('a sequence of 12 notes with gaps gives 12 results, in order, each starting when its note does', () => {
    const keys = [3, 10, 20, 28, 35, 40, 44, 49, 56, 63, 71, 80];
    const { notes } = analyseRecording(run(keys, { noteS: 0.8, gapS: 0.35 }), SAMPLE_RATE);
    expect(notes.map((n) => n.key)).toEqual(keys);
    notes.forEach((n, i) => {
      expect(Math.abs(n.startS - i * 1.15)).toBeLessThan(0.02);
      expect(Math.abs(n.cents)).toBeLessThan(0.5);
    });
  });

  it.each([0.025, 0.1])('a note broken by a dropout in the capture (%f s of nothing) is still one note', (gapS) => {
    const note = tone({ f0: keyFrequency(37), partials: pianoPartials(8), durationS: 1.2, decayS: 1 });
    note.fill(0, Math.round(0.6 * SAMPLE_RATE), Math.round((0.6 + gapS) * SAMPLE_RATE));
    expect(analyseRecording(padded(note), SAMPLE_RATE).notes.map((n) => n.key)).toEqual([37]);
  });

  it('the same key struck again, as loud, is a second note', () => {
    const strike = () => tone({ f0: keyFrequency(37), partials: pianoPartials(8), durationS: 0.7, decayS: 1 });
    expect(analyseRecording(padded(concat(strike(), silence(0.05), strike())), SAMPLE_RATE).notes.map((n) => n.key)).toEqual([37, 37]);
  });

  it('detuned notes keep their offsets: a piano 20 cents flat reads 20 cents flat on every key', () => {
    const keys = [25, 37, 49, 61];
    const { notes } = analyseRecording(run(keys, { noteS: 0.8, gapS: 0.3, centsOff: () => -20 }), SAMPLE_RATE);
    expect(notes.map((n) => n.key)).toEqual(keys);
    for (const n of notes) expect(Math.abs(n.cents + 20)).toBeLessThan(0.5);
  });
});
