import type { WorkTask } from '@/modules/assessment/core/work-tasks';

// The usual cautions for work that can hurt someone. Feltwire defers to local codes and licensed practice.
export type CautionKind = 'pitch' | 'chemicals' | 'moving' | 'tension';

export const CAUTIONS: Record<CautionKind, string> = {
  pitch: 'Old strings can break when the pitch is raised. Wear eye protection, and let a technician judge whether the strings will stand it.',
  chemicals: 'Voicing and refinishing chemicals: work in a well-ventilated place and follow the product’s safety data sheet.',
  moving: 'Moving a piano: pianos are heavy and tip easily. Moves are for trained movers with proper equipment.',
  tension: 'Strings are under high tension: wear eye protection and gloves when removing or fitting them.',
};

export const CAUTION_FOOTER = 'These are the usual cautions, not a full safety procedure: follow local codes and licensed practice.';

const BY_TASK: Partial<Record<WorkTask, CautionKind[]>> = {
  pitch_raise: ['pitch'],
  fine_tuning: [],
  reshape_voice_hammers: ['chemicals'],
  voicing: ['chemicals'],
  cabinet_touch_up: ['chemicals', 'moving'],
  restring_section: ['tension', 'moving'],
  replace_broken_strings: ['tension'],
  soundboard_repair: ['moving', 'chemicals'],
  reglue_ribs: ['moving', 'chemicals'],
  tuning_pin_repair: ['tension', 'moving'],
};

export function cautionsFor(task: string): { kind: CautionKind; text: string }[] {
  return (BY_TASK[task as WorkTask] ?? []).map((kind) => ({ kind, text: CAUTIONS[kind] }));
}
