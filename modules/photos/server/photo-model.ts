import type { PhotoArea } from '@/modules/photos/core/photo-rules';
import { BaseModel } from '@/server/db/base-model';

export class Photo extends BaseModel {
  static tableName = 'photos';
  static hasUpdatedAt = false;
  id!: number;
  pianoId!: number | null;
  draftKey!: string | null;
  area!: PhotoArea;
  caption!: string | null;
  workItemId!: number | null;
  phase!: 'before' | 'after' | null;
  objectKey!: string;
  contentType!: string;
  bytes!: number;
  uploadedById!: number;
  createdAt!: string;
}
