// Pitch and level of each note in a recording of a piano: pure, the same on the server and in the browser.
// Only YIN is imported from pitchfinder, so the web bundle carries no other detector.
import { YIN } from 'pitchfinder/lib/detectors/yin';

import { isPowerOfTwo, nextPowerOfTwo, powerSpectrum } from './fft';
import { cents, keyFrequency, nearestKey } from './pitch';

export interface ToneNote {
  /** when the note starts, seconds from the start of the recording */
  startS: number;
  /** the fundamental (first partial), Hz */
  frequencyHz: number;
  /** the nearest key, 1 (A0) to 88 (C8) */
  key: number;
  /** cents from that key's equal-tempered frequency at A4 = 440 Hz */
  cents: number;
  /** the note's level: RMS over its first 0.3 s, dB relative to full scale (a full-scale square wave is 0 dB) */
  levelDb: number;
}

export interface ToneAnalysis {
  notes: ToneNote[];
}

/** How the analysis listens; every value is Feltwire's own choice (common practice, no published source). */
export const ANALYSIS_SETTINGS = {
  /** level envelope: frames longer than the period of A0 (36 ms), so a bass note's level does not ripple, every 5 ms */
  hopS: 0.005,
  frameS: 0.04,
  /** nothing quieter than this is a note, whatever the room */
  silenceDb: -60,
  /** a note must also stand this far above the recording's quiet floor (its 10th percentile level), */
  aboveFloorDb: 10,
  /** but a recording with no pause in it is gated this far below its loud end (its 90th percentile) */
  belowLoudDb: 20,
  /** a note lasts while it stays this far above the floor, or until the next onset */
  endAboveFloorDb: 3,
  /** an onset: the level rises this much within `onsetWithinS` */
  onsetRiseDb: 6,
  onsetWithinS: 0.05,
  /** a "new" note running on from the last at the same key (or after a gap of up to maxDropoutS), within this many cents and quieter, is the same note */
  sameNoteCents: 5,
  maxDropoutS: 0.15,
  /** a string left ringing has decayed by then; a key struck again comes back as loud */
  sameNoteQuieterDb: 1,
  /** two onsets closer than this are one note */
  minOnsetGapS: 0.08,
  /** the hammer's attack is skipped before the pitch is read */
  attackSkipS: 0.05,
  /** a sound shorter than this is not read as a note */
  minNoteS: 0.12,
  /** the level is the RMS over this long from the onset */
  levelWindowS: 0.3,
  /** the longest stretch of a note the spectrum reads (longer windows resolve the bass partials better) */
  maxWindowS: 0.4,
  /** lowest pitch looked for: A0 (27.5 Hz) a little over a semitone flat */
  minHz: 25.5,
  /** partials looked for per note, and the highest frequency searched */
  maxPartials: 16,
  maxPartialHz: 12000,
  /** and every partial found must lie within this many cents of the fitted stretched series */
  maxPartialResidualCents: 5,
  /** a note whose first partial is not heard must sound each of partials 2 to this one */
  partialsWithoutFundamental: 6,
  /** a partial counts when its peak stands this far above the spectrum around it */
  partialProminenceDb: 15,
  /** a note needs one partial this prominent, or two at partialProminenceDb (noise has neither) */
  clearPartialDb: 25,
} as const;

const dbOfPower = (p: number) => 10 * Math.log10(p + 1e-20);

interface Envelope {
  hop: number;
  db: Float64Array;
}

/** Mean-square level of each frame, in dB. */
function levelEnvelope(x: Float32Array, sampleRate: number): Envelope {
  const hop = Math.max(1, Math.round(ANALYSIS_SETTINGS.hopS * sampleRate));
  const frame = Math.round(ANALYSIS_SETTINGS.frameS * sampleRate);
  const count = Math.max(0, Math.floor((x.length - frame) / hop) + 1);
  // Running sum of squares: each frame's power in constant time.
  const squares = new Float64Array(x.length + 1);
  for (let i = 0; i < x.length; i++) squares[i + 1] = squares[i] + x[i] * x[i];
  const db = new Float64Array(count);
  for (let i = 0; i < count; i++) db[i] = dbOfPower((squares[i * hop + frame] - squares[i * hop]) / frame);
  return { hop, db };
}

function percentile(values: Float64Array, q: number): number {
  if (!values.length) return -Infinity;
  const sorted = Float64Array.from(values).sort();
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
}

interface Segment {
  start: number;
  end: number;
  /** the sound ran on into the next onset without falling under the end gate */
  runsOn: boolean;
}

/** Where notes start and end, in samples: a quick rise in level starts one; falling under the gate or the next onset ends it. */
function findSegments(x: Float32Array, sampleRate: number): Segment[] {
  const s = ANALYSIS_SETTINGS;
  const { hop, db } = levelEnvelope(x, sampleRate);
  if (!db.length) return [];
  const frame = Math.round(s.frameS * sampleRate);
  const floor = percentile(db, 0.1);
  const gate = Math.max(s.silenceDb, Math.min(floor + s.aboveFloorDb, percentile(db, 0.9) - s.belowLoudDb));
  const endGate = Math.max(s.silenceDb, Math.min(floor + s.endAboveFloorDb, gate));
  const within = Math.max(1, Math.round(s.onsetWithinS / s.hopS));
  const candidates: number[] = [];
  for (let i = 0; i < db.length; i++) {
    if (db[i] < gate) continue;
    // A recording that opens on a note starts with an onset.
    let low = i === 0 ? -Infinity : Infinity;
    for (let j = Math.max(0, i - within); j < i; j++) low = Math.min(low, db[j]);
    // The rise is seen once the new sound fills the end of a frame: the note began about a hop before that.
    if (db[i] - low >= s.onsetRiseDb) candidates.push(i === 0 ? 0 : i * hop + frame - hop);
  }
  const minGap = s.minOnsetGapS * sampleRate;
  const onsets: number[] = [];
  for (const c of candidates) if (!onsets.length || c - onsets[onsets.length - 1] >= minGap) onsets.push(c);

  const segments: Segment[] = [];
  for (let n = 0; n < onsets.length; n++) {
    const next = n + 1 < onsets.length ? onsets[n + 1] : x.length;
    // The note ends once its level, past the attack, falls under the end gate.
    let i = Math.ceil(onsets[n] / hop) + within;
    while (i < db.length && i * hop + frame < next && db[i] >= endGate) i++;
    const end = Math.min(next, i * hop + frame, x.length);
    segments.push({ start: onsets[n], end, runsOn: n + 1 < onsets.length && end >= next });
  }
  return segments;
}

/** DC removed and scaled to unit RMS: YIN reads a quiet frame as well as a loud one. */
function normalised(x: Float32Array, from: number, length: number): Float32Array {
  const out = new Float32Array(length);
  let mean = 0;
  for (let i = 0; i < length; i++) mean += x[from + i];
  mean /= length;
  let power = 0;
  for (let i = 0; i < length; i++) {
    out[i] = x[from + i] - mean;
    power += out[i] * out[i];
  }
  const scale = power > 0 ? 1 / Math.sqrt(power / length) : 0;
  for (let i = 0; i < length; i++) out[i] *= scale;
  return out;
}

interface Spectrum {
  power: Float64Array;
  /** Hz per bin */
  binHz: number;
  /** the Hann-windowed stretch itself, for exact peak search */
  windowed: Float64Array;
  sampleRate: number;
}

function spectrumOf(x: Float32Array, from: number, length: number, sampleRate: number): Spectrum {
  const windowed = new Float64Array(length);
  for (let i = 0; i < length; i++) windowed[i] = x[from + i] * (0.5 - 0.5 * Math.cos((2 * Math.PI * i) / (length - 1)));
  // Zero-padded to twice the length: finer bins for the first guess at each peak.
  const size = 2 * nextPowerOfTwo(length);
  return { power: powerSpectrum(windowed, size), binHz: sampleRate / size, windowed, sampleRate };
}

/** |X(f)|^2 of the windowed stretch at any frequency (one direct DFT term, by a rotating phasor). */
function powerAt(sp: Spectrum, hz: number): number {
  const w = (2 * Math.PI * hz) / sp.sampleRate;
  const cr = Math.cos(w);
  const ci = -Math.sin(w);
  let pr = 1;
  let pi = 0;
  let re = 0;
  let im = 0;
  const x = sp.windowed;
  for (let n = 0; n < x.length; n++) {
    re += x[n] * pr;
    im += x[n] * pi;
    const t = pr * cr - pi * ci;
    pi = pr * ci + pi * cr;
    pr = t;
    // Renormalise now and then so rounding does not shrink the phasor.
    if ((n & 1023) === 1023) {
      const m = 1 / Math.hypot(pr, pi);
      pr *= m;
      pi *= m;
    }
  }
  return re * re + im * im;
}

interface Peak {
  hz: number;
  /** dB above the median of the spectrum around it */
  prominenceDb: number;
  powerDb: number;
}

/** The strongest peak within `halfWidthHz` of `hz`, located to a fraction of a bin, with how far it stands out. */
function peakNear(sp: Spectrum, hz: number, halfWidthHz: number, floorHalfWidthHz: number): Peak | null {
  const { power, binHz } = sp;
  const lo = Math.max(1, Math.floor((hz - halfWidthHz) / binHz));
  const hi = Math.min(power.length - 2, Math.ceil((hz + halfWidthHz) / binHz));
  if (hi <= lo) return null;
  let best = lo;
  for (let m = lo + 1; m <= hi; m++) if (power[m] > power[best]) best = m;
  // A maximum on the edge of the search is a slope of something else, not a peak here.
  if (best === lo || best === hi) return null;
  const a = dbOfPower(power[best - 1]);
  const b = dbOfPower(power[best]);
  const c = dbOfPower(power[best + 1]);
  const denom = a - 2 * b + c;
  const offset = denom < 0 ? (0.5 * (a - c)) / denom : 0;
  const flo = Math.max(1, Math.floor((hz - floorHalfWidthHz) / binHz));
  const fhi = Math.min(power.length - 1, Math.ceil((hz + floorHalfWidthHz) / binHz));
  const around = power.slice(flo, fhi + 1).sort();
  const floor = around[Math.floor(around.length / 2)];
  return { hz: (best + offset) * binHz, prominenceDb: b - dbOfPower(floor), powerDb: b };
}

/** Moves a peak to the maximum of the exact spectrum: parabolas through three points, narrowing each time. */
function refinePeak(sp: Spectrum, hz: number): number {
  let f = hz;
  let step = sp.binHz / 2;
  for (let round = 0; round < 3; round++) {
    const a = dbOfPower(powerAt(sp, f - step));
    const b = dbOfPower(powerAt(sp, f));
    const c = dbOfPower(powerAt(sp, f + step));
    const denom = a - 2 * b + c;
    if (!(denom < 0)) break;
    const offset = Math.max(-1, Math.min(1, (0.5 * (a - c)) / denom));
    f += offset * step;
    step /= 4;
  }
  return f;
}

interface PartialFit {
  /** f0 and the inharmonicity B of f_k = k f0 sqrt(1 + B k^2) */
  f0: number;
  b: number;
}

/** Least squares of (f_k / k)^2 = f0^2 + f0^2 B k^2, weighted toward the higher, better-resolved partials. */
function fitPartials(found: { k: number; hz: number }[]): PartialFit {
  if (found.length === 1) return { f0: found[0].hz / found[0].k, b: 0 };
  let sw = 0;
  let sx = 0;
  let sy = 0;
  let sxx = 0;
  let sxy = 0;
  for (const { k, hz } of found) {
    const w = k;
    const x = k * k;
    const y = (hz / k) ** 2;
    sw += w;
    sx += w * x;
    sy += w * y;
    sxx += w * x * x;
    sxy += w * x * y;
  }
  const det = sw * sxx - sx * sx;
  const slope = det > 0 ? (sw * sxy - sx * sy) / det : 0;
  const intercept = (sy - slope * sx) / sw;
  const b = intercept > 0 ? slope / intercept : 0;
  if (!(b >= 0) || !(intercept > 0)) {
    // Stretch cannot be negative: without it, f0 is the weighted mean of f_k / k.
    let num = 0;
    for (const { k, hz } of found) num += k * (hz / k);
    return { f0: num / sw, b: 0 };
  }
  return { f0: Math.sqrt(intercept), b };
}

/** Is there a partial series one octave below `hz`? Its odd partials (at 1.5, 2.5, 3.5 x hz) would show. */
function octaveBelowHeard(sp: Spectrum, hz: number, strongestDb: number): boolean {
  const s = ANALYSIS_SETTINGS;
  const half = hz / 2;
  if (half < s.minHz) return false;
  let heard = 0;
  for (const k of [1, 3, 5, 7]) {
    const at = k * half;
    if (at > sp.sampleRate * 0.45) break;
    const p = peakNear(sp, at, Math.max(2 * sp.binHz, 0.03 * at), half / 2);
    if (p && p.prominenceDb >= s.partialProminenceDb && p.powerDb >= strongestDb - 40) heard++;
  }
  return heard >= 2;
}

/** Is `hz` an octave too low: nothing at it or at 3 x hz, but a partial at 2 x hz? (YIN can skip a short treble period.) */
function octaveAboveOnly(sp: Spectrum, hz: number): boolean {
  const s = ANALYSIS_SETTINGS;
  const heard = (at: number) => {
    if (at > sp.sampleRate * 0.45) return false;
    const p = peakNear(sp, at, Math.max(2 * sp.binHz, 0.03 * at), hz / 2);
    return !!p && p.prominenceDb >= s.partialProminenceDb;
  };
  return !heard(hz) && !heard(3 * hz) && heard(2 * hz);
}

interface PitchReading {
  hz: number;
  partials: number;
}

/** The fundamental from a first guess: the octave checked against the spectrum, then each partial found and fitted. */
function readPitch(sp: Spectrum, guessHz: number): PitchReading | null {
  const s = ANALYSIS_SETTINGS;
  const nyquistLimit = Math.min(s.maxPartialHz, sp.sampleRate * 0.45);
  let f = guessHz;
  // The strongest partial near the guess and its octave: the level other partials are judged against.
  const near = [peakNear(sp, f, 0.1 * f, f / 2), peakNear(sp, 2 * f, 0.1 * f, f / 2)];
  const strongestDb = Math.max(...near.map((p) => p?.powerDb ?? -Infinity));
  if (!Number.isFinite(strongestDb)) return null;
  // A weak bass fundamental beside strong partials makes YIN read an octave high; the odd partials below give it away.
  for (let i = 0; i < 2 && octaveBelowHeard(sp, f, strongestDb); i++) f /= 2;
  for (let i = 0; i < 2 && octaveAboveOnly(sp, f); i++) f *= 2;

  const found: { k: number; hz: number; prominenceDb: number }[] = [];
  let fit: PartialFit = { f0: f, b: 0 };
  let misses = 0;
  for (let k = 1; k <= s.maxPartials; k++) {
    const predicted = k * fit.f0 * Math.sqrt(1 + fit.b * k * k);
    if (predicted > nyquistLimit) break;
    const halfWidth = Math.min(0.3 * fit.f0, Math.max(4 * sp.binHz, 0.02 * k * fit.f0));
    const p = peakNear(sp, predicted, halfWidth, fit.f0 / 2);
    if (!p || p.prominenceDb < s.partialProminenceDb || p.powerDb < strongestDb - 50) {
      if (++misses >= 3 && found.length) break;
      continue;
    }
    misses = 0;
    // The exact search costs one pass over the window per step: spent on the first partials, which fix f0 and B.
    const hz = k <= 8 ? refinePeak(sp, p.hz) : p.hz;
    found.push({ k, hz, prominenceDb: p.prominenceDb });
    fit = fitPartials(found);
  }
  if (!found.length) return null;
  const clear = found.some((p) => p.prominenceDb >= s.clearPartialDb) || found.length >= 2;
  if (!clear) return null;
  // Without its first partial (a weak bass fundamental), a note still sounds each of the next few; a series pieced
  // together from two notes ringing at once (a fourth apart: partials 2, 3, 4, 6 of a key that was not played) does not.
  if (!found.some((p) => p.k === 1)) {
    const upTo = Math.min(s.partialsWithoutFundamental, Math.floor(nyquistLimit / fit.f0));
    for (let k = 2; k <= upTo; k++) if (!found.some((p) => p.k === k)) return null;
  }
  // A note's partials lie on one stretched series; partials borrowed from another note do not.
  const offSeries = found.some((p) => Math.abs(cents(p.hz, p.k * fit.f0 * Math.sqrt(1 + fit.b * p.k * p.k))) > s.maxPartialResidualCents);
  if (offSeries) return null;
  return { hz: fit.f0 * Math.sqrt(1 + fit.b), partials: found.length };
}

function yinBufferFor(sampleRate: number): number {
  // YIN looks for periods up to half its buffer, and uses the largest power of two below its input length.
  return nextPowerOfTwo((2 * sampleRate) / ANALYSIS_SETTINGS.minHz);
}

/** One result per note heard: start, fundamental, nearest key, cents from it and level. Silence and noise give none. */
export function analyseRecording(samples: Float32Array, sampleRate: number): ToneAnalysis {
  if (!(sampleRate >= 8000 && sampleRate <= 192000)) throw new RangeError('sampleRate must be between 8000 and 192000 Hz');
  const s = ANALYSIS_SETTINGS;
  const yin = YIN({ sampleRate, threshold: 0.15, probabilityThreshold: 0.1 });
  const yinSize = yinBufferFor(sampleRate);
  const maxWindow = 2 ** Math.floor(Math.log2(s.maxWindowS * sampleRate));
  const notes: ToneNote[] = [];
  let previousEnd = -Infinity;
  let ranOn = false;
  for (const seg of findSegments(samples, sampleRate)) {
    const continues = ranOn || seg.start - previousEnd <= s.maxDropoutS * sampleRate;
    ranOn = seg.runsOn;
    previousEnd = seg.end;
    if ((seg.end - seg.start) / sampleRate < s.minNoteS) continue;
    const levelEnd = Math.min(seg.end, seg.start + Math.round(s.levelWindowS * sampleRate));
    let power = 0;
    for (let i = seg.start; i < levelEnd; i++) power += samples[i] * samples[i];
    const levelDb = dbOfPower(power / (levelEnd - seg.start));

    const from = Math.min(seg.start + Math.round(s.attackSkipS * sampleRate), seg.end);
    const available = seg.end - from;
    const yinLength = Math.min(yinSize, 2 ** Math.floor(Math.log2(Math.max(2, available - 1))));
    if (!isPowerOfTwo(yinLength) || yinLength < 256) continue;
    const guess = yin(normalised(samples, from, yinLength + 1));
    if (guess == null || !(guess >= s.minHz)) continue;
    const windowLength = Math.min(maxWindow, 2 ** Math.floor(Math.log2(available)));
    const reading = readPitch(spectrumOf(samples, from, windowLength, sampleRate), guess);
    if (!reading) continue;
    const key = nearestKey(reading.hz);
    if (key == null) continue;
    const note = { startS: seg.start / sampleRate, frequencyHz: reading.hz, key, cents: cents(reading.hz, keyFrequency(key)), levelDb };
    // The same key, straight after (or after a gap no longer than a dropout) and quieter: one note broken by a
    // dropout in the capture, not a new one.
    const last = notes[notes.length - 1];
    if (continues && last && last.key === key && Math.abs(last.cents - note.cents) < s.sameNoteCents && levelDb <= last.levelDb - s.sameNoteQuieterDb) continue;
    notes.push(note);
  }
  return { notes };
}
