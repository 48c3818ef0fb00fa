import { z } from '@/modules/input/core/zod';

import { MARK_WORDS, type AreaMark } from '@/modules/assessment/core/grade';
import { isFormat2, V1_MARKS, type AnyDisclosureContent } from '@/modules/disclosure/core/disclosure';
import { MAX_INTEGER } from '@/modules/input/core/numbers';
import { PIANO_KINDS, type PianoKind } from '@/modules/pianos/core/piano';

/** Pianos a page of the catalogue shows. */
export const CATALOGUE_PAGE = 12;

const whole = (what: string) =>
  z
    .string({ message: `${what} must be given once, as a whole number` })
    .regex(/^[0-9]{1,10}$/, `${what} must be a whole number`)
    .transform(Number)
    .refine((n) => n <= MAX_INTEGER, `${what} must be at most ${MAX_INTEGER}`);

/** The catalogue's filters as they come in the query string: every one optional, nothing else allowed. */
export const catalogueQuery = z
  .object({
    kind: z.enum(PIANO_KINDS, { message: 'kind must be upright or grand' }).optional(),
    minSizeCm: whole('minSizeCm').optional(),
    maxSizeCm: whole('maxSizeCm').optional(),
    minPriceMinor: whole('minPriceMinor').optional(),
    maxPriceMinor: whole('maxPriceMinor').optional(),
    offset: whole('offset').optional(),
  })
  // Anything else is refused by name: a mistyped filter must not silently show every piano.
  .strict()
  .refine((q) => q.minSizeCm == null || q.maxSizeCm == null || q.minSizeCm <= q.maxSizeCm, { message: 'minSizeCm must not be above maxSizeCm', path: ['minSizeCm'] })
  .refine((q) => q.minPriceMinor == null || q.maxPriceMinor == null || q.minPriceMinor <= q.maxPriceMinor, { message: 'minPriceMinor must not be above maxPriceMinor', path: ['minPriceMinor'] });
export type CatalogueQuery = z.infer<typeof catalogueQuery>;

/** One area's mark as the published disclosure gives it. */
export interface CatalogueArea {
  label: string;
  mark: AreaMark;
  word: string;
}

/** A piano in the catalogue: only what its published disclosure says, plus the live asking price. */
export interface CatalogueEntry {
  /** the disclosure's link: the page is /d/<token> */
  token: string;
  stockNumber: string;
  maker: string;
  model: string | null;
  kind: PianoKind;
  size: string;
  year: string;
  finish: string | null;
  areas: CatalogueArea[];
  soldAsItStands: boolean;
  /** how many pieces of work the findings call for that were not done */
  notDoneCount: number;
  askingPrice: { minor: number; currency: string } | null;
  photo: { id: number; caption: string | null; url: string | null } | null;
  /** the newest version's publication time */
  publishedAt: string;
}

export interface CataloguePage {
  /** the dealer's name as the listed disclosures publish it; null with none listed */
  dealerName: string | null;
  pianos: CatalogueEntry[];
  total: number;
  offset: number;
  pageSize: number;
}

/** The size in centimetres the published size line states ("upright, 125 cm tall"), if it states one. */
export function publishedSizeCm(size: string): number | null {
  const m = /(\d+) cm/.exec(size);
  return m ? Number(m[1]) : null;
}

/** The catalogue's row from a published version (either format) and the live price. */
export function catalogueEntry(
  content: AnyDisclosureContent,
  live: { token: string; askingPrice: { minor: number; currency: string } | null; publishedAt: string; photoUrl: string | null },
): CatalogueEntry {
  const p = content.piano;
  const areas: CatalogueArea[] = isFormat2(content)
    ? content.areas.map((a) => ({ label: a.label, mark: a.mark, word: MARK_WORDS[a.mark] }))
    : content.areas.map((a) => ({ label: a.label, mark: V1_MARKS[a.severity], word: MARK_WORDS[V1_MARKS[a.severity]] }));
  const first = content.photos[0];
  return {
    token: live.token,
    stockNumber: p.stockNumber,
    maker: p.maker,
    model: p.model,
    kind: p.kind,
    size: p.size,
    year: p.year,
    finish: p.finish,
    areas,
    soldAsItStands: isFormat2(content) ? content.soldAsItStands : false,
    notDoneCount: isFormat2(content) ? content.notDone.length : 0,
    askingPrice: live.askingPrice,
    photo: first ? { id: first.id, caption: first.caption, url: live.photoUrl } : null,
    publishedAt: live.publishedAt,
  };
}
