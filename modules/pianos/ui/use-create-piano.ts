import { useMutation } from 'urql';

import type { PianoInput } from '@/modules/pianos/core/piano';

import { PIANO_FIELDS, type PianoRecord } from './use-pianos';

export const CREATE_PIANO = `mutation CreatePiano($maker: String!, $model: String, $serialNumber: String, $year: Int, $yearIsEstimate: Boolean, $kind: String!, $sizeCm: Int, $finish: String) {
  createPiano(maker: $maker, model: $model, serialNumber: $serialNumber, year: $year, yearIsEstimate: $yearIsEstimate, kind: $kind, sizeCm: $sizeCm, finish: $finish) { ${PIANO_FIELDS} }
}`;

export function useCreatePiano() {
  const [state, run] = useMutation<{ createPiano: PianoRecord }, PianoInput>(CREATE_PIANO);
  return { creating: state.fetching, createPiano: (input: PianoInput) => run(input) };
}
