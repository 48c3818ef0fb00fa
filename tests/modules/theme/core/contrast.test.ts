import { contrastRatio, linearChannel, meetsTextContrast, parseHex, relativeLuminance } from '@/modules/theme/core/contrast';
import { EDGE_PAIRS, PALETTE, STAGE_TONES, TEXT_PAIRS } from '@/modules/theme/core/palette';

describe('contrastRatio', () => {
  it('matches the published extremes', () => {
    // W3C WCAG 2.2, SC 1.4.3
    expect(contrastRatio('#000000', '#FFFFFF')).toBeCloseTo(21, 10);
    // W3C WCAG 2.2, SC 1.4.3
    expect(contrastRatio('#FFFFFF', '#FFFFFF')).toBe(1);
  });

  it('is symmetric', () => {
    expect(contrastRatio('#1F3A34', '#F6F1E7')).toBe(contrastRatio('#F6F1E7', '#1F3A34'));
  });

  it('gives the usual values for common greys', () => {
    // from memory: #767676 is the lightest grey that passes 4.5:1 on white (about 4.54:1)
    expect(contrastRatio('#767676', '#FFFFFF')).toBeCloseTo(4.54, 2);
    // from memory: #777777 just fails on white (about 4.48:1)
    expect(contrastRatio('#777777', '#FFFFFF')).toBeCloseTo(4.48, 2);
    // from memory: #959595 on white is about 3.0:1, the large-text threshold
    expect(contrastRatio('#959595', '#FFFFFF')).toBeCloseTo(3.0, 1);
  });
});

describe('relativeLuminance', () => {
  it('is 0 for black and 1 for white', () => {
    // W3C WCAG 2.2, definition of relative luminance
    expect(relativeLuminance('#000')).toBe(0);
    expect(relativeLuminance('#fff')).toBe(1);
  });

  it('weights the primaries 0.2126, 0.7152, 0.0722', () => {
    // W3C WCAG 2.2, definition of relative luminance
    expect(relativeLuminance('#FF0000')).toBeCloseTo(0.2126, 10);
    expect(relativeLuminance('#00FF00')).toBeCloseTo(0.7152, 10);
    expect(relativeLuminance('#0000FF')).toBeCloseTo(0.0722, 10);
  });

  it('linearises below and above the 0.04045 threshold', () => {
    // W3C WCAG 2.2, definition of relative luminance: c / 12.92 at or below 0.04045
    expect(linearChannel(10)).toBeCloseTo(10 / 255 / 12.92, 12);
    // W3C WCAG 2.2, definition of relative luminance: ((c + 0.055) / 1.055) ^ 2.4 above it
    expect(linearChannel(128)).toBeCloseTo(((128 / 255 + 0.055) / 1.055) ** 2.4, 12);
  });
});

describe('parseHex', () => {
  it('reads long and short forms', () => {
    expect(parseHex('#1F3A34')).toEqual([31, 58, 52]);
    expect(parseHex('abc')).toEqual([170, 187, 204]);
  });

  it('refuses what is not a colour', () => {
    expect(() => parseHex('#12345')).toThrow('not a hex colour');
  });
});

describe('the theme', () => {
  it('lists a badge pair for every stage', () => {
    const uses = TEXT_PAIRS.map((p) => p.use);
    for (const stage of Object.keys(STAGE_TONES)) expect(uses).toContain(`stage badge: ${stage}`);
  });

  it('uses only hex colours', () => {
    for (const colour of Object.values(PALETTE)) expect(() => parseHex(colour)).not.toThrow();
  });

  // W3C WCAG 2.2, SC 1.4.3: at least 4.5:1 for text, 3:1 for large text
  it.each(TEXT_PAIRS.map((p) => [p.use, p.text, p.background, p.large] as const))(
    '%s (%s on %s, large: %s) meets the minimum contrast',
    (_use, text, background, large) => {
      expect(contrastRatio(text, background)).toBeGreaterThanOrEqual(large ? 3 : 4.5);
      expect(meetsTextContrast(text, background, large)).toBe(true);
    },
  );

  // W3C WCAG 2.2, SC 1.4.11: at least 3:1 for the edges of controls and the focus indicator
  it.each(EDGE_PAIRS.map((p) => [p.use, p.edge, p.background] as const))('%s (%s on %s) stands out 3:1', (_use, edge, background) => {
    expect(contrastRatio(edge, background)).toBeGreaterThanOrEqual(3);
  });
});
