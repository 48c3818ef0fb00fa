import { cents } from '@/modules/tone/core/pitch';

import { defaultRules, type GradeRules } from './grade-rules';
import type { Crack, Measurements } from './measurements';
import type { WorkItem } from './work-tasks';

export const SEVERITIES = ['sound', 'watch', 'needs_work', 'serious'] as const;
export type Severity = (typeof SEVERITIES)[number];
export const SEVERITY_LABELS: Record<Severity, string> = {
  sound: 'Sound',
  watch: 'Watch',
  needs_work: 'Needs work',
  serious: 'Serious',
};

export const AREAS = ['keys', 'hammers', 'strings', 'soundboard', 'tuning', 'play'] as const;
export type Area = (typeof AREAS)[number];
export const AREA_LABELS: Record<Area, string> = {
  keys: 'Keys',
  hammers: 'Hammers',
  strings: 'Strings',
  soundboard: 'Soundboard',
  tuning: 'Tuning and pitch',
  play: 'Play test',
};

export type Band = 'excellent' | 'good' | 'fair' | 'poor';
export const BAND_LABELS: Record<Band, string> = { excellent: 'Excellent', good: 'Good', fair: 'Fair', poor: 'Poor' };

export interface Finding {
  area: Area;
  /** A stable name for the check, e.g. `keys.sidePlay` or `soundboard.crack.2`. */
  check: string;
  severity: Severity;
  /** Plain words a buyer could read. */
  finding: string;
  work: WorkItem[];
  mustDisclose: boolean;
}

export interface Grade {
  rulesVersion: string;
  findings: Finding[];
  score: number;
  band: Band;
  referToTechnician: boolean;
  notRecommendedForRetail: boolean;
  /** Cents of the measured A4 from 440 Hz, when A4 was measured. */
  centsFromStandard: number | null;
}

const fmt = (n: number, digits = 1) => String(Number(n.toFixed(digits)));
const keyList = (keys: number[]) => keys.map((k) => `${k}`).join(', ');

function finding(area: Area, check: string, severity: Severity, text: string, work: WorkItem[] = []): Finding {
  // Everything short of sound goes on the buyer's disclosure.
  return { area, check, severity, finding: text, work, mustDisclose: severity !== 'sound' };
}

/** Regulation hours for a key-level deviation: light up to the light limit, rising to a full regulation. */
export function regulationHours(deviationMm: number, rules: GradeRules = defaultRules): number {
  const { keyLevelLightRegulationMm: light, keyLevelFullRegulationMm: full, lightRegulationHours: lo, fullRegulationHours: hi } = rules;
  if (deviationMm <= light) return lo;
  if (deviationMm >= full) return hi;
  const hours = lo + ((deviationMm - light) / (full - light)) * (hi - lo);
  return Math.round(hours * 2) / 2;
}

function gradeKeys(m: Measurements, r: GradeRules): Finding[] {
  const out: Finding[] = [];
  if (m.keyTouchesNeighbour) {
    out.push(
      finding('keys', 'keys.sidePlay', 'needs_work', 'A key can be pushed sideways until it touches its neighbour: the key bushings are worn.', [
        { task: 'rebush_keys' },
        { task: 'ease_front_rail_pins', alternativeTo: 'rebush_keys', note: 'cheaper partial fix' },
      ]),
    );
  } else if (m.keySidePlayMm != null) {
    const mm = m.keySidePlayMm;
    out.push(
      mm <= r.keySidePlayNormalMm
        ? finding('keys', 'keys.sidePlay', 'sound', `Keys move ${fmt(mm)} mm sideways at the front, within the normal range.`)
        : finding('keys', 'keys.sidePlay', 'watch', `Keys move ${fmt(mm)} mm sideways at the front, more than usual: the key bushings are wearing.`, [
            { task: 'ease_front_rail_pins' },
          ]),
    );
  }
  if (m.keyLevelDeviationMm != null) {
    const mm = m.keyLevelDeviationMm;
    if (mm <= r.keyLevelSoundMm) {
      out.push(finding('keys', 'keys.level', 'sound', `Keys rest level (within ${fmt(mm)} mm).`));
    } else {
      const hours = regulationHours(mm, r);
      const severity: Severity = mm <= r.keyLevelLightRegulationMm ? 'watch' : 'needs_work';
      const text =
        severity === 'watch'
          ? `Keys rest up to ${fmt(mm)} mm out of level: a light regulation will even them.`
          : `Keys rest up to ${fmt(mm)} mm out of level: the action needs regulation.`;
      out.push(finding('keys', 'keys.level', severity, text, [{ task: 'regulation', hours }]));
    }
  }
  const damage = m.keytopDamage ?? [];
  if (damage.length) {
    const severity: Severity = damage.includes('missing') ? 'needs_work' : 'watch';
    out.push(
      finding('keys', 'keys.keytops', severity, `Keytops: ${damage.join(', ')}.`, severity === 'needs_work' || damage.includes('chipped') ? [{ task: 'replace_keytops' }] : []),
    );
  }
  const stuck = [...(m.stickingKeys ?? []), ...(m.deadKeys ?? [])];
  if (stuck.length) {
    const parts = [
      m.stickingKeys?.length ? `sticking keys ${keyList(m.stickingKeys)}` : '',
      m.deadKeys?.length ? `silent keys ${keyList(m.deadKeys)}` : '',
    ].filter(Boolean);
    out.push(finding('keys', 'keys.sticking', 'needs_work', `Keys that do not play freely: ${parts.join('; ')}.`, [{ task: 'ease_sticking_keys' }]));
  }
  return out;
}

function gradeHammers(m: Measurements, r: GradeRules): Finding[] {
  const endOfLife = m.hammerFelt === 'chemically_hardened' || m.hammerFeltLeft === 'none';
  const groove = m.hammerGrooveDepthMm;
  if (endOfLife || (groove != null && groove >= r.hammerGrooveReplaceMm)) {
    const why = [
      groove != null && groove >= r.hammerGrooveReplaceMm ? `string grooves ${fmt(groove)} mm deep` : '',
      m.hammerFelt === 'chemically_hardened' ? 'felt hardened by chemicals' : '',
      m.hammerFeltLeft === 'none' ? 'no felt left to shape' : '',
    ].filter(Boolean);
    return [finding('hammers', 'hammers.wear', 'serious', `Hammers are at the end of their life (${why.join(', ')}); they cannot be revoiced and must be replaced.`, [{ task: 'replace_hammers' }])];
  }
  const out: Finding[] = [];
  if (groove != null) {
    out.push(
      groove <= r.hammerGrooveNormalMm
        ? finding('hammers', 'hammers.wear', 'sound', `Hammer string grooves are shallow (${fmt(groove)} mm), as is normal.`)
        : finding('hammers', 'hammers.wear', 'needs_work', `Hammer string grooves are ${fmt(groove)} mm deep: the hammers need reshaping and voicing.`, [{ task: 'reshape_voice_hammers' }]),
    );
  }
  if (m.hammerFelt === 'hard' || m.hammerFeltLeft === 'thin') {
    const why = [m.hammerFelt === 'hard' ? 'the felt is hard, which brightens the tone' : '', m.hammerFeltLeft === 'thin' ? 'little felt is left to shape' : ''].filter(Boolean);
    out.push(finding('hammers', 'hammers.felt', 'watch', `Hammer felt: ${why.join('; ')}.`, [{ task: 'voicing' }]));
  }
  return out;
}

// What each observed string state means: severity and the buyer's words; the worst state asks for restringing.
const STEEL_STATES: Record<NonNullable<Measurements['steelCorrosion']>, [Severity, string]> = {
  none: ['sound', 'Treble (steel) strings are clean.'],
  light: ['sound', 'Treble (steel) strings show light surface rust, usual for their age.'],
  moderate: ['watch', 'Treble (steel) strings show moderate rust: a sign of age.'],
  heavy: ['needs_work', 'Treble (steel) strings are heavily rusted and pitted: they should be replaced.'],
};
const BASS_STATES: Record<NonNullable<Measurements['bassWinding']>, [Severity, string]> = {
  bright: ['sound', 'Bass (copper-wound) strings are bright.'],
  dull: ['sound', 'Bass (copper-wound) strings are dulled, usual for their age.'],
  dark: ['watch', 'Bass (copper-wound) strings are dark with oxidation: a sign of age.'],
  green: ['needs_work', 'Bass (copper-wound) strings show green oxidation: they should be replaced.'],
};

function stringSection(check: string, state: [Severity, string], section: string): Finding {
  const [severity, text] = state;
  return finding('strings', check, severity, text, severity === 'needs_work' ? [{ task: 'restring_section', note: section }] : []);
}

function gradeStrings(m: Measurements): Finding[] {
  const out: Finding[] = [];
  if (m.steelCorrosion) out.push(stringSection('strings.steel', STEEL_STATES[m.steelCorrosion], 'treble section'));
  if (m.bassWinding) out.push(stringSection('strings.bass', BASS_STATES[m.bassWinding], 'bass section'));
  if (m.brokenStrings) {
    const n = m.brokenStrings;
    const strings = `${n} string${n === 1 ? '' : 's'}`;
    out.push(finding('strings', 'strings.broken', 'needs_work', `${n} broken string${n === 1 ? '' : 's'}.`, [{ task: 'replace_broken_strings', quantity: n, note: strings }]));
  }
  return out;
}

function describeCrack(c: Crack, r: GradeRules): string {
  const effects = [c.crossesRib ? 'crosses a rib' : '', c.buzzes ? 'buzzes' : '', c.hurtsTuning ? 'affects tuning stability' : ''].filter(Boolean);
  const wide = c.widestGapMm >= r.wideCrackGapMm ? ', a wide crack (a payment card fits in it)' : '';
  const size = `${fmt(c.lengthCm)} cm long, ${fmt(c.widestGapMm, 2)} mm at its widest${wide}`;
  return effects.length
    ? `Soundboard crack, ${size}: it ${effects.join(', ')}. This is a structural concern.`
    : `Soundboard crack, ${size}: it does not cross a rib, buzz or affect tuning, so it is cosmetic, but it lowers resale value.`;
}

function gradeSoundboard(m: Measurements, r: GradeRules): Finding[] {
  const cracks = m.soundboardCracks ?? [];
  const out = cracks.map((c, i) => {
    const serious = c.crossesRib || c.buzzes || c.hurtsTuning;
    return finding('soundboard', `soundboard.crack.${i + 1}`, serious ? 'serious' : 'watch', describeCrack(c, r), serious ? [{ task: 'soundboard_repair' }] : []);
  });
  if (m.ribsSeparated) {
    out.push(finding('soundboard', 'soundboard.ribs', 'needs_work', 'A soundboard rib has come away from the board and needs regluing.', [{ task: 'reglue_ribs' }]));
  }
  if (!cracks.length && m.ribsSeparated === false) {
    out.push(finding('soundboard', 'soundboard.cracks', 'sound', 'No soundboard cracks found; the ribs are sound.'));
  }
  return out;
}

function gradeTuning(m: Measurements, r: GradeRules): { findings: Finding[]; centsFromStandard: number | null } {
  const out: Finding[] = [];
  let c: number | null = null;
  if (m.a4Hz != null) {
    c = cents(m.a4Hz);
    const where = `A4 measured at ${fmt(m.a4Hz, 1)} Hz, ${fmt(Math.abs(c), 0)} cents ${c < 0 ? 'below' : 'above'} standard pitch (440 Hz)`;
    // Compared at 0.01-cent resolution, far finer than any measurement, so limits hold exactly.
    const at = Math.round(c * 100) / 100;
    if (Math.abs(at) <= r.pitchSoundCents) {
      out.push(finding('tuning', 'tuning.pitch', 'sound', `A4 measured at ${fmt(m.a4Hz, 1)} Hz, within ${r.pitchSoundCents} cents of standard pitch (440 Hz).`));
    }
    else if (at < -r.pitchRaiseCents) out.push(finding('tuning', 'tuning.pitch', 'needs_work', `${where}: it needs a pitch raise before a fine tuning.`, [{ task: 'pitch_raise' }, { task: 'fine_tuning' }]));
    else if (at > r.pitchRaiseCents) out.push(finding('tuning', 'tuning.pitch', 'needs_work', `${where}: it needs a rough pass to bring the pitch down before a fine tuning.`, [{ task: 'fine_tuning', note: 'two passes' }]));
    else out.push(finding('tuning', 'tuning.pitch', 'watch', `${where}: a fine tuning brings it to pitch.`, [{ task: 'fine_tuning' }]));
  }
  if (m.tuningPins === 'loose') {
    out.push(finding('tuning', 'tuning.pins', 'serious', 'Tuning pins are loose: the piano will not hold a tuning until the pins or pin block are repaired.', [{ task: 'tuning_pin_repair' }]));
  } else if (m.tuningPins === 'some_loose') {
    out.push(finding('tuning', 'tuning.pins', 'watch', 'Some tuning pins turn too easily; the tuning may not hold as long as it should.'));
  } else if (m.tuningPins === 'firm') {
    out.push(finding('tuning', 'tuning.pins', 'sound', 'Tuning pins hold firmly.'));
  }
  return { findings: out, centsFromStandard: c };
}

function gradePlay(m: Measurements, r: GradeRules): { findings: Finding[]; poor: boolean } {
  const out: Finding[] = [];
  const ratings = [
    ['bass', m.bassEvenness],
    ['middle', m.middleEvenness],
    ['treble', m.trebleEvenness],
    ['overall impression', m.overallImpression],
  ].filter((x): x is [string, number] => x[1] != null);
  let poor = false;
  if (ratings.length) {
    const low = ratings.filter(([, v]) => v <= r.playPoorAtOrBelow).map(([k]) => k);
    const fair = ratings.filter(([, v]) => v > r.playPoorAtOrBelow && v < r.playGoodAtOrAbove).map(([k]) => k);
    if (low.length) {
      poor = true;
      out.push(finding('play', 'play.tone', 'serious', `Plays poorly in the play test (${low.join(', ')}). However well the rest checks out, it is not ready to sell as it stands.`, [{ task: 'regulation' }, { task: 'voicing' }]));
    } else if (fair.length) {
      out.push(finding('play', 'play.tone', 'watch', `Tone is uneven in places (${fair.join(', ')}); voicing will even it out.`, [{ task: 'voicing' }]));
    } else {
      out.push(finding('play', 'play.tone', 'sound', 'Tone is even from key to key across the bass, middle and treble.'));
    }
  }
  if (m.dynamicRange != null) {
    const d = m.dynamicRange;
    if (d <= r.playPoorAtOrBelow) out.push(finding('play', 'play.dynamics', 'needs_work', 'Little difference between soft and loud playing.', [{ task: 'voicing' }]));
    else if (d < r.playGoodAtOrAbove) out.push(finding('play', 'play.dynamics', 'watch', 'The range from soft to loud is fair.'));
    else out.push(finding('play', 'play.dynamics', 'sound', 'A good range from soft to loud.'));
  }
  if (m.notesStickingOut?.length) {
    out.push(finding('play', 'play.notes', 'watch', `Notes that stand out from their neighbours: keys ${keyList(m.notesStickingOut)}.`, [{ task: 'voicing', note: `keys ${keyList(m.notesStickingOut)}` }]));
  }
  return { findings: out, poor };
}

export function bandFor(score: number, rules: GradeRules = defaultRules): Band {
  if (score >= rules.bands.excellent) return 'excellent';
  if (score >= rules.bands.good) return 'good';
  if (score >= rules.bands.fair) return 'fair';
  return 'poor';
}

/** Grades an inspection from its measurements. Pure: the screen runs it live, the server again on submit. */
export function gradeAssessment(m: Measurements, rules: GradeRules = defaultRules): Grade {
  const tuning = gradeTuning(m, rules);
  const play = gradePlay(m, rules);
  const findings = [...gradeKeys(m, rules), ...gradeHammers(m, rules), ...gradeStrings(m), ...gradeSoundboard(m, rules), ...tuning.findings, ...play.findings];
  const p = rules.scorePenalty;
  const penalty = findings.reduce((sum, f) => sum + (f.severity === 'watch' ? p.watch : f.severity === 'needs_work' ? p.needsWork : f.severity === 'serious' ? p.serious : 0), 0);
  const score = Math.max(0, 100 - penalty);
  return {
    rulesVersion: rules.version,
    findings,
    score,
    band: bandFor(score, rules),
    referToTechnician: findings.some((f) => f.severity === 'serious'),
    notRecommendedForRetail: play.poor,
    centsFromStandard: tuning.centsFromStandard,
  };
}
