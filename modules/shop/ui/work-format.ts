// Words and numbers for workshop screens: hours, minutes, priorities, due dates, variances.
import { checkWords } from '@/modules/assessment/core/grade';
import { WORK_TASK_LABELS, type WorkTask } from '@/modules/assessment/core/work-tasks';
import { CURRENCY_DIGITS, formatMoney, type Currency } from '@/modules/shop/core/money';

export const PRIORITIES = ['1', '2', '3'] as const;
export type PriorityKey = (typeof PRIORITIES)[number];
export const PRIORITY_LABELS: Record<PriorityKey, string> = { 1: 'Urgent', 2: 'Soon', 3: 'When there is time' };

export function priorityLabel(priority: number): string {
  return PRIORITY_LABELS[String(priority) as PriorityKey] ?? `Priority ${priority}`;
}

export const STATUS_LABELS: Record<string, string> = { planned: 'Not started', in_progress: 'Under way', done: 'Done' };

export function taskLabel(task: string): string {
  return task === 'custom' ? 'Other work' : (WORK_TASK_LABELS[task as WorkTask] ?? task);
}

/** A currency from the server, trusted only when Feltwire knows its minor units. */
export function asCurrency(value: unknown): Currency {
  return typeof value === 'string' && value in CURRENCY_DIGITS ? (value as Currency) : 'USD';
}

export const money = (minor: number, currency: unknown) => formatMoney(minor, asCurrency(currency));

const trim = (n: number, digits = 2) => String(Number(n.toFixed(digits)));

/** 8 -> "8 h", 10.5 -> "10.5 h". */
export function formatHours(hours: number): string {
  return `${trim(hours)} h`;
}

/** 552 -> "9 h 12 min"; 45 -> "45 min". */
export function formatMinutes(minutes: number): string {
  const m = Math.max(0, Math.round(minutes));
  const h = Math.floor(m / 60);
  const rest = m % 60;
  if (!h) return `${rest} min`;
  return rest ? `${h} h ${rest} min` : `${h} h`;
}

/** A running clock: 0:04:09, 1:12:30. */
export function formatClock(ms: number): string {
  const s = Math.max(0, Math.floor(ms / 1000));
  const h = Math.floor(s / 3600);
  const m = Math.floor((s % 3600) / 60);
  const sec = s % 60;
  return `${h}:${String(m).padStart(2, '0')}:${String(sec).padStart(2, '0')}`;
}

const DAY = new Intl.DateTimeFormat('en-GB', { weekday: 'short', day: 'numeric', month: 'short' });
const DAY_YEAR = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
const DAY_TIME = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });

/** Today as YYYY-MM-DD in the device's own calendar. */
export function todayIso(now = new Date()): string {
  return `${now.getFullYear()}-${String(now.getMonth() + 1).padStart(2, '0')}-${String(now.getDate()).padStart(2, '0')}`;
}

export function addDaysIso(iso: string, days: number): string {
  const [y, m, d] = iso.split('-').map(Number);
  const date = new Date(y, m - 1, d + days);
  return todayIso(date);
}

function localDate(iso: string): Date {
  const [y, m, d] = iso.slice(0, 10).split('-').map(Number);
  return new Date(y, m - 1, d);
}

export interface DueWords {
  text: string;
  overdue: boolean;
}

/** "due Thu 3 Dec", "due today", "overdue since Mon 30 Nov"; null when no date is set. */
export function dueWords(dueOn: string | null, now = new Date()): DueWords | null {
  if (!dueOn) return null;
  const today = todayIso(now);
  const day = dueOn.slice(0, 10);
  if (day === today) return { text: 'due today', overdue: false };
  if (day < today) return { text: `overdue since ${DAY.format(localDate(day))}`, overdue: true };
  return { text: `due ${DAY.format(localDate(day))}`, overdue: false };
}

export function formatDate(iso: string | null | undefined): string {
  if (!iso) return '—';
  const date = iso.length === 10 ? localDate(iso) : new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : DAY_YEAR.format(date);
}

export function formatWhen(iso: string | null | undefined): string {
  if (!iso) return '—';
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : DAY_TIME.format(date);
}

/** Typed major units ("95.50", "95,50") to a number, or null when it is not one. */
export function parseAmount(text: string): number | null {
  const t = text.trim().replace(',', '.');
  if (!t || !/^\d+(\.\d+)?$/.test(t)) return null;
  return Number(t);
}

/** Typed number: null when empty, NaN when not a number. */
export function parseNumber(text: string): number | null {
  const t = text.trim().replace(',', '.');
  if (!t) return null;
  return /^-?\d+(\.\d+)?$/.test(t) ? Number(t) : Number.NaN;
}

/** Minor units back to the text a field shows in major units. */
export function minorToText(minor: number, currency: Currency): string {
  const digits = CURRENCY_DIGITS[currency];
  return (minor / 10 ** digits).toFixed(digits);
}

/** The check that called for a piece of work, in words a technician reads at the bench. */
export const checkLabel = checkWords;

export type VarianceKind = 'over' | 'under' | 'even';

export function varianceKind(varianceMinor: number): VarianceKind {
  return varianceMinor > 0 ? 'over' : varianceMinor < 0 ? 'under' : 'even';
}

/** "USD 49.00 over the estimate", "USD 12.00 under", "on the estimate". */
export function varianceWords(varianceMinor: number, currency: unknown): string {
  const kind = varianceKind(varianceMinor);
  if (kind === 'even') return 'on the estimate';
  return `${money(Math.abs(varianceMinor), currency)} ${kind}`;
}
