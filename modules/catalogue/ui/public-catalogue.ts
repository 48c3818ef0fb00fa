// The buyer's catalogue: the public list of pianos on the floor, read without signing in.
import type { CataloguePage, CatalogueQuery } from '@/modules/catalogue/core/catalogue';
import { errorMessage, UNREACHABLE, type Loaded } from '@/modules/disclosure/ui/public-disclosure';
import type { PianoKind } from '@/modules/pianos/core/piano';

export const CATALOGUE_PATH = '/pianos-for-sale';

export type SizeBand = 'under100' | 'from100' | 'from120' | 'from140' | 'from180';
export const SIZE_BANDS: readonly SizeBand[] = ['under100', 'from100', 'from120', 'from140', 'from180'];
// Uprights are measured in height, grands in length: the same centimetres serve both.
export const SIZE_LABELS: Record<SizeBand, string> = { under100: 'Under 100 cm', from100: '100–119 cm', from120: '120–139 cm', from140: '140–179 cm', from180: '180 cm and over' };
const SIZE_RANGES: Record<SizeBand, [number | undefined, number | undefined]> = { under100: [undefined, 99], from100: [100, 119], from120: [120, 139], from140: [140, 179], from180: [180, undefined] };

export type PriceBand = 'under3k' | 'from3k' | 'from6k' | 'from10k';
export const PRICE_BANDS: readonly PriceBand[] = ['under3k', 'from3k', 'from6k', 'from10k'];
// In whole units of the shop's currency; the query takes minor units.
const PRICE_RANGES: Record<PriceBand, [number | undefined, number | undefined]> = { under3k: [undefined, 2_999], from3k: [3_000, 5_999], from6k: [6_000, 9_999], from10k: [10_000, undefined] };

export interface CatalogueFilters {
  kind: PianoKind | null;
  size: SizeBand | null;
  price: PriceBand | null;
  offset: number;
}

const DIGITS: Record<string, number> = { JPY: 0 };

/** The price bands' words in the shop's currency: "Under USD 3,000". */
export function priceLabels(currency: string): Record<PriceBand, string> {
  const n = (v: number) => `${currency} ${v.toLocaleString('en-US')}`;
  return { under3k: `Under ${n(3_000)}`, from3k: `${n(3_000)}–${(5_999).toLocaleString('en-US')}`, from6k: `${n(6_000)}–${(9_999).toLocaleString('en-US')}`, from10k: `${n(10_000)} and over` };
}

/** The server's query for the chosen filters. */
export function catalogueSearch(f: CatalogueFilters, currency: string): string {
  const q: Partial<Record<keyof CatalogueQuery, string>> = {};
  if (f.kind) q.kind = f.kind;
  if (f.size) {
    const [min, max] = SIZE_RANGES[f.size];
    if (min != null) q.minSizeCm = String(min);
    if (max != null) q.maxSizeCm = String(max);
  }
  if (f.price) {
    const scale = 10 ** (DIGITS[currency] ?? 2);
    const [min, max] = PRICE_RANGES[f.price];
    if (min != null) q.minPriceMinor = String(min * scale);
    if (max != null) q.maxPriceMinor = String((max + 1) * scale - 1);
  }
  if (f.offset) q.offset = String(f.offset);
  const s = new URLSearchParams(q as Record<string, string>).toString();
  return s ? `?${s}` : '';
}

export async function fetchCatalogue(search: string): Promise<Loaded<CataloguePage>> {
  let response: Response;
  try {
    response = await fetch(`/api/public/pianos${search}`, { headers: { Accept: 'application/json' }, cache: 'no-store' });
  } catch {
    return { state: 'error', message: UNREACHABLE };
  }
  if (!response.ok) return { state: 'error', message: await errorMessage(response, 'The list of pianos did not load') };
  return { state: 'ok', data: (await response.json()) as CataloguePage };
}
