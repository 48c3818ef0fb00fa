import type { Stage } from '@/modules/pianos/core/piano';
import { BaseModel } from '@/server/db/base-model';

export class StageMove extends BaseModel {
  static tableName = 'stage_moves';
  static hasUpdatedAt = false;
  id!: number;
  pianoId!: number;
  action!: string;
  fromStage!: Stage | null;
  toStage!: Stage;
  why!: string | null;
  byUserId!: number | null;
  byRole!: string;
  at!: string;

  static jsonSchema = {
    type: 'object',
    properties: {
      id: { type: 'integer' },
      pianoId: { type: 'integer' },
      action: { type: 'string' },
      fromStage: { type: ['string', 'null'] },
      toStage: { type: 'string' },
      why: { type: ['string', 'null'] },
      byUserId: { type: ['integer', 'null'] },
      byRole: { type: 'string' },
      at: { type: 'string' },
    },
  };
}
