// The kinds of workshop task a finding can call for; the workshop's rate card prices each one.
export const WORK_TASKS = [
  'regulation',
  'rebush_keys',
  'ease_front_rail_pins',
  'ease_sticking_keys',
  'replace_keytops',
  'reshape_voice_hammers',
  'replace_hammers',
  'voicing',
  'replace_broken_strings',
  'restring_section',
  'soundboard_repair',
  'reglue_ribs',
  'pitch_raise',
  'fine_tuning',
  'tuning_pin_repair',
  'cabinet_touch_up',
] as const;
export type WorkTask = (typeof WORK_TASKS)[number];

export const WORK_TASK_LABELS: Record<WorkTask, string> = {
  regulation: 'Regulation',
  rebush_keys: 'Rebush keys',
  ease_front_rail_pins: 'Ease front rail pins',
  ease_sticking_keys: 'Free sticking keys',
  replace_keytops: 'Replace keytops',
  reshape_voice_hammers: 'Reshape and voice hammers',
  replace_hammers: 'Replace hammers',
  voicing: 'Voicing',
  replace_broken_strings: 'Replace broken strings',
  restring_section: 'Restring a section',
  soundboard_repair: 'Soundboard shim or repair',
  reglue_ribs: 'Reglue soundboard ribs',
  pitch_raise: 'Pitch raise',
  fine_tuning: 'Fine tuning',
  tuning_pin_repair: 'Tuning pin repair (larger pins or pin block)',
  cabinet_touch_up: 'Cabinet touch-up',
};

/** The part of the piano each task works on: where its photos are taken and where a buyer reads of it. */
export type WorkArea = 'keys' | 'hammers' | 'strings' | 'soundboard' | 'tuning' | 'case';
export const WORK_TASK_AREAS: Record<WorkTask, WorkArea> = {
  regulation: 'keys',
  rebush_keys: 'keys',
  ease_front_rail_pins: 'keys',
  ease_sticking_keys: 'keys',
  replace_keytops: 'keys',
  reshape_voice_hammers: 'hammers',
  replace_hammers: 'hammers',
  voicing: 'hammers',
  replace_broken_strings: 'strings',
  restring_section: 'strings',
  soundboard_repair: 'soundboard',
  reglue_ribs: 'soundboard',
  pitch_raise: 'tuning',
  fine_tuning: 'tuning',
  tuning_pin_repair: 'tuning',
  cabinet_touch_up: 'case',
};

/** One recommended piece of work; `hours` only where the finding itself sizes the job. */
export interface WorkItem {
  task: WorkTask;
  hours?: number | null;
  /** How many units the task covers where the rate card prices it per unit (strings, keytops). */
  quantity?: number | null;
  note?: string | null;
  /** A cheaper partial fix offered instead of the full one. */
  alternativeTo?: WorkTask | null;
}
