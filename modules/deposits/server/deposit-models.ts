import type { DepositStatus } from '@/modules/deposits/core/deposit';
import { BaseModel } from '@/server/db/base-model';

export type { DepositStatus };

export class Deposit extends BaseModel {
  static tableName = 'deposits';
  static hasUpdatedAt = false;
  id!: number;
  pianoId!: number;
  disclosureId!: number;
  acknowledgementId!: number;
  disclosureDigest!: string;
  buyerName!: string;
  buyerEmail!: string;
  amountMinor!: number;
  currency!: string;
  checkoutSessionId!: string;
  paymentIntentId!: string | null;
  status!: DepositStatus;
  createdAt!: string;
  paidAt!: string | null;
  holdExpiresAt!: string | null;
  closedAt!: string | null;
  refundId!: string | null;
  refundedMinor!: number;
  closeReason!: string | null;
}

export class PaymentEvent extends BaseModel {
  static tableName = 'payment_events';
  static idColumn = 'event_id';
  static hasUpdatedAt = false;
  eventId!: string;
  type!: string;
}
