// What the buyer's screens show, from either shape of published content: format 2, or the first
// format as it was published (its own words, each finding led by the mark it reads as today).
import { MARK_WORDS, type AreaMark } from '@/modules/assessment/core/grade';
import { V1_MARKS, V1_SEVERITY_WORDS, areaSections, isFormat2, notDoneSummary, pitchSentence, pitchWhen, toneWords, type DisclosureContent, type DisclosureContentV1 } from '@/modules/disclosure/core/disclosure';
import type { DealerLocality } from '@/modules/shop/core/dealer-time';

import { calendarDay } from './disclosure-format';
import type { DisclosureView } from './public-disclosure';

export interface ShownItem {
  mark: AreaMark | 'done' | null;
  /** the mark's word, printed beside its shape */
  word: string | null;
  text: string;
}

export interface ShownSection {
  kind: string;
  title: string;
  items: ShownItem[];
}

export interface ShownArea {
  area: string;
  label: string;
  mark: AreaMark;
  condition: string;
  sections: ShownSection[];
  /** format 1 ended each area with a count of the points to know */
  closing: string | null;
  photoIds: number[];
}

export interface ShownDocument {
  format: 1 | 2;
  inspected: string;
  notDone: { title: string; text: string } | null;
  otherWorkDone: string[];
  pitch: { a4Hz: number; cents: number; text: string; when: string | null } | null;
  /** the play test measured from a recording: when, what it says, and cents per key for the chart */
  tone: { when: string; lines: string[]; keys: { key: number; cents: number }[] } | null;
  areas: ShownArea[];
}

const wordOf = (mark: AreaMark | 'done' | null) => (mark == null ? null : mark === 'done' ? 'Done' : MARK_WORDS[mark]);

function format2(c: DisclosureContent, where: DealerLocality): ShownDocument {
  const day = (d: string) => calendarDay(d, where);
  return {
    format: 2,
    inspected: `Inspected at intake on ${day(c.inspectedOn)}${c.measuredAfterOn ? `; measured again after the work in our workshop on ${day(c.measuredAfterOn)}` : ''}.`,
    notDone: notDoneSummary(c),
    otherWorkDone: c.otherWorkDone,
    // The sentence from the numbers the version keeps, in the one way cents are written.
    pitch: c.pitch ? { ...c.pitch, text: pitchSentence(c.pitch.a4Hz, c.pitch.cents), when: pitchWhen(c.pitch, day) } : null,
    tone: c.tone?.keys.length ? { ...toneWords(c.tone, day), keys: c.tone.keys.map((k) => ({ key: k.key, cents: k.cents })) } : null,
    areas: c.areas.map((a) => ({
      area: a.area,
      label: a.label,
      mark: a.mark,
      condition: a.condition,
      sections: areaSections(a, c, day).map((s) => ({ kind: s.kind, title: s.title, items: s.items.map((i) => ({ ...i, word: wordOf(i.mark) })) })),
      closing: null,
      photoIds: a.photoIds,
    })),
  };
}

function format1(c: DisclosureContentV1, where: DealerLocality): ShownDocument {
  return {
    format: 1,
    inspected: `Inspected on ${calendarDay(c.assessedOn, where)}${c.assessedAfterWorkshop ? ', after the work in our workshop' : ''}. Each area says what we found, what we did and what is left to know.`,
    notDone: null,
    otherWorkDone: [],
    pitch: c.pitch ? { ...c.pitch, when: null } : null,
    tone: null,
    areas: c.areas.map((a) => {
      const remaining = a.findings.filter((f) => f.severity !== 'sound').length;
      const sections: ShownSection[] = [];
      if (a.findings.length) sections.push({ kind: 'found', title: c.assessedAfterWorkshop ? 'As it stands now' : 'What we found', items: a.findings.map((f) => ({ mark: V1_MARKS[f.severity], word: V1_SEVERITY_WORDS[f.severity], text: f.text })) });
      else sections.push({ kind: 'found', title: 'What we found', items: [{ mark: null, word: null, text: 'No findings were recorded in this area.' }] });
      if (a.workDone.length) sections.push({ kind: 'work', title: 'What we did', items: a.workDone.map((w) => ({ mark: 'done', word: null, text: w })) });
      return {
        area: a.area,
        label: a.label,
        mark: a.findings.length ? V1_MARKS[a.severity] : 'unseen',
        condition: a.condition,
        sections,
        closing: a.findings.length ? (remaining === 0 ? 'Nothing outstanding in this area.' : `${remaining === 1 ? 'One point' : `${remaining} points`} to know about in this area.`) : null,
        photoIds: a.photoIds,
      };
    }),
  };
}

/** The document as the buyer's screens show it, whichever format it was published in. */
export function shownDocument(c: DisclosureView, where: DealerLocality): ShownDocument {
  return isFormat2(c as DisclosureContent) ? format2(c as DisclosureContent, where) : format1(c as unknown as DisclosureContentV1, where);
}
