// Feltwire's look: the greens, woods and papers of a piano workshop. Pure values, no React.
import type { AreaMark } from '@/modules/assessment/core/grade';
import type { Stage } from '@/modules/pianos/core/piano';

export const PALETTE = {
  /** deep green of damper and key-frame felt: the brand colour, the navigation */
  felt: '#1F3A34',
  /** felt in shadow: pressed states */
  feltShade: '#16302A',
  /** pale wash of felt: the selected item, quiet panels */
  feltMist: '#E3ECE6',
  /** soft nav text on felt */
  feltLichen: '#C9D8CF',
  /** aged key-top ivory: the page */
  ivory: '#F6F1E7',
  /** fresh paper of a work ticket: cards and fields */
  vellum: '#FFFCF5',
  /** sharp ink of an ebony key: main text */
  ebony: '#221D19',
  /** dark cabinet wood: secondary text */
  walnut: '#5A4636',
  /** grey of an old tuning pin: quiet text */
  pinGrey: '#625A52',
  /** unbleached cloth: borders and rules */
  linen: '#E4DACA',
  /** a darker thread of linen: field borders (non-text, 3:1 on the page) */
  linenDark: '#8F8374',
  /** pedal brass: decorative rules only, never text */
  brass: '#B8862F',
  /** brass in shade: accent text and the focus ring */
  brassShade: '#7C5A17',
  /** red-brown rosewood: danger and errors */
  rosewood: '#9A2F24',
  /** rosewood in shade: a pressed danger button */
  rosewoodShade: '#7F261D',
  /** a blush of rosewood: the ground of an error notice */
  rosewoodBlush: '#F7E4DF',
  /** moss on an old case: success */
  moss: '#3E6B45',
  /** a wash of moss: the ground of a success notice */
  mossMist: '#DDEBDD',
} as const;

export type PaletteName = keyof typeof PALETTE;

/** Each stage's tag: a ground and an ink, and the strip the tag's eyelet is punched through; the word always goes with it. */
export interface StageTone {
  ground: string;
  ink: string;
  /** the tag's strip and the tile's edge: a strong line in the stage's colour */
  edge: string;
}

export const STAGE_TONES: Record<Stage, StageTone> = {
  received: { ground: '#E3E8EE', ink: '#2E3F52', edge: '#2E3F52' },
  assessed: { ground: '#EFE6D2', ink: '#5E4712', edge: '#5E4712' },
  in_workshop: { ground: '#F3DEC9', ink: '#7A3E12', edge: '#7A3E12' },
  ready: { ground: PALETTE.mossMist, ink: '#2D5A33', edge: '#2D5A33' },
  on_floor: { ground: PALETTE.felt, ink: PALETTE.ivory, edge: PALETTE.felt },
  held: { ground: '#F4E2A8', ink: '#5C4506', edge: '#5C4506' },
  sold: { ground: '#D9E3EF', ink: '#1F3D63', edge: '#1F3D63' },
  delivered: { ground: '#E6E6E1', ink: '#3F3F3A', edge: '#3F3F3A' },
  wholesaled: { ground: '#ECE0E6', ink: '#5B2F46', edge: '#5B2F46' },
  returned_to_owner: { ground: '#EDE3DC', ink: '#5A3E2E', edge: '#5A3E2E' },
};

/** The shape each mark is drawn with: five shapes apart, so no mark leans on its colour. */
export type MarkShape = 'circle' | 'bar' | 'square' | 'triangle' | 'dashed-ring';

export interface MarkLook {
  shape: MarkShape;
  /** the word and the shape */
  ink: string;
  /** the tag behind them */
  ground: string;
}

/** Feltwire's marks, one set for staff, buyers and paper: fine, noted, needs work, major work, not inspected. */
export const MARK_LOOKS: Record<AreaMark, MarkLook> = {
  fine: { shape: 'circle', ink: '#2D5A33', ground: PALETTE.mossMist },
  noted: { shape: 'bar', ink: '#5E4712', ground: '#EFE6D2' },
  work: { shape: 'square', ink: '#7A3E12', ground: '#F3DEC9' },
  major: { shape: 'triangle', ink: PALETTE.rosewood, ground: PALETTE.rosewoodBlush },
  unseen: { shape: 'dashed-ring', ink: PALETTE.pinGrey, ground: PALETTE.vellum },
};

/** Family names as registered with expo-font; the ui layer maps them to the font files. */
export const FONT_FAMILIES = {
  display: 'Fraunces_600SemiBold',
  body: 'SourceSans3_400Regular',
  bodyStrong: 'SourceSans3_600SemiBold',
} as const;

export interface TypeStyle {
  fontFamily: string;
  fontSize: number;
  lineHeight: number;
  /** numeric weight for the fallback font while the web font loads */
  fontWeight: '400' | '600';
}

export const TYPE_SCALE = {
  display: { fontFamily: FONT_FAMILIES.display, fontSize: 34, lineHeight: 40, fontWeight: '600' },
  title: { fontFamily: FONT_FAMILIES.display, fontSize: 26, lineHeight: 32, fontWeight: '600' },
  heading: { fontFamily: FONT_FAMILIES.display, fontSize: 21, lineHeight: 28, fontWeight: '600' },
  subheading: { fontFamily: FONT_FAMILIES.bodyStrong, fontSize: 18, lineHeight: 24, fontWeight: '600' },
  body: { fontFamily: FONT_FAMILIES.body, fontSize: 17, lineHeight: 25, fontWeight: '400' },
  bodyStrong: { fontFamily: FONT_FAMILIES.bodyStrong, fontSize: 17, lineHeight: 25, fontWeight: '600' },
  label: { fontFamily: FONT_FAMILIES.bodyStrong, fontSize: 15, lineHeight: 20, fontWeight: '600' },
  small: { fontFamily: FONT_FAMILIES.body, fontSize: 15, lineHeight: 21, fontWeight: '400' },
  badge: { fontFamily: FONT_FAMILIES.bodyStrong, fontSize: 14, lineHeight: 18, fontWeight: '600' },
} as const satisfies Record<string, TypeStyle>;

export type TypeName = keyof typeof TYPE_SCALE;

export const SPACE = { xxs: 2, xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32, xxxl: 48 } as const;

export const RADIUS = { sm: 6, md: 10, lg: 14, pill: 999 } as const;

export const LAYOUT = {
  /** from this window width the staff shell shows a side navigation instead of a bottom bar */
  wideFrom: 900,
  sideNavWidth: 248,
  contentMaxWidth: 1120,
  formMaxWidth: 560,
  /** WCAG 2.2 SC 2.5.8 asks 24 px; 44 px is the comfortable size for a thumb */
  touchTarget: 44,
} as const;

/** Text of at least this size (or this size when bold) counts as large text (W3C WCAG 2.2, "large scale"). */
export const LARGE_TEXT_PX = 24;
export const LARGE_BOLD_TEXT_PX = 18.66;

export interface TextPair {
  /** where the pair appears */
  use: string;
  text: string;
  background: string;
  large: boolean;
}

const isLarge = (t: TypeStyle) => t.fontSize >= LARGE_TEXT_PX || (t.fontWeight === '600' && t.fontSize >= LARGE_BOLD_TEXT_PX);
const T = TYPE_SCALE;
const P = PALETTE;

/** Every text colour on every ground the theme puts it on; the contrast test walks this list. */
export const TEXT_PAIRS: readonly TextPair[] = [
  { use: 'page title on the page', text: P.ebony, background: P.ivory, large: isLarge(T.display) },
  { use: 'body text on the page', text: P.ebony, background: P.ivory, large: isLarge(T.body) },
  { use: 'body text on a card', text: P.ebony, background: P.vellum, large: isLarge(T.body) },
  { use: 'secondary text on the page', text: P.walnut, background: P.ivory, large: isLarge(T.small) },
  { use: 'secondary text on a card', text: P.walnut, background: P.vellum, large: isLarge(T.small) },
  { use: 'quiet text on the page', text: P.pinGrey, background: P.ivory, large: isLarge(T.small) },
  { use: 'quiet text on a card', text: P.pinGrey, background: P.vellum, large: isLarge(T.small) },
  { use: 'body text on a hovered row', text: P.ebony, background: P.feltMist, large: isLarge(T.body) },
  { use: 'secondary text on a hovered row', text: P.walnut, background: P.feltMist, large: isLarge(T.small) },
  { use: 'quiet text on a selected row', text: P.pinGrey, background: P.feltMist, large: isLarge(T.small) },
  { use: 'accent text (eyebrows, links) on the page', text: P.brassShade, background: P.ivory, large: isLarge(T.label) },
  { use: 'accent text on a card', text: P.brassShade, background: P.vellum, large: isLarge(T.label) },
  { use: 'field text and placeholder-free input', text: P.ebony, background: P.vellum, large: isLarge(T.body) },
  { use: 'field error below a field', text: P.rosewood, background: P.ivory, large: isLarge(T.small) },
  { use: 'field error on a card', text: P.rosewood, background: P.vellum, large: isLarge(T.small) },
  { use: 'error notice', text: P.rosewood, background: P.rosewoodBlush, large: isLarge(T.body) },
  { use: 'success notice', text: P.felt, background: P.mossMist, large: isLarge(T.body) },
  { use: 'success text on the page', text: P.moss, background: P.ivory, large: isLarge(T.small) },
  { use: 'success text on a card', text: P.moss, background: P.vellum, large: isLarge(T.small) },
  { use: 'primary button label', text: P.vellum, background: P.felt, large: isLarge(T.bodyStrong) },
  { use: 'primary button label, pressed', text: P.vellum, background: P.feltShade, large: isLarge(T.bodyStrong) },
  { use: 'secondary button label', text: P.felt, background: P.vellum, large: isLarge(T.bodyStrong) },
  { use: 'secondary button label, pressed', text: P.felt, background: P.feltMist, large: isLarge(T.bodyStrong) },
  { use: 'danger button label', text: P.vellum, background: P.rosewood, large: isLarge(T.bodyStrong) },
  { use: 'danger button label, pressed', text: P.vellum, background: P.rosewoodShade, large: isLarge(T.bodyStrong) },
  { use: 'quiet button label on the page', text: P.felt, background: P.ivory, large: isLarge(T.bodyStrong) },
  { use: 'quiet button label on a card', text: P.felt, background: P.vellum, large: isLarge(T.bodyStrong) },
  { use: 'navigation brand on felt', text: P.ivory, background: P.felt, large: isLarge(T.heading) },
  { use: 'navigation label on felt', text: P.ivory, background: P.felt, large: isLarge(T.bodyStrong) },
  { use: 'navigation item on felt', text: P.feltLichen, background: P.felt, large: isLarge(T.bodyStrong) },
  { use: 'navigation item on felt, hovered', text: P.feltLichen, background: P.feltShade, large: isLarge(T.small) },
  { use: 'navigation label on felt, hovered', text: P.ivory, background: P.feltShade, large: isLarge(T.bodyStrong) },
  { use: 'navigation item, current', text: P.felt, background: P.ivory, large: isLarge(T.bodyStrong) },
  { use: 'introduction on the sign-in panel', text: P.feltLichen, background: P.felt, large: isLarge(T.body) },
  { use: 'signed-in user on felt', text: P.feltLichen, background: P.felt, large: isLarge(T.small) },
  { use: 'bottom bar item', text: P.walnut, background: P.vellum, large: isLarge(T.label) },
  { use: 'bottom bar item, current', text: P.felt, background: P.feltMist, large: isLarge(T.label) },
  { use: 'selected choice', text: P.ivory, background: P.felt, large: isLarge(T.label) },
  ...Object.entries(STAGE_TONES).map(([stage, tone]) => ({
    use: `stage badge: ${stage}`,
    text: tone.ink,
    background: tone.ground,
    large: isLarge(T.badge),
  })),
  ...Object.entries(MARK_LOOKS).flatMap(([mark, look]) => [
    { use: `mark tag: ${mark}`, text: look.ink, background: look.ground, large: isLarge(T.badge) },
    // the verdict's words stand in the mark's ink on a card, at heading size and at body size for its reasons
    { use: `mark word on a card: ${mark}`, text: look.ink, background: P.vellum, large: isLarge(T.label) },
    { use: `mark word on the page: ${mark}`, text: look.ink, background: P.ivory, large: isLarge(T.label) },
  ]),
  { use: 'priority tag: urgent', text: P.rosewood, background: P.rosewoodBlush, large: isLarge(T.badge) },
  { use: 'priority tag', text: P.walnut, background: P.vellum, large: isLarge(T.badge) },
  { use: 'stage tile label', text: P.walnut, background: P.vellum, large: isLarge(T.label) },
  { use: 'stage tile count', text: P.ebony, background: P.vellum, large: isLarge(T.title) },
];

export interface EdgePair {
  use: string;
  edge: string;
  background: string;
}

/** Edges a user must see to use a control: W3C WCAG 2.2 SC 1.4.11 asks 3:1 against what is next to them. */
export const EDGE_PAIRS: readonly EdgePair[] = [
  { use: 'text field border on a card', edge: P.linenDark, background: P.vellum },
  { use: 'text field border on the page', edge: P.linenDark, background: P.ivory },
  { use: 'focus ring on the page', edge: P.brassShade, background: P.ivory },
  { use: 'focus ring on a card', edge: P.brassShade, background: P.vellum },
  { use: 'focus ring on a selected row', edge: P.brassShade, background: P.feltMist },
  { use: 'focus halo on the felt navigation', edge: P.vellum, background: P.felt },
  { use: 'choice and button outline on a card', edge: P.felt, background: P.vellum },
  { use: 'sign-out outline on felt', edge: P.feltLichen, background: P.felt },
  // A mark's shape carries meaning beside its word: it must be seen against its tag and on a card (SC 1.4.11).
  ...Object.entries(MARK_LOOKS).flatMap(([mark, look]) => [
    { use: `mark shape on its tag: ${mark}`, edge: look.ink, background: look.ground },
    { use: `mark shape on a card: ${mark}`, edge: look.ink, background: P.vellum },
  ]),
  ...Object.entries(STAGE_TONES).map(([stage, tone]) => ({ use: `stage strip beside its eyelet: ${stage}`, edge: tone.edge, background: P.vellum })),
  { use: 'dashed edge of a not-inspected tag', edge: P.linenDark, background: P.vellum },
  { use: 'priority chevron, urgent', edge: P.rosewood, background: P.rosewoodBlush },
  { use: 'priority chevron', edge: P.walnut, background: P.vellum },
];
