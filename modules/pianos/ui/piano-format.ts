import { STAGES, describeSize, describeYear, pianoName, type PianoKind, type Stage } from '@/modules/pianos/core/piano';

/** A stage from the address bar, or null when it names none. */
export function parseStage(value: unknown): Stage | null {
  return typeof value === 'string' && (STAGES as readonly string[]).includes(value) ? (value as Stage) : null;
}

/** A record id from the address bar, or null when it is not a positive whole number. */
export function parseId(value: unknown): number | null {
  if (typeof value !== 'string' || !/^[1-9][0-9]{0,9}$/.test(value)) return null;
  const id = Number(value);
  return id <= 2147483647 ? id : null;
}

/** "1986", "about 1986" or "about 1978-1984"; "Not known" when nothing was noted. */
export function formatYear(p: { year: number | null; yearIsEstimate: boolean; yearFrom?: number | null; yearTo?: number | null }): string {
  if (p.year == null && (p.yearFrom == null || p.yearTo == null)) return 'Not known';
  return describeYear(p);
}

export function formatKindAndSize(kind: PianoKind, sizeCm: number | null): string {
  const text = describeSize(kind, sizeCm);
  return text.charAt(0).toUpperCase() + text.slice(1);
}

const DAY = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
const DAY_TIME = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

export function formatDay(iso: string | null | undefined): string {
  if (!iso) return '—';
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : DAY.format(date);
}

export function formatDayTime(iso: string | null | undefined): string {
  if (!iso) return '—';
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : DAY_TIME.format(date);
}

export function makerAndModel(maker: string, model: string | null): string {
  return pianoName({ maker, model });
}
