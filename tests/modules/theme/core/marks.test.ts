import { MARK_WORDS, MARKS, READINESS, READINESS_MARKS, READINESS_WORDS } from '@/modules/assessment/core/grade';
import { MARK_LOOKS, TEXT_PAIRS } from '@/modules/theme/core/palette';

describe('the marks', () => {
  const all = [...MARKS, 'unseen'] as const;

  it('give every mark a word, a shape and an ink of its own, so none leans on colour', () => {
    expect(Object.keys(MARK_LOOKS).sort()).toEqual([...all].sort());
    expect(new Set(all.map((m) => MARK_LOOKS[m].shape)).size).toBe(all.length);
    expect(new Set(all.map((m) => MARK_WORDS[m])).size).toBe(all.length);
    expect(new Set(all.map((m) => MARK_LOOKS[m].ink)).size).toBe(all.length);
  });

  it('give every readiness verdict its own words and one of the marks', () => {
    expect(new Set(READINESS.map((r) => READINESS_WORDS[r])).size).toBe(READINESS.length);
    expect(new Set(READINESS.map((r) => READINESS_MARKS[r])).size).toBe(READINESS.length);
  });

  it('are all in the contrast test', () => {
    const uses = TEXT_PAIRS.map((p) => p.use);
    for (const m of all) {
      expect(uses).toContain(`mark tag: ${m}`);
      expect(uses).toContain(`mark word on a card: ${m}`);
    }
  });
});
