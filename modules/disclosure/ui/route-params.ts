/** `?version=3` from the address bar; anything else means the newest version. */
export function parseVersion(value: unknown): number | null {
  if (typeof value !== 'string' || !/^[1-9][0-9]{0,5}$/.test(value)) return null;
  return Number(value);
}

/** `?session=cs_...` from the payment provider's return address. */
export function parseSession(value: unknown): string | null {
  return typeof value === 'string' && /^cs_[A-Za-z0-9_]{8,80}$/.test(value) ? value : null;
}
