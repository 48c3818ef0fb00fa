// Relative luminance and contrast ratio as defined by W3C WCAG 2.2 (SC 1.4.3 and its definitions).

export type Rgb = readonly [number, number, number];

/** '#RRGGBB' or '#RGB' to 0..255 channels. */
export function parseHex(hex: string): Rgb {
  const m = /^#?([0-9a-f]{3}|[0-9a-f]{6})$/i.exec(hex.trim());
  if (!m) throw new Error(`not a hex colour: ${hex}`);
  const digits = m[1].length === 3 ? [...m[1]].map((d) => d + d).join('') : m[1];
  return [0, 2, 4].map((i) => parseInt(digits.slice(i, i + 2), 16)) as unknown as Rgb;
}

/** sRGB channel (0..255) to linear light; WCAG 2.2 uses the 0.04045 threshold of IEC 61966-2-1. */
export function linearChannel(channel: number): number {
  const c = channel / 255;
  return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
}

export function relativeLuminance(colour: string | Rgb): number {
  const [r, g, b] = typeof colour === 'string' ? parseHex(colour) : colour;
  return 0.2126 * linearChannel(r) + 0.7152 * linearChannel(g) + 0.0722 * linearChannel(b);
}

/** (L1 + 0.05) / (L2 + 0.05) with L1 the lighter colour: 1 to 21. */
export function contrastRatio(a: string | Rgb, b: string | Rgb): number {
  const la = relativeLuminance(a);
  const lb = relativeLuminance(b);
  return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
}

/** SC 1.4.3 minimum: 4.5:1, or 3:1 for large text. */
export function minimumContrast(large: boolean): number {
  return large ? 3 : 4.5;
}

export function meetsTextContrast(text: string, background: string, large: boolean): boolean {
  return contrastRatio(text, background) >= minimumContrast(large);
}
