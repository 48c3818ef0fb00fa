import { decodeWav, encodeWav, looksLikeWav, MAX_RECORDING_SECONDS, readWavInfo } from '@/modules/tone/core/wav';
import { sine } from '@/tests/support/tone-signals';

/** A WAV header by hand, as another recorder would write it (RIFF specification, 1991: "RIFF" size "WAVE" "fmt " "data"). */
function wavBytes(opts: { format?: number; channels?: number; sampleRate?: number; bits?: number; frames: number; fill?: (view: DataView, at: number) => void }): Uint8Array {
  const { format = 1, channels = 1, sampleRate = 8000, bits = 16, frames } = opts;
  const block = (channels * bits) / 8;
  const bytes = new Uint8Array(44 + frames * block);
  const view = new DataView(bytes.buffer);
  const text = (at: number, s: string) => [...s].forEach((c, i) => (bytes[at + i] = c.charCodeAt(0)));
  text(0, 'RIFF');
  view.setUint32(4, 36 + frames * block, true);
  text(8, 'WAVE');
  text(12, 'fmt ');
  view.setUint32(16, 16, true);
  view.setUint16(20, format, true);
  view.setUint16(22, channels, true);
  view.setUint32(24, sampleRate, true);
  view.setUint32(28, sampleRate * block, true);
  view.setUint16(32, block, true);
  view.setUint16(34, bits, true);
  text(36, 'data');
  view.setUint32(40, frames * block, true);
  opts.fill?.(view, 44);
  return bytes;
}

describe('WAV files', () => {
  it('round-trips a tone through 16-bit PCM within one step of 1/32768', () => {
    const tone = sine(440, 1, 0.5, 8000);
    const bytes = encodeWav(tone, 8000);
    const read = readWavInfo(bytes);
    if (!read.ok) throw new Error(read.problem.message);
    expect(read.info).toMatchObject({ sampleRate: 8000, channels: 1, bitsPerSample: 16, format: 'pcm', frames: 8000, durationS: 1 });
    const back = decodeWav(bytes, read.info);
    let worst = 0;
    for (let i = 0; i < tone.length; i++) worst = Math.max(worst, Math.abs(back[i] - tone[i]));
    expect(worst).toBeLessThanOrEqual(1 / 32768);
  });

  it('averages stereo to one channel and reads 32-bit float', () => {
    const frames = 8000;
    const stereo = wavBytes({ channels: 2, frames, fill: (v, at) => { for (let f = 0; f < frames; f++) { v.setInt16(at + f * 4, 16384, true); v.setInt16(at + f * 4 + 2, 0, true); } } });
    const s = readWavInfo(stereo);
    if (!s.ok) throw new Error(s.problem.message);
    expect(decodeWav(stereo, s.info)[100]).toBeCloseTo(0.25, 6);
    const float = wavBytes({ format: 3, bits: 32, frames, fill: (v, at) => { for (let f = 0; f < frames; f++) v.setFloat32(at + f * 4, -0.75, true); } });
    const fl = readWavInfo(float);
    if (!fl.ok) throw new Error(fl.problem.message);
    expect(decodeWav(float, fl.info)[10]).toBeCloseTo(-0.75, 6);
  });

  it.each([
    ['a JPEG', Uint8Array.from([0xff, 0xd8, 0xff, 0xe0, 0, 0x10, 0x4a, 0x46, 0x49, 0x46, 0, 1]), 'not_wav'],
    ['a WebP (RIFF of another form)', Uint8Array.from([...'RIFF'].map((c) => c.charCodeAt(0)).concat([4, 0, 0, 0], [...'WEBP'].map((c) => c.charCodeAt(0)))), 'not_wav'],
    ['compressed samples (MPEG in WAV)', wavBytes({ format: 0x55, frames: 8000 }), 'unsupported'],
    ['six channels', wavBytes({ channels: 6, frames: 8000 }), 'unsupported'],
    ['a header cut short', wavBytes({ frames: 8000 }).slice(0, 30), 'malformed'],
    ['a tenth of a second', wavBytes({ frames: 800 }), 'too_short'],
    ['longer than the limit', (() => { const b = wavBytes({ frames: 10 }); new DataView(b.buffer).setUint32(40, (MAX_RECORDING_SECONDS + 1) * 8000 * 2, true); return b; })(), 'too_short'],
  ])('refuses %s', (_what, bytes, kind) => {
    const read = readWavInfo(bytes);
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.problem.kind).toBe(kind);
  });

  it('judges the duration by the samples there are, not the size the header claims', () => {
    const long = wavBytes({ frames: (MAX_RECORDING_SECONDS + 1) * 100, sampleRate: 8000 });
    // a 301 s header over 37.6 s of samples is 37.6 s
    const read = readWavInfo(long);
    expect(read.ok && read.info.durationS).toBeCloseTo(((MAX_RECORDING_SECONDS + 1) * 100) / 8000, 6);
    const tooLong = wavBytes({ frames: (MAX_RECORDING_SECONDS + 1) * 8000, sampleRate: 8000 });
    const refused = readWavInfo(tooLong);
    expect(!refused.ok && refused.problem.kind).toBe('too_long');
  });

  it('knows a WAV by its first twelve bytes', () => {
    expect(looksLikeWav(encodeWav(new Float32Array(10), 8000))).toBe(true);
    expect(looksLikeWav(new TextEncoder().encode('RIFF....AVI LIST'))).toBe(false);
  });
});
