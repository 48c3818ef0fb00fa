// Recording from the microphone in the browser: raw PCM through Web Audio, kept in memory, written out as a WAV.
import { MAX_RECORDING_SECONDS } from '@/modules/tone/core/wav';

export type RecorderProblemKind = 'denied' | 'no_microphone' | 'unsupported' | 'busy' | 'failed';

export interface RecorderProblem {
  kind: RecorderProblemKind;
  message: string;
}

export interface LiveRecording {
  sampleRate: number;
  /** the last `seconds` of what was heard so far */
  tail: (seconds: number) => Float32Array;
  /** ends the recording and gives everything heard */
  stop: () => Float32Array;
  cancel: () => void;
}

export interface RecorderCallbacks {
  /** about ten times a second: the level of the last block, dB relative to full scale */
  onLevel: (db: number) => void;
  /** the recording reached the longest the server takes, and stopped itself */
  onLimit: () => void;
}

const PROBLEMS: Record<RecorderProblemKind, string> = {
  denied: 'The browser was not allowed to use the microphone. Allow it for this site (the lock or camera icon beside the address), then press Record again — or upload a WAV file instead.',
  no_microphone: 'No microphone was found on this device. Plug one in, or upload a WAV file instead.',
  unsupported: 'This browser cannot record here (recording needs a secure https page). Upload a WAV file instead.',
  busy: 'The microphone is in use by another program. Close it and press Record again.',
  failed: 'The microphone could not be started. Try again, or upload a WAV file instead.',
};

function problemOf(err: unknown): RecorderProblem {
  const name = (err as { name?: string } | null)?.name;
  const kind: RecorderProblemKind =
    name === 'NotAllowedError' || name === 'SecurityError' ? 'denied' : name === 'NotFoundError' || name === 'OverconstrainedError' ? 'no_microphone' : name === 'NotReadableError' ? 'busy' : 'failed';
  return { kind, message: PROBLEMS[kind] };
}

// Runs on the audio thread: blocks of samples go to the page by message, so a busy page loses none of them.
const CAPTURE_WORKLET = `class FeltwireCapture extends AudioWorkletProcessor {
  constructor() { super(); this.block = new Float32Array(2048); this.at = 0; }
  process(inputs) {
    const channel = inputs[0] && inputs[0][0];
    if (channel) for (let i = 0; i < channel.length; i++) {
      this.block[this.at++] = channel[i];
      if (this.at === this.block.length) { this.port.postMessage(this.block, [this.block.buffer]); this.block = new Float32Array(2048); this.at = 0; }
    }
    return true;
  }
}
registerProcessor('feltwire-capture', FeltwireCapture);`;

/** The node that hands over the samples: an AudioWorklet where there is one, else the older ScriptProcessor (on the page's thread). */
async function captureNode(context: AudioContext, take: (block: Float32Array) => void): Promise<{ node: AudioNode; stop: () => void }> {
  if (context.audioWorklet && typeof AudioWorkletNode !== 'undefined') {
    try {
      const url = URL.createObjectURL(new Blob([CAPTURE_WORKLET], { type: 'application/javascript' }));
      await context.audioWorklet.addModule(url);
      URL.revokeObjectURL(url);
      const node = new AudioWorkletNode(context, 'feltwire-capture');
      node.port.onmessage = (event: MessageEvent<Float32Array>) => take(event.data);
      return { node, stop: () => (node.port.onmessage = null) };
    } catch {
      // A page that forbids blob: modules falls back below.
    }
  }
  const processor = context.createScriptProcessor(4096, 1, 1);
  processor.onaudioprocess = (event) => take(new Float32Array(event.inputBuffer.getChannelData(0)));
  return { node: processor, stop: () => (processor.onaudioprocess = null) };
}

/** Asks for the microphone and starts recording; the browser's voice processing is turned off, since it would bend the pitch and level. */
export async function startRecording(callbacks: RecorderCallbacks): Promise<{ ok: true; recording: LiveRecording } | { ok: false; problem: RecorderProblem }> {
  const media = typeof navigator !== 'undefined' ? navigator.mediaDevices : undefined;
  const AudioContextClass = typeof window !== 'undefined' ? (window.AudioContext ?? (window as unknown as { webkitAudioContext?: typeof AudioContext }).webkitAudioContext) : undefined;
  if (!media?.getUserMedia || !AudioContextClass) return { ok: false, problem: { kind: 'unsupported', message: PROBLEMS.unsupported } };
  let stream: MediaStream;
  try {
    stream = await media.getUserMedia({ audio: { echoCancellation: false, noiseSuppression: false, autoGainControl: false, channelCount: 1 } });
  } catch (err) {
    return { ok: false, problem: problemOf(err) };
  }
  const context = new AudioContextClass();
  await context.resume().catch(() => undefined);
  const source = context.createMediaStreamSource(stream);
  const silent = context.createGain();
  silent.gain.value = 0;
  const chunks: Float32Array[] = [];
  let length = 0;
  let finished = false;
  const limit = MAX_RECORDING_SECONDS * context.sampleRate - 4096;

  const take = (block: Float32Array) => {
    if (finished) return;
    chunks.push(block);
    length += block.length;
    let power = 0;
    for (let i = 0; i < block.length; i++) power += block[i] * block[i];
    callbacks.onLevel(10 * Math.log10(power / block.length + 1e-12));
    if (length >= limit) callbacks.onLimit();
  };
  const capture = await captureNode(context, take);
  const release = () => {
    finished = true;
    capture.stop();
    source.disconnect();
    capture.node.disconnect();
    silent.disconnect();
    stream.getTracks().forEach((t) => t.stop());
    void context.close().catch(() => undefined);
  };
  const joined = (from: number) => {
    const out = new Float32Array(length - from);
    let at = 0;
    let skipped = 0;
    for (const c of chunks) {
      if (skipped + c.length <= from) {
        skipped += c.length;
        continue;
      }
      const start = Math.max(0, from - skipped);
      out.set(c.subarray(start), at);
      at += c.length - start;
      skipped += c.length;
    }
    return out;
  };
  source.connect(capture.node);
  capture.node.connect(silent);
  silent.connect(context.destination);

  return {
    ok: true,
    recording: {
      sampleRate: context.sampleRate,
      tail: (seconds) => joined(Math.max(0, length - Math.round(seconds * context.sampleRate))),
      stop: () => {
        const all = joined(0);
        release();
        return all;
      },
      cancel: release,
    },
  };
}
