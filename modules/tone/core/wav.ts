// WAV files read and written by their bytes: the RIFF/WAVE container with PCM or IEEE float samples.
// Layout from the RIFF specification (IBM/Microsoft, 1991): "RIFF" size "WAVE", then chunks; "fmt " before "data".

export const MAX_RECORDING_BYTES = 48 * 1024 * 1024;
export const MAX_RECORDING_SECONDS = 300;
export const MIN_RECORDING_SECONDS = 0.5;
export const WAV_CONTENT_TYPE = 'audio/wav';

const FORMAT_PCM = 1;
const FORMAT_FLOAT = 3;
const FORMAT_EXTENSIBLE = 0xfffe;

export interface WavInfo {
  sampleRate: number;
  channels: number;
  bitsPerSample: number;
  format: 'pcm' | 'float';
  frames: number;
  durationS: number;
  dataOffset: number;
}

export type WavProblem =
  | { kind: 'not_wav'; message: string }
  | { kind: 'unsupported'; message: string }
  | { kind: 'malformed'; message: string }
  | { kind: 'too_long'; message: string }
  | { kind: 'too_short'; message: string };

const ascii = (b: Uint8Array, at: number) => String.fromCharCode(b[at], b[at + 1], b[at + 2], b[at + 3]);

/** True when the bytes open as a RIFF container of form WAVE. */
export function looksLikeWav(bytes: Uint8Array): boolean {
  return bytes.length >= 12 && ascii(bytes, 0) === 'RIFF' && ascii(bytes, 8) === 'WAVE';
}

/** Reads the header of a WAV file: its format, and where its samples are; or the problem with it. */
export function readWavInfo(bytes: Uint8Array): { ok: true; info: WavInfo } | { ok: false; problem: WavProblem } {
  if (!looksLikeWav(bytes)) return { ok: false, problem: { kind: 'not_wav', message: 'must be a WAV file (RIFF/WAVE)' } };
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  let at = 12;
  let fmt: { format: number; channels: number; sampleRate: number; bits: number; blockAlign: number } | null = null;
  while (at + 8 <= bytes.length) {
    const id = ascii(bytes, at);
    const size = view.getUint32(at + 4, true);
    const body = at + 8;
    if (id === 'fmt ') {
      if (size < 16 || body + size > bytes.length) return { ok: false, problem: { kind: 'malformed', message: 'has a broken format chunk' } };
      let format = view.getUint16(body, true);
      if (format === FORMAT_EXTENSIBLE && size >= 40) format = view.getUint16(body + 24, true);
      fmt = { format, channels: view.getUint16(body + 2, true), sampleRate: view.getUint32(body + 4, true), blockAlign: view.getUint16(body + 12, true), bits: view.getUint16(body + 14, true) };
    } else if (id === 'data') {
      if (!fmt) return { ok: false, problem: { kind: 'malformed', message: 'has its samples before its format chunk' } };
      const pcm = fmt.format === FORMAT_PCM && [8, 16, 24, 32].includes(fmt.bits);
      const float = fmt.format === FORMAT_FLOAT && fmt.bits === 32;
      if (!pcm && !float) return { ok: false, problem: { kind: 'unsupported', message: 'must hold uncompressed samples: 8-, 16-, 24- or 32-bit PCM, or 32-bit float' } };
      if (fmt.channels < 1 || fmt.channels > 2) return { ok: false, problem: { kind: 'unsupported', message: 'must be mono or stereo' } };
      if (fmt.sampleRate < 8000 || fmt.sampleRate > 192000) return { ok: false, problem: { kind: 'unsupported', message: 'must be sampled at 8000 to 192000 Hz' } };
      if (fmt.blockAlign !== (fmt.channels * fmt.bits) / 8) return { ok: false, problem: { kind: 'malformed', message: 'has a format chunk that does not add up' } };
      // A recorder that could not seek back may leave the size unset: the samples then run to the end of the file.
      const length = Math.min(size, bytes.length - body);
      const frames = Math.floor(length / fmt.blockAlign);
      const durationS = frames / fmt.sampleRate;
      if (durationS > MAX_RECORDING_SECONDS) return { ok: false, problem: { kind: 'too_long', message: `must be at most ${MAX_RECORDING_SECONDS / 60} minutes long` } };
      if (durationS < MIN_RECORDING_SECONDS) return { ok: false, problem: { kind: 'too_short', message: `must be at least ${MIN_RECORDING_SECONDS} seconds long` } };
      return { ok: true, info: { sampleRate: fmt.sampleRate, channels: fmt.channels, bitsPerSample: fmt.bits, format: pcm ? 'pcm' : 'float', frames, durationS, dataOffset: body } };
    }
    at = body + size + (size % 2);
  }
  return { ok: false, problem: { kind: 'malformed', message: fmt ? 'has no samples (no data chunk)' : 'has no format chunk' } };
}

/** The samples of a WAV file as one channel (stereo is averaged), from -1 to 1. */
export function decodeWav(bytes: Uint8Array, info: WavInfo): Float32Array {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const bytesPer = info.bitsPerSample / 8;
  const out = new Float32Array(info.frames);
  for (let f = 0; f < info.frames; f++) {
    let sum = 0;
    for (let c = 0; c < info.channels; c++) {
      const at = info.dataOffset + (f * info.channels + c) * bytesPer;
      if (info.format === 'float') sum += view.getFloat32(at, true);
      else if (bytesPer === 1) sum += (view.getUint8(at) - 128) / 128;
      else if (bytesPer === 2) sum += view.getInt16(at, true) / 32768;
      else if (bytesPer === 3) sum += ((view.getUint8(at) | (view.getUint8(at + 1) << 8) | (view.getInt8(at + 2) << 16)) / 8388608);
      else sum += view.getInt32(at, true) / 2147483648;
    }
    out[f] = sum / info.channels;
  }
  return out;
}

/** A mono 16-bit PCM WAV file of the samples (clipped to -1..1). */
export function encodeWav(samples: Float32Array, sampleRate: number): Uint8Array {
  const bytes = new Uint8Array(44 + samples.length * 2);
  const view = new DataView(bytes.buffer);
  const text = (at: number, s: string) => {
    for (let i = 0; i < 4; i++) bytes[at + i] = s.charCodeAt(i);
  };
  text(0, 'RIFF');
  view.setUint32(4, 36 + samples.length * 2, true);
  text(8, 'WAVE');
  text(12, 'fmt ');
  view.setUint32(16, 16, true);
  view.setUint16(20, FORMAT_PCM, true);
  view.setUint16(22, 1, true);
  view.setUint32(24, sampleRate, true);
  view.setUint32(28, sampleRate * 2, true);
  view.setUint16(32, 2, true);
  view.setUint16(34, 16, true);
  text(36, 'data');
  view.setUint32(40, samples.length * 2, true);
  for (let i = 0; i < samples.length; i++) {
    const v = Math.max(-1, Math.min(1, samples[i]));
    view.setInt16(44 + i * 2, v < 0 ? Math.round(v * 32768) : Math.round(v * 32767), true);
  }
  return bytes;
}
