// What the printable page and the signed copy share: days in the dealer's words, the marks drawn as
// shapes, and the keyboard chart drawn from the same layout as the screen's.
import { MARK_WORDS, type AreaMark } from '@/modules/assessment/core/grade';
import { areaSections, notDoneSummary, pitchSentence, pitchWhen, toneWords, type DisclosureContent } from '@/modules/disclosure/core/disclosure';
import { formatCalendarDay, type DealerLocality } from '@/modules/shop/core/dealer-time';
import { MARK_LOOKS, PALETTE } from '@/modules/theme/core/palette';
import { keyboardChartLayout, type ChartKey, type ChartLayout } from '@/modules/tone/core/chart-layout';

/** "2026-11-28" as the dealer writes it ("28 November 2026"): a calendar day stays that day wherever it is read. */
export function paperDay(isoDay: string, locale: string): string {
  return formatCalendarDay(isoDay, locale) || isoDay;
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

const num = (n: number) => n.toFixed(1);

/** The keyboard chart as SVG markup, from the layout the screen's chart uses: the same ticks, octaves and marks. */
export function chartSvg(keys: readonly ChartKey[], width: number, height: number): string {
  const l: ChartLayout = keyboardChartLayout(keys, width, height);
  const r = Math.max(2.5, Math.min(4, l.keyWidth * 0.45));
  const parts: string[] = [
    `<svg class="chart" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" role="img" aria-label="Cents from equal temperament for each key heard, A0 to C8">`,
    `<rect x="${num(l.left)}" y="${num(l.top)}" width="${num(l.right - l.left)}" height="${num(l.bottom - l.top)}" fill="${PALETTE.vellum}" stroke="${PALETTE.linen}"/>`,
  ];
  for (const t of l.ticks) {
    parts.push(`<line x1="${num(l.left)}" x2="${num(l.right)}" y1="${num(t.y)}" y2="${num(t.y)}" stroke="${t.cents === 0 ? PALETTE.walnut : PALETTE.linen}" stroke-width="${t.cents === 0 ? 1.5 : 1}"${t.cents === 0 ? '' : ' stroke-dasharray="3 3"'}/>`);
    parts.push(`<text x="${num(l.left - 4)}" y="${num(t.y + 4)}" font-size="11" fill="${PALETTE.walnut}" text-anchor="end">${t.label}</text>`);
  }
  for (const o of l.octaves) {
    parts.push(`<line x1="${num(o.x)}" x2="${num(o.x)}" y1="${num(l.bottom)}" y2="${num(l.bottom + 4)}" stroke="${PALETTE.walnut}"/>`);
    parts.push(`<text x="${num(o.x)}" y="${num(l.bottom + 16)}" font-size="11" fill="${PALETTE.walnut}" text-anchor="middle">${o.label}</text>`);
  }
  for (const m of l.marks) {
    parts.push(`<line x1="${num(m.x)}" x2="${num(m.x)}" y1="${num(l.zeroY)}" y2="${num(m.y)}" stroke="${PALETTE.felt}" stroke-width="1.5"/>`);
    if (m.clipped === 'above') parts.push(`<path d="M ${num(m.x)} ${num(m.y - 2)} l ${num(r + 1)} ${num(2 * r)} l ${num(-2 * r - 2)} 0 Z" fill="${PALETTE.felt}"/>`);
    else if (m.clipped === 'below') parts.push(`<path d="M ${num(m.x)} ${num(m.y + 2)} l ${num(r + 1)} ${num(-2 * r)} l ${num(-2 * r - 2)} 0 Z" fill="${PALETTE.felt}"/>`);
    else parts.push(`<circle cx="${num(m.x)}" cy="${num(m.y)}" r="${num(r)}" fill="${PALETTE.felt}"/>`);
  }
  parts.push('</svg>');
  return parts.join('');
}

/** The chart's legend, the same words under the screen's chart. */
export const chartLegend = (rangeCents: number) => `Cents from equal temperament at A4 = 440 Hz, keys A0 to C8 left to right; scale ±${rangeCents} cents. ● a key heard · ▲ ▼ beyond the scale.`;

/** The printable page's view of format-2 content, in the dealer's words. */
export function paperView(c: DisclosureContent, where: DealerLocality) {
  const day = (d: string) => paperDay(d, where.locale);
  const tone = c.tone ?? null;
  return {
    inspectedOn: day(c.inspectedOn),
    measuredAfterOn: c.measuredAfterOn ? day(c.measuredAfterOn) : null,
    notDone: notDoneSummary(c),
    otherWorkDone: c.otherWorkDone,
    pitch: c.pitch ? { text: pitchSentence(c.pitch.a4Hz, c.pitch.cents), when: pitchWhen(c.pitch, day) } : null,
    tone: tone && tone.keys.length ? { ...toneWords(tone, day), svg: chartSvg(tone.keys, 680, 180), legend: chartLegend(keyboardChartLayout(tone.keys, 680, 180).rangeCents) } : null,
    areas: c.areas.map((a) => ({
      label: a.label,
      condition: a.condition,
      svg: markSvg(a.mark),
      sections: areaSections(a, c, day).map((s) => ({ ...s, items: s.items.map((i) => ({ ...i, svg: s.kind === 'not_done' ? OPEN_BOX_SVG : markSvg(i.mark), word: markWord(i.mark) })) })),
    })),
  };
}
