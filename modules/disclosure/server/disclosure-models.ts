import type { AnyDisclosureContent } from '@/modules/disclosure/core/disclosure';
import { BaseModel } from '@/server/db/base-model';

export class Disclosure extends BaseModel {
  static tableName = 'disclosures';
  static hasUpdatedAt = false;
  static jsonAttributes = ['content'];
  id!: number;
  pianoId!: number;
  version!: number;
  /** Frozen as published: format 2, or the first shape for versions published before it. */
  content!: AnyDisclosureContent;
  html!: string;
  digest!: string;
  publishedById!: number;
  publishedAt!: string;
}

export class DisclosureLink extends BaseModel {
  static tableName = 'disclosure_links';
  static idColumn = 'piano_id';
  static hasUpdatedAt = false;
  pianoId!: number;
  token!: string;
}

export class Acknowledgement extends BaseModel {
  static tableName = 'acknowledgements';
  static hasUpdatedAt = false;
  id!: number;
  disclosureId!: number;
  buyerName!: string;
  buyerEmail!: string;
  digest!: string;
  acknowledgedAt!: string;
  receiptToken!: string;
  countersignedById!: number | null;
  countersignedAt!: string | null;
  pdfKey!: string | null;
  /** an earlier acknowledgement by the same buyer of the same version, which stands for this one */
  repeatsId!: number | null;
}

export class ShopSetting extends BaseModel {
  static tableName = 'shop_settings';
  static idColumn = 'key';
  static hasUpdatedAt = false;
  static jsonAttributes = ['value'];
  key!: string;
  value!: unknown;
  updatedById!: number | null;
  declare updatedAt: string;
}
