// What the printable page and the signed copy share: days in words and the marks drawn as shapes.
import { MARK_WORDS, type AreaMark } from '@/modules/assessment/core/grade';
import { areaSections, notDoneSummary, pitchWhen, type DisclosureContent } from '@/modules/disclosure/core/disclosure';
import { MARK_LOOKS, PALETTE } from '@/modules/theme/core/palette';

const DAY = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });

/** "2026-11-28" as "28 November 2026": a calendar day stays that day wherever it is read. */
export function paperDay(isoDay: string): string {
  const d = new Date(`${isoDay.slice(0, 10)}T00:00:00Z`);
  return Number.isNaN(d.getTime()) ? isoDay : DAY.format(d);
}

/** A mark as a small inline SVG, hidden from screen readers: its word is always printed beside it. */
export function markSvg(mark: AreaMark | 'done' | null): string {
  if (mark == null) return '';
  const open = '<svg class="mark" width="12" height="12" viewBox="0 0 12 12" aria-hidden="true">';
  if (mark === 'done') return `${open}<path d="M2 6.5 L5 9.5 L10.5 2.5" fill="none" stroke="${PALETTE.moss}" stroke-width="2"/></svg>`;
  const { shape, ink } = MARK_LOOKS[mark];
  const body = {
    circle: `<circle cx="6" cy="6" r="5" fill="${ink}"/>`,
    bar: `<rect x="0.5" y="4" width="11" height="4" fill="${ink}"/>`,
    square: `<rect x="1" y="1" width="10" height="10" fill="${ink}"/>`,
    triangle: `<path d="M6 0.5 L11.5 11 L0.5 11 Z" fill="${ink}"/>`,
    'dashed-ring': `<circle cx="6" cy="6" r="4.5" fill="none" stroke="${ink}" stroke-width="1.5" stroke-dasharray="2.2 1.6"/>`,
  }[shape];
  return `${open}${body}</svg>`;
}

/** Work recommended and not done: an open box, like the screens. */
export const OPEN_BOX_SVG = `<svg class="mark" width="12" height="12" viewBox="0 0 12 12" aria-hidden="true"><rect x="1.5" y="1.5" width="9" height="9" fill="none" stroke="${PALETTE.walnut}" stroke-width="1.5"/></svg>`;

/** The word printed beside a mark: the mark's own, or "Done" for work done. */
export function markWord(mark: AreaMark | 'done' | null): string {
  return mark == null ? '' : mark === 'done' ? 'Done' : MARK_WORDS[mark];
}

/** The printable page's view of format-2 content. */
export function paperView(c: DisclosureContent) {
  return {
    inspectedOn: paperDay(c.inspectedOn),
    measuredAfterOn: c.measuredAfterOn ? paperDay(c.measuredAfterOn) : null,
    notDone: notDoneSummary(c),
    otherWorkDone: c.otherWorkDone,
    pitch: c.pitch ? { text: c.pitch.text, when: pitchWhen(c.pitch, paperDay) } : null,
    areas: c.areas.map((a) => ({
      label: a.label,
      condition: a.condition,
      svg: markSvg(a.mark),
      sections: areaSections(a, c, paperDay).map((s) => ({ ...s, items: s.items.map((i) => ({ ...i, svg: s.kind === 'not_done' ? OPEN_BOX_SVG : markSvg(i.mark), word: markWord(i.mark) })) })),
    })),
  };
}
