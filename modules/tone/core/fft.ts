// In-place iterative radix-2 FFT (Cooley-Tukey); twiddles kept per size so repeated spectra cost no trigonometry.
const twiddles = new Map<number, { cos: Float64Array; sin: Float64Array }>();

function twiddlesFor(n: number) {
  let t = twiddles.get(n);
  if (!t) {
    const cos = new Float64Array(n / 2);
    const sin = new Float64Array(n / 2);
    for (let i = 0; i < n / 2; i++) {
      cos[i] = Math.cos((2 * Math.PI * i) / n);
      sin[i] = -Math.sin((2 * Math.PI * i) / n);
    }
    t = { cos, sin };
    twiddles.set(n, t);
  }
  return t;
}

export const isPowerOfTwo = (n: number) => n >= 1 && (n & (n - 1)) === 0;

/** Transforms re/im (length a power of two) into their discrete Fourier transform, in place. */
export function fft(re: Float64Array, im: Float64Array): void {
  const n = re.length;
  if (!isPowerOfTwo(n) || im.length !== n) throw new RangeError('fft needs two arrays of the same power-of-two length');
  for (let i = 1, j = 0; i < n; i++) {
    let bit = n >> 1;
    for (; j & bit; bit >>= 1) j ^= bit;
    j ^= bit;
    if (i < j) {
      const tr = re[i];
      re[i] = re[j];
      re[j] = tr;
      const ti = im[i];
      im[i] = im[j];
      im[j] = ti;
    }
  }
  const { cos, sin } = twiddlesFor(n);
  for (let size = 2; size <= n; size <<= 1) {
    const half = size >> 1;
    const step = n / size;
    for (let start = 0; start < n; start += size) {
      for (let k = 0; k < half; k++) {
        const wr = cos[k * step];
        const wi = sin[k * step];
        const a = start + k;
        const b = a + half;
        const xr = re[b] * wr - im[b] * wi;
        const xi = re[b] * wi + im[b] * wr;
        re[b] = re[a] - xr;
        im[b] = im[a] - xi;
        re[a] += xr;
        im[a] += xi;
      }
    }
  }
}

/** Power spectrum |X[m]|^2 for m = 0 .. size/2 of a real signal, zero-padded to `size`. */
export function powerSpectrum(signal: ArrayLike<number>, size: number): Float64Array {
  const re = new Float64Array(size);
  const im = new Float64Array(size);
  for (let i = 0; i < Math.min(signal.length, size); i++) re[i] = signal[i];
  fft(re, im);
  const out = new Float64Array(size / 2 + 1);
  for (let m = 0; m <= size / 2; m++) out[m] = re[m] * re[m] + im[m] * im[m];
  return out;
}

export const nextPowerOfTwo = (n: number) => 2 ** Math.ceil(Math.log2(Math.max(1, n)));
