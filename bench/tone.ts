// Analysis speed as a real-time factor: seconds of work per second of sound, on a synthetic 3-minute recording of all 88 keys.
// Run with `npx tsx bench/tone.ts`; the target is under 0.05 (20 times faster than real time).
import { analyseRecording } from '@/modules/tone/core/analyse';
import { SAMPLE_RATE, run } from '@/tests/support/tone-signals';

const TARGET = 0.05;
const ROUNDS = 3;

const keys = Array.from({ length: 88 }, (_, i) => i + 1);
// 88 notes of 1.6 s with 0.45 s between them: 180 s; each key a few cents off so the reading has work to do.
const recording = run(keys, { noteS: 1.6, gapS: 0.45, centsOff: (key) => ((key * 7) % 13) - 6 });
const seconds = recording.length / SAMPLE_RATE;

analyseRecording(recording, SAMPLE_RATE);
const times: number[] = [];
let found = 0;
let worstCents = 0;
for (let round = 0; round < ROUNDS; round++) {
  const started = process.hrtime.bigint();
  const { notes } = analyseRecording(recording, SAMPLE_RATE);
  times.push(Number(process.hrtime.bigint() - started) / 1e9);
  found = notes.filter((n, i) => n.key === keys[i]).length;
  worstCents = Math.max(...notes.map((n) => Math.abs(n.cents - (((n.key * 7) % 13) - 6))));
}
const best = Math.min(...times);
const factor = best / seconds;
console.log(`tone analysis: ${seconds.toFixed(1)} s of sound at ${SAMPLE_RATE} Hz, ${found}/88 notes at their keys, worst error ${worstCents.toFixed(3)} cents`);
console.log(`best of ${ROUNDS}: ${best.toFixed(2)} s, real-time factor ${factor.toFixed(4)} (target under ${TARGET}) ${factor < TARGET ? 'ok' : 'TOO SLOW'}`);
if (factor >= TARGET) process.exitCode = 1;
