import type { WorkTask } from '@/modules/assessment/core/work-tasks';
import type { RateCard } from '@/modules/shop/core/rate-card';
import { BaseModel } from '@/server/db/base-model';

export class RateCardSet extends BaseModel {
  static tableName = 'rate_cards';
  static hasUpdatedAt = false;
  static jsonAttributes = ['card'];
  id!: number;
  version!: string;
  card!: RateCard;
  createdById!: number | null;
}

export class WorkPlan extends BaseModel {
  static tableName = 'work_plans';
  static hasUpdatedAt = false;
  id!: number;
  pianoId!: number;
  assessmentId!: number | null;
  rateCardVersion!: string;
  currency!: RateCard['currency'];
  hourlyRateMinor!: number;
  createdById!: number;
  createdAt!: string;
  approvedById!: number | null;
  approvedAt!: string | null;
}

export const WORK_STATUSES = ['planned', 'in_progress', 'done'] as const;
export type WorkStatus = (typeof WORK_STATUSES)[number];

export class WorkItem extends BaseModel {
  static tableName = 'work_items';
  id!: number;
  planId!: number;
  pianoId!: number;
  task!: WorkTask | 'custom';
  title!: string;
  estimatedHours!: number;
  estimatedPartsMinor!: number;
  quantity!: number;
  because!: string[];
  assignedToId!: number | null;
  priority!: number;
  dueOn!: string | null;
  status!: WorkStatus;
  doneAt!: string | null;
  /** Marked done with no time logged: why, for staff. */
  doneReason!: string | null;
  createdAt!: string;

  static jsonSchema = {
    type: 'object',
    properties: {
      id: { type: 'integer' },
      planId: { type: 'integer' },
      pianoId: { type: 'integer' },
      task: { type: 'string' },
      title: { type: 'string', minLength: 1, maxLength: 120 },
      estimatedHours: { type: 'number', minimum: 0, maximum: 200 },
      estimatedPartsMinor: { type: 'integer', minimum: 0 },
      quantity: { type: 'integer', minimum: 1 },
      assignedToId: { type: ['integer', 'null'] },
      priority: { type: 'integer', minimum: 1, maximum: 3 },
      dueOn: { type: ['string', 'null'] },
      status: { type: 'string', enum: [...WORK_STATUSES] },
      doneAt: { type: ['string', 'null'] },
      doneReason: { type: ['string', 'null'] },
      createdAt: { type: 'string' },
      updatedAt: { type: 'string' },
    },
  };
}

export class TimeEntry extends BaseModel {
  static tableName = 'time_entries';
  static hasUpdatedAt = false;
  id!: number;
  workItemId!: number;
  technicianId!: number;
  startedAt!: string;
  endedAt!: string | null;
  minutes!: number | null;
  note!: string | null;
}

/** One correction of a time entry; append-only. */
export class TimeEntryCorrection extends BaseModel {
  static tableName = 'time_entry_corrections';
  static hasUpdatedAt = false;
  id!: number;
  timeEntryId!: number;
  correctedById!: number;
  correctedAt!: string;
  oldMinutes!: number;
  newMinutes!: number;
  why!: string;
}

export class PartUse extends BaseModel {
  static tableName = 'part_uses';
  static hasUpdatedAt = false;
  id!: number;
  workItemId!: number;
  description!: string;
  quantity!: number;
  costMinor!: number;
  loggedById!: number;
  createdAt!: string;
}

export class WorkNote extends BaseModel {
  static tableName = 'work_notes';
  static hasUpdatedAt = false;
  id!: number;
  workItemId!: number;
  authorId!: number;
  body!: string;
  createdAt!: string;
}

export class ClimateReadingRow extends BaseModel {
  static tableName = 'climate_readings';
  static hasUpdatedAt = false;
  id!: number;
  tempC!: number;
  relativeHumidity!: number;
  emcPct!: number;
  loggedById!: number;
  at!: string;
}
