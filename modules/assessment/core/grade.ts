import { cents, centsOffset, FROM_STANDARD } from '@/modules/tone/core/pitch';

import { defaultRules, type GradeRules } from './grade-rules';
import { MEASURES, type Crack, type Measurements } from './measurements';
import type { WorkItem } from './work-tasks';

/**
 * Feltwire's marks: one set for staff, buyers and paper. A finding is fine, noted (worth knowing,
 * nothing to do), needs work, or major work; an area nobody looked at is not inspected.
 */
export const MARKS = ['fine', 'noted', 'work', 'major'] as const;
export type Mark = (typeof MARKS)[number];
export type AreaMark = Mark | 'unseen';
export const MARK_WORDS: Record<AreaMark, string> = {
  fine: 'Fine',
  noted: 'Noted',
  work: 'Needs work',
  major: 'Major work',
  unseen: 'Not inspected',
};
/** What each mark means, in words for anyone reading it: the key beside the marks. */
export const MARK_MEANINGS: Record<AreaMark, string> = {
  fine: 'nothing to do',
  noted: 'worth knowing; no work needed',
  work: 'work the piano calls for',
  major: 'a large repair or a structural concern',
  unseen: 'nobody measured it, so nothing is claimed',
};
const MARK_RANK: Record<Mark, number> = { fine: 0, noted: 1, work: 2, major: 3 };

/** The worst of some marks; null when there are none. */
export function worstMark(marks: readonly Mark[]): Mark | null {
  return marks.reduce<Mark | null>((w, m) => (w == null || MARK_RANK[m] > MARK_RANK[w] ? m : w), null);
}

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

export type MeasureField = keyof Measurements;

/** The area each measurement belongs to: an area is inspected when one of its measurements is given. */
export const FIELD_AREAS = Object.fromEntries(MEASURES.map((m) => [m.key, m.area])) as Record<MeasureField, Area>;

/** The readiness verdict a dealer acts on. */
export const READINESS = ['floor', 'work_first', 'wholesale', 'unjudged'] as const;
export type Readiness = (typeof READINESS)[number];
export const READINESS_WORDS: Record<Readiness, string> = {
  floor: 'Ready for the floor',
  work_first: 'Needs work first',
  wholesale: 'For wholesale',
  unjudged: 'Not judged yet',
};
/** Each verdict wears the mark of what it means: nothing to do, work, not for retail, not looked at enough. */
export const READINESS_MARKS: Record<Readiness, AreaMark> = { floor: 'fine', work_first: 'work', wholesale: 'major', unjudged: 'unseen' };

export interface Finding {
  area: Area;
  /** A stable name for the check, e.g. `keys.sidePlay` or `soundboard.crack.2`. */
  check: string;
  mark: Mark;
  /** Plain words a buyer could read. */
  finding: string;
  work: WorkItem[];
  mustDisclose: boolean;
  /** The measurements the finding rests on: re-measuring all of them after the work replaces it. */
  fields: MeasureField[];
}

export interface Grade {
  /** The shape of this record: 2 since marks and readiness replaced the score. */
  format: 2;
  rulesVersion: string;
  findings: Finding[];
  /** Areas with at least one measurement, in area order. */
  inspectedAreas: Area[];
  /** The shop's rule in force: fewer inspected areas than this make the grade provisional. */
  minInspectedAreas: number;
  provisional: boolean;
  playTested: boolean;
  readiness: Readiness;
  referToTechnician: boolean;
  notRecommendedForRetail: boolean;
  /** Cents of the measured A4 from 440 Hz, when A4 was measured. */
  centsFromStandard: number | null;
}

/** A grade as screens and reports read it: everything but the record's own format number. */
export type GradeView = Omit<Grade, 'format'>;

const fmt = (n: number, digits = 1) => String(Number(n.toFixed(digits)));
const keyList = (keys: number[]) => keys.map((k) => `${k}`).join(', ');

function finding(area: Area, check: string, mark: Mark, text: string, fields: MeasureField[], work: WorkItem[] = []): Finding {
  // Everything short of fine goes on the buyer's disclosure.
  return { area, check, mark, finding: text, work, mustDisclose: mark !== 'fine', fields };
}

const given = (v: unknown) => v != null && !(Array.isArray(v) && v.length === 0);

/** The areas an inspection looked at: each with at least one measurement given. */
export function inspectedAreas(m: Measurements): Area[] {
  const seen = new Set((Object.keys(m) as MeasureField[]).filter((f) => FIELD_AREAS[f] && given(m[f])).map((f) => FIELD_AREAS[f]));
  return AREAS.filter((a) => seen.has(a));
}

/** Regulation hours for a key-level deviation: light up to the light limit, rising to a full regulation. */
export function regulationHours(deviationMm: number, rules: GradeRules = defaultRules): number {
  const { keyLevelLightRegulationMm: light, keyLevelFullRegulationMm: full, lightRegulationHours: lo, fullRegulationHours: hi } = rules;
  if (deviationMm <= light) return lo;
  if (deviationMm >= full) return hi;
  const hours = lo + ((deviationMm - light) / (full - light)) * (hi - lo);
  return Math.round(hours * 2) / 2;
}

const SIDE_PLAY: MeasureField[] = ['keySidePlayMm', 'keyTouchesNeighbour', 'keysTouchingNeighbour'];

function gradeKeys(m: Measurements, r: GradeRules): Finding[] {
  const out: Finding[] = [];
  if (m.keyTouchesNeighbour) {
    const keys = m.keysTouchingNeighbour ?? [];
    const which = keys.length === 1 ? `Key ${keys[0]} can be pushed sideways until it touches its neighbour` : keys.length ? `Keys ${keyList(keys)} can be pushed sideways until they touch their neighbours` : 'A key can be pushed sideways until it touches its neighbour';
    out.push(
      finding('keys', 'keys.sidePlay', 'work', `${which}: the key bushings are worn.`, SIDE_PLAY, [
        { task: 'rebush_keys' },
        { task: 'ease_front_rail_pins', alternativeTo: 'rebush_keys', note: 'cheaper partial fix' },
      ]),
    );
  } else if (m.keySidePlayMm != null) {
    const mm = m.keySidePlayMm;
    out.push(
      mm <= r.keySidePlayNormalMm
        ? finding('keys', 'keys.sidePlay', 'fine', `Keys move ${fmt(mm)} mm sideways at the front, within the normal range.`, SIDE_PLAY)
        : finding('keys', 'keys.sidePlay', 'noted', `Keys move ${fmt(mm)} mm sideways at the front, more than usual: the key bushings are wearing.`, SIDE_PLAY, [
            { task: 'ease_front_rail_pins' },
          ]),
    );
  } else if (m.keyTouchesNeighbour === false) {
    out.push(finding('keys', 'keys.sidePlay', 'fine', 'No key can be pushed sideways against its neighbour.', SIDE_PLAY));
  }
  if (m.keyLevelDeviationMm != null) {
    const mm = m.keyLevelDeviationMm;
    if (mm <= r.keyLevelSoundMm) {
      out.push(finding('keys', 'keys.level', 'fine', `Keys rest level (within ${fmt(mm)} mm).`, ['keyLevelDeviationMm']));
    } else {
      const hours = regulationHours(mm, r);
      const mark: Mark = mm <= r.keyLevelLightRegulationMm ? 'noted' : 'work';
      const text =
        mark === 'noted'
          ? `Keys rest up to ${fmt(mm)} mm out of level: a light regulation will even them.`
          : `Keys rest up to ${fmt(mm)} mm out of level: the action needs regulation.`;
      out.push(finding('keys', 'keys.level', mark, text, ['keyLevelDeviationMm'], [{ task: 'regulation', hours }]));
    }
  }
  const damage = m.keytopDamage ?? [];
  if (damage.length) {
    const mark: Mark = damage.includes('missing') ? 'work' : 'noted';
    out.push(finding('keys', 'keys.keytops', mark, `Keytops: ${damage.join(', ')}.`, ['keytopDamage'], mark === 'work' || damage.includes('chipped') ? [{ task: 'replace_keytops' }] : []));
  }
  const stuck = [...(m.stickingKeys ?? []), ...(m.deadKeys ?? [])];
  if (stuck.length) {
    const parts = [
      m.stickingKeys?.length ? `sticking keys ${keyList(m.stickingKeys)}` : '',
      m.deadKeys?.length ? `silent keys ${keyList(m.deadKeys)}` : '',
    ].filter(Boolean);
    out.push(finding('keys', 'keys.sticking', 'work', `Keys that do not play freely: ${parts.join('; ')}.`, ['stickingKeys', 'deadKeys'], [{ task: 'ease_sticking_keys' }]));
  }
  return out;
}

const HAMMER_FIELDS: MeasureField[] = ['hammerGrooveDepthMm', 'hammerFelt', 'hammerFeltLeft'];
const FELT_WORDS: Record<string, string> = { soft: 'soft', firm: 'firm' };

function gradeHammers(m: Measurements, r: GradeRules): Finding[] {
  const endOfLife = m.hammerFelt === 'chemically_hardened' || m.hammerFeltLeft === 'none';
  const groove = m.hammerGrooveDepthMm;
  if (endOfLife || (groove != null && groove >= r.hammerGrooveReplaceMm)) {
    const why = [
      groove != null && groove >= r.hammerGrooveReplaceMm ? `string grooves ${fmt(groove)} mm deep` : '',
      m.hammerFelt === 'chemically_hardened' ? 'felt hardened by chemicals' : '',
      m.hammerFeltLeft === 'none' ? 'no felt left to shape' : '',
    ].filter(Boolean);
    return [finding('hammers', 'hammers.wear', 'major', `Hammers are at the end of their life (${why.join(', ')}); they cannot be revoiced and must be replaced.`, HAMMER_FIELDS, [{ task: 'replace_hammers' }])];
  }
  const out: Finding[] = [];
  if (groove != null) {
    out.push(
      groove <= r.hammerGrooveNormalMm
        ? finding('hammers', 'hammers.wear', 'fine', `Hammer string grooves are shallow (${fmt(groove)} mm), as is normal.`, ['hammerGrooveDepthMm'])
        : finding('hammers', 'hammers.wear', 'work', `Hammer string grooves are ${fmt(groove)} mm deep: the hammers need reshaping and voicing.`, ['hammerGrooveDepthMm'], [{ task: 'reshape_voice_hammers' }]),
    );
  }
  const felt: MeasureField[] = ['hammerFelt', 'hammerFeltLeft'];
  if (m.hammerFelt === 'hard' || m.hammerFeltLeft === 'thin') {
    const why = [m.hammerFelt === 'hard' ? 'the felt is hard, which brightens the tone' : '', m.hammerFeltLeft === 'thin' ? 'little felt is left to shape' : ''].filter(Boolean);
    out.push(finding('hammers', 'hammers.felt', 'noted', `Hammer felt: ${why.join('; ')}.`, felt, [{ task: 'voicing' }]));
  } else if (m.hammerFelt || m.hammerFeltLeft) {
    const parts = [m.hammerFelt ? `the felt is ${FELT_WORDS[m.hammerFelt]}` : '', m.hammerFeltLeft === 'ample' ? 'ample felt is left to shape' : ''].filter(Boolean);
    out.push(finding('hammers', 'hammers.felt', 'fine', `Hammer felt: ${parts.join('; ')}.`, felt));
  }
  return out;
}

// What each observed string state means: the mark and the buyer's words; the worst state asks for restringing.
const STEEL_STATES: Record<NonNullable<Measurements['steelCorrosion']>, [Mark, string]> = {
  none: ['fine', 'Treble (steel) strings are clean.'],
  light: ['fine', 'Treble (steel) strings show light surface rust, usual for their age.'],
  moderate: ['noted', 'Treble (steel) strings show moderate rust: a sign of age.'],
  heavy: ['work', 'Treble (steel) strings are heavily rusted and pitted: they should be replaced.'],
};
const BASS_STATES: Record<NonNullable<Measurements['bassWinding']>, [Mark, string]> = {
  bright: ['fine', 'Bass (copper-wound) strings are bright.'],
  dull: ['fine', 'Bass (copper-wound) strings are dulled, usual for their age.'],
  dark: ['noted', 'Bass (copper-wound) strings are dark with oxidation: a sign of age.'],
  green: ['work', 'Bass (copper-wound) strings show green oxidation: they should be replaced.'],
};

function stringSection(check: string, field: MeasureField, state: [Mark, string], section: string): Finding {
  const [mark, text] = state;
  return finding('strings', check, mark, text, [field], mark === 'work' ? [{ task: 'restring_section', note: section }] : []);
}

function gradeStrings(m: Measurements): Finding[] {
  const out: Finding[] = [];
  if (m.steelCorrosion) out.push(stringSection('strings.steel', 'steelCorrosion', STEEL_STATES[m.steelCorrosion], 'treble section'));
  if (m.bassWinding) out.push(stringSection('strings.bass', 'bassWinding', BASS_STATES[m.bassWinding], 'bass section'));
  if (m.brokenStrings) {
    const n = m.brokenStrings;
    const strings = `${n} string${n === 1 ? '' : 's'}`;
    out.push(finding('strings', 'strings.broken', 'work', `${n} broken string${n === 1 ? '' : 's'}.`, ['brokenStrings'], [{ task: 'replace_broken_strings', quantity: n, note: strings }]));
  } else if (m.brokenStrings === 0) {
    out.push(finding('strings', 'strings.broken', 'fine', 'No broken strings.', ['brokenStrings']));
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
    return finding('soundboard', `soundboard.crack.${i + 1}`, serious ? 'major' : 'noted', describeCrack(c, r), ['soundboardCracks'], serious ? [{ task: 'soundboard_repair' }] : []);
  });
  if (m.ribsSeparated) {
    out.push(finding('soundboard', 'soundboard.ribs', 'work', 'A soundboard rib has come away from the board and needs regluing.', ['ribsSeparated'], [{ task: 'reglue_ribs' }]));
  }
  if (!cracks.length && m.ribsSeparated === false) {
    out.push(finding('soundboard', 'soundboard.cracks', 'fine', 'No soundboard cracks found; the ribs are sound.', ['soundboardCracks', 'ribsSeparated']));
  }
  return out;
}

function gradeTuning(m: Measurements, r: GradeRules): { findings: Finding[]; centsFromStandard: number | null } {
  const out: Finding[] = [];
  let c: number | null = null;
  if (m.a4Hz != null) {
    c = cents(m.a4Hz);
    const where = `A4 measured at ${fmt(m.a4Hz, 1)} Hz, ${centsOffset(c, FROM_STANDARD)} (440 Hz)`;
    // Compared at 0.01-cent resolution, far finer than any measurement, so limits hold exactly.
    const at = Math.round(c * 100) / 100;
    const pitch = (mark: Mark, text: string, work: WorkItem[] = []) => finding('tuning', 'tuning.pitch', mark, text, ['a4Hz'], work);
    if (Math.abs(at) <= r.pitchSoundCents) out.push(pitch('fine', `A4 measured at ${fmt(m.a4Hz, 1)} Hz, within ${r.pitchSoundCents} cents of standard pitch (440 Hz).`));
    else if (at < -r.pitchRaiseCents) out.push(pitch('work', `${where}: it needs a pitch raise before a fine tuning.`, [{ task: 'pitch_raise' }, { task: 'fine_tuning' }]));
    else if (at > r.pitchRaiseCents) out.push(pitch('work', `${where}: it needs a rough pass to bring the pitch down before a fine tuning.`, [{ task: 'fine_tuning', note: 'two passes' }]));
    else out.push(pitch('noted', `${where}: a fine tuning brings it to pitch.`, [{ task: 'fine_tuning' }]));
  }
  if (m.tuningPins === 'loose') {
    out.push(finding('tuning', 'tuning.pins', 'major', 'Tuning pins are loose: the piano will not hold a tuning until the pins or pin block are repaired.', ['tuningPins'], [{ task: 'tuning_pin_repair' }]));
  } else if (m.tuningPins === 'some_loose') {
    out.push(finding('tuning', 'tuning.pins', 'noted', 'Some tuning pins turn too easily; the tuning may not hold as long as it should.', ['tuningPins']));
  } else if (m.tuningPins === 'firm') {
    out.push(finding('tuning', 'tuning.pins', 'fine', 'Tuning pins hold firmly.', ['tuningPins']));
  }
  return { findings: out, centsFromStandard: c };
}

const TONE_FIELDS: MeasureField[] = ['bassEvenness', 'middleEvenness', 'trebleEvenness', 'overallImpression'];

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
      out.push(finding('play', 'play.tone', 'major', `Plays poorly in the play test (${low.join(', ')}). However well the rest checks out, it is not ready to sell as it stands.`, TONE_FIELDS, [{ task: 'regulation' }, { task: 'voicing' }]));
    } else if (fair.length) {
      out.push(finding('play', 'play.tone', 'noted', `Tone is uneven in places (${fair.join(', ')}); voicing will even it out.`, TONE_FIELDS, [{ task: 'voicing' }]));
    } else {
      out.push(finding('play', 'play.tone', 'fine', 'Tone is even from key to key across the bass, middle and treble.', TONE_FIELDS));
    }
  }
  if (m.dynamicRange != null) {
    const d = m.dynamicRange;
    if (d <= r.playPoorAtOrBelow) out.push(finding('play', 'play.dynamics', 'work', 'Little difference between soft and loud playing.', ['dynamicRange'], [{ task: 'voicing' }]));
    else if (d < r.playGoodAtOrAbove) out.push(finding('play', 'play.dynamics', 'noted', 'The range from soft to loud is fair.', ['dynamicRange']));
    else out.push(finding('play', 'play.dynamics', 'fine', 'A good range from soft to loud.', ['dynamicRange']));
  }
  if (m.notesStickingOut?.length) {
    out.push(finding('play', 'play.notes', 'noted', `Notes that stand out from their neighbours: keys ${keyList(m.notesStickingOut)}.`, ['notesStickingOut'], [{ task: 'voicing', note: `keys ${keyList(m.notesStickingOut)}` }]));
  }
  return { findings: out, poor };
}

/** The rule that makes a grade provisional, in words for the screens. */
export function provisionalRule(minInspectedAreas: number): string {
  return `A grade is provisional until at least ${minInspectedAreas} of the ${AREAS.length} areas are inspected (the shop’s rule).`;
}

/** Whether a finding asks for work that counts (a cheaper alternative alone does not). */
export const callsForWork = (f: Finding) => f.work.some((w) => !w.alternativeTo);

/**
 * The verdict: wholesale when the play test finds it plays poorly; work first when any finding
 * calls for work; ready for the floor only over a full grade with the play test; otherwise not judged.
 */
export function readinessOf(findings: readonly Finding[], provisional: boolean, playTested: boolean, notRecommendedForRetail: boolean): Readiness {
  if (notRecommendedForRetail) return 'wholesale';
  if (findings.some(callsForWork)) return 'work_first';
  if (provisional || !playTested) return 'unjudged';
  return 'floor';
}

/** Why the verdict is what it is, in plain sentences a dealer reads beside it. */
export function readinessReasons(g: Pick<Grade, 'readiness' | 'provisional' | 'playTested' | 'inspectedAreas' | 'minInspectedAreas' | 'findings'>): string[] {
  const n = g.inspectedAreas.length;
  const out: string[] = [];
  const working = g.findings.filter(callsForWork).length;
  if (g.readiness === 'wholesale') out.push('The play test found it plays poorly: not recommended for retail as it stands.');
  if (g.readiness === 'work_first') out.push(`${working === 1 ? 'One finding calls' : `${working} findings call`} for work before it goes on the floor.`);
  if (g.readiness === 'floor') out.push('Every inspected area is fine or noted, with no work called for.');
  if (n === 0) out.push('Nothing has been inspected yet.');
  else if (g.provisional) out.push(`Provisional: ${n} of ${AREAS.length} areas inspected; the shop asks for ${g.minInspectedAreas}.`);
  if (n > 0 && !g.playTested) out.push('The play test has not been done: it outranks every visual check.');
  return out;
}

/** Grades an inspection from its measurements. Pure: the screen runs it live, the server again on submit. */
export function gradeAssessment(m: Measurements, rules: GradeRules = defaultRules): Grade {
  const tuning = gradeTuning(m, rules);
  const play = gradePlay(m, rules);
  const findings = [...gradeKeys(m, rules), ...gradeHammers(m, rules), ...gradeStrings(m), ...gradeSoundboard(m, rules), ...tuning.findings, ...play.findings];
  const inspected = inspectedAreas(m);
  const minInspectedAreas = rules.minInspectedAreas ?? defaultRules.minInspectedAreas;
  const provisional = inspected.length < minInspectedAreas;
  const playTested = inspected.includes('play');
  return {
    format: 2,
    rulesVersion: rules.version,
    findings,
    inspectedAreas: inspected,
    minInspectedAreas,
    provisional,
    playTested,
    readiness: readinessOf(findings, provisional, playTested, play.poor),
    referToTechnician: findings.some((f) => f.mark === 'major'),
    notRecommendedForRetail: play.poor,
    centsFromStandard: tuning.centsFromStandard,
  };
}

// The checks in the words a technician or a buyer reads: "for key side play", "not measured again: hammer felt".
const CHECK_WORDS: Record<string, string> = {
  'keys.sidePlay': 'key side play',
  'keys.level': 'key level',
  'keys.keytops': 'keytops',
  'keys.sticking': 'sticking or silent keys',
  'hammers.wear': 'hammer wear',
  'hammers.felt': 'hammer felt',
  'strings.broken': 'broken strings',
  'strings.steel': 'treble string corrosion',
  'strings.bass': 'bass string winding',
  'soundboard.cracks': 'soundboard cracks',
  'soundboard.ribs': 'soundboard ribs',
  'tuning.pitch': 'pitch',
  'tuning.pins': 'tuning pins',
  'play.tone': 'evenness of tone',
  'play.dynamics': 'dynamic range',
  'play.notes': 'notes that stand out',
};

export function checkWords(check: string): string {
  if (CHECK_WORDS[check]) return CHECK_WORDS[check];
  const crack = /^soundboard\.crack\.(\d+)$/.exec(check);
  if (crack) return `soundboard crack ${Number(crack[1])}`;
  const area = check.split('.')[0] as Area;
  return AREA_LABELS[area] ? AREA_LABELS[area].toLowerCase() : check;
}

/** The area a check belongs to (`soundboard.crack.2` is the soundboard's). */
export function areaOfCheck(check: string): Area | null {
  const area = check.split('.')[0];
  return (AREAS as readonly string[]).includes(area) ? (area as Area) : null;
}
