import { StaffMember } from '@/modules/accounts/server/staff-member-model';
import { BaseModel } from '@/server/db/base-model';

export class ToneRecording extends BaseModel {
  static tableName = 'tone_recordings';
  static hasUpdatedAt = false;
  id!: number;
  pianoId!: number | null;
  assessmentId!: number | null;
  draftKey!: string | null;
  source!: 'recorded' | 'uploaded';
  objectKey!: string;
  bytes!: number;
  sampleRate!: number;
  channels!: number;
  durationS!: number;
  recordedById!: number;
  recordedAt!: string | Date;
  recordedBy?: StaffMember;
  notes?: ToneNoteRow[];

  static relationMappings = () => ({
    recordedBy: { relation: BaseModel.BelongsToOneRelation, modelClass: StaffMember, join: { from: 'tone_recordings.recorded_by_id', to: 'staff_members.id' } },
    notes: { relation: BaseModel.HasManyRelation, modelClass: ToneNoteRow, join: { from: 'tone_recordings.id', to: 'tone_notes.recording_id' } },
  });
}

export class ToneNoteRow extends BaseModel {
  static tableName = 'tone_notes';
  static hasUpdatedAt = false;
  id!: number;
  recordingId!: number;
  position!: number;
  startS!: number;
  frequencyHz!: number;
  key!: number;
  cents!: number;
  levelDb!: number;
}
