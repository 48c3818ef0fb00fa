// Synthetic piano sounds for the tone tests and the benchmark: made here, so every true value is known.
export const SAMPLE_RATE = 44100;

/** A small seeded generator (mulberry32), so "random" noise is the same on every run. */
export function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export interface ToneSpec {
  /** f0 of f_k = k f0 sqrt(1 + B k^2); the first partial sounds at f0 sqrt(1 + B) */
  f0: number;
  /** inharmonicity coefficient B (0: a harmonic series) */
  inharmonicity?: number;
  /** amplitude of each partial, first partial first */
  partials?: number[];
  /** seconds */
  durationS: number;
  /** peak amplitude of the whole tone, 0..1 */
  amplitude?: number;
  /** decay time constant of the level, seconds (Infinity: steady) */
  decayS?: number;
  /** attack, seconds */
  attackS?: number;
}

/** The frequency of partial k of a stretched series. */
export const partialHz = (f0: number, b: number, k: number) => k * f0 * Math.sqrt(1 + b * k * k);

/** A tone: a sum of (stretched) partials with a short attack and an exponential decay, peak-normalised to `amplitude`. */
export function tone(spec: ToneSpec, sampleRate = SAMPLE_RATE): Float32Array {
  const { f0, inharmonicity = 0, partials = [1], durationS, amplitude = 0.5, decayS = Infinity, attackS = 0.005 } = spec;
  const n = Math.round(durationS * sampleRate);
  const out = new Float64Array(n);
  partials.forEach((a, i) => {
    const f = partialHz(f0, inharmonicity, i + 1);
    if (a === 0 || f >= sampleRate / 2) return;
    const w = (2 * Math.PI * f) / sampleRate;
    const phase = i * 0.7;
    for (let t = 0; t < n; t++) out[t] += a * Math.sin(w * t + phase);
  });
  let peak = 0;
  for (let t = 0; t < n; t++) peak = Math.max(peak, Math.abs(out[t]));
  const result = new Float32Array(n);
  const attack = Math.max(1, Math.round(attackS * sampleRate));
  for (let t = 0; t < n; t++) {
    const env = Math.min(1, t / attack) * (Number.isFinite(decayS) ? Math.exp(-t / sampleRate / decayS) : 1);
    // A 5 ms fade at the end, so the cut makes no click.
    const tail = Math.min(1, (n - t) / (0.005 * sampleRate));
    result[t] = (amplitude * env * tail * out[t]) / (peak || 1);
  }
  return result;
}

export const sine = (hz: number, durationS: number, amplitude = 0.5, sampleRate = SAMPLE_RATE) =>
  tone({ f0: hz, durationS, amplitude }, sampleRate);

/** Partial amplitudes of a piano-like tone: falling about 3 dB per partial. */
export const pianoPartials = (count: number) => Array.from({ length: count }, (_, i) => 10 ** ((-3 * i) / 20));

export function silence(durationS: number, sampleRate = SAMPLE_RATE): Float32Array {
  return new Float32Array(Math.round(durationS * sampleRate));
}

export function whiteNoise(durationS: number, amplitude: number, seed = 1, sampleRate = SAMPLE_RATE): Float32Array {
  const random = seeded(seed);
  const out = new Float32Array(Math.round(durationS * sampleRate));
  for (let i = 0; i < out.length; i++) out[i] = amplitude * (2 * random() - 1);
  return out;
}

export function concat(...parts: Float32Array[]): Float32Array {
  const out = new Float32Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}

/** Mixes `b` into `a` (same length or shorter). */
export function mix(a: Float32Array, b: Float32Array): Float32Array {
  const out = Float32Array.from(a);
  for (let i = 0; i < Math.min(a.length, b.length); i++) out[i] += b[i];
  return out;
}

/** Equal-tempered frequency of key n at A4 = 440 Hz, detuned by `centsOff`. */
export const keyHz = (key: number, centsOff = 0) => 440 * 2 ** ((key - 49) / 12 + centsOff / 1200);

/** The stretch a piano's strings show across the keyboard: more in the treble and the lowest bass (a rough model). */
export const inharmonicityOfKey = (key: number) => (key < 20 ? 4e-4 - key * 1.5e-5 : 1e-4 * 2 ** ((key - 20) / 24));

/** A run of piano-like notes, one per key given, each `noteS` long with `gapS` of silence after it. */
export function run(keys: number[], opts: { noteS: number; gapS: number; centsOff?: (key: number) => number; amplitude?: (key: number) => number; sampleRate?: number }): Float32Array {
  const sampleRate = opts.sampleRate ?? SAMPLE_RATE;
  const parts: Float32Array[] = [];
  for (const key of keys) {
    const b = inharmonicityOfKey(key);
    const f1 = keyHz(key, opts.centsOff?.(key) ?? 0);
    const f0 = f1 / Math.sqrt(1 + b);
    parts.push(tone({ f0, inharmonicity: b, partials: pianoPartials(12), durationS: opts.noteS, amplitude: opts.amplitude?.(key) ?? 0.4, decayS: 1.2 }, sampleRate));
    parts.push(silence(opts.gapS, sampleRate));
  }
  return concat(...parts);
}
