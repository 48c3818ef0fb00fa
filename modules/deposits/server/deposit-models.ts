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

/** A recorded sale. The buyer's details are personal data: served only to roles with `readBuyerDetails`. */
export class Sale extends BaseModel {
  static tableName = 'sales';
  static hasUpdatedAt = false;
  id!: number;
  pianoId!: number;
  buyerName!: string;
  buyerPhone!: string | null;
  buyerEmail!: string | null;
  buyerAddress!: string | null;
  currency!: string;
  agreedPriceMinor!: number;
  salesTaxPct!: number;
  taxMinor!: number;
  totalMinor!: number;
  depositId!: number | null;
  depositMinor!: number;
  tradeInPianoId!: number | null;
  tradeInAllowanceMinor!: number;
  balanceMinor!: number;
  owedToBuyerMinor!: number;
  recordedById!: number;
  recordedAt!: string;
  balancePaidAt!: string | null;
  balancePaidHow!: 'in_shop' | 'online' | null;
  balancePaidById!: number | null;
  balanceCheckoutSessionId!: string | null;
  balancePaymentIntentId!: string | null;
}
