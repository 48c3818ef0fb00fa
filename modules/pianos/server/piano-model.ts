import { CASE_CONDITIONS, PIANO_KINDS, STAGES, type CaseCondition, type PianoKind, type Stage } from '@/modules/pianos/core/piano';
import { StaffMember } from '@/modules/accounts/server/staff-member-model';
import { BaseModel } from '@/server/db/base-model';

export class Piano extends BaseModel {
  static tableName = 'pianos';

  id!: number;
  stockNumber!: string;
  maker!: string;
  model!: string | null;
  serialNumber!: string | null;
  year!: number | null;
  yearIsEstimate!: boolean;
  yearFrom!: number | null;
  yearTo!: number | null;
  caseCondition!: CaseCondition | null;
  caseNotes!: string | null;
  askingPriceMinor!: number | null;
  priceCurrency!: string | null;
  kind!: PianoKind;
  sizeCm!: number | null;
  finish!: string | null;
  stage!: Stage;
  stageChangedAt!: string;
  createdById!: number | null;
  createdAt!: string;
  createdBy?: StaffMember;

  static jsonSchema = {
    type: 'object',
    required: ['maker', 'kind'],
    properties: {
      id: { type: 'integer' },
      stockNumber: { type: 'string' },
      maker: { type: 'string', minLength: 1, maxLength: 80 },
      model: { type: ['string', 'null'], maxLength: 80 },
      serialNumber: { type: ['string', 'null'], maxLength: 40 },
      year: { type: ['integer', 'null'], minimum: 1700, maximum: 2100 },
      yearIsEstimate: { type: 'boolean' },
      yearFrom: { type: ['integer', 'null'], minimum: 1700, maximum: 2100 },
      yearTo: { type: ['integer', 'null'], minimum: 1700, maximum: 2100 },
      caseCondition: { anyOf: [{ type: 'string', enum: [...CASE_CONDITIONS] }, { type: 'null' }] },
      caseNotes: { type: ['string', 'null'], maxLength: 500 },
      askingPriceMinor: { type: ['integer', 'null'], minimum: 0 },
      priceCurrency: { type: ['string', 'null'] },
      kind: { type: 'string', enum: [...PIANO_KINDS] },
      sizeCm: { type: ['integer', 'null'], minimum: 50, maximum: 400 },
      finish: { type: ['string', 'null'], maxLength: 80 },
      stage: { type: 'string', enum: [...STAGES] },
      stageChangedAt: { type: 'string' },
      createdById: { type: ['integer', 'null'] },
      createdAt: { type: 'string' },
      updatedAt: { type: 'string' },
    },
  };

  static relationMappings = () => ({
    // Who logged the piano in, by name: every staff role reads it.
    createdBy: {
      relation: BaseModel.BelongsToOneRelation,
      modelClass: StaffMember,
      join: { from: 'pianos.created_by_id', to: 'staff_members.id' },
    },
  });
}
