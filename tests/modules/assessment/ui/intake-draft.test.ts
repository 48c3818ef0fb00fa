import { buildCorrectionInput, EMPTY_MEASUREMENTS, fillFromRecording, newCorrectionDraft } from '@/modules/assessment/ui/intake-draft';

describe('filling the play test from a recording', () => {
  it('replaces only what the recording measured, as the fields hold it', () => {
    const typed = { ...EMPTY_MEASUREMENTS, a4Hz: '440', bassEvenness: 2 as const, dynamicRange: 4 as const, notesStickingOut: '12' };
    const filled = fillFromRecording(typed, { a4Hz: 433.7, bassEvenness: null, middleEvenness: 4, trebleEvenness: 5, notesStickingOut: [33, 45] });
    expect(filled).toMatchObject({ a4Hz: '433.7', bassEvenness: 2, middleEvenness: 4, trebleEvenness: 5, dynamicRange: 4, notesStickingOut: '33, 45' });
  });

  it('sends the draft’s recordings with a correction', () => {
    const draft = { ...newCorrectionDraft(12, 1, { a4Hz: 437 }), changeNote: 'Measured from a recording.', recordingIds: [7, 9] };
    const built = buildCorrectionInput(draft);
    expect(built.ok && built.input).toMatchObject({ pianoId: 12, recordingIds: [7, 9], measurements: { a4Hz: 437 } });
  });
});
