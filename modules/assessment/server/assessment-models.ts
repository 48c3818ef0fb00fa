import type { Grade } from '@/modules/assessment/core/grade';
import type { GradeRules } from '@/modules/assessment/core/grade-rules';
import type { Measurements } from '@/modules/assessment/core/measurements';
import { StaffMember } from '@/modules/accounts/server/staff-member-model';
import { BaseModel } from '@/server/db/base-model';

export class Intake extends BaseModel {
  static tableName = 'intakes';
  id!: number;
  pianoId!: number;
  sellerName!: string;
  sellerPhone!: string | null;
  sellerEmail!: string | null;
  sellerAddress!: string | null;
  acquisition!: string;
  receivedOn!: string;
  inspectedAt!: string;
  notes!: string | null;
  samePianoAsId!: number | null;
  createdById!: number;
  createdAt!: string;
}

export class Assessment extends BaseModel {
  static tableName = 'assessments';
  static hasUpdatedAt = false;
  static jsonAttributes = ['measurements', 'grade'];
  id!: number;
  pianoId!: number;
  version!: number;
  kind!: 'intake' | 'post_workshop';
  measurements!: Measurements;
  /** As stored: format 2, or an older shape the service regrades from the measurements when read. */
  grade!: Grade;
  /** The fields a re-measurement measured again; null before the column existed. */
  remeasuredFields!: string[] | null;
  referToTechnician!: boolean;
  notRecommendedForRetail!: boolean;
  rulesVersion!: string;
  changeNote!: string | null;
  submittedById!: number;
  submittedAt!: string;
  submittedBy?: StaffMember;

  // The JSON documents stay out of the generated read type; hand-written queries serve them whole.
  static jsonSchema = {
    type: 'object',
    properties: {
      id: { type: 'integer' },
      pianoId: { type: 'integer' },
      version: { type: 'integer' },
      kind: { type: 'string', enum: ['intake', 'post_workshop'] },
      referToTechnician: { type: 'boolean' },
      notRecommendedForRetail: { type: 'boolean' },
      rulesVersion: { type: 'string' },
      changeNote: { type: ['string', 'null'] },
      submittedById: { type: 'integer' },
      submittedAt: { type: 'string' },
    },
  };

  static relationMappings = () => ({
    submittedBy: { relation: BaseModel.BelongsToOneRelation, modelClass: StaffMember, join: { from: 'assessments.submitted_by_id', to: 'staff_members.id' } },
  });
}

export class GradeRuleSet extends BaseModel {
  static tableName = 'grade_rule_sets';
  static hasUpdatedAt = false;
  static jsonAttributes = ['rules'];
  id!: number;
  version!: string;
  rules!: GradeRules;
  createdById!: number | null;
  createdAt!: string;
}
